/**
 * The device's own store for the offline brew day: two small IndexedDB databases through
 * idb-keyval, one for the queue of writes waiting to be sent, one for copies of what the pages
 * need to open without a connection.
 */
import { createStore, type UseStore } from 'idb-keyval';

let queueStore: UseStore | null = null;
let copyStore: UseStore | null = null;

export const hasIndexedDb = () => typeof indexedDB !== 'undefined';

export function queueDb(): UseStore {
  queueStore ??= createStore('wortwise-queue', 'items');
  return queueStore;
}

export function copyDb(): UseStore {
  copyStore ??= createStore('wortwise-copies', 'copies');
  return copyStore;
}

/** For tests: forget the open stores so a fresh fake IndexedDB is used. */
export function resetStoresForTests() {
  queueStore = null;
  copyStore = null;
}

/** The device refused to store more: the brewer must hear it before relying on the queue. */
export class StorageFullError extends Error {
  constructor() {
    super('This device has no room left to keep readings offline. Free some space, or send what is waiting while you have a connection.');
    this.name = 'StorageFullError';
  }
}

export function isQuotaError(error: unknown): boolean {
  if (!(error instanceof Error) && !(typeof DOMException !== 'undefined' && error instanceof DOMException)) return false;
  const name = (error as { name?: string }).name;
  return name === 'QuotaExceededError' || name === 'NS_ERROR_DOM_QUOTA_REACHED';
}

/** How full the device store is, when the browser says (navigator.storage.estimate). */
export async function storageEstimate(): Promise<{ usage: number; quota: number } | null> {
  if (typeof navigator === 'undefined' || !navigator.storage?.estimate) return null;
  try {
    const { usage, quota } = await navigator.storage.estimate();
    return usage === undefined || quota === undefined ? null : { usage, quota };
  } catch {
    return null;
  }
}

/** Below this much free room the brew day warns that offline readings may not fit. */
export const LOW_STORAGE_BYTES = 5 * 1024 * 1024;
