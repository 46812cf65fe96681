/**
 * Queries whose SQL is built once rather than on every request (issue 14: per-request cost).
 * Building a Drizzle query walks its whole expression tree; on the hot reads and writes that walk
 * cost more CPU than sending the statement and reading its rows. A prepared query keeps the SQL
 * text and fills its `sql.placeholder(...)` values at execution (client-side, as mysql2's `query`
 * always does: no server-side statement is left open).
 *
 * `build` must be a module-level function (its identity is the cache key) whose query depends on
 * nothing but its placeholders. A list goes in as `inList(column, 'name')`. The SQL is built once
 * per builder; each database handle gets that query bound to its own connection, logger and cache
 * (a transaction's statements run on the transaction, and are counted by its handle's logger).
 */
import { sql, type AnyColumn, type SQL } from 'drizzle-orm';
import type { DbOrTx } from './client';

/** What a handle's session lends the prepared queries made on it (drizzle-orm/mysql2's session). */
interface SessionState {
  client: unknown;
  logger: unknown;
  cache: unknown;
}
const sessionOf = (db: DbOrTx) => (db as unknown as { session: SessionState }).session;

const templates = new Map<unknown, object>();
const bound = new WeakMap<SessionState, Map<unknown, unknown>>();
/** Far more than the queries in the code: more builders than this means one is made per call. */
const MAX_BUILDERS = 500;

/**
 * drizzle asks mysql2 to call a typeCast function for every field of every row, only so that date
 * and time columns arrive as text; the pool reads those as text itself (`dateStrings`, in
 * client.ts), so a prepared query leaves the per-field call out and gets the same values.
 */
function withoutTypeCast<P extends object>(query: P): P {
  const q = query as { query?: { typeCast?: unknown }; rawQuery?: { typeCast?: unknown } };
  for (const key of ['query', 'rawQuery'] as const) {
    const options = q[key];
    if (options && typeof options.typeCast === 'function') {
      const { typeCast: _drop, ...rest } = options;
      q[key] = rest;
    }
  }
  return query;
}

export function prepared<P extends object>(db: DbOrTx, build: (db: DbOrTx) => { prepare(): P }): P {
  const session = sessionOf(db);
  let byBuild = bound.get(session);
  if (!byBuild) bound.set(session, (byBuild = new Map()));
  let query = byBuild.get(build) as P | undefined;
  if (query) return query;
  const template = templates.get(build) as P | undefined;
  if (!template) {
    if (templates.size >= MAX_BUILDERS) throw new Error('prepared(): `build` must be a module-level function, not one made per call');
    query = withoutTypeCast(build(db).prepare());
    templates.set(build, query);
  } else {
    // The same statement on another handle: a copy that runs on that handle's connection.
    query = Object.assign(Object.create(Object.getPrototypeOf(template) as object) as P, template, { client: session.client, logger: session.logger, cache: session.cache });
  }
  byBuild.set(build, query);
  return query;
}

/**
 * `column IN (…)` over a placeholder holding a non-empty array of ids: mysql2 writes an array as
 * a comma-separated list of escaped values. Callers skip the query when the list is empty.
 */
export function inList(column: AnyColumn, name: string): SQL {
  return sql`${column} in (${sql.placeholder(name)})`;
}
