/** React views of the device queue: what is waiting, whether we are online, and sending it. */
import { useCallback, useEffect, useSyncExternalStore } from 'react';
import { itemsOf, onQueueChange, type QueuedItem } from './queue';
import { flushQueue, getSendState, onSendStateChange, queueOwner, type FlushOptions } from './send';
import { hasIndexedDb, LOW_STORAGE_BYTES, storageEstimate } from './storage';

function subscribeOnline(callback: () => void) {
  window.addEventListener('online', callback);
  window.addEventListener('offline', callback);
  return () => {
    window.removeEventListener('online', callback);
    window.removeEventListener('offline', callback);
  };
}

/** What the browser says about the connection. */
export function useOnline(): boolean {
  return useSyncExternalStore(
    subscribeOnline,
    () => navigator.onLine,
    () => true,
  );
}

export function useSendState() {
  return useSyncExternalStore(onSendStateChange, getSendState, getSendState);
}

// One in-memory snapshot of the signed-in brewer's items, read again whenever the queue changes.
let snapshot: readonly QueuedItem[] = [];
let snapshotOwner: number | null = null;
let lowStorage = false;
const listeners = new Set<() => void>();
let unsubscribeQueue: (() => void) | null = null;
let reading: Promise<void> | null = null;

async function reread() {
  const owner = queueOwner();
  if (!hasIndexedDb() || owner === null) {
    snapshot = [];
  } else {
    snapshot = await itemsOf(owner);
    const estimate = await storageEstimate();
    lowStorage = estimate !== null && estimate.quota - estimate.usage < LOW_STORAGE_BYTES;
  }
  snapshotOwner = owner;
  listeners.forEach((l) => l());
}

function refresh() {
  reading = (reading ?? Promise.resolve()).then(reread, reread);
  return reading;
}

function subscribeItems(callback: () => void) {
  listeners.add(callback);
  if (!unsubscribeQueue) unsubscribeQueue = onQueueChange(() => void refresh());
  if (snapshotOwner !== queueOwner()) void refresh();
  return () => {
    listeners.delete(callback);
    if (listeners.size === 0 && unsubscribeQueue) {
      unsubscribeQueue();
      unsubscribeQueue = null;
    }
  };
}

/** Everything the signed-in brewer has waiting on this device, oldest first. */
export function useQueuedItems(): readonly QueuedItem[] {
  const items = useSyncExternalStore(
    subscribeItems,
    () => snapshot,
    () => snapshot,
  );
  useEffect(() => {
    void refresh();
  }, []);
  return items;
}

export const isStorageLow = () => lowStorage;

/** Sends the queue now; `onAccepted` refreshes whatever shows the accepted items. */
export function useSendNow(options: FlushOptions = {}) {
  const { onAccepted, fetchImpl } = options;
  return useCallback(async () => {
    const owner = queueOwner();
    if (owner === null) return;
    await flushQueue(owner, { onAccepted, fetchImpl });
  }, [onAccepted, fetchImpl]);
}

/** Sends the queue when the connection comes back, when the page opens, and when `trigger` changes (a new sign-in). */
export function useCatchUp(trigger: unknown, onAccepted?: FlushOptions['onAccepted']) {
  const sendNow = useSendNow({ onAccepted });
  useEffect(() => {
    if (trigger == null) return;
    void refresh().then(() => {
      if (navigator.onLine && snapshot.some((i) => i.state === 'waiting')) void sendNow();
    });
    const onOnline = () => void sendNow();
    window.addEventListener('online', onOnline);
    return () => window.removeEventListener('online', onOnline);
  }, [trigger, sendNow]);
}

export { refresh as refreshQueueView };
