/**
 * The queue of writes kept on the device until the server has them. Each item is one create
 * (a reading, a late-boil decision, a note, a stage change, a fermentation reading or a photo)
 * with its own idempotency key and the time it was taken, owned by one signed-in brewer.
 */
import { del, entries, get, set } from 'idb-keyval';
import { isQuotaError, queueDb, StorageFullError } from './storage';

export const queuedKinds = ['reading', 'decision', 'note', 'stage', 'fermentation-reading', 'photo'] as const;
export type QueuedKind = (typeof queuedKinds)[number];

export interface QueuedRefusal {
  status: number;
  message: string;
  fields?: Record<string, string>;
}

export interface QueuedItem {
  /** Also the Idempotency-Key header: a resend of the same item is never stored twice. */
  id: string;
  userId: number;
  brewId: number;
  kind: QueuedKind;
  url: string;
  /** JSON body; for a photo, the file itself (IndexedDB keeps Blobs). */
  body: unknown;
  photo?: Blob;
  /** What the brewer sees in the log, e.g. "Mash temperature 66.6 °C". */
  label: string;
  /** When it was read, decided or written on the device (ISO). */
  takenAt: string;
  /** Sending order: items go out in the order they were made. */
  seq: number;
  state: 'waiting' | 'refused';
  refusal?: QueuedRefusal;
}

export type NewQueuedItem = Omit<QueuedItem, 'id' | 'seq' | 'state' | 'refusal'> & { id?: string };

const listeners = new Set<() => void>();
let channel: BroadcastChannel | null = null;

function broadcast(): BroadcastChannel | null {
  if (typeof BroadcastChannel === 'undefined') return null;
  if (!channel) {
    channel = new BroadcastChannel('wortwise-queue');
    // Another tab changed the queue: every view here reads it again.
    channel.onmessage = () => listeners.forEach((l) => l());
  }
  return channel;
}

/** Called whenever the queue changes, in this tab or another. */
export function onQueueChange(listener: () => void): () => void {
  broadcast();
  listeners.add(listener);
  return () => listeners.delete(listener);
}

export function queueChanged() {
  listeners.forEach((l) => l());
  broadcast()?.postMessage('changed');
}

export function newKey(): string {
  if (typeof crypto !== 'undefined' && typeof crypto.randomUUID === 'function') return crypto.randomUUID();
  const bytes = new Uint8Array(16);
  crypto.getRandomValues(bytes);
  return Array.from(bytes, (b) => b.toString(16).padStart(2, '0')).join('');
}

let lastSeq = 0;
/** Increasing across tabs as long as the clocks agree; ties broken by a counter within a tab. */
function nextSeq() {
  lastSeq = Math.max(Date.now() * 1000, lastSeq + 1);
  return lastSeq;
}

export async function addToQueue(input: NewQueuedItem): Promise<QueuedItem> {
  const item: QueuedItem = { ...input, id: input.id ?? newKey(), seq: nextSeq(), state: 'waiting' };
  try {
    await set(item.id, item, queueDb());
  } catch (error) {
    if (isQuotaError(error)) throw new StorageFullError();
    throw error;
  }
  queueChanged();
  return item;
}

/** Every item on the device, oldest first (all owners: callers filter by the signed-in brewer). */
export async function allItems(): Promise<QueuedItem[]> {
  const rows = await entries<string, QueuedItem>(queueDb());
  return rows.map(([, item]) => item).sort((a, b) => a.seq - b.seq);
}

export async function itemsOf(userId: number): Promise<QueuedItem[]> {
  return (await allItems()).filter((i) => i.userId === userId);
}

export async function getItem(id: string): Promise<QueuedItem | undefined> {
  return get<QueuedItem>(id, queueDb());
}

export async function removeItem(id: string, notify = true) {
  await del(id, queueDb());
  if (notify) queueChanged();
}

export async function markRefused(item: QueuedItem, refusal: QueuedRefusal) {
  await set(item.id, { ...item, state: 'refused', refusal }, queueDb());
  queueChanged();
}

/** The brewer fixed what was wrong elsewhere (or just wants another go): send it again. */
export async function markWaiting(id: string) {
  const item = await getItem(id);
  if (!item) return;
  await set(id, { ...item, state: 'waiting', refusal: undefined }, queueDb());
  queueChanged();
}

/** On sign-out: the queue belongs to that brewer only. */
export async function clearQueueOf(userId: number) {
  for (const item of await itemsOf(userId)) await del(item.id, queueDb());
  queueChanged();
}
