import { eq, sql } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import { createHarness, type TestHarness } from '../../tests/support/api';
import type { DbOrTx } from './client';
import { createDb } from './client';
import { makeUser } from './factories';
import { inList, prepared } from './prepared';
import { users } from './schema';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
});

const userById = (db: DbOrTx) => db.select({ id: users.id, name: users.displayName }).from(users).where(eq(users.id, sql.placeholder('id')));
const userCreatedAt = (db: DbOrTx) => db.select({ createdAt: users.createdAt }).from(users).where(eq(users.id, sql.placeholder('id')));
const usersByIds = (db: DbOrTx) => db.select({ id: users.id }).from(users).where(inList(users.id, 'ids')).orderBy(users.id);

describe('prepared queries (server/db/prepared.ts)', () => {
  it('builds a query once per handle and fills its placeholders on each run', async () => {
    const [a, b] = [await makeUser(h.ctx.db, { displayName: 'Prepared A' }), await makeUser(h.ctx.db, { displayName: 'Prepared B' })];
    expect(prepared(h.ctx.db, userById)).toBe(prepared(h.ctx.db, userById));
    expect(await prepared(h.ctx.db, userById).execute({ id: a.id })).toEqual([{ id: a.id, name: 'Prepared A' }]);
    expect(await prepared(h.ctx.db, userById).execute({ id: b.id })).toEqual([{ id: b.id, name: 'Prepared B' }]);
    expect(await prepared(h.ctx.db, userById).execute({ id: -1 })).toEqual([]);
  });

  it('reads date and time columns as the unprepared query does (the pool gives them as text, drizzle maps them)', async () => {
    const u = await makeUser(h.ctx.db);
    const [plain] = await h.ctx.db.select({ createdAt: users.createdAt }).from(users).where(eq(users.id, u.id));
    const [viaPrepared] = await prepared(h.ctx.db, userCreatedAt).execute({ id: u.id });
    expect(plain.createdAt).toBeInstanceOf(Date);
    expect(viaPrepared.createdAt).toEqual(plain.createdAt);
    // Written a moment ago: read back as UTC, not shifted by a time zone.
    expect(Math.abs(viaPrepared.createdAt.getTime() - Date.now())).toBeLessThan(10 * 60_000);
  });

  it('writes a list placeholder as an IN list of one or many ids', async () => {
    const made = [await makeUser(h.ctx.db), await makeUser(h.ctx.db), await makeUser(h.ctx.db)];
    const ids = made.map((u) => u.id).sort((x, y) => x - y);
    expect(await prepared(h.ctx.db, usersByIds).execute({ ids: [ids[1]] })).toEqual([{ id: ids[1] }]);
    expect(await prepared(h.ctx.db, usersByIds).execute({ ids })).toEqual(ids.map((id) => ({ id })));
  });

  it('runs inside a transaction on that transaction, seeing its own uncommitted rows', async () => {
    let seen: unknown[] = [];
    const rolledBack = new Error('roll back');
    await expect(
      h.ctx.db.transaction(async (tx) => {
        const u = await makeUser(tx, { displayName: 'Only in the transaction' });
        expect(prepared(tx, userById)).not.toBe(prepared(h.ctx.db, userById));
        seen = await prepared(tx, userById).execute({ id: u.id });
        // Outside the transaction the row does not exist yet.
        expect(await prepared(h.ctx.db, userById).execute({ id: u.id })).toEqual([]);
        throw rolledBack;
      }),
    ).rejects.toBe(rolledBack);
    expect(seen).toEqual([expect.objectContaining({ name: 'Only in the transaction' })]);
  });

  it('runs on each handle’s own pool, and its logger sees the statement', async () => {
    const u = await makeUser(h.ctx.db, { displayName: 'Seen by the other handle' });
    await prepared(h.ctx.db, userById).execute({ id: u.id });
    const logged: string[] = [];
    const other = createDb(h.ctx.env.DATABASE_URL, { poolSize: 1, logger: { logQuery: (query) => void logged.push(query) } });
    try {
      expect(prepared(other.db, userById)).not.toBe(prepared(h.ctx.db, userById));
      expect(await prepared(other.db, userById).execute({ id: u.id })).toEqual([{ id: u.id, name: 'Seen by the other handle' }]);
      expect(logged).toHaveLength(1);
      expect(logged[0]).toMatch(/^select .* from `users` where `users`.`id` = \?$/);
    } finally {
      await other.pool.end();
    }
    // Ending the other pool leaves this handle's query working.
    expect(await prepared(h.ctx.db, userById).execute({ id: u.id })).toHaveLength(1);
  });

  it('refuses a builder made per call, which would grow the cache without end', () => {
    const db = { session: {} } as unknown as DbOrTx;
    const fake = () => ({ prepare: () => ({}) });
    expect(() => {
      for (let i = 0; i < 1000; i++) prepared(db, () => fake());
    }).toThrow(/module-level/);
  });
});
