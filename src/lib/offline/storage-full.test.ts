// @vitest-environment node
/** A device with no room left: the brewer is told before relying on the queue. */
import 'fake-indexeddb/auto';
import { describe, expect, it, vi } from 'vitest';
import { addToQueue } from './queue';
import { getSendState, sendOrQueue, setQueueOwner } from './send';
import { StorageFullError } from './storage';

vi.mock('idb-keyval', async (importOriginal) => {
  const real = await importOriginal<typeof import('idb-keyval')>();
  return {
    ...real,
    // What browsers throw when the origin's storage quota is used up.
    set: vi.fn(async () => {
      throw new DOMException('The quota has been exceeded.', 'QuotaExceededError');
    }),
  };
});

const note = { brewId: 1, kind: 'note' as const, url: '/api/brews/1/notes', body: { body: 'Lid on.' }, label: 'Note: Lid on.', takenAt: '2026-12-05T03:00:00.000Z' };

describe('a full device store', () => {
  it('turns the quota error into a StorageFullError the brewer can read', async () => {
    await expect(addToQueue({ ...note, userId: 1 })).rejects.toBeInstanceOf(StorageFullError);
  });

  it('offline: refuses to pretend the entry is kept, and says the device is full', async () => {
    setQueueOwner(1);
    await expect(sendOrQueue(note, { isOnline: () => false })).rejects.toThrow(/no room left/);
    expect(getSendState().storageFull).toBe(true);
  });

  it('online: sends the entry straight away instead of keeping it', async () => {
    setQueueOwner(1);
    const fetchImpl = vi.fn(async () => new Response(JSON.stringify({ id: 5 }), { status: 201 })) as unknown as typeof fetch;
    await expect(sendOrQueue(note, { isOnline: () => true, fetchImpl })).resolves.toEqual({ status: 'sent', data: { id: 5 } });
    expect(fetchImpl).toHaveBeenCalledTimes(1);
  });
});
