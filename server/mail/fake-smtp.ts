/**
 * A local stand-in for a real mail provider: a genuine SMTP server (smtp-server) that keeps every
 * message it receives, plus a small JSON listing over HTTP so tests and the admin page can read
 * what was sent. Used only by our scripts and tests, never in production.
 */
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

export interface CaughtMail {
  id: number;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  receivedAt: string;
}

export interface FakeSmtp {
  smtpPort: number;
  apiPort: number;
  apiUrl: string;
  messages: CaughtMail[];
  close(): Promise<void>;
}

export async function startFakeSmtp({ smtpPort = 0, apiPort = 0, host = '127.0.0.1' } = {}): Promise<FakeSmtp> {
  // Its listing shows every mail, password-reset links included: this machine only.
  if (!(host === 'localhost' || host === '::1' || /^127\./.test(host))) throw new Error(`The fake SMTP server listens on loopback only, not ${host}.`);
  const messages: CaughtMail[] = [];
  let nextId = 1;
  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          messages.push({
            id: nextId++,
            from: parsed.from?.text ?? session.envelope.mailFrom?.toString() ?? '',
            to: session.envelope.rcptTo.map((r) => r.address),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : null,
            receivedAt: new Date().toISOString(),
          });
          callback();
        })
        .catch(callback);
    },
  });
  await new Promise<void>((resolve, reject) => {
    smtp.once('error', reject);
    smtp.listen(smtpPort, host, () => resolve());
  });
  const api = http.createServer((req, res) => {
    const url = new URL(req.url ?? '/', 'http://localhost');
    if (url.pathname === '/messages' && req.method === 'GET') {
      const to = url.searchParams.get('to')?.toLowerCase();
      const list = to ? messages.filter((m) => m.to.some((a) => a.toLowerCase() === to)) : messages;
      res.writeHead(200, { 'content-type': 'application/json' }).end(JSON.stringify([...list].reverse()));
    } else if (url.pathname === '/messages' && req.method === 'DELETE') {
      messages.length = 0;
      res.writeHead(204).end();
    } else {
      res.writeHead(404, { 'content-type': 'application/json' }).end('{"error":"not_found"}');
    }
  });
  await new Promise<void>((resolve, reject) => {
    api.once('error', reject);
    api.listen(apiPort, host, () => resolve());
  });
  const boundSmtp = (smtp.server.address() as AddressInfo).port;
  const boundApi = (api.address() as AddressInfo).port;
  return {
    smtpPort: boundSmtp,
    apiPort: boundApi,
    apiUrl: `http://${host}:${boundApi}`,
    messages,
    close: () =>
      Promise.all([
        new Promise<void>((r) => smtp.close(() => r())),
        new Promise<void>((r) => {
          api.closeAllConnections();
          api.close(() => r());
        }),
      ]).then(() => undefined),
  };
}
