// @vitest-environment node
import 'fake-indexeddb/auto';
import { IDBFactory } from 'fake-indexeddb';
import { beforeEach, describe, expect, it } from 'vitest';
import { addToQueue } from '@/lib/offline/queue';
import { resetStoresForTests } from '@/lib/offline/storage';
import { forgetBrewer } from '@/lib/offline/use-offline-sync';
import { confirmSignOut } from './logout';

const entry = (userId: number) => ({ userId, brewId: 1, kind: 'note' as const, url: '/api/brews/1/notes', body: { body: 'x' }, label: 'Note: x', takenAt: '2026-12-05T03:00:00.000Z' });

beforeEach(() => {
  globalThis.indexedDB = new IDBFactory();
  resetStoresForTests();
});

describe('signing out with entries not yet sent', () => {
  it('signs out without asking when nothing of theirs waits', async () => {
    await addToQueue(entry(2));
    const asked: string[] = [];
    expect(await confirmSignOut(1, (m) => (asked.push(m), false))).toBe(true);
    expect(asked).toEqual([]);
  });

  it('asks first, saying how many would be lost, and stays signed in on "no"', async () => {
    await addToQueue(entry(1));
    await addToQueue(entry(1));
    const asked: string[] = [];
    expect(await confirmSignOut(1, (m) => (asked.push(m), false))).toBe(false);
    expect(asked[0]).toMatch(/^2 entries have not been sent/);
    expect(await confirmSignOut(1, () => true)).toBe(true);
  });

  it('clears only that brewer’s entries once signed out', async () => {
    await addToQueue(entry(1));
    await addToQueue(entry(2));
    await forgetBrewer(1);
    expect(await confirmSignOut(1, () => false)).toBe(true);
    expect(await confirmSignOut(2, () => false)).toBe(false);
  });
});
