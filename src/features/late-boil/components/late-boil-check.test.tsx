import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { MemoryRouter } from 'react-router';
import { describe, expect, it, vi } from 'vitest';
import { RouterLink } from '@/components/ui/router-link';
import { meQueryOptions } from '@/lib/auth';
import { unitsFor, type Units } from '@/lib/units';
import type { LateBoilInitialValues } from './form-values';
import { LateBoilCheck, type LateBoilCheckProps } from './late-boil-check';
import { SignUpNudge } from './public-check';

const metric = unitsFor({ unitSystem: 'metric', gravityUnit: 'sg' });
const us = unitsFor({ unitSystem: 'us', gravityUnit: 'sg' });

function renderCheck(props: Partial<LateBoilCheckProps> & { units?: Units } = {}) {
  const client = new QueryClient();
  // A visitor: nobody signed in, so no request for the current user.
  client.setQueryData(meQueryOptions().queryKey, null);
  return render(
    <QueryClientProvider client={client}>
      <MemoryRouter>
        <LateBoilCheck units={metric} {...props} />
      </MemoryRouter>
    </QueryClientProvider>,
  );
}

// No pause between keystrokes: the check recomputes on each one anyway.
const user = userEvent.setup({ delay: null });

async function typeInto(label: string, text: string) {
  const input = screen.getByLabelText(label);
  await user.clear(input);
  await user.type(input, text);
}

const optionHeadings = () =>
  screen.queryAllByRole('article').map((card) => within(card).getByRole('heading', { level: 3 }).textContent?.replace(/\u00a0/g, ' '));

/**
 * Worked example, gravity points × litres mass balance, hand calculation.
 * 26 L hot, 11.4 °Brix with WCF 1.04, 10 minutes left, boil-off 4 L/h, target 1.050 and 23 L, 4 % shrinkage.
 * - 11.4 / 1.04 = 10.9615 °P → 1.04402 (ASBC cubic, inverted; the rational approximation
 *   1 + P / (258.6 − P/258.2 × 227.1) gives 1.04403).
 * - End of boil: 26 − 4 × 10/60 = 25.33 L hot, 25.33 × 0.96 = 24.32 L cold.
 * - Extract: 44.023 × 26 × 0.96 = 1098.8 points·L → 1098.8 / 24.32 = 45.18 points: OG 1.045, about 5 points short.
 * - Dry malt extract (367 points·L/kg, 0.62 L/kg): (50 × 24.32 − 1098.8) / (367 − 50 × 0.62) = 117.2 / 336 = 0.349 kg → 349 g.
 * - Boiling on to 1.050 would leave 1098.8 / 50 = 21.98 L, under the recipe's 23 L: not offered.
 */
async function enterWorkedExample() {
  await typeInto('Brix', '11.4');
  await typeInto('Wort in the kettle (hot)', '26');
  await typeInto('Boil-off rate', '4');
  await typeInto('Target OG', '1.050');
  await typeInto('Into the fermenter', '23');
}

