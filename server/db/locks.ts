/**
 * Parent-row locks, taken first in a transaction that writes child rows and then the parent.
 * Inserting a child takes a shared lock on its parent (the foreign key check); two such
 * transactions that then update the parent each wait for the other's shared lock: a deadlock.
 * Locking the parent row FOR UPDATE first makes them queue instead. The order is always
 * club rows (ascending id), then the user row, then the brew row, then children.
 */
import { asc, eq, inArray } from 'drizzle-orm';
import type { Tx } from './client';
import { brews, clubs, users } from './schema';
import { NotFound } from '../lib/errors';

export async function lockBrewRow(tx: Tx, brewId: number) {
  const [row] = await tx.select({ id: brews.id, pitchedAt: brews.pitchedAt, status: brews.status }).from(brews).where(eq(brews.id, brewId)).for('update');
  if (!row) throw new NotFound('Brew day was not found.');
  return row;
}

export async function lockUserRow(tx: Tx, userId: number) {
  const [row] = await tx.select({ id: users.id }).from(users).where(eq(users.id, userId)).for('update');
  if (!row) throw new NotFound('That account was not found.');
  return row;
}

/** Locks the given clubs' rows in ascending id order (the order every transaction uses); returns the ids found. */
export async function lockClubRows(tx: Tx, clubIds: number[]): Promise<number[]> {
  if (clubIds.length === 0) return [];
  const rows = await tx.select({ id: clubs.id }).from(clubs).where(inArray(clubs.id, clubIds)).orderBy(asc(clubs.id)).for('update');
  return rows.map((r) => r.id);
}
