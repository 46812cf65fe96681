/** A club with one person of each kind, for the clubs API tests. Written straight to the database. */
import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import type { DbOrTx } from '../db/client';
import { addMember, makeClub, makeUser } from '../db/factories';
import { clubInvitations } from '../db/schema';
import { newLinkToken } from '../lib/tokens';

export async function makeClubScene(db: DbOrTx) {
  const tag = randomUUID().slice(0, 8);
  const person = (name: string, extra: { siteRole?: 'admin' } = {}) => makeUser(db, { email: `${name.split(' ')[0].toLowerCase()}-${tag}@example.org`, displayName: name, ...extra });
  const organiser = await person('Orla Organiser');
  const mentor = await person('Milo Mentor');
  const member = await person('Maren Member');
  const otherMentor = await person('Otto Othermentor');
  const otherBrewer = await person('Bea Otherbrewer');
  const admin = await person('Ada Siteadmin', { siteRole: 'admin' });
  const club = await makeClub(db, { name: `Copper Kettle Collective ${tag}`, createdBy: organiser.id });
  const otherClub = await makeClub(db, { name: `Far Valley Brewers ${tag}` });
  await addMember(db, club.id, organiser.id, 'organiser');
  await addMember(db, club.id, mentor.id, 'mentor');
  await addMember(db, club.id, member.id, 'member');
  await addMember(db, otherClub.id, otherMentor.id, 'mentor');
  return { tag, club, otherClub, organiser, mentor, member, otherMentor, otherBrewer, admin };
}

/** An invitation written directly, with its token, for tests that need to bend its dates. */
export async function makeInvitation(
  db: DbOrTx,
  input: { clubId: number; email: string; invitedBy?: number; role?: 'member' | 'mentor' | 'organiser'; expiresAt?: Date },
) {
  const { token, hash } = newLinkToken();
  const [{ id }] = await db
    .insert(clubInvitations)
    .values({
      clubId: input.clubId,
      email: input.email.toLowerCase(),
      role: input.role ?? 'member',
      tokenHash: hash,
      invitedBy: input.invitedBy ?? null,
      expiresAt: input.expiresAt ?? new Date(Date.now() + 7 * 24 * 3600 * 1000),
    })
    .$returningId();
  return { id, token };
}

export async function invitationRow(db: DbOrTx, id: number) {
  const [row] = await db.select().from(clubInvitations).where(eq(clubInvitations.id, id));
  return row;
}

/** The token in an e-mailed link `…/invitations/<token>` or `…/reset-password/<token>`. */
export function linkToken(text: string, path: 'invitations' | 'reset-password') {
  const match = new RegExp(`/${path}/([A-Za-z0-9_-]+)`).exec(text);
  if (!match) throw new Error(`No /${path}/ link in: ${text}`);
  return match[1];
}
