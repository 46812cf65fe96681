import nodemailer from 'nodemailer';
import type { Env } from '../env';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
}

/** Real SMTP through nodemailer; locally and in tests it points at our fake SMTP server. */
export function createMailer(env: Env): Mailer {
  const transport = nodemailer.createTransport({
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    secure: env.SMTP_SECURE,
    ignoreTLS: !env.SMTP_SECURE && env.NODE_ENV !== 'production',
    auth: env.SMTP_USER ? { user: env.SMTP_USER, pass: env.SMTP_PASS ?? '' } : undefined,
  });
  return {
    async send(mail) {
      await transport.sendMail({ from: env.MAIL_FROM, ...mail });
    },
  };
}

/**
 * Sends after the database work has committed. A failed send is logged and reported, never
 * thrown: what was saved stays saved, and the person can ask for the mail again.
 */
export async function sendAfterCommit(mailer: Mailer, mail: OutgoingMail): Promise<boolean> {
  try {
    await mailer.send(mail);
    return true;
  } catch (error) {
    console.warn(`Mail "${mail.subject}" to ${mail.to} could not be sent:`, (error as Error).message);
    return false;
  }
}
