/**
 * Sending the queue: in order, one tab at a time (Web Locks), each item with its idempotency key,
 * so a retry after a lost answer is recognised by the server instead of stored twice.
 */
import type { ApiErrorBody } from '@shared/schemas/common';
import { ApiError, NetworkError } from '../api-client';
import { addToQueue, getItem, itemsOf, markRefused, queueChanged, removeItem, type NewQueuedItem, type QueuedItem } from './queue';
import { hasIndexedDb, StorageFullError } from './storage';

export type SendOutcome =
  | { kind: 'accepted'; data: unknown }
  | { kind: 'refused'; status: number; body: ApiErrorBody }
  | { kind: 'unreachable' }
  | { kind: 'signed-out' }
  | { kind: 'server-trouble'; message: string };

/** What the brew day shows about sending, beside the items themselves. */
export interface SendState {
  sending: boolean;
  /** The session ran out: the queue waits until the brewer signs in again. */
  needsSignIn: boolean;
  /** The last try could not reach the server, or the server failed (5xx, 429). */
  problem: string | null;
  storageFull: boolean;
}

let state: SendState = { sending: false, needsSignIn: false, problem: null, storageFull: false };
const stateListeners = new Set<() => void>();

export const getSendState = () => state;
export function onSendStateChange(listener: () => void) {
  stateListeners.add(listener);
  return () => stateListeners.delete(listener);
}
function setSendState(patch: Partial<SendState>) {
  state = { ...state, ...patch };
  stateListeners.forEach((l) => l());
}

/** A fresh sign-in: whatever waited for it can go. */
export function signedInAgain() {
  if (state.needsSignIn) setSendState({ needsSignIn: false });
}

/** Sends one item, exactly as it was first made. */
export async function sendItem(item: QueuedItem, fetchImpl: typeof fetch = fetch): Promise<SendOutcome> {
  let body: BodyInit;
  const headers: Record<string, string> = { Accept: 'application/json', 'Idempotency-Key': item.id };
  if (item.photo) {
    const form = new FormData();
    form.append('photo', item.photo, (item.body as { fileName?: string } | undefined)?.fileName ?? 'photo');
    body = form;
  } else {
    headers['Content-Type'] = 'application/json';
    body = JSON.stringify(item.body);
  }
  let res: Response;
  try {
    res = await fetchImpl(item.url, { method: 'POST', credentials: 'same-origin', headers, body });
  } catch {
    return { kind: 'unreachable' };
  }
  const text = await res.text().catch(() => '');
  let data: unknown;
  try {
    data = text ? JSON.parse(text) : undefined;
  } catch {
    data = undefined;
  }
  if (res.ok) return { kind: 'accepted', data };
  if (res.status === 401) return { kind: 'signed-out' };
  const errorBody: ApiErrorBody =
    data && typeof data === 'object' && 'message' in data ? (data as ApiErrorBody) : { error: `http_${res.status}`, message: `The server answered ${res.status}.` };
  // Overloaded or failing: worth another try later, not the brewer's mistake.
  if (res.status >= 500 || res.status === 429 || res.status === 408) return { kind: 'server-trouble', message: errorBody.message };
  return { kind: 'refused', status: res.status, body: errorBody };
}

/** Runs `work` in one tab at a time; without Web Locks (old browsers, jsdom), one run per tab. */
let localChain: Promise<unknown> = Promise.resolve();
async function exclusively<T>(work: () => Promise<T>): Promise<T> {
  if (typeof navigator !== 'undefined' && navigator.locks?.request) {
    return navigator.locks.request('wortwise-send-queue', { mode: 'exclusive' }, work) as Promise<T>;
  }
  const run = localChain.then(work, work);
  localChain = run.catch(() => undefined);
  return run;
}

let acceptedHandler: FlushOptions['onAccepted'] | null = null;
/** The app's way to show the server's version once an item is accepted (set once, app-wide). */
export function setAcceptedHandler(handler: FlushOptions['onAccepted'] | null) {
  acceptedHandler = handler;
}

export interface FlushOptions {
  fetchImpl?: typeof fetch;
  /** Called after each accepted item, e.g. to refresh the page's data. */
  onAccepted?: (item: QueuedItem, data: unknown) => void;
}

/**
 * Sends every waiting item of this brewer, oldest first. Accepted items leave the queue; refused
 * ones stay with their reason for the brewer to fix or discard; a lost connection, a failing
 * server or an expired session stop the run and leave the rest waiting.
 */
