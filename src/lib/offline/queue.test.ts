// @vitest-environment node
/**
 * The device queue against an in-memory IndexedDB (fake-indexeddb) and a stand-in fetch that
 * plays the server's part: order, idempotency keys, refusals kept with their reason, a lost
 * connection or an expired session leaving items waiting, two tabs never sending one item twice.
 */
import 'fake-indexeddb/auto';
import { IDBFactory } from 'fake-indexeddb';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { ApiError } from '../api-client';
import { addToQueue, allItems, clearQueueOf, itemsOf, markWaiting } from './queue';
import { flushQueue, getSendState, sendOrQueue, setQueueOwner, signedInAgain } from './send';
import { resetStoresForTests } from './storage';

interface Call {
  url: string;
  key: string | null;
  body: unknown;
}

/** A stand-in server: remembers every request; answers by a rule per call. */
function fakeServer(answer: (call: Call, n: number) => Response | 'offline' = () => json(201, { ok: true })) {
  const calls: Call[] = [];
  const fetchImpl = (async (url: string, init: RequestInit) => {
    const headers = init.headers as Record<string, string>;
    const call = { url, key: headers['Idempotency-Key'] ?? null, body: typeof init.body === 'string' ? JSON.parse(init.body) : init.body };
    calls.push(call);
    const reply = answer(call, calls.length);
    if (reply === 'offline') throw new TypeError('Failed to fetch');
    return reply;
  }) as unknown as typeof fetch;
  return { calls, fetchImpl };
}

const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });

const reading = (n: number, userId = 7) => ({
  userId,
  brewId: 3,
  kind: 'reading' as const,
  url: '/api/brews/3/readings',
  body: { kind: 'mash_temp', tempC: 60 + n, takenAt: `2026-12-05T03:0${n}:00.000Z` },
  label: `Mash temperature ${n}`,
  takenAt: `2026-12-05T03:0${n}:00.000Z`,
});

beforeEach(() => {
  globalThis.indexedDB = new IDBFactory();
  resetStoresForTests();
  setQueueOwner(7);
  signedInAgain();
});

afterEach(() => setQueueOwner(null));

describe('the device queue', () => {
  it('sends in the order the entries were made, each with its own idempotency key, and empties', async () => {
    const a = await addToQueue(reading(1));
    const b = await addToQueue(reading(2));
    const c = await addToQueue(reading(3));
    const server = fakeServer();
    await flushQueue(7, { fetchImpl: server.fetchImpl });
    expect(server.calls.map((x) => (x.body as { tempC: number }).tempC)).toEqual([61, 62, 63]);
    expect(server.calls.map((x) => x.key)).toEqual([a.id, b.id, c.id]);
    expect(new Set(server.calls.map((x) => x.key)).size).toBe(3);
    expect(await allItems()).toEqual([]);
  });

  it('keeps the time each entry was taken in what is sent', async () => {
    await addToQueue(reading(4));
    const server = fakeServer();
    await flushQueue(7, { fetchImpl: server.fetchImpl });
    expect((server.calls[0].body as { takenAt: string }).takenAt).toBe('2026-12-05T03:04:00.000Z');
  });

  it('keeps a refused entry with its reason and sends the rest', async () => {
    await addToQueue(reading(1));
    await addToQueue(reading(2));
    const server = fakeServer((call) =>
      (call.body as { tempC: number }).tempC === 61 ? json(400, { error: 'validation', message: 'Check the highlighted fields.', fields: { tempC: 'Too hot for a mash.' } }) : json(201, {}),
    );
    await flushQueue(7, { fetchImpl: server.fetchImpl });
    const left = await allItems();
    expect(left).toHaveLength(1);
    expect(left[0].state).toBe('refused');
    expect(left[0].refusal).toEqual({ status: 400, message: 'Check the highlighted fields.', fields: { tempC: 'Too hot for a mash.' } });
    expect(server.calls).toHaveLength(2);

    // A refused entry is not sent again by itself, only when the brewer asks.
    await flushQueue(7, { fetchImpl: server.fetchImpl });
    expect(server.calls).toHaveLength(2);
    await markWaiting(left[0].id);
    expect((await allItems())[0].state).toBe('waiting');
  });

  it('stops at a lost connection and resends the same key later', async () => {
    await addToQueue(reading(1));
    await addToQueue(reading(2));
    let online = false;
    const server = fakeServer(() => (online ? json(201, {}) : 'offline'));
    await flushQueue(7, { fetchImpl: server.fetchImpl });
    expect(server.calls).toHaveLength(1);
    expect(await allItems()).toHaveLength(2);
    expect(getSendState().problem).toBe('No connection to Wortwise.');
    online = true;
    await flushQueue(7, { fetchImpl: server.fetchImpl });
    expect(server.calls.map((c) => c.key)[0]).toBe(server.calls.map((c) => c.key)[1]);
    expect(await allItems()).toHaveLength(0);
  });

  it('waits for a new sign-in when the session has expired, keeping every entry', async () => {
    await addToQueue(reading(1));
    await addToQueue(reading(2));
    const server = fakeServer(() => json(401, { error: 'unauthorized', message: 'Sign in first.' }));
    await flushQueue(7, { fetchImpl: server.fetchImpl });
    expect(getSendState().needsSignIn).toBe(true);
    expect(server.calls).toHaveLength(1);
    expect((await allItems()).every((i) => i.state === 'waiting')).toBe(true);
    signedInAgain();
    expect(getSendState().needsSignIn).toBe(false);
  });

  it('treats a failing server as worth another try, not as a refusal', async () => {
    await addToQueue(reading(1));
    const server = fakeServer(() => json(503, { error: 'unavailable', message: 'Try again shortly.' }));
    await flushQueue(7, { fetchImpl: server.fetchImpl });
    expect((await allItems())[0].state).toBe('waiting');
    expect(getSendState().problem).toBe('Try again shortly.');
  });

  it('belongs to one brewer: another brewer neither sends nor sees it, and sign-out clears only theirs', async () => {
    await addToQueue(reading(1, 7));
    await addToQueue(reading(2, 8));
    const server = fakeServer();
    await flushQueue(8, { fetchImpl: server.fetchImpl });
    expect(server.calls).toHaveLength(1);
    expect(await itemsOf(7)).toHaveLength(1);
    await addToQueue(reading(3, 8));
    await clearQueueOf(7);
    expect((await allItems()).map((i) => i.userId)).toEqual([8]);
  });

  it('never sends one entry twice when two runs overlap (two tabs, or a button pressed twice)', async () => {
    for (let n = 1; n <= 3; n++) await addToQueue(reading(n));
    let release: () => void = () => {};
    const gate = new Promise<void>((r) => (release = r));
    const calls: string[] = [];
    const slow = (async (_url: string, init: RequestInit) => {
      calls.push((init.headers as Record<string, string>)['Idempotency-Key']);
      await gate;
      return json(201, {});
    }) as unknown as typeof fetch;
    const first = flushQueue(7, { fetchImpl: slow });
    const second = flushQueue(7, { fetchImpl: slow });
    release();
    await Promise.all([first, second]);
    expect(calls).toHaveLength(3);
    expect(new Set(calls).size).toBe(3);
  });
});

