import type { AppContext } from '../context';

/** True when MariaDB answers within two seconds; the pool reconnects by itself when it is back. */
export async function databaseIsUp({ pool }: Pick<AppContext, 'pool'>): Promise<boolean> {
  try {
    await pool.query({ sql: 'SELECT 1', timeout: 2_000 });
    return true;
  } catch {
    return false;
  }
}