export async function flushQueue(userId: number, options: FlushOptions = {}): Promise<Map<string, SendOutcome>> {
  const outcomes = new Map<string, SendOutcome>();
  return exclusively(async () => {
    setSendState({ sending: true });
    try {
      // Read inside the lock: another tab may have sent some of these a moment ago.
      const waiting = (await itemsOf(userId)).filter((i) => i.state === 'waiting');
      for (const listed of waiting) {
        const item = await getItem(listed.id);
        if (!item || item.state !== 'waiting') continue;
        const outcome = await sendItem(item, options.fetchImpl);
        outcomes.set(item.id, outcome);
        if (outcome.kind === 'accepted') {
          await removeItem(item.id);
          (options.onAccepted ?? acceptedHandler)?.(item, outcome.data);
          setSendState({ problem: null, needsSignIn: false });
        } else if (outcome.kind === 'refused') {
          await markRefused(item, { status: outcome.status, message: outcome.body.message, fields: outcome.body.fields });
        } else if (outcome.kind === 'signed-out') {
          setSendState({ needsSignIn: true });
          break;
        } else {
          setSendState({ problem: outcome.kind === 'unreachable' ? 'No connection to Wortwise.' : outcome.message });
          break;
        }
      }
      return outcomes;
    } finally {
      setSendState({ sending: false });
      queueChanged();
    }
  });
}

/** Who owns new queue items: the brewer signed in on this device (set by the auth module). */
let owner: number | null = null;
export const setQueueOwner = (userId: number | null) => {
  owner = userId;
};
export const queueOwner = () => owner;

export type QueuedOr<T> = { status: 'sent'; data: T } | { status: 'queued'; item: QueuedItem };

export interface SendOrQueueOptions {
  fetchImpl?: typeof fetch;
  onAccepted?: FlushOptions['onAccepted'];
  isOnline?: () => boolean;
}

/**
 * The one way the brew day writes: keep the item on the device first, then send the queue.
 * Sent now: the server's answer. Refused now: thrown as an ApiError, so the form shows the reason
 * under its fields while the brewer is still there. Otherwise it waits in the queue.
 */
export async function sendOrQueue<T>(input: Omit<NewQueuedItem, 'userId'>, options: SendOrQueueOptions = {}): Promise<QueuedOr<T>> {
  const userId = owner;
  const online = options.isOnline ?? (() => typeof navigator === 'undefined' || navigator.onLine !== false);
  let item: QueuedItem;
  // Nobody known to be signed in, or a browser without IndexedDB: one plain attempt, as before.
  if (userId === null || !hasIndexedDb()) return { status: 'sent', data: await sendDirect<T>({ ...input, userId: userId ?? -1 }, options.fetchImpl) };
  try {
    item = await addToQueue({ ...input, userId });
    if (state.storageFull) setSendState({ storageFull: false });
  } catch (error) {
    if (!(error instanceof StorageFullError)) throw error;
    setSendState({ storageFull: true });
    // No room to keep it: with a connection, send it straight away; without, say so.
    if (!online()) throw error;
    return { status: 'sent', data: await sendDirect<T>({ ...input, userId }, options.fetchImpl) };
  }
  if (!online()) {
    setSendState({ problem: 'No connection to Wortwise.' });
    return { status: 'queued', item };
  }
  const outcome = (await flushQueue(userId, options)).get(item.id);
  if (outcome?.kind === 'accepted') return { status: 'sent', data: outcome.data as T };
  if (outcome?.kind === 'refused') {
    await removeItem(item.id);
    throw new ApiError(outcome.status, outcome.body);
  }
  return { status: 'queued', item };
}

/** Without a queue (nobody known to be signed in, or no room): one plain attempt with the key. */
async function sendDirect<T>(input: NewQueuedItem, fetchImpl?: typeof fetch): Promise<T> {
  const outcome = await sendItem({ ...input, id: input.id ?? crypto.randomUUID(), seq: 0, state: 'waiting' } as QueuedItem, fetchImpl);
  if (outcome.kind === 'accepted') return outcome.data as T;
  if (outcome.kind === 'refused') throw new ApiError(outcome.status, outcome.body);
  if (outcome.kind === 'signed-out') throw new ApiError(401, { error: 'unauthorized', message: 'Sign in again to save this.' });
  if (outcome.kind === 'server-trouble') throw new ApiError(503, { error: 'server_trouble', message: outcome.message });
  throw new NetworkError();
}
