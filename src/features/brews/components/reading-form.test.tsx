import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Me } from '@shared/schemas/auth';
import type { Instrument, InstrumentSnapshot } from '@shared/schemas/instruments';
import { meQueryOptions } from '@/lib/auth';
import { ReadingForm } from './reading-form';

function me(unitSystem: Me['unitSystem'] = 'metric'): Me {
  return { id: 1, email: 'brewer@example.org', displayName: 'Brewer', unitSystem, gravityUnit: 'sg', colourScale: 'srm', gallonUnit: 'us', siteRole: 'user', clubs: [] };
}

function instrument(id: number, snapshot: InstrumentSnapshot): Instrument {
  return {
    id,
    kind: snapshot.kind,
    name: snapshot.name,
    notes: null,
    archived: false,
    calibrationTempC: snapshot.kind === 'hydrometer' ? snapshot.calibrationTempC : null,
    resolutionSg: snapshot.kind === 'hydrometer' ? (snapshot.resolutionSg ?? 0.001) : null,
    wcf: snapshot.kind === 'refractometer' ? snapshot.wcf : null,
    wcfSource: snapshot.kind === 'refractometer' ? snapshot.wcfSource : null,
    offsetC: snapshot.kind === 'thermometer' ? snapshot.offsetC : null,
    offsetCheckedOn: snapshot.kind === 'thermometer' ? snapshot.checkedOn : null,
    resolutionPh: null,
    calibratedOn: null,
    bufferLowPh: null,
    bufferHighPh: null,
    reminderDays: null,
    createdAt: '2025-01-01T00:00:00Z',
    updatedAt: '2025-01-01T00:00:00Z',
    snapshot,
  };
}

// A probe that read 0.4 °C in a stirred ice bath (melting ice is 0 °C): it reads 0.4 °C high.
const probe = instrument(7, { kind: 'thermometer', instrumentId: 7, name: 'Probe', calibrationId: 1, offsetC: 0.4, checkedOn: '2025-03-01' });
const hydrometer = instrument(8, { kind: 'hydrometer', instrumentId: 8, name: 'Trial jar', calibrationId: null, calibrationTempC: 20 });

function renderForm(kinds: Parameters<typeof ReadingForm>[0]['kinds'], user: Me = me()) {
  const client = new QueryClient();
  client.setQueryData(meQueryOptions().queryKey, user);
  return render(
    <QueryClientProvider client={client}>
      <ReadingForm brewId={42} kinds={kinds} instruments={[probe, hydrometer]} />
    </QueryClientProvider>,
  );
}

const text = (testId: string) => screen.getByTestId(testId).textContent?.replace(/\u00a0/g, ' ');

afterEach(() => {
  vi.unstubAllGlobals();
});

describe('ReadingForm', () => {
  it('shows the raw and the corrected value side by side as the brewer types (thermometer offset from an ice-bath check)', async () => {
    renderForm(['mash_temp']);
    expect(screen.getByLabelText('Thermometer')).toHaveValue('7');
    expect(text('corrected-value')).toBe('—');
    await userEvent.type(screen.getByLabelText('Mash temperature, as read'), '66.6');
    expect(text('raw-value')).toBe('66.6 °C');
    expect(text('corrected-value')).toBe('66.2 °C');
    // With no instrument of the brewer's own, nothing is corrected and the form says it is unchecked.
    await userEvent.selectOptions(screen.getByLabelText('Thermometer'), '');
    expect(text('corrected-value')).toBe('66.6 °C');
    expect(screen.getByText(/This thermometer has not been checked yet/)).toBeInTheDocument();
  });

  it('corrects a hydrometer for sample temperature, in US units too (water densities at 20 and 30 °C, CRC Handbook table, recalled from memory)', async () => {
    renderForm(['og'], me('us'));
    await userEvent.type(screen.getByLabelText('Hydrometer reading'), '1.046');
    // 86 °F = 30 °C; 1.046 × 998.2071 / 995.6502 = 1.04869 → shown to three decimals.
    await userEvent.type(screen.getByLabelText('Sample temperature'), '86');
    expect(text('raw-value')).toBe('1.046');
    expect(text('corrected-value')).toBe('1.049');
  });

  it('refuses an impossible reading under its field and sends nothing', async () => {
    const fetch = vi.fn();
    vi.stubGlobal('fetch', fetch);
    renderForm(['pre_boil_gravity', 'late_boil_gravity']);
    await userEvent.click(screen.getByRole('radio', { name: 'Late-boil gravity' }));
    await userEvent.type(screen.getByLabelText('Brix'), '60');
    await userEvent.type(screen.getByLabelText('Wort in the kettle (hot)'), '0');
    await userEvent.click(screen.getByRole('button', { name: 'Save reading' }));
    expect(await screen.findByText('A brewing refractometer reads 0 to 40 °Bx. Check the reading.')).toBeInTheDocument();
    expect(screen.getByText('The volume must be more than 0.')).toBeInTheDocument();
    expect(fetch).not.toHaveBeenCalled();
    expect(screen.getByLabelText('Brix')).toHaveValue('60');
  });

  it('keeps what was typed when the connection is lost, and retries with the time of the first attempt', async () => {
    const fetch = vi.fn().mockRejectedValueOnce(new TypeError('Failed to fetch'));
    vi.stubGlobal('fetch', fetch);
    renderForm(['mash_temp']);
    await userEvent.type(screen.getByLabelText('Mash temperature, as read'), '66.6');
    await userEvent.type(screen.getByLabelText('Note (optional)'), 'Stirred first');
    await userEvent.click(screen.getByRole('button', { name: 'Save reading' }));
    expect(await screen.findByText('Not saved — no connection')).toBeInTheDocument();
    expect(screen.getByLabelText('Mash temperature, as read')).toHaveValue('66.6');
    expect(screen.getByLabelText('Note (optional)')).toHaveValue('Stirred first');

    fetch.mockResolvedValueOnce(new Response(JSON.stringify({ id: 1 }), { status: 201, headers: { 'Content-Type': 'application/json' } }));
    await userEvent.click(screen.getByRole('button', { name: 'Retry' }));
    expect(await screen.findByText('Mash temperature saved.')).toBeInTheDocument();
    await waitFor(() => expect(screen.getByLabelText('Mash temperature, as read')).toHaveValue(''));

    expect(fetch).toHaveBeenCalledTimes(2);
    const bodies = fetch.mock.calls.map(([, init]) => JSON.parse((init as RequestInit).body as string));
    expect(bodies[0]).toEqual({ kind: 'mash_temp', instrumentId: 7, note: 'Stirred first', tempC: 66.6, takenAt: bodies[0].takenAt });
    expect(bodies[1].takenAt).toBe(bodies[0].takenAt);
    expect(fetch.mock.calls[0][0]).toBe('/api/brews/42/readings');
  });
});
