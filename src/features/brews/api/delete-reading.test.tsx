import { QueryClient, QueryClientProvider, type InfiniteData } from '@tanstack/react-query';
import { act, renderHook } from '@testing-library/react';
import type { ReactNode } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { BrewDayChange, BrewDetail, BrewReading, BrewReadingPage, ReadingDeleted } from '@shared/schemas/brews';
import { useDeleteReading } from './delete-reading';
import { brewKeys } from './keys';
import { olderReadingsQueryOptions } from './older-readings';

const reading = (id: number) => ({ id, takenAt: `2025-09-20T08:0${id}:00.000Z` }) as BrewReading;

afterEach(() => {
  vi.unstubAllGlobals();
});

describe('deleting a brew-day reading', () => {
  it('drops it from the cached day and its older pages and takes what changed from the answer, asking for nothing else', async () => {
    const brewDay = { og: null, readingCount: 3, deviations: [] } as unknown as BrewDayChange;
    const answer: ReadingDeleted = { readingId: 2, brewDay };
    const fetch = vi.fn().mockResolvedValueOnce(new Response(JSON.stringify(answer), { status: 200, headers: { 'Content-Type': 'application/json' } }));
    vi.stubGlobal('fetch', fetch);
    const client = new QueryClient();
    client.setQueryData(brewKeys.detail(42), { id: 42, og: 1.05, readingCount: 4, readings: [reading(3), reading(4)], deviations: [{ code: 'og-low' }] } as unknown as BrewDetail);
    const older = olderReadingsQueryOptions(42, 'from');
    client.setQueryData<InfiniteData<BrewReadingPage, string | null>>(older.queryKey, { pages: [{ items: [reading(1), reading(2)], nextCursor: null, pageSize: 50 }], pageParams: ['from'] });
    const wrapper = ({ children }: { children: ReactNode }) => <QueryClientProvider client={client}>{children}</QueryClientProvider>;
    const { result } = renderHook(() => useDeleteReading(42), { wrapper });
    await act(() => result.current.mutateAsync(2));
    expect(fetch).toHaveBeenCalledTimes(1);
    expect(fetch.mock.calls[0][0]).toBe('/api/brews/42/readings/2');
    const day = client.getQueryData<BrewDetail>(brewKeys.detail(42))!;
    expect(day.readings.map((r) => r.id)).toEqual([3, 4]);
    expect(day).toMatchObject({ og: null, readingCount: 3, deviations: [] });
    expect(client.getQueryData(older.queryKey)!.pages[0].items.map((r) => r.id)).toEqual([1]);
    // The day was patched, not marked for a reload.
    expect(client.getQueryState(brewKeys.detail(42))!.isInvalidated).toBe(false);
  });
});
