import { QueryClient, QueryClientProvider, type InfiniteData } from '@tanstack/react-query';
import { act, renderHook } from '@testing-library/react';
import type { ReactNode } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { FermentationLog, FermentationReading, FermentationReadingDeleted, FermentationReadingPage } from '@shared/schemas/fermentation';
import { useDeleteFermentationReading } from './delete-reading';
import { fermentationKeys } from './keys';
import { olderFermentationReadingsQueryOptions } from './older-readings';

const reading = (id: number) => ({ id, kind: 'temperature', takenAt: `2026-03-0${id}T10:00:00.000Z`, corrected: 19, estimate: false }) as FermentationReading;

afterEach(() => {
  vi.unstubAllGlobals();
});

describe('deleting a fermentation reading', () => {
  it('drops it from the cached log, its chart series and its older pages, and takes the verdict from the answer, asking for nothing else', async () => {
    const answer = { readingId: 2, readingCount: 3, verdict: { state: 'moving' }, temperature: { latest: null }, progress: { og: 1.05 }, now: '2026-03-09T00:00:00.000Z' } as unknown as FermentationReadingDeleted;
    const fetch = vi.fn().mockResolvedValueOnce(new Response(JSON.stringify(answer), { status: 200, headers: { 'Content-Type': 'application/json' } }));
    vi.stubGlobal('fetch', fetch);
    const client = new QueryClient();
    const log = { brew: { id: 7 }, readings: [reading(3), reading(4)], readingCount: 4, olderReadings: 'from', series: [1, 2, 3, 4].map(reading), verdict: { state: 'stable' } } as unknown as FermentationLog;
    client.setQueryData(fermentationKeys.log(7), log);
    const older = olderFermentationReadingsQueryOptions(7, 'from');
    client.setQueryData<InfiniteData<FermentationReadingPage, string | null>>(older.queryKey, { pages: [{ items: [reading(1), reading(2)], nextCursor: null, pageSize: 50 }], pageParams: ['from'] });
    const wrapper = ({ children }: { children: ReactNode }) => <QueryClientProvider client={client}>{children}</QueryClientProvider>;
    const { result } = renderHook(() => useDeleteFermentationReading(7), { wrapper });
    await act(() => result.current.mutateAsync(2));
    expect(fetch).toHaveBeenCalledTimes(1);
    expect(fetch.mock.calls[0][0]).toBe('/api/brews/7/fermentation/readings/2');
    const next = client.getQueryData<FermentationLog>(fermentationKeys.log(7))!;
    expect(next.readings.map((r) => r.id)).toEqual([3, 4]);
    expect(next.series.map((p) => p.id)).toEqual([1, 3, 4]);
    expect(next).toMatchObject({ readingCount: 3, verdict: { state: 'moving' }, olderReadings: 'from' });
    expect(client.getQueryData(older.queryKey)!.pages[0].items.map((r) => r.id)).toEqual([1]);
    expect(client.getQueryState(fermentationKeys.log(7))!.isInvalidated).toBe(false);
  });
});
