import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Me } from '@shared/schemas/auth';
import type { FermentationLog, FermentationReading, FermentationReadingPage } from '@shared/schemas/fermentation';
import { meQueryOptions } from '@/lib/auth';
import { ReadingsList } from './readings-list';

const pitchedAt = '2026-03-01T12:00:00.000Z';

/** A long log of thermometer readings, one an hour (readings from..to): only what the list reads. */
function readings(n: number, from = 1): FermentationReading[] {
  return Array.from({ length: n }, (_, k) => k + from - 1).map((i) => ({
    id: i + 1,
    brewId: 7,
    kind: 'temperature',
    method: 'thermometer',
    instrumentId: null,
    instrument: { name: 'Stick-on strip' },
    raw: { method: 'thermometer', tempC: 19 },
    corrected: 19,
    correction: null,
    estimate: false,
    warnings: [],
    takenAt: new Date(Date.parse(pitchedAt) + (i + 1) * 3_600_000).toISOString(),
    day: (i + 1) / 24,
    note: `reading ${i + 1}`,
    source: 'csv',
    createdAt: pitchedAt,
  })) as unknown as FermentationReading[];
}

/** The log as the server sends it: its latest readings, the count of all and the cursor for older ones. */
const logOf = (latest: FermentationReading[], readingCount = latest.length, olderReadings: string | null = null) =>
  ({ brew: { id: 7, pitchedAt }, readings: latest, readingCount, olderReadings }) as Pick<FermentationLog, 'brew' | 'readings' | 'readingCount' | 'olderReadings'>;

const page = (items: FermentationReading[], nextCursor: string | null): Response =>
  new Response(JSON.stringify({ items, nextCursor, pageSize: 50 } satisfies FermentationReadingPage), { status: 200, headers: { 'Content-Type': 'application/json' } });

afterEach(() => {
  vi.unstubAllGlobals();
});

function renderList(log: ReturnType<typeof logOf>) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false, staleTime: Infinity } } });
  const me: Me = { id: 1, email: 'b@example.org', displayName: 'B', colourScale: 'srm', gallonUnit: 'us', siteRole: 'user', clubs: [], unitSystem: 'metric', gravityUnit: 'sg' };
  queryClient.setQueryData(meQueryOptions().queryKey, me);
  render(
    <QueryClientProvider client={queryClient}>
      <ReadingsList log={log} canEdit={false} />
    </QueryClientProvider>,
  );
}

const shownNotes = () => screen.getAllByTestId('fermentation-reading').map((li) => li.textContent!.match(/reading \d+/)![0]);

describe('the fermentation readings list', () => {
  it('opens with the latest six of what the log sent and shows older ones fifty at a time, here first, then from the server', async () => {
    const fetch = vi.fn().mockResolvedValueOnce(page(readings(50, 11), 'second')).mockResolvedValueOnce(page(readings(10, 1), null));
    vi.stubGlobal('fetch', fetch);
    // 110 readings in all: the log came with the latest 50 (61 to 110).
    renderList(logOf(readings(50, 61), 110, 'first'));
    expect(shownNotes()).toEqual(['reading 110', 'reading 109', 'reading 108', 'reading 107', 'reading 106', 'reading 105']);
    expect(screen.getByRole('status')).toHaveTextContent('Showing the latest 6 of 110 readings.');
    // 44 more are here already, and the server's first older page adds the rest of the fifty.
    await userEvent.click(screen.getByRole('button', { name: 'Show older readings' }));
    await waitFor(() => expect(shownNotes()).toHaveLength(56));
    expect(fetch).toHaveBeenCalledTimes(1);
    expect(fetch.mock.calls[0][0]).toBe('/api/brews/7/fermentation/readings?cursor=first&pageSize=50');
    expect(shownNotes().at(-1)).toBe('reading 55');
    // 44 here are not enough for fifty: the next page is asked for with them.
    await userEvent.click(screen.getByRole('button', { name: 'Show older readings' }));
    await waitFor(() => expect(shownNotes()).toHaveLength(106));
    expect(fetch).toHaveBeenCalledTimes(2);
    expect(fetch.mock.calls[1][0]).toBe('/api/brews/7/fermentation/readings?cursor=second&pageSize=50');
    // The last four are here already: no request.
    await userEvent.click(screen.getByRole('button', { name: 'Show older readings' }));
    await waitFor(() => expect(shownNotes()).toHaveLength(110));
    expect(shownNotes().at(-1)).toBe('reading 1');
    expect(screen.queryByRole('button', { name: 'Show older readings' })).toBeNull();
    expect(screen.getByRole('status')).toHaveTextContent('All 110 readings shown.');
    await userEvent.click(screen.getByRole('button', { name: 'Show the latest only' }));
    expect(shownNotes()).toHaveLength(6);
    expect(fetch).toHaveBeenCalledTimes(2);
  });

  it('offers no buttons and asks for nothing when every reading fits', () => {
    const fetch = vi.fn();
    vi.stubGlobal('fetch', fetch);
    renderList(logOf(readings(4)));
    expect(shownNotes()).toEqual(['reading 4', 'reading 3', 'reading 2', 'reading 1']);
    expect(screen.queryByRole('button')).toBeNull();
    expect(fetch).not.toHaveBeenCalled();
  });

  it('says so, and keeps the button, when older readings cannot be loaded', async () => {
    vi.stubGlobal('fetch', vi.fn().mockRejectedValueOnce(new TypeError('Failed to fetch')));
    renderList(logOf(readings(6, 5), 10, 'first'));
    await userEvent.click(screen.getByRole('button', { name: 'Show older readings' }));
    expect(await screen.findByText(/Older readings could not be loaded/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Show older readings' })).toBeEnabled();
  });
});
