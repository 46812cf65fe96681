import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Me } from '@shared/schemas/auth';
import type { BrewDetail, BrewReading, BrewReadingPage } from '@shared/schemas/brews';
import type { EquipmentProfile } from '@shared/schemas/equipment';
import type { RecipeTargets } from '@shared/schemas/recipes';
import { meQueryOptions } from '@/lib/auth';
import { BrewLog } from './brew-log';

const me: Me = { id: 1, email: 'brewer@example.org', displayName: 'Brewer', unitSystem: 'metric', gravityUnit: 'sg', colourScale: 'srm', gallonUnit: 'us', siteRole: 'user', clubs: [] };

/** Mash temperatures a minute apart from 08:00 UTC, reading `id` at minute `id`. */
function mashReading(id: number): BrewReading {
  return {
    id,
    brewId: 42,
    stage: 'mash',
    kind: 'mash_temp',
    quantity: 'temperature',
    instrumentId: null,
    instrument: { kind: 'thermometer', instrumentId: null, name: 'Thermometer', calibrationId: null, offsetC: 0, checkedOn: null },
    raw: { tempC: 66 },
    corrected: 66,
    correction: null,
    warnings: [],
    volumeL: null,
    takenAt: new Date(Date.UTC(2025, 8, 20, 8, id)).toISOString(),
    note: `reading ${id}`,
    recomputedAt: null,
    recomputedFrom: null,
    photos: [],
  };
}

const range = (from: number, to: number) => Array.from({ length: to - from + 1 }, (_, i) => from + i);

function brewDay(readings: BrewReading[], readingCount: number, olderReadings: string | null): BrewDetail {
  return {
    id: 42,
    name: 'Test pale',
    status: 'brewing',
    brewedOn: '2025-09-20',
    recipeId: 1,
    recipeName: 'Test pale',
    ownerId: 1,
    ownerName: 'Brewer',
    isOwner: true,
    currentStage: 'mash',
    targetOg: 1.05,
    og: null,
    pitchedAt: null,
    sharedWithClubIds: [],
    createdAt: '2025-09-20T07:00:00.000Z',
    updatedAt: '2025-09-20T07:00:00.000Z',
    targets: { targetOg: 1.05, targetFg: 1.011, batchVolumeL: 23 } as RecipeTargets,
    equipment: { name: 'Kettle' } as EquipmentProfile,
    boilOffLPerHour: 4,
    notes: '',
    stages: [],
    readings,
    readingCount,
    olderReadings,
    fermenterVolumeL: null,
    decisions: [],
    log: [],
    deviations: [],
    permissions: { edit: false, share: false, delete: false, comment: false },
  };
}

const page = (items: BrewReading[], nextCursor: string | null): Response =>
  new Response(JSON.stringify({ items, nextCursor, pageSize: 50 } satisfies BrewReadingPage), { status: 200, headers: { 'Content-Type': 'application/json' } });

function renderLog(brew: BrewDetail) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  client.setQueryData(meQueryOptions().queryKey, me);
  return render(
    <QueryClientProvider client={client}>
      <BrewLog brew={brew} />
    </QueryClientProvider>,
  );
}

/** The notes of the readings in the timeline, top to bottom. */
const timelineNotes = () =>
  within(screen.getByRole('list', { name: 'Timeline' }))
    .getAllByRole('listitem')
    .map((li) => li.textContent?.match(/reading \d+/)?.[0]);

afterEach(() => {
  vi.unstubAllGlobals();
});

describe('BrewLog with a long log', () => {
  it('shows the latest readings first and adds older pages above them, oldest first, on “Show older readings”', async () => {
    const fetch = vi.fn().mockResolvedValueOnce(page([mashReading(2), mashReading(3)], 'second')).mockResolvedValueOnce(page([mashReading(1)], null));
    vi.stubGlobal('fetch', fetch);
    renderLog(brewDay([mashReading(4), mashReading(5), mashReading(6)], 6, 'first'));

    expect(fetch).not.toHaveBeenCalled();
    expect(timelineNotes()).toEqual(['reading 4', 'reading 5', 'reading 6']);
    expect(screen.getByText('Showing the latest 3 of 6 readings.')).toBeInTheDocument();

    await userEvent.click(screen.getByRole('button', { name: 'Show older readings' }));
    await waitFor(() => expect(timelineNotes()).toEqual(['reading 2', 'reading 3', 'reading 4', 'reading 5', 'reading 6']));
    expect(fetch.mock.calls[0][0]).toBe('/api/brews/42/readings?cursor=first&pageSize=50');
    expect(screen.getByText('Showing the latest 5 of 6 readings.')).toBeInTheDocument();

    await userEvent.click(screen.getByRole('button', { name: 'Show older readings' }));
    await waitFor(() => expect(timelineNotes()).toEqual(['reading 1', 'reading 2', 'reading 3', 'reading 4', 'reading 5', 'reading 6']));
    expect(fetch.mock.calls[1][0]).toBe('/api/brews/42/readings?cursor=second&pageSize=50');
    // Every reading is on screen: nothing older to ask for.
    expect(screen.queryByRole('button', { name: 'Show older readings' })).not.toBeInTheDocument();
    expect(fetch).toHaveBeenCalledTimes(2);
  });

  it('has no “Show older readings” when every reading came with the day', () => {
    const fetch = vi.fn();
    vi.stubGlobal('fetch', fetch);
    renderLog(brewDay([mashReading(1), mashReading(2)], 2, null));
    expect(timelineNotes()).toEqual(['reading 1', 'reading 2']);
    expect(screen.queryByRole('button', { name: 'Show older readings' })).not.toBeInTheDocument();
    expect(fetch).not.toHaveBeenCalled();
  });

  it('builds only the readings sent for a day of 2,000: 50 timeline entries, not 2,000', () => {
    vi.stubGlobal('fetch', vi.fn());
    renderLog(brewDay(range(1951, 2000).map(mashReading), 2000, 'older'));
    expect(timelineNotes()).toHaveLength(50);
    expect(screen.getByText('Showing the latest 50 of 2,000 readings.')).toBeInTheDocument();
  });

  it('lists a reading once when an older page and the day both carry it (a reading sent late with an earlier time)', async () => {
    vi.stubGlobal('fetch', vi.fn().mockResolvedValueOnce(page([mashReading(1), mashReading(2)], null)));
    renderLog(brewDay([mashReading(2), mashReading(3)], 3, 'first'));
    await userEvent.click(screen.getByRole('button', { name: 'Show older readings' }));
    await waitFor(() => expect(timelineNotes()).toEqual(['reading 1', 'reading 2', 'reading 3']));
  });

  it('says so, and keeps the button, when older readings cannot be loaded', async () => {
    vi.stubGlobal('fetch', vi.fn().mockRejectedValueOnce(new TypeError('Failed to fetch')));
    renderLog(brewDay([mashReading(2)], 2, 'first'));
    await userEvent.click(screen.getByRole('button', { name: 'Show older readings' }));
    expect(await screen.findByText(/Older readings could not be loaded/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Show older readings' })).toBeEnabled();
    expect(timelineNotes()).toEqual(['reading 2']);
  });
});
