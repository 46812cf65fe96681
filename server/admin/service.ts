import { count, desc, eq, like, or } from 'drizzle-orm';
import type { AdminUserPage, CaughtMessage } from '@shared/schemas/admin';
import type { Db } from '../db/client';
import { clubMemberships, users } from '../db/schema';
import { HttpError } from '../lib/errors';

export async function listUsers(db: Db, query: { page: number; pageSize: number; q?: string }): Promise<AdminUserPage> {
  const term = query.q ? `%${query.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%` : null;
  const where = term ? or(like(users.email, term), like(users.displayName, term)) : undefined;
  const clubCounts = db
    .select({ userId: clubMemberships.userId, clubCount: count().as('club_count') })
    .from(clubMemberships)
    .groupBy(clubMemberships.userId)
    .as('club_counts');
  const [rows, [{ total }]] = await Promise.all([
    db
      .select({
        id: users.id,
        email: users.email,
        displayName: users.displayName,
        siteRole: users.siteRole,
        createdAt: users.createdAt,
        clubCount: clubCounts.clubCount,
      })
      .from(users)
      .leftJoin(clubCounts, eq(clubCounts.userId, users.id))
      .where(where)
      .orderBy(desc(users.createdAt), desc(users.id))
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize),
    db.select({ total: count() }).from(users).where(where),
  ]);
  return {
    items: rows.map((r) => ({ ...r, clubCount: Number(r.clubCount ?? 0), createdAt: r.createdAt.toISOString() })),
    total: Number(total),
    page: query.page,
    pageSize: query.pageSize,
  };
}

/** Reads the fake SMTP server's listing (development and tests only). */
export async function caughtMail(apiUrl: string): Promise<CaughtMessage[]> {
  let res: Response;
  try {
    res = await fetch(`${apiUrl}/messages`, { signal: AbortSignal.timeout(5_000) });
  } catch {
    throw new HttpError(502, 'mail_listing_unavailable', 'The local mail catcher is not answering. Is it running?');
  }
  if (!res.ok) throw new HttpError(502, 'mail_listing_unavailable', `The local mail catcher answered ${res.status}.`);
  return (await res.json()) as CaughtMessage[];
}
