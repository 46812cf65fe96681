import argon2 from 'argon2';
import { eq } from 'drizzle-orm';
import type { LoginInput, Preferences, SignupInput } from '@shared/schemas/auth';
import type { Db } from '../db/client';
import { users } from '../db/schema';
import { isDuplicateKey } from '../lib/db-errors';
import { Conflict, Unauthorized } from '../lib/errors';
import { loadSessionUser, type SessionUser } from './session';

// OWASP's argon2id guidance: 19 MiB memory, 2 iterations, 1 lane.
const hashOptions = { type: argon2.argon2id, memoryCost: 19_456, timeCost: 2, parallelism: 1 } as const;

export function hashPassword(password: string) {
  return argon2.hash(password, hashOptions);
}

const wrongCredentials = 'That e-mail and password do not match an account.';
// Verified when the e-mail is unknown, so both failures take about as long.
let dummyHash: Promise<string> | null = null;

export async function createUser(db: Db, input: SignupInput & { siteRole?: 'user' | 'admin' }) {
  const email = input.email.trim().toLowerCase();
  const [existing] = await db.select({ id: users.id }).from(users).where(eq(users.email, email));
  if (existing) throw new Conflict('An account with that e-mail already exists. Sign in instead?', { email: 'An account with that e-mail already exists.' });
  const passwordHash = await hashPassword(input.password);
  try {
    const [result] = await db.insert(users).values({
      email,
      passwordHash,
      displayName: input.displayName.trim(),
      siteRole: input.siteRole ?? 'user',
    }).$returningId();
    return result.id;
  } catch (error) {
    // Two sign-ups racing for the same address: the unique index decides.
    if (isDuplicateKey(error)) {
      throw new Conflict('An account with that e-mail already exists. Sign in instead?', { email: 'An account with that e-mail already exists.' });
    }
    throw error;
  }
}

export async function verifyLogin(db: Db, input: LoginInput) {
  const [user] = await db.select().from(users).where(eq(users.email, input.email.trim().toLowerCase()));
  if (!user) {
    dummyHash ??= hashPassword('not-a-real-password');
    await argon2.verify(await dummyHash, input.password);
    throw new Unauthorized(wrongCredentials);
  }
  if (!(await argon2.verify(user.passwordHash, input.password))) throw new Unauthorized(wrongCredentials);
  return user;
}

/** Saves the brewer's own settings (only those given) and returns them as the session sees them. */
export async function updatePreferences(db: Db, userId: number, preferences: Preferences): Promise<SessionUser> {
  if (Object.keys(preferences).length > 0) await db.update(users).set(preferences).where(eq(users.id, userId));
  return (await loadSessionUser(db, userId))!;
}
