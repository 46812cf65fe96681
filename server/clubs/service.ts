/**
 * Clubs and their members. Every function asks server/auth/permissions.ts first; the rules that
 * need a count (a club always keeps at least one organiser) live here, checked inside a
 * transaction that locks the club row, so two organisers stepping down at once cannot both win.
 */
import { and, asc, count, eq, inArray, isNull } from 'drizzle-orm';
import type { ClubDetail, ClubMember, ClubRole, ClubSummary, CreateClubInput, UpdateClubInput } from '@shared/schemas/clubs';
import { canInClub, requireClubAccess, type Actor } from '../auth/permissions';
import type { DbOrTx, Db, Tx } from '../db/client';
import { brewClubShares, brews, clubInvitations, clubMemberships, clubs, recipeClubShares, recipes, users } from '../db/schema';
import { Conflict, NotFound } from '../lib/errors';

export async function listMyClubs(db: Db, userId: number): Promise<ClubSummary[]> {
  const counts = db
    .select({ clubId: clubMemberships.clubId, memberCount: count().as('member_count') })
    .from(clubMemberships)
    .groupBy(clubMemberships.clubId)
    .as('counts');
  const rows = await db
    .select({ id: clubs.id, name: clubs.name, description: clubs.description, role: clubMemberships.role, memberCount: counts.memberCount })
    .from(clubMemberships)
    .innerJoin(clubs, eq(clubs.id, clubMemberships.clubId))
    .innerJoin(counts, eq(counts.clubId, clubs.id))
    .where(eq(clubMemberships.userId, userId))
    .orderBy(asc(clubs.name), asc(clubs.id));
  return rows.map((r) => ({ ...r, memberCount: Number(r.memberCount) }));
}

/** The creator becomes the club's first organiser. */
export async function createClub(db: Db, actor: Actor, input: { name: string; description?: string | null }): Promise<number> {
  return db.transaction(async (tx) => {
    const [{ id }] = await tx.insert(clubs).values({ name: input.name, description: input.description ?? null, createdBy: actor.id }).$returningId();
    await tx.insert(clubMemberships).values({ clubId: id, userId: actor.id, role: 'organiser' });
    return id;
  });
}
export type { CreateClubInput };

async function findClub(db: DbOrTx, clubId: number) {
  const [club] = await db.select().from(clubs).where(eq(clubs.id, clubId));
  if (!club) throw new NotFound('That club was not found.');
  return club;
}

/** Locks the club row for the rest of the transaction and checks that it still exists. */
export async function lockClub(tx: Tx, clubId: number) {
  const [club] = await tx.select().from(clubs).where(eq(clubs.id, clubId)).for('update');
  if (!club) throw new NotFound('That club was not found.');
  return club;
}

export async function getClub(db: Db, actor: Actor, clubId: number): Promise<ClubDetail> {
  requireClubAccess(actor, 'view', clubId);
  const club = await findClub(db, clubId);
  const canManage = canInClub(actor, 'invite', clubId);
  const rows = await db
    .select({ userId: users.id, displayName: users.displayName, email: users.email, role: clubMemberships.role, joinedAt: clubMemberships.joinedAt })
    .from(clubMemberships)
    .innerJoin(users, eq(users.id, clubMemberships.userId))
    .where(eq(clubMemberships.clubId, clubId))
    .orderBy(asc(users.displayName), asc(users.id));
  const roleOrder: Record<ClubRole, number> = { organiser: 0, mentor: 1, member: 2 };
  const members: ClubMember[] = rows
    .map((r) => ({
      userId: r.userId,
      displayName: r.displayName,
      ...(canManage && { email: r.email }),
      role: r.role,
      joinedAt: r.joinedAt.toISOString(),
    }))
    .sort((a, b) => roleOrder[a.role] - roleOrder[b.role]);
  return {
    id: club.id,
    name: club.name,
    description: club.description,
    createdAt: club.createdAt.toISOString(),
    myRole: actor.memberships.find((m) => m.clubId === clubId)?.role ?? null,
    canManage,
    members,
  };
}

