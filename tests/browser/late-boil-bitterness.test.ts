import { describe, expect, it } from 'vitest';
import { newPage, phone, signInViaApi, useBrowser } from '../support/browser';

const b = useBrowser();

const nbsp = (s: string | null) => (s ?? '').replace(/\u00a0/g, ' ').replace(/\s+/g, ' ').trim();
const ibuOf = (text: string) => Number(/([\d.]+) IBU/.exec(text)?.[1]);

/**
 * Worked example, gravity points × litres mass balance and Tinseth (1997), by hand.
 * A cooled sample reads 1.056 at the hydrometer's 20 °C calibration temperature; 24 L hot in the
 * kettle, 10 minutes left, boiling off 3 L/h; recipe OG 1.050; 40 g of 10 % hops boiled 60 minutes.
 * - With no action the boil ends at 24 − 3 × 10/60 = 23.5 L hot and 56 × 24 / 23.5 = 57.19 points.
 * - Water to 1.050 brings the same extract to 57.19 / 50 times the volume (whatever the cooling
 *   shrinkage, which cancels). The hops have done their work by then, so the iso-alpha acids are
 *   only diluted: bitterness falls to 50 / 57.19 = 0.8743 of the as-is figure (Tinseth's IBU is
 *   mg/L, inversely proportional to the volume at the same boil gravity and minutes).
 */
const expectedRatio = 50 / ((56 * 24) / 23.5);

describe('late-boil check on a brew day: bitterness of each option', () => {
  it('adding water shows the bitterness falling by the hand-worked proportion', async () => {
    expect(expectedRatio).toBeCloseTo(0.8743, 4);
    const { page, context, errors } = await newPage(b.browser, phone);
    await signInViaApi(context, 'priya@hollow-oak.example', 'wortwise-demo');
    const recipe = await context.request.post('/api/recipes', {
      data: {
        name: 'Bitterness check pale',
        batchVolumeL: 23,
        preBoilVolumeL: 28,
        postBoilVolumeL: 24,
        boilMinutes: 60,
        boilOffLPerHour: 4,
        efficiency: 0.75,
        targetOg: 1.05,
        targetFg: 1.012,
        targetIbu: 35,
        fermentationTempMinC: 18,
        fermentationTempMaxC: 20,
        fermentables: [{ name: 'Pale malt', kind: 'grain', amountKg: 5, potentialPointsLPerKg: 300, colourLovibond: 3 }],
        hops: [{ name: 'Bittering hop', amountG: 40, minutes: 60, alphaAcidPercent: 10 }],
      },
    });
    expect(recipe.status()).toBe(201);
    const brew = await context.request.post('/api/brews', { data: { recipeId: (await recipe.json()).id, name: 'Bitterness browser test' } });
    expect(brew.status()).toBe(201);
    await page.goto(`/brews/${(await brew.json()).id}?stage=boil`);

    const check = page.getByRole('form', { name: 'Late-boil check' });
    await check.waitFor();
    await expect.poll(async () => check.getByLabel('Target OG').inputValue()).toBe('1.05');
    await check.getByText('Hydrometer (cooled sample)').click();
    await check.getByLabel('Hydrometer reading').fill('1.056');
    await check.getByLabel('Sample temperature').fill('20');
    await check.getByLabel('Calibrated at').fill('20');
    await check.getByLabel('Wort in the kettle (hot)').fill('24');
    await check.getByLabel('Minutes left').fill('10');
    await check.getByLabel('Boil-off rate').fill('3');

    const water = page.getByTestId('ibu-water');
    await water.waitFor();
    const asIs = ibuOf(nbsp(await page.getByTestId('ibu-projected').textContent()));
    const diluted = ibuOf(nbsp(await water.textContent()));
    expect(asIs).toBeGreaterThan(30);
    // Shown to 0.1 IBU, so the ratio of the shown figures is good to about ±0.003.
    expect(Math.abs(diluted / asIs - expectedRatio)).toBeLessThan(0.003);
    expect(diluted).toBeLessThan(asIs);
    // The deviation from the recipe's 35 IBU is shown beside it.
    await expect.poll(async () => nbsp(await water.locator('xpath=following-sibling::dd').textContent())).toMatch(/IBU vs target$/);
    expect(errors).toEqual([]);
    await context.close();
  });
});
