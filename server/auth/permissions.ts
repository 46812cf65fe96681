/**
 * The one place that decides who may do what with a brewer's things (recipes, brew days,
 * instruments) and with clubs. Every route asks here. Denied reads are reported as 404 so a
 * private resource's existence is never leaked; a visible resource refuses other actions with 403.
 */
import { Forbidden, NotFound } from '../lib/errors';

export type ClubRole = 'member' | 'mentor' | 'organiser';

export interface Actor {
  id: number;
  siteRole: 'user' | 'admin';
  memberships: ReadonlyArray<{ clubId: number; role: ClubRole }>;
}

/** Anything a brewer owns and may share with clubs they belong to. */
export interface OwnedResource {
  ownerId: number;
  sharedWithClubIds: readonly number[];
}

export type ResourceAction = 'read' | 'update' | 'delete' | 'comment' | 'share' | 'clone';
export type ClubAction = 'view' | 'invite' | 'remove-member' | 'set-role' | 'rename' | 'delete' | 'leave';

function rolesInSharedClubs(actor: Actor, resource: OwnedResource): ClubRole[] {
  return actor.memberships.filter((m) => resource.sharedWithClubIds.includes(m.clubId)).map((m) => m.role);
}

export function can(actor: Actor | null, action: ResourceAction, resource: OwnedResource): boolean {
  if (!actor) return false;
  if (actor.id === resource.ownerId) return true;
  // Site admins manage accounts, not other people's brewing: no special access here.
  const roles = rolesInSharedClubs(actor, resource);
  switch (action) {
    case 'read':
    case 'clone':
      return roles.length > 0;
    case 'comment':
      return roles.includes('mentor');
    case 'update':
    case 'delete':
    case 'share':
      return false;
  }
}

/** Throws NotFound when the actor may not even see the resource, Forbidden when they may see but not act. */
export function requireAccess(actor: Actor | null, action: ResourceAction, resource: OwnedResource | null | undefined, what = 'That'): asserts resource is OwnedResource {
  if (!resource || !can(actor, 'read', resource)) throw new NotFound(`${what} was not found.`);
  if (!can(actor, action, resource)) throw new Forbidden(`You may not ${action} this ${what.toLowerCase()}.`);
}

/** A comment's author, and nobody else, may delete it: the brewer cannot remove a mentor's words, nor a mentor the brewer's. */
export function canDeleteComment(actor: Actor | null, comment: { authorId: number | null }): boolean {
  return actor !== null && comment.authorId !== null && comment.authorId === actor.id;
}

/**
 * Who sees a comment on a brew day they may read: its brewer sees every comment, everyone sees
 * their own and the brewer's replies, and a mentor's comment is seen in the clubs the author and
 * the reader share with the brew day, so a member of one club never learns of another club's review.
 */
export function canSeeComment(actor: Actor | null, resource: OwnedResource, comment: { authorId: number | null; authorClubIds: readonly number[] }): boolean {
  if (!actor || !can(actor, 'read', resource)) return false;
  if (actor.id === resource.ownerId || comment.authorId === actor.id || comment.authorId === resource.ownerId) return true;
  return actor.memberships.some((m) => resource.sharedWithClubIds.includes(m.clubId) && comment.authorClubIds.includes(m.clubId));
}

export function clubRole(actor: Actor | null, clubId: number): ClubRole | null {
  return actor?.memberships.find((m) => m.clubId === clubId)?.role ?? null;
}

/** A brewer shares their recipes and brew days only with clubs they belong to (any role); site admins are no exception. */
export function canShareWithClub(actor: Actor | null, clubId: number): boolean {
  return clubRole(actor, clubId) !== null;
}

export function canInClub(actor: Actor | null, action: ClubAction, clubId: number): boolean {
  if (!actor) return false;
  const role = clubRole(actor, clubId);
  if (action === 'view') return role !== null || actor.siteRole === 'admin';
  // Only a member can leave; the last-organiser rule is the club service's, as it needs a count.
  if (action === 'leave') return role !== null;
  // Organisers run their club; site admins may step in to manage accounts and clubs.
  return role === 'organiser' || actor.siteRole === 'admin';
}

export function requireClubAccess(actor: Actor | null, action: ClubAction, clubId: number) {
  if (!canInClub(actor, 'view', clubId)) throw new NotFound('That club was not found.');
  if (!canInClub(actor, action, clubId)) {
    throw new Forbidden(action === 'leave' ? 'You are not a member of this club.' : 'Only the club’s organisers may do that.');
  }
}

export function requireSiteAdmin(actor: Actor | null) {
  if (actor?.siteRole !== 'admin') throw new NotFound('Not found.');
}
