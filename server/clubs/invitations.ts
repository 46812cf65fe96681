/**
 * Invitations by e-mail: an organiser invites an address; the link carries a single-use token
 * that expires after seven days; accepting joins the club, creating the account first when the
 * address has none. The database work commits before any mail is sent.
 */
import { and, asc, desc, eq, isNull } from 'drizzle-orm';
import type { ClubRole, InvitationPreview, InvitationSent, PendingInvitation } from '@shared/schemas/clubs';
import { requireClubAccess, type Actor } from '../auth/permissions';
import { hashPassword } from '../auth/service';
import type { SessionUser } from '../auth/session';
import type { AppContext } from '../context';
import type { Db, DbOrTx } from '../db/client';
import { clubInvitations, clubMemberships, clubs, users, type ClubInvitation } from '../db/schema';
import { isDuplicateKey } from '../lib/db-errors';
import { BadRequest, Conflict, Forbidden, Gone, NotFound } from '../lib/errors';
import { hashLinkToken, newLinkToken } from '../lib/tokens';
import { sendAfterCommit } from '../mail/mailer';
import { invitationMail } from '../mail/templates';
import { lockClub, pendingInvitationsTo } from './service';
import { DAY_MS, utcDayInWords } from '@shared/dates';

export const INVITATION_DAYS = 7;

function toPending(row: ClubInvitation, inviterName: string | null): PendingInvitation {
  return {
    id: row.id,
    email: row.email,
    role: row.role,
    invitedBy: inviterName,
    createdAt: row.createdAt.toISOString(),
    expiresAt: row.expiresAt.toISOString(),
    expired: row.expiresAt.getTime() <= Date.now(),
  };
}

export async function inviteToClub(ctx: AppContext, actor: SessionUser, clubId: number, input: { email: string; role: ClubRole }): Promise<InvitationSent> {
  requireClubAccess(actor, 'invite', clubId);
  const { token, hash } = newLinkToken();
  const expiresAt = new Date(Date.now() + INVITATION_DAYS * DAY_MS);
  const { club, row } = await ctx.db.transaction(async (tx) => {
    const club = await lockClub(tx, clubId);
    const [member] = await tx
      .select({ id: users.id })
      .from(clubMemberships)
      .innerJoin(users, eq(users.id, clubMemberships.userId))
      .where(and(eq(clubMemberships.clubId, clubId), eq(users.email, input.email)));
    if (member) {
      throw new Conflict(`${input.email} is already a member of ${club.name}.`, { email: 'This address already belongs to a member of the club.' });
    }
    // Re-inviting replaces the pending invitation: only the newest link works.
    await tx.update(clubInvitations).set({ revokedAt: new Date(), revokedReason: 'replaced' }).where(pendingInvitationsTo(clubId, input.email));
    const [{ id }] = await tx
      .insert(clubInvitations)
      .values({ clubId, email: input.email, role: input.role, tokenHash: hash, invitedBy: actor.id, expiresAt })
      .$returningId();
    const [row] = await tx.select().from(clubInvitations).where(eq(clubInvitations.id, id));
    return { club, row };
  });
  const mailSent = await sendAfterCommit(ctx.mailer, {
    to: input.email,
    ...invitationMail({
      clubName: club.name,
      inviterName: actor.displayName,
      role: input.role,
      url: `${ctx.env.APP_URL}/invitations/${token}`,
      expiresAt,
    }),
  });
  return { invitation: toPending(row, actor.displayName), mailSent };
}

export async function listPendingInvitations(db: Db, actor: Actor, clubId: number): Promise<PendingInvitation[]> {
  requireClubAccess(actor, 'invite', clubId);
  const rows = await db
    .select({ invitation: clubInvitations, inviterName: users.displayName })
    .from(clubInvitations)
    .leftJoin(users, eq(users.id, clubInvitations.invitedBy))
    .where(and(eq(clubInvitations.clubId, clubId), isNull(clubInvitations.acceptedAt), isNull(clubInvitations.revokedAt)))
    .orderBy(desc(clubInvitations.createdAt), asc(clubInvitations.email));
  return rows.map((r) => toPending(r.invitation, r.inviterName));
}

export async function revokeInvitation(db: Db, actor: Actor, clubId: number, invitationId: number) {
  requireClubAccess(actor, 'invite', clubId);
  await db.transaction(async (tx) => {
    const [row] = await tx
      .select()
      .from(clubInvitations)
      .where(and(eq(clubInvitations.id, invitationId), eq(clubInvitations.clubId, clubId)))
      .for('update');
    if (!row || row.revokedAt) throw new NotFound('That invitation was not found.');
    if (row.acceptedAt) throw new Conflict('That invitation has already been accepted: the person is a member now.');
    await tx.update(clubInvitations).set({ revokedAt: new Date(), revokedReason: 'revoked' }).where(eq(clubInvitations.id, invitationId));
  });
}

