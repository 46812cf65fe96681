import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { Me } from '@shared/schemas/auth';
import type { FermentationReading } from '@shared/schemas/fermentation';
import { meQueryOptions } from '@/lib/auth';
import { ReadingsList } from './readings-list';

const pitchedAt = '2026-03-01T12:00:00.000Z';

/** A long log of thermometer readings, one an hour: only what the list reads. */
function readings(n: number): FermentationReading[] {
  return Array.from({ length: n }, (_, i) => ({
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

function renderList(list: FermentationReading[]) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false, staleTime: Infinity } } });
  const me: Me = { id: 1, email: 'b@example.org', displayName: 'B', colourScale: 'srm', gallonUnit: 'us', siteRole: 'user', clubs: [], unitSystem: 'metric', gravityUnit: 'sg' };
  queryClient.setQueryData(meQueryOptions().queryKey, me);
  render(
    <QueryClientProvider client={queryClient}>
      <ReadingsList brewId={7} readings={list} pitchedAt={pitchedAt} canEdit={false} />
    </QueryClientProvider>,
  );
}

const shownNotes = () => screen.getAllByTestId('fermentation-reading').map((li) => li.textContent!.match(/reading \d+/)![0]);

describe('the fermentation readings list', () => {
  it('opens with the latest six and adds older readings a hundred at a time', async () => {
    renderList(readings(250));
    expect(shownNotes()).toEqual(['reading 250', 'reading 249', 'reading 248', 'reading 247', 'reading 246', 'reading 245']);
    await userEvent.click(screen.getByRole('button', { name: 'Show 100 more (244 readings not shown)' }));
    expect(shownNotes()).toHaveLength(106);
    expect(shownNotes().at(-1)).toBe('reading 145');
    await userEvent.click(screen.getByRole('button', { name: 'Show 100 more (144 readings not shown)' }));
    await userEvent.click(screen.getByRole('button', { name: 'Show 44 more (44 readings not shown)' }));
    expect(shownNotes()).toHaveLength(250);
    expect(shownNotes().at(-1)).toBe('reading 1');
    expect(screen.queryByRole('button', { name: /more/ })).toBeNull();
    await userEvent.click(screen.getByRole('button', { name: 'Show the latest only' }));
    expect(shownNotes()).toHaveLength(6);
  });

  it('offers no buttons when every reading fits', () => {
    renderList(readings(4));
    expect(shownNotes()).toEqual(['reading 4', 'reading 3', 'reading 2', 'reading 1']);
    expect(screen.queryByRole('button')).toBeNull();
  });
});
