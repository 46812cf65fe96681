import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { Me } from '@shared/schemas/auth';
import type { FermentationLog } from '@shared/schemas/fermentation';
import { meQueryOptions } from '@/lib/auth';
import { FermentationChart } from './fermentation-chart';

const pitchedAt = '2026-03-01T12:00:00.000Z';
const day = (d: number) => new Date(Date.parse(pitchedAt) + d * 86_400_000).toISOString();

/** Only what the chart reads; the rest of a log does not matter to it. */
const log = {
  brew: { pitchedAt, targetFg: 1.012 },
  // The page of whole readings holds only the latest; the chart draws the series of all.
  readings: [{ kind: 'gravity', takenAt: day(12), corrected: 1.012, estimate: false }],
  series: [
    { id: 1, kind: 'gravity', takenAt: day(0), corrected: 1.05, estimate: false },
    { id: 2, kind: 'temperature', takenAt: day(1), corrected: 20, estimate: false },
    { id: 3, kind: 'gravity', takenAt: day(12), corrected: 1.012, estimate: false },
  ],
  temperature: { target: { minC: 18, maxC: 21 } },
  verdict: { daysSincePitch: 12 },
  progress: { og: 1.05 },
} as unknown as FermentationLog;

function renderChart(prefs: Pick<Me, 'unitSystem' | 'gravityUnit'>, shown: FermentationLog = log) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false, staleTime: Infinity } } });
  const me: Me = { id: 1, email: 'b@example.org', displayName: 'B', colourScale: 'srm', gallonUnit: 'us', siteRole: 'user', clubs: [], ...prefs };
  queryClient.setQueryData(meQueryOptions().queryKey, me);
  render(
    <QueryClientProvider client={queryClient}>
      <FermentationChart log={shown} />
    </QueryClientProvider>,
  );
}

describe('the fermentation chart’s text alternative', () => {
  it('names the picture and describes it in a sentence, in the brewer’s units, with correct plurals', () => {
    // 20 °C = 68 °F, 18 °C = 64.4 °F, 21 °C = 69.8 °F (°F = °C × 9/5 + 32, NIST SP 811 appendix B).
    renderChart({ unitSystem: 'us', gravityUnit: 'sg' });
    const img = screen.getByRole('img', { name: 'Gravity (SG) and fermenter temperature (°F) since pitching' });
    const summary = screen.getByTestId('chart-summary');
    expect(img).toHaveAttribute('aria-describedby', summary.id);
    const text = summary.textContent!.replace(/\u00a0/g, ' ');
    expect(text).toContain('2 gravity readings and 1 temperature reading over 12 days since pitching.');
    expect(text).toContain('Latest gravity 1.012 on day 12, target FG 1.012.');
    expect(text).toContain('Fermenter between 68.0 °F and 68.0 °F, recipe range 64.4 °F to 69.8 °F.');
  });

  it('lists every reading in a table one tap away', async () => {
    renderChart({ unitSystem: 'metric', gravityUnit: 'sg' });
    await userEvent.click(screen.getByText('The numbers as a table'));
    const table = screen.getByRole('table', { name: 'Fermentation readings by day since pitching' });
    const rows = within(table).getAllByRole('row').map((r) => r.textContent!.replace(/\u00a0/g, ' '));
    expect(rows).toEqual(['DayWhatValue', '0Gravity1.050', '1Fermenter temperature20.0 °C', '12Gravity1.012']);
  });

  it('draws a long table a hundred rows at a time', async () => {
    const series = Array.from({ length: 150 }, (_, i) => ({ id: i + 1, kind: 'temperature', takenAt: day(i / 10), corrected: 19, estimate: false }));
    renderChart({ unitSystem: 'metric', gravityUnit: 'sg' }, { ...log, series } as unknown as FermentationLog);
    await userEvent.click(screen.getByText('The numbers as a table'));
    const table = screen.getByRole('table', { name: 'Fermentation readings by day since pitching' });
    // A header row and the first hundred readings.
    expect(within(table).getAllByRole('row')).toHaveLength(101);
    await userEvent.click(screen.getByRole('button', { name: 'Show 50 more rows (50 not shown)' }));
    expect(within(table).getAllByRole('row')).toHaveLength(151);
    expect(screen.queryByRole('button', { name: /more rows/ })).toBeNull();
  });

  it('draws a log kept on the device before the series existed from its readings', () => {
    const { series, ...old } = log;
    renderChart({ unitSystem: 'metric', gravityUnit: 'sg' }, { ...old, readings: series } as unknown as FermentationLog);
    expect(screen.getByTestId('chart-summary').textContent).toContain('2 gravity readings and 1 temperature reading over 12 days since pitching.');
  });
});
