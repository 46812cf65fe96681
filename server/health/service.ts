import type { Pool } from 'mysql2/promise';

/** True when MariaDB answers within two seconds; the pool reconnects by itself when it is back. */
export async function databaseIsUp(pool: Pool): Promise<boolean> {
  try {
    await pool.query({ sql: 'SELECT 1', timeout: 2_000 });
    return true;
  } catch {
    return false;
  }
}
