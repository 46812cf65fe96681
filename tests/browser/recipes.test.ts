import type { Locator, Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { newPage, useBrowser } from '../support/browser';

const b = useBrowser();

/**
 * Exact definitions, independent of the app's own conversion code: US gallon = 3.785411784 L,
 * pound = 0.45359237 kg (international yard and pound agreement, 1959), ounce = pound / 16,
 * °C = (°F − 32) / 1.8.
 */
const L_PER_GAL = 3.785411784;
const KG_PER_LB = 0.45359237;
const G_PER_OZ = (KG_PER_LB * 1000) / 16;
const fToC = (f: number) => (f - 32) / 1.8;

const text = async (locator: Locator) => ((await locator.textContent()) ?? '').replace(/\u00a0/g, ' ');

async function fillIn(scope: Page | Locator, label: string, value: string) {
  await scope.getByLabel(label, { exact: true }).fill(value);
}

describe('a recipe written in US units and read in metric', () => {
  it('keeps the same quantities', async () => {
    const { page, context, errors } = await newPage(b.browser);
    const email = `us-brewer-${Date.now()}@example.org`;
    const signup = await context.request.post('/api/auth/signup', { data: { email, password: 'a-long-password', displayName: 'Hale Brennick' } });
    expect(signup.ok()).toBe(true);
    await context.request.patch('/api/auth/me', { data: { unitSystem: 'us', gravityUnit: 'sg' } });

    await page.goto('/recipes');
    await page.getByRole('link', { name: 'New recipe' }).click();
    await page.waitForURL(/\/recipes\/new$/);

    await fillIn(page, 'Recipe name', 'Cross-Units Amber');
    await fillIn(page, 'Style', 'Amber ale');
    await fillIn(page, 'Batch volume into the fermenter', '5');
    await fillIn(page, 'Pre-boil volume', '6.5');
    await fillIn(page, 'Post-boil volume', '5.5');
    await fillIn(page, 'Boil-off rate', '1');
    await fillIn(page, 'Target OG', '1.052');
    await fillIn(page, 'Target FG', '1.012');

    const fermentable = page.getByRole('group', { name: 'Fermentable 1' });
    await fillIn(fermentable, 'Name', 'Pale malt');
    await fillIn(fermentable, 'Amount', '10');
    await fillIn(fermentable, 'Potential', '36');

    await page.getByRole('button', { name: 'Add a hop' }).click();
    const hop = page.getByRole('group', { name: 'Hop 1' });
    await fillIn(hop, 'Name', 'Cascade');
    await fillIn(hop, 'Amount', '1');
    await fillIn(hop, 'Minutes', '60');
    await fillIn(hop, 'Alpha acid', '6');

    await page.getByRole('button', { name: 'Add a mash step' }).click();
    const step = page.getByRole('group', { name: 'Step 1' });
    await fillIn(step, 'Temperature', '152');
    await fillIn(step, 'Length', '60');

    await fillIn(page, 'Yeast', 'Clean ale yeast');
    await fillIn(page, 'Lowest fermentation temperature', '64');
    await fillIn(page, 'Highest fermentation temperature', '68');

    // 10 lb × 36 points/lb/gal × 72 % / 5 gal = 51.8 points: the estimate agrees with 1.052.
    await page.getByText('Agrees with the target OG').waitFor();
    await page.getByRole('button', { name: 'Create recipe' }).click();
    await page.waitForURL(/\/recipes\/\d+$/);
    const id = Number(page.url().split('/').pop());

    const targets = page.getByRole('region', { name: 'Targets' });
    await targets.waitFor();
    expect(await text(targets)).toContain('5.00 gal');

    // What was stored is SI.
    const stored = await (await context.request.get(`/api/recipes/${id}`)).json();
    expect(stored.batchVolumeL).toBeCloseTo(5 * L_PER_GAL, 9);
    expect(stored.preBoilVolumeL).toBeCloseTo(6.5 * L_PER_GAL, 9);
    expect(stored.boilOffLPerHour).toBeCloseTo(L_PER_GAL, 9);
    expect(stored.fermentables[0].amountKg).toBeCloseTo(10 * KG_PER_LB, 9);
    expect(stored.hops[0].amountG).toBeCloseTo(G_PER_OZ, 9);
    expect(stored.mashSteps[0].tempC).toBeCloseTo(fToC(152), 9);
    expect(stored.fermentationTempMinC).toBeCloseTo(fToC(64), 9);

    // Switch to metric in the account menu: the same recipe, in litres, kilograms and °C.
    await page.getByRole('button', { name: 'Account and units' }).click();
    await page.getByRole('menuitemradio', { name: 'Metric (L, kg, °C)' }).click();
    await page.keyboard.press('Escape');
    await page.getByText(`${(5 * L_PER_GAL).toFixed(1)} L`).first().waitFor();

    const body = await text(page.locator('main'));
    expect(await text(targets)).toContain(`${(5 * L_PER_GAL).toFixed(1)} L`); // 18.9 L
    expect(body).toContain(`${(6.5 * L_PER_GAL).toFixed(1)} L`); // pre-boil 24.6 L
    expect(body).toContain(`${(5.5 * L_PER_GAL).toFixed(1)} L`); // post-boil 20.8 L
    expect(body).toContain(`${L_PER_GAL.toFixed(1)} L/h`); // boil-off 3.8 L/h
    expect(body).toContain(`${(10 * KG_PER_LB).toFixed(2)} kg`); // 4.54 kg
    expect(body).toContain(`${G_PER_OZ.toFixed(0)} g`); // 28 g
    expect(body).toContain(`${fToC(152).toFixed(1)} °C`); // 66.7 °C
    expect(body).toContain(`${fToC(64).toFixed(1)} °C to ${fToC(68).toFixed(1)} °C`); // 17.8 to 20.0 °C
    expect(await text(targets)).toContain('1.052');

    // The edit form shows the same quantities in metric, to the precision stored.
    await page.getByRole('link', { name: 'Edit' }).click();
    await page.waitForURL(/\/edit$/);
    const batch = Number(await page.getByLabel('Batch volume into the fermenter').inputValue());
    expect(batch).toBeCloseTo(5 * L_PER_GAL, 2);
    const amount = Number(await page.getByRole('group', { name: 'Fermentable 1' }).getByLabel('Amount', { exact: true }).inputValue());
    expect(amount).toBeCloseTo(10 * KG_PER_LB, 3);
    const potential = Number(await page.getByRole('group', { name: 'Fermentable 1' }).getByLabel('Potential', { exact: true }).inputValue());
    // 36 points per pound per gallon = 36 × 3.785411784 / 0.45359237 points·L/kg ≈ 300.4.
    expect(potential).toBeCloseTo((36 * L_PER_GAL) / KG_PER_LB, 0);

    // No sideways scroll on a 375 px phone.
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    expect(errors).toEqual([]);
    await context.close();
  });

  it('shows a field error and keeps the typed values when the boil-off contradicts the volumes', async () => {
    const { page, context, errors } = await newPage(b.browser);
    const email = `metric-brewer-${Date.now()}@example.org`;
    await context.request.post('/api/auth/signup', { data: { email, password: 'a-long-password', displayName: 'Ines Carrow' } });
    await page.goto('/recipes/new');
    await fillIn(page, 'Recipe name', 'Leaky Kettle');
    await fillIn(page, 'Pre-boil volume', '28');
    await fillIn(page, 'Post-boil volume', '24');
    await fillIn(page, 'Boil-off rate', '2');
    await page.getByRole('button', { name: 'Create recipe' }).click();
    await page.getByText(/^This boil-off rate does not match the volumes/).waitFor();
    expect(await page.getByLabel('Recipe name').inputValue()).toBe('Leaky Kettle');
    expect(page.url()).toMatch(/\/recipes\/new$/);
    expect(errors).toEqual([]);
    await context.close();
  });

  it('refuses a save over a newer version, keeps what was typed, and can load the latest', async () => {
    const { page, context, errors } = await newPage(b.browser, { width: 1280, height: 900 });
    const email = `two-tabs-${Date.now()}@example.org`;
    await context.request.post('/api/auth/signup', { data: { email, password: 'a-long-password', displayName: 'Tove Marrin' } });
    const created = await context.request.post('/api/recipes', {
      data: {
        name: 'Two Tab Mild',
        batchVolumeL: 20,
        preBoilVolumeL: 25,
        postBoilVolumeL: 21,
        boilMinutes: 60,
        boilOffLPerHour: 4,
        efficiency: 0.7,
        targetOg: 1.036,
        targetFg: 1.01,
        fermentationTempMinC: 18,
        fermentationTempMaxC: 20,
        fermentables: [{ name: 'Mild malt', kind: 'grain', amountKg: 3.5, potentialPointsLPerKg: 300 }],
      },
    });
    const { id } = await created.json();

    await page.goto(`/recipes/${id}/edit`);
    await fillIn(page, 'Recipe name', 'Two Tab Mild, edited here');
    // Meanwhile the same recipe is saved from another tab.
    const other = await context.newPage();
    await other.goto(`/recipes/${id}/edit`);
    await fillIn(other, 'Style', 'Dark mild');
    await other.getByRole('button', { name: 'Save recipe' }).click();
    await other.waitForURL(new RegExp(`/recipes/${id}$`));
    await other.close();

    await page.getByRole('button', { name: 'Save recipe' }).click();
    await page.getByText('Not saved: this recipe changed elsewhere').waitFor();
    expect(await text(page.getByRole('status').filter({ hasText: 'Not saved' }))).toMatch(/you were editing version 1, and version 2 was saved at/);
    expect(await page.getByLabel('Recipe name').inputValue()).toBe('Two Tab Mild, edited here');

    await page.getByRole('button', { name: 'Load the latest version' }).click();
    await page.waitForFunction(() => (document.querySelector('input[name="style"]') as HTMLInputElement | null)?.value === 'Dark mild');
    expect(await page.getByLabel('Recipe name').inputValue()).toBe('Two Tab Mild');
    await fillIn(page, 'Recipe name', 'Two Tab Mild, on top of version 2');
    await page.getByRole('button', { name: 'Save recipe' }).click();
    await page.waitForURL(new RegExp(`/recipes/${id}$`));
    const saved = await (await context.request.get(`/api/recipes/${id}`)).json();
    expect(saved).toMatchObject({ name: 'Two Tab Mild, on top of version 2', style: 'Dark mild', version: 3 });
    expect(errors.filter((e) => !/409/.test(e))).toEqual([]);
    await context.close();
  });
});