/** Refuses a link that can no longer be used, saying why. */
function assertUsable(row: ClubInvitation, now = new Date()) {
  if (row.acceptedAt) throw new Gone('This invitation has already been used. If that was you, sign in and open Clubs.');
  if (row.revokedReason === 'replaced') throw new Gone('This invitation was replaced by a newer one: use the link in the most recent e-mail.');
  if (row.revokedAt) throw new Gone('This invitation was withdrawn by the club’s organiser.');
  if (row.expiresAt.getTime() <= now.getTime()) {
    throw new Gone(`This invitation expired on ${utcDayInWords(row.expiresAt)}. Ask the club’s organiser to invite you again.`);
  }
}

const unknownLink = () => new NotFound('This invitation link is not valid. Check that the whole link was copied from the e-mail.');

async function findByToken(db: DbOrTx, token: string) {
  const [row] = await db.select().from(clubInvitations).where(eq(clubInvitations.tokenHash, hashLinkToken(token)));
  if (!row) throw unknownLink();
  return row;
}

async function accountFor(db: DbOrTx, email: string) {
  const [row] = await db.select({ id: users.id }).from(users).where(eq(users.email, email));
  return row ?? null;
}

export async function previewInvitation(db: Db, token: string): Promise<InvitationPreview> {
  const row = await findByToken(db, token);
  assertUsable(row);
  const [club] = await db.select({ name: clubs.name }).from(clubs).where(eq(clubs.id, row.clubId));
  const [inviter] = row.invitedBy ? await db.select({ name: users.displayName }).from(users).where(eq(users.id, row.invitedBy)) : [];
  return {
    clubId: row.clubId,
    clubName: club.name,
    inviterName: inviter?.name ?? null,
    email: row.email,
    role: row.role,
    expiresAt: row.expiresAt.toISOString(),
    accountExists: (await accountFor(db, row.email)) !== null,
  };
}

export interface Accepted {
  clubId: number;
  userId: number;
  /** True when accepting created the account, so the caller signs the newcomer in. */
  createdAccount: boolean;
}

/**
 * A signed-in brewer whose address matches joins; an anonymous visitor whose address has no
 * account sends a name and password and is signed up and joined. One transaction, with the
 * invitation row locked, so a link can be used once however many tabs race for it.
 */
export async function acceptInvitation(
  db: Db,
  token: string,
  actor: SessionUser | null,
  newcomer: { displayName?: string; password?: string },
): Promise<Accepted> {
  const found = await findByToken(db, token);
  assertUsable(found);
  let passwordHash: string | null = null;
  if (actor) {
    if (actor.email !== found.email) {
      throw new Forbidden(`This invitation was sent to ${found.email}, but you are signed in as ${actor.email}. Sign out and open the link again, or ask the organiser to invite ${actor.email}.`);
    }
  } else {
    if (await accountFor(db, found.email)) {
      throw new Conflict(`An account for ${found.email} already exists: sign in to accept the invitation.`);
    }
    const fields: Record<string, string> = {};
    if (!newcomer.displayName) fields.displayName = 'Tell us what to call you.';
    if (!newcomer.password) fields.password = 'Choose a password.';
    if (Object.keys(fields).length > 0) throw new BadRequest('To join, create your account: a name and a password.', fields);
    // Hashing is slow on purpose; do it before the transaction takes its locks.
    passwordHash = await hashPassword(newcomer.password!);
  }

  return db.transaction(async (tx) => {
    const [row] = await tx.select().from(clubInvitations).where(eq(clubInvitations.id, found.id)).for('update');
    if (!row) throw unknownLink();
    assertUsable(row);
    await lockClub(tx, row.clubId);
    let userId: number;
    if (actor) {
      userId = actor.id;
      const [existing] = await tx
        .select({ role: clubMemberships.role })
        .from(clubMemberships)
        .where(and(eq(clubMemberships.clubId, row.clubId), eq(clubMemberships.userId, userId)));
      if (existing) throw new Conflict('You are already a member of this club.');
    } else {
      try {
        const [created] = await tx
          .insert(users)
          .values({ email: row.email, passwordHash: passwordHash!, displayName: newcomer.displayName!, siteRole: 'user' })
          .$returningId();
        userId = created.id;
      } catch (error) {
        if (isDuplicateKey(error)) throw new Conflict(`An account for ${row.email} already exists: sign in to accept the invitation.`);
        throw error;
      }
    }
    await tx.insert(clubMemberships).values({ clubId: row.clubId, userId, role: row.role });
    await tx.update(clubInvitations).set({ acceptedAt: new Date(), acceptedBy: userId }).where(eq(clubInvitations.id, row.id));
    return { clubId: row.clubId, userId, createdAccount: !actor };
  });
}
