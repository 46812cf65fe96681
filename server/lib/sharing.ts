import { canShareWithClub, type Actor } from '../auth/permissions';
import { BadRequest } from './errors';

/**
 * The clubs a brewer asked to share something with, checked (each must be a club they belong
 * to) and de-duplicated. An empty list means private.
 */
export function checkShareTargets(actor: Actor, clubIds: number[]): number[] {
  const fields: Record<string, string> = {};
  clubIds.forEach((clubId, i) => {
    if (!canShareWithClub(actor, clubId)) fields[`clubIds.${i}`] = 'You can only share with a club you belong to.';
  });
  if (Object.keys(fields).length > 0) throw new BadRequest('You can only share with clubs you belong to.', fields);
  return [...new Set(clubIds)].sort((a, b) => a - b);
}

/** What to delete and insert so the shares become `wanted`; clubs kept keep their shared_at. */
export function diffShares(existing: number[], wanted: number[]) {
  const keep = new Set(wanted);
  const had = new Set(existing);
  return { gone: existing.filter((c) => !keep.has(c)), added: wanted.filter((c) => !had.has(c)) };
}
