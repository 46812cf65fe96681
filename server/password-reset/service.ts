/**
 * Password reset by e-mail: a single-use link valid for one hour; only the token's SHA-256 hash
 * is stored. Setting the new password bumps the account's token version, which signs out every
 * session issued before.
 */
import { and, count, eq, gt, isNull, sql } from 'drizzle-orm';
import { hashPassword } from '../auth/service';
import type { AppContext } from '../context';
import type { Db, DbOrTx } from '../db/client';
import { passwordResetTokens, users, type PasswordResetToken } from '../db/schema';
import { Gone, NotFound } from '../lib/errors';
import { hashLinkToken, newLinkToken } from '../lib/tokens';
import { sendAfterCommit } from '../mail/mailer';
import { passwordResetMail } from '../mail/templates';

export const RESET_VALID_MINUTES = 60;
/** Links per account per hour; more requests are answered the same way but send nothing. */
export const RESET_MAX_PER_HOUR = 3;

/**
 * Creates a link and mails it when the address has an account. Resolves once the token is
 * stored; the mail goes out in the background so the answer takes as long either way.
 */
export async function requestPasswordReset(ctx: AppContext, email: string): Promise<void> {
  const { db } = ctx;
  const [user] = await db.select({ id: users.id, displayName: users.displayName, email: users.email }).from(users).where(eq(users.email, email));
  if (!user) return;
  const since = new Date(Date.now() - 60 * 60 * 1000);
  const [{ recent }] = await db
    .select({ recent: count() })
    .from(passwordResetTokens)
    .where(and(eq(passwordResetTokens.userId, user.id), gt(passwordResetTokens.createdAt, since)));
  if (Number(recent) >= RESET_MAX_PER_HOUR) return;
  const { token, hash } = newLinkToken();
  await db.insert(passwordResetTokens).values({
    userId: user.id,
    tokenHash: hash,
    expiresAt: new Date(Date.now() + RESET_VALID_MINUTES * 60 * 1000),
  });
  void sendAfterCommit(ctx.mailer, {
    to: user.email,
    ...passwordResetMail({ displayName: user.displayName, url: `${ctx.env.APP_URL}/reset-password/${token}`, validMinutes: RESET_VALID_MINUTES }),
  });
}

const unknownLink = () => new NotFound('This reset link is not valid. Check that the whole link was copied from the e-mail.');

function assertUsable(row: PasswordResetToken, now = new Date()) {
  if (row.usedAt) throw new Gone('This reset link has already been used. Ask for a new one if you still need to change your password.');
  if (row.expiresAt.getTime() <= now.getTime()) {
    throw new Gone(`This reset link has expired: links work for ${RESET_VALID_MINUTES} minutes. Ask for a new one.`);
  }
}

async function findByToken(db: DbOrTx, token: string) {
  const [row] = await db.select().from(passwordResetTokens).where(eq(passwordResetTokens.tokenHash, hashLinkToken(token)));
  if (!row) throw unknownLink();
  return row;
}

export async function checkResetToken(db: Db, token: string) {
  const row = await findByToken(db, token);
  assertUsable(row);
  return { expiresAt: row.expiresAt.toISOString() };
}

/** Sets the password, uses up every outstanding link of the account and signs out other sessions. */
export async function resetPassword(db: Db, token: string, password: string) {
  const found = await findByToken(db, token);
  assertUsable(found);
  const passwordHash = await hashPassword(password);
  return db.transaction(async (tx) => {
    const [row] = await tx.select().from(passwordResetTokens).where(eq(passwordResetTokens.id, found.id)).for('update');
    if (!row) throw unknownLink();
    assertUsable(row);
    await tx
      .update(users)
      .set({ passwordHash, tokenVersion: sql`${users.tokenVersion} + 1` })
      .where(eq(users.id, row.userId));
    await tx
      .update(passwordResetTokens)
      .set({ usedAt: new Date() })
      .where(and(eq(passwordResetTokens.userId, row.userId), isNull(passwordResetTokens.usedAt)));
    const [user] = await tx.select({ id: users.id, tokenVersion: users.tokenVersion }).from(users).where(eq(users.id, row.userId));
    return user;
  });
}
