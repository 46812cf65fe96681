import { and, eq, inArray } from 'drizzle-orm';
import { canShareWithClub, type Actor } from '../auth/permissions';
import type { Tx } from '../db/client';
import { lockClubRows } from '../db/locks';
import { clubMemberships } from '../db/schema';
import { BadRequest } from './errors';

const notAMember = 'You can only share with a club you belong to.';

/**
 * The clubs a brewer asked to share something with, checked (each must be a club they belong
 * to) and de-duplicated. An empty list means private.
 */
export function checkShareTargets(actor: Actor, clubIds: number[]): number[] {
  const fields: Record<string, string> = {};
  clubIds.forEach((clubId, i) => {
    if (!canShareWithClub(actor, clubId)) fields[`clubIds.${i}`] = notAMember;
  });
  if (Object.keys(fields).length > 0) throw new BadRequest('You can only share with clubs you belong to.', fields);
  return [...new Set(clubIds)].sort((a, b) => a - b);
}

/**
 * Inside the sharing transaction: takes the club row locks that leaving a club takes, then checks
 * the membership again under them. A brewer leaving at the same moment either went first (the
 * share is refused) or waits until the share is committed (and leaving then removes it).
 */
export async function lockShareTargets(tx: Tx, actorId: number, wanted: number[]): Promise<void> {
  if (wanted.length === 0) return;
  await lockClubRows(tx, wanted);
  const rows = await tx
    .select({ clubId: clubMemberships.clubId })
    .from(clubMemberships)
    .where(and(eq(clubMemberships.userId, actorId), inArray(clubMemberships.clubId, wanted)));
  const still = new Set(rows.map((r) => r.clubId));
  const fields: Record<string, string> = {};
  wanted.forEach((clubId, i) => {
    if (!still.has(clubId)) fields[`clubIds.${i}`] = notAMember;
  });
  if (Object.keys(fields).length > 0) throw new BadRequest('You can only share with clubs you belong to.', fields);
}

/** What to delete and insert so the shares become `wanted`; clubs kept keep their shared_at. */
export function diffShares(existing: number[], wanted: number[]) {
  const keep = new Set(wanted);
  const had = new Set(existing);
  return { gone: existing.filter((c) => !keep.has(c)), added: wanted.filter((c) => !had.has(c)) };
}