describe('sendOrQueue, the way the brew day writes', () => {
  it('returns the server answer when sent at once, and leaves nothing behind', async () => {
    const server = fakeServer(() => json(201, { id: 42 }));
    const outcome = await sendOrQueue<{ id: number }>(reading(1), { fetchImpl: server.fetchImpl, isOnline: () => true });
    expect(outcome).toEqual({ status: 'sent', data: { id: 42 } });
    expect(await allItems()).toEqual([]);
  });

  it('keeps the entry waiting, without trying the network, when the browser is offline', async () => {
    const server = fakeServer();
    const outcome = await sendOrQueue(reading(1), { fetchImpl: server.fetchImpl, isOnline: () => false });
    expect(outcome.status).toBe('queued');
    expect(server.calls).toHaveLength(0);
    expect(await allItems()).toHaveLength(1);
  });

  it('throws a refusal made while the brewer is there (the form shows it) and keeps nothing', async () => {
    const server = fakeServer(() => json(400, { error: 'validation', message: 'Check the highlighted fields.', fields: { tempC: 'Too hot.' } }));
    await expect(sendOrQueue(reading(1), { fetchImpl: server.fetchImpl, isOnline: () => true })).rejects.toBeInstanceOf(ApiError);
    expect(await allItems()).toEqual([]);
  });

  it('keeps the entry when the connection drops during the send', async () => {
    const server = fakeServer(() => 'offline');
    const outcome = await sendOrQueue(reading(1), { fetchImpl: server.fetchImpl, isOnline: () => true });
    expect(outcome.status).toBe('queued');
    expect(await allItems()).toHaveLength(1);
  });
});

describe('a photo in the queue', () => {
  it('is sent as the form field the server reads, with its idempotency key', async () => {
    const photo = new Blob([new Uint8Array([0x89, 0x50, 0x4e, 0x47])], { type: 'image/png' });
    const item = await addToQueue({ userId: 7, brewId: 3, kind: 'photo', url: '/api/brews/3/readings/9/photos', body: { fileName: 'probe.png' }, photo, label: 'Photo', takenAt: '2026-12-05T03:00:00.000Z' });
    const server = fakeServer(() => json(201, {}));
    await flushQueue(7, { fetchImpl: server.fetchImpl });
    expect(server.calls).toHaveLength(1);
    expect(server.calls[0].key).toBe(item.id);
    const form = server.calls[0].body as FormData;
    expect(form).toBeInstanceOf(FormData);
    expect((form.get('photo') as File).size).toBe(4);
    expect(await allItems()).toEqual([]);
  });
});
