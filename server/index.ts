import { createApp } from './app';
import type { AppContext } from './context';
import { createDb } from './db/client';
import { assertSafeToListen, loadEnv } from './env';
import { connectRedis } from './lib/rate-limit';
import { startReminderWorker } from './fermentation/reminders';
import { createMailer } from './mail/mailer';

/** Starts the HTTP server; resolves with a function that shuts it down gracefully. */
export async function startServer(env = loadEnv()) {
  assertSafeToListen(env);
  const { db, pool } = createDb(env.DATABASE_URL, { poolSize: env.DB_POOL_SIZE, trace: env.NODE_ENV !== 'production' });
  const redis = env.REDIS_URL ? await connectRedis(env.REDIS_URL) : null;
  const ctx: AppContext = { env, db, pool, mailer: createMailer(env), redis };
  const app = createApp(ctx);
  const server = await new Promise<import('node:http').Server>((resolve) => {
    const s = app.listen(env.PORT, env.HOST, () => resolve(s));
  });
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : env.PORT;
  console.log(`Wortwise is serving on http://${env.HOST}:${port} (rate limits ${redis ? 'shared through Redis' : 'in memory'})`);
  // Fermentation reminders are scheduled in the database; tests run the worker themselves.
  const stopReminders = env.NODE_ENV === 'test' ? null : startReminderWorker(ctx);
  return {
    port,
    ctx,
    async stop() {
      stopReminders?.();
      await new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeIdleConnections();
      });
      await pool.end();
      await redis?.quit().catch(() => redis.disconnect());
    },
  };
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const running = await startServer();
  const shutdown = async (signal: string) => {
    console.log(`${signal}: closing connections`);
    await running.stop();
    process.exit(0);
  };
  process.once('SIGINT', () => void shutdown('SIGINT'));
  process.once('SIGTERM', () => void shutdown('SIGTERM'));
}
