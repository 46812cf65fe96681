/**
 * The only way a transaction runs. createDb wraps `db.transaction` with this, so every call site
 * gets the same bounded retry: a deadlock (1213, which a Galera cluster also answers when a
 * write set fails certification) or a lock-wait timeout (1205) rolls the whole transaction back,
 * and running it again from the start is safe. Nested `tx.transaction` calls are savepoints and
 * are not retried on their own: the outermost transaction is.
 *
 * A transaction callback must therefore only touch the database (no mail, no HTTP), so that a
 * second run has the same effect as the first.
 */
import { isRetryableTransactionError } from '../lib/db-errors';

export interface RetryPolicy {
  /** Runs after the first; 0 disables retrying. */
  retries: number;
  /** Backoff before retry n (1-based) is a random delay in [0, baseMs * 2^(n-1)] ("full jitter"). */
  baseMs: number;
}

export const defaultRetryPolicy: RetryPolicy = { retries: 4, baseMs: 15 };

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/** Runs `attempt` again on a retryable lock error, up to policy.retries times, with jittered backoff. */
export async function withTransactionRetry<T>(attempt: () => Promise<T>, policy: RetryPolicy = defaultRetryPolicy): Promise<T> {
  for (let n = 0; ; n++) {
    try {
      return await attempt();
    } catch (error) {
      if (n >= policy.retries || !isRetryableTransactionError(error)) throw error;
      await sleep(Math.random() * policy.baseMs * 2 ** n);
    }
  }
}

type TransactionFn = (...args: never[]) => Promise<unknown>;

/** Replaces `db.transaction` with a retrying version; the type stays exactly drizzle's. */
export function retryTransactions<D extends { transaction: TransactionFn }>(db: D, policy: RetryPolicy = defaultRetryPolicy): D {
  const original = db.transaction.bind(db) as (...args: unknown[]) => Promise<unknown>;
  const retrying = (...args: unknown[]) => withTransactionRetry(() => original(...args), policy);
  Object.defineProperty(db, 'transaction', { value: retrying, writable: false, configurable: true });
  return db;
}
