import { QueryClient, type InfiniteData } from '@tanstack/react-query';
import { describe, expect, it } from 'vitest';
import type { BrewDetail, BrewReading, BrewReadingPage, ReadingPhoto } from '@shared/schemas/brews';
import { brewKeys } from './keys';
import { olderReadingsQueryOptions } from './older-readings';
import { updateCachedReading } from './reading-cache';

const reading = (id: number) => ({ id, photos: [] as ReadingPhoto[] }) as BrewReading;
const photo = (id: number, readingId: number): ReadingPhoto => ({
  id,
  readingId,
  mime: 'image/jpeg',
  sizeBytes: 10,
  sha256: 'a'.repeat(64),
  createdAt: '2025-09-20T08:00:00.000Z',
  url: `/api/brews/42/readings/${readingId}/photos/${id}`,
});

function cached() {
  const client = new QueryClient();
  client.setQueryData(brewKeys.detail(42), { id: 42, readings: [reading(3), reading(4)] } as BrewDetail);
  const older = olderReadingsQueryOptions(42, 'from');
  client.setQueryData<InfiniteData<BrewReadingPage, string | null>>(older.queryKey, { pages: [{ items: [reading(1), reading(2)], nextCursor: null, pageSize: 50 }], pageParams: ['from'] });
  const photosOf = (id: number) => {
    const all = [...client.getQueryData<BrewDetail>(brewKeys.detail(42))!.readings, ...client.getQueryData(older.queryKey)!.pages[0].items];
    return all.find((r) => r.id === id)!.photos.map((p) => p.id);
  };
  return { client, photosOf };
}

describe('updating a reading on the page from a write’s answer', () => {
  it('adds a photo to a reading among the day’s latest, and only to it', () => {
    const { client, photosOf } = cached();
    updateCachedReading(client, 42, 4, (r) => ({ ...r, photos: [...r.photos, photo(9, 4)] }));
    expect([photosOf(4), photosOf(3), photosOf(1)]).toEqual([[9], [], []]);
  });

  it('adds a photo to a reading on an older page', () => {
    const { client, photosOf } = cached();
    updateCachedReading(client, 42, 1, (r) => ({ ...r, photos: [...r.photos, photo(7, 1)] }));
    expect([photosOf(1), photosOf(2), photosOf(4)]).toEqual([[7], [], []]);
    expect(client.getQueryState(brewKeys.detail(42))?.isInvalidated).toBe(false);
  });
});