export async function updateClub(db: Db, actor: Actor, clubId: number, input: { name?: string; description?: string | null }) {
  requireClubAccess(actor, 'rename', clubId);
  await findClub(db, clubId);
  const values = {
    ...(input.name !== undefined && { name: input.name }),
    ...(input.description !== undefined && { description: input.description }),
  };
  await db.update(clubs).set(values).where(eq(clubs.id, clubId));
}
export type { UpdateClubInput };

async function membership(tx: DbOrTx, clubId: number, userId: number) {
  const [row] = await tx
    .select({ role: clubMemberships.role })
    .from(clubMemberships)
    .where(and(eq(clubMemberships.clubId, clubId), eq(clubMemberships.userId, userId)));
  return row ?? null;
}

async function organiserCount(tx: DbOrTx, clubId: number) {
  const [{ n }] = await tx
    .select({ n: count() })
    .from(clubMemberships)
    .where(and(eq(clubMemberships.clubId, clubId), eq(clubMemberships.role, 'organiser')));
  return Number(n);
}

const notAMember = () => new NotFound('That person is not a member of this club.');

export async function setMemberRole(db: Db, actor: Actor, clubId: number, userId: number, role: ClubRole) {
  requireClubAccess(actor, 'set-role', clubId);
  await db.transaction(async (tx) => {
    await lockClub(tx, clubId);
    const current = await membership(tx, clubId, userId);
    if (!current) throw notAMember();
    if (current.role === role) return;
    if (current.role === 'organiser' && (await organiserCount(tx, clubId)) <= 1) {
      throw new Conflict('A club needs at least one organiser: name another organiser first, then change this role.');
    }
    await tx.update(clubMemberships).set({ role }).where(and(eq(clubMemberships.clubId, clubId), eq(clubMemberships.userId, userId)));
  });
}

async function removeMembership(tx: Tx, clubId: number, userId: number, lastOrganiserMessage: string) {
  await lockClub(tx, clubId);
  const current = await membership(tx, clubId, userId);
  if (!current) throw notAMember();
  if (current.role === 'organiser' && (await organiserCount(tx, clubId)) <= 1) throw new Conflict(lastOrganiserMessage);
  await tx.delete(clubMemberships).where(and(eq(clubMemberships.clubId, clubId), eq(clubMemberships.userId, userId)));
  // Whoever leaves takes what they shared with them: the club stops seeing it at once.
  await tx
    .delete(recipeClubShares)
    .where(and(eq(recipeClubShares.clubId, clubId), inArray(recipeClubShares.recipeId, tx.select({ id: recipes.id }).from(recipes).where(eq(recipes.ownerId, userId)))));
  await tx
    .delete(brewClubShares)
    .where(and(eq(brewClubShares.clubId, clubId), inArray(brewClubShares.brewId, tx.select({ id: brews.id }).from(brews).where(eq(brews.ownerId, userId)))));
}

export async function removeMember(db: Db, actor: Actor, clubId: number, userId: number) {
  requireClubAccess(actor, 'remove-member', clubId);
  await db.transaction((tx) =>
    removeMembership(tx, clubId, userId, 'That person is the club’s last organiser: name another organiser before removing them.'),
  );
}

export async function leaveClub(db: Db, actor: Actor, clubId: number) {
  requireClubAccess(actor, 'leave', clubId);
  await db.transaction((tx) =>
    removeMembership(tx, clubId, actor.id, 'You are the club’s last organiser: name another member as organiser before you leave.'),
  );
}

/** The pending invitations to an address, so a new one can replace them. */
export function pendingInvitationsTo(clubId: number, email: string) {
  return and(eq(clubInvitations.clubId, clubId), eq(clubInvitations.email, email), isNull(clubInvitations.acceptedAt), isNull(clubInvitations.revokedAt));
}
