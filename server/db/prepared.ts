/**
 * Queries whose SQL is built once per database handle rather than on every request (issue 14:
 * per-request cost). Building a Drizzle query walks its whole expression tree; on the hot reads
 * that walk cost more CPU than sending the statement and reading its rows. A prepared query keeps
 * the SQL text and fills its `sql.placeholder(...)` values at execution (client-side, as mysql2's
 * `query` always does: no server-side statement is left open).
 *
 * `build` must be a module-level function (its identity is the cache key) whose query depends on
 * nothing but its placeholders. A list goes in as `inList(column, 'name')`. Inside a
 * transaction the query is prepared on that transaction's handle, and forgotten with it.
 */
import { sql, type AnyColumn, type SQL } from 'drizzle-orm';
import type { DbOrTx } from './client';

const cache = new WeakMap<DbOrTx, Map<unknown, unknown>>();
/** Far more than the queries in the code: more builders than this means one is made per call. */
const MAX_BUILDERS = 500;

export function prepared<P>(db: DbOrTx, build: (db: DbOrTx) => { prepare(): P }): P {
  let byBuild = cache.get(db);
  if (!byBuild) cache.set(db, (byBuild = new Map()));
  let query = byBuild.get(build) as P | undefined;
  if (!query) {
    if (byBuild.size >= MAX_BUILDERS) throw new Error('prepared(): `build` must be a module-level function, not one made per call');
    byBuild.set(build, (query = build(db).prepare()));
  }
  return query;
}

/**
 * `column IN (…)` over a placeholder holding a non-empty array of ids: mysql2 writes an array as
 * a comma-separated list of escaped values. Callers skip the query when the list is empty.
 */
export function inList(column: AnyColumn, name: string): SQL {
  return sql`${column} in (${sql.placeholder(name)})`;
}