// Many keystrokes per test; generous on a loaded machine (no timing is asserted).
describe('LateBoilCheck', { timeout: 30_000 }, () => {
  it('updates the projection and the options live as the brewer types (worked example, gravity points × litres mass balance, hand calculation)', async () => {
    renderCheck();
    expect(screen.getByText(/Your options appear here as you type/)).toBeInTheDocument();
    expect(optionHeadings()).toEqual([]);

    await enterWorkedExample();
    expect(screen.getByTestId('gap')).toHaveTextContent('About 5 points short');
    expect(screen.getByTestId('projected-og')).toHaveTextContent('1.045');
    expect(screen.getByTestId('projected-hot')).toHaveTextContent('25.3 L');
    expect(screen.getByTestId('projected-fermenter')).toHaveTextContent('24.3 L');
    // The cards load in their own chunk and follow a deferred copy of the check: on a loaded machine they come a little later.
    await waitFor(() =>
      expect(optionHeadings()).toEqual([
        'Add 349 g dry malt extract',
        'Add 442 g liquid malt extract',
        'Add 332 g table sugar',
        'Add 369 g dextrose',
        'Leave it',
      ]),
    );
    const dme = screen.getByRole('article', { name: /349\sg dry malt extract/ });
    // Into the fermenter: 24.32 + 0.349 × 0.62 = 24.54 L at 1.050; ABV at 75 % attenuation (FG 1.0125): 37.5 × 0.13125 = 4.9 %.
    expect(within(dme).getByText('1.050')).toBeInTheDocument();
    expect(within(dme).getByText('24.5 L')).toBeInTheDocument();
    expect(within(dme).getByText('4.9 %')).toBeInTheDocument();
    expect(screen.getByRole('region', { name: 'Not possible now' })).toHaveTextContent(/less than the recipe's 23 L/);

    // 12.0 °Bx: 12 / 1.04 = 11.538 °P → 1.04643. 46.43 × 24.96 = 1158.9 points·L → 47.65 points, about 2 short.
    // DME: (1216 − 1158.9) / 336 = 0.170 kg. Boiling on: 1158.9 / 50 = 23.18 L ≥ 23 L, so it is offered:
    // (24.32 − 23.18) L cold / (4 L/h × 0.96) = 17.8 min → 18 minutes, rounded up.
    await typeInto('Brix', '12');
    expect(screen.getByTestId('gap')).toHaveTextContent('About 2 points short');
    expect(optionHeadings()).toContain('Add 170 g dry malt extract');
    expect(optionHeadings()).toContain('Boil 18 more minutes');

    // 13.4 °Bx: 12.885 °P → 1.05210. 52.10 × 24.96 = 1300.3 points·L → 53.47 points, about 3 over.
    // Water: 1300.3 / 50 − 24.32 = 1.69 L.
    await typeInto('Brix', '13.4');
    expect(screen.getByTestId('gap')).toHaveTextContent('About 3 points over');
    expect(optionHeadings()).toEqual(['Add 1.7 L water', 'Leave it']);
  });

  it('says what is wrong with an impossible reading, offers nothing, and keeps what was typed', async () => {
    renderCheck();
    await enterWorkedExample();
    await typeInto('Brix', '60');
    const message = 'Brix 60 is outside 0 to 40 °Bx, the scale of a brewing refractometer. Check the reading.';
    expect(await screen.findByRole('alert')).toHaveTextContent(message);
    expect(screen.getByTestId('problems')).toHaveTextContent(message);
    expect(optionHeadings()).toEqual([]);
    expect(screen.getByLabelText('Brix')).toHaveValue('60');
    expect(screen.getByLabelText('Wort in the kettle (hot)')).toHaveValue('26');

    await typeInto('Brix', '11.4');
    await typeInto('Wort in the kettle (hot)', '0');
    await waitFor(() => expect(screen.getByRole('alert')).toHaveTextContent('Kettle volume must be more than 0.'));
    expect(optionHeadings()).toEqual([]);

    await typeInto('Wort in the kettle (hot)', '26');
    await typeInto('Minutes left', '-1');
    await waitFor(() => expect(screen.getByRole('alert')).toHaveTextContent('Minutes left cannot be below 0.'));
    expect(optionHeadings()).toEqual([]);

    // 6 hours left at 4 L/h would boil away 24 L of 3 L: the check itself refuses, under the boil-off rate.
    await typeInto('Minutes left', '360');
    await typeInto('Wort in the kettle (hot)', '3');
    await waitFor(() => expect(screen.getByRole('alert')).toHaveTextContent(/more than the 3 L in the kettle/));
    expect(optionHeadings()).toEqual([]);
  });

  it('shows gallons, quarts and ounces in US units', async () => {
    // The worked example, prefilled in SI as a brew day would; the brewer types only the reading.
    const initialValues: LateBoilInitialValues = { volumeL: 26, boilOffLPerHour: 4, targetSg: 1.05, targetVolumeL: 23 };
    renderCheck({ units: us, initialValues });
    // 26 L / 3.785411784 L per US gallon = 6.86842 gal, shown to one digit beyond the 0.01 gal it is read to.
    expect(screen.getByLabelText('Wort in the kettle (hot)')).toHaveValue('6.868');
    await typeInto('Brix', '11.4');
    // 348.8 g / 28.3495 g per ounce = 12.3 oz; 24.32 L = 6.42 gal; 25.33 L = 6.69 gal.
    expect(optionHeadings()[0]).toBe('Add 12.3 oz dry malt extract');
    expect(screen.getByTestId('projected-fermenter')).toHaveTextContent('6.42 gal');
    expect(screen.getByTestId('projected-hot')).toHaveTextContent('6.69 gal');
    // Over target (13.4 °Bx): 1.69 L of water = 0.446 gal = 1.8 qt.
    await typeInto('Brix', '13.4');
    expect(optionHeadings()[0]).toBe('Add 1.8 qt water');
  });

  it('without onChoose, invites a visitor to sign up instead of saving', async () => {
    renderCheck({ nudge: <SignUpNudge Link={RouterLink} /> });
    await enterWorkedExample();
    expect(screen.queryByRole('button', { name: 'Choose this' })).not.toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Sign up to keep a log of your brew days' })).toHaveAttribute('href', '/sign-up');
  });

  it('hands the chosen option with its input to onChoose, and offers a retry when saving fails', async () => {
    const onChoose = vi.fn().mockRejectedValueOnce(new Error('No connection to Wortwise: nothing was saved.')).mockResolvedValueOnce(undefined);
    renderCheck({ onChoose });
    await enterWorkedExample();
    const dme = screen.getByRole('article', { name: /349\sg dry malt extract/ });
    await user.click(within(dme).getByRole('button', { name: 'Choose this' }));

    expect(await within(dme).findByText('Not saved')).toBeInTheDocument();
    expect(within(dme).getByText(/No connection to Wortwise/)).toBeInTheDocument();
    expect(screen.getByLabelText('Brix')).toHaveValue('11.4');
    const [first] = onChoose.mock.calls[0];
    expect(first.option).toMatchObject({ kind: 'extract', extract: 'dme', feasible: true });
    expect(first.option.kg).toBeCloseTo(117.2 / 336, 3);
    expect(first.input).toMatchObject({ volumeL: 26, minutesLeft: 10, boilOffLPerHour: 4, targetSg: 1.05, targetVolumeL: 23 });
    expect(first.input.reading).toEqual({ kind: 'refractometer', brix: 11.4, wcf: 1.04 });
    expect(first.result.currentSg).toBeCloseTo(1.04402, 5);

    await user.click(within(dme).getByRole('button', { name: 'Try again' }));
    expect(await within(dme).findByText('Saved to the brew-day log.')).toBeInTheDocument();
    expect(onChoose).toHaveBeenCalledTimes(2);
  });

  it('reads a cooled hydrometer sample and warns when it is far from the calibration temperature', async () => {
    renderCheck({ initialValues: { volumeL: 26, boilOffLPerHour: 4, targetSg: 1.05 } });
    await user.click(screen.getByLabelText('Hydrometer (cooled sample)'));
    await typeInto('Hydrometer reading', '1.040');
    await typeInto('Sample temperature', '35');
    // Water at 35 °C is 994.03 kg/m³ against 998.21 at 20 °C (CRC Handbook, recalled from memory):
    // 1.040 × 998.21 / 994.03 = 1.0444, the gravity now.
    expect(screen.getByText('Gravity now').nextElementSibling).toHaveTextContent('1.044');
    expect(screen.getByText(/more than 10 °C from the hydrometer's 20 °C calibration/)).toBeInTheDocument();
  });

  it('refuses a sample above 40 °C and asks for a cooled one', async () => {
    renderCheck({ initialValues: { volumeL: 26, boilOffLPerHour: 4, targetSg: 1.05 } });
    await user.click(screen.getByLabelText('Hydrometer (cooled sample)'));
    await typeInto('Hydrometer reading', '1.040');
    await typeInto('Sample temperature', '45');
    expect(await screen.findAllByText(/too hot to decide the boil on.*Cool the sample below 40 °C/)).not.toHaveLength(0);
    expect(screen.queryByText('Gravity now')).not.toBeInTheDocument();
  });
});
