/**
 * Copies of what the offline pages need (who is signed in, the brew day, the instruments, the
 * fermentation log), kept in IndexedDB each time they load, read back only when the network is
 * gone. Each copy names its owner, so another brewer signing in on the device never sees it.
 */
import { clear, del, entries, get, set } from 'idb-keyval';
import { NetworkError } from '../api-client';
import { copyDb, hasIndexedDb, isQuotaError } from './storage';

interface Copy<T> {
  ownerId: number | null;
  savedAt: string;
  data: T;
}

const ME_KEY = 'me';

/** The brewer signed in when the copy was made (the copy of "me" itself has none). */
let currentOwner: number | null = null;
export const setCopyOwner = (id: number | null) => {
  currentOwner = id;
};

/** Keeps a copy; a full device only loses the copy, never the page. */
export async function saveCopy<T>(key: string, data: T, ownerId: number | null = currentOwner): Promise<boolean> {
  if (!hasIndexedDb()) return false;
  try {
    await set(key, { ownerId, savedAt: new Date().toISOString(), data } satisfies Copy<T>, copyDb());
    return true;
  } catch (error) {
    if (isQuotaError(error)) return false;
    throw error;
  }
}

export async function loadCopy<T>(key: string, ownerId: number | null = currentOwner): Promise<T | undefined> {
  if (!hasIndexedDb()) return undefined;
  const copy = await get<Copy<T>>(key, copyDb());
  if (!copy || (key !== ME_KEY && copy.ownerId !== ownerId)) return undefined;
  return copy.data;
}

/** Fetch fresh and keep a copy; with no connection, answer from the copy if there is one. */
export async function withDeviceCopy<T>(key: string, fetcher: () => Promise<T>): Promise<T> {
  try {
    const data = await fetcher();
    void saveCopy(key, data).catch(() => undefined);
    return data;
  } catch (error) {
    if (!(error instanceof NetworkError)) throw error;
    const copy = await loadCopy<T>(key).catch(() => undefined);
    if (copy === undefined) throw error;
    return copy;
  }
}

export const saveMeCopy = <T extends { id: number }>(me: T) => saveCopy(ME_KEY, me, me.id);
export const loadMeCopy = <T>() => loadCopy<T>(ME_KEY, null);

/** On sign-out: nothing of this brewer's stays on the device. */
export async function clearCopiesOf(userId: number) {
  if (!hasIndexedDb()) return;
  const rows = await entries<string, Copy<unknown>>(copyDb());
  const mine = rows.filter(([key, copy]) => copy.ownerId === userId || key === ME_KEY);
  if (mine.length === rows.length) return clear(copyDb());
  for (const [key] of mine) await del(key, copyDb());
}
