/**
 * Factories for the things every test and the demo seed need. They write straight to the
 * database (no HTTP), so a test can set up a scene in a few milliseconds.
 */
import { randomUUID } from 'node:crypto';
import { hashPassword } from '../auth/service';
import type { DbOrTx } from './client';
import { clubMemberships, clubs, users, type ClubMembership } from './schema';

const hashCache = new Map<string, Promise<string>>();
function cachedHash(password: string) {
  let hash = hashCache.get(password);
  if (!hash) {
    hash = hashPassword(password);
    hashCache.set(password, hash);
  }
  return hash;
}

export interface UserFactoryInput {
  email?: string;
  displayName?: string;
  password?: string;
  siteRole?: 'user' | 'admin';
  unitSystem?: 'metric' | 'us';
  gravityUnit?: 'sg' | 'plato';
  colourScale?: 'srm' | 'ebc';
}

export const factoryPassword = 'correct horse battery';

export async function makeUser(db: DbOrTx, input: UserFactoryInput = {}) {
  const email = (input.email ?? `brewer-${randomUUID().slice(0, 8)}@example.org`).toLowerCase();
  const values = {
    email,
    displayName: input.displayName ?? 'Test Brewer',
    passwordHash: await cachedHash(input.password ?? factoryPassword),
    siteRole: input.siteRole ?? 'user',
    unitSystem: input.unitSystem ?? 'metric',
    gravityUnit: input.gravityUnit ?? 'sg',
    colourScale: input.colourScale ?? 'srm',
  } as const;
  const [{ id }] = await db.insert(users).values(values).$returningId();
  return { id, ...values, password: input.password ?? factoryPassword };
}

export async function makeClub(db: DbOrTx, input: { name?: string; description?: string; createdBy?: number } = {}) {
  const values = {
    name: input.name ?? `Test Club ${randomUUID().slice(0, 6)}`,
    description: input.description ?? null,
    createdBy: input.createdBy ?? null,
  };
  const [{ id }] = await db.insert(clubs).values(values).$returningId();
  return { id, ...values };
}

export async function addMember(db: DbOrTx, clubId: number, userId: number, role: ClubMembership['role'] = 'member') {
  await db.insert(clubMemberships).values({ clubId, userId, role });
}
