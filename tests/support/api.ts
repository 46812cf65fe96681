/**
 * API test harness: the real app on the run's MariaDB database, mail going to a fake SMTP server
 * and photos to a fake S3 server, both started for this test file. No fake of our own backend.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, inject } from 'vitest';
import { createApp } from '../../server/app';
import type { AppContext } from '../../server/context';
import { createDb } from '../../server/db/client';
import { loadEnv } from '../../server/env';
import { startFakeS3, type FakeS3 } from '../../server/lib/fake-s3';
import { startFakeSmtp, type FakeSmtp } from '../../server/mail/fake-smtp';
import { createMailer } from '../../server/mail/mailer';

export interface TestHarness {
  app: ReturnType<typeof createApp>;
  ctx: AppContext;
  smtp: FakeSmtp;
  s3: FakeS3;
  /** A supertest agent that keeps cookies, signed in as the given user. */
  signIn(email: string, password?: string): Promise<ReturnType<typeof request.agent>>;
}

export const defaultPassword = 'correct horse battery';

export async function createHarness(envOverrides: Record<string, string> = {}): Promise<TestHarness> {
  const smtp = await startFakeSmtp();
  const s3Dir = mkdtempSync(path.join(os.tmpdir(), 'wortwise-s3-'));
  const s3 = await startFakeS3({ directory: s3Dir, bucket: 'wortwise-test-photos' });
  const env = loadEnv({
    NODE_ENV: 'test',
    DATABASE_URL: inject('databaseUrl'),
    SMTP_PORT: String(smtp.smtpPort),
    FAKE_SMTP_API_URL: smtp.apiUrl,
    S3_ENDPOINT: s3.endpoint,
    S3_BUCKET: 'wortwise-test-photos',
    AUTH_RATE_LIMIT_MAX: '10000',
    CALC_RATE_LIMIT_MAX: '10000',
    ...envOverrides,
  });
  const { db, pool } = createDb(env.DATABASE_URL);
  const ctx: AppContext = { env, db, pool, mailer: createMailer(env) };
  const app = createApp(ctx);
  afterAll(async () => {
    await pool.end();
    await smtp.close();
    await s3.close();
    rmSync(s3Dir, { recursive: true, force: true });
  });
  return {
    app,
    ctx,
    smtp,
    s3,
    async signIn(email, password = defaultPassword) {
      const agent = request.agent(app);
      await agent.post('/api/auth/login').send({ email, password }).expect(200);
      return agent;
    },
  };
}

/** Waits for mail to a recipient to arrive at the fake SMTP server. */
export async function waitForMail(smtp: FakeSmtp, to: string, timeoutMs = 5_000) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const found = smtp.messages.filter((m) => m.to.includes(to.toLowerCase()));
    if (found.length > 0) return found[found.length - 1];
    if (Date.now() > deadline) throw new Error(`No mail to ${to} within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 50));
  }
}
