import { is } from 'drizzle-orm';
import { MySqlTable, getTableConfig } from 'drizzle-orm/mysql-core';
import { describe, expect, it } from 'vitest';
import * as schema from './schema';

/**
 * Galera replicates row changes by primary key, and our cluster refuses tables without one
 * (wsrep_mode=REQUIRED_PRIMARY_KEY, scripts/lib/cluster.ts). Checked here from the schema so a new
 * table without a key fails in the ordinary `npm test`, not on the cluster.
 */
describe('every table has a primary key', () => {
  const tables = (Object.values(schema) as unknown[]).filter((value): value is MySqlTable => is(value, MySqlTable));
  it('finds the tables', () => {
    expect(tables.length).toBeGreaterThan(10);
  });
  it.each(tables.map((t) => [getTableConfig(t).name, t] as const))('%s', (_name, table) => {
    const config = getTableConfig(table);
    expect(config.columns.some((c) => c.primary) || config.primaryKeys.length > 0).toBe(true);
  });
});
