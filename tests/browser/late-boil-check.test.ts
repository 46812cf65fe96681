import { describe, expect, it } from 'vitest';
import { demoPassword, demoPeople } from '../../server/db/seed';
import { newPage, signInViaApi, useBrowser } from '../support/browser';

const b = useBrowser();

/**
 * Worked example, gravity points × litres mass balance, hand calculation.
 * 26 L hot at 11.4 °Brix (WCF 1.04: 10.96 °P → 1.04402), 10 minutes left, boil-off 4 L/h,
 * recipe 1.050 and 23 L, 4 % cooling shrinkage.
 * - End of boil: 26 − 4 × 10/60 = 25.33 L hot → 24.32 L cold.
 * - Extract: 44.023 × 26 × 0.96 = 1098.8 points·L → 45.18 points with no action.
 * - Dry malt extract, 367 points·L/kg and 0.62 L/kg: (50 × 24.32 − 1098.8) / (367 − 31) = 0.349 kg → 349 g.
 */
describe('the public late-boil check, on a phone-sized window', () => {
  it('answers the worked example without an account: grams of dry malt extract, no sideways scroll', async () => {
    const { page, context, errors } = await newPage(b.browser);
    await page.goto('/late-boil-check');
    await page.getByRole('heading', { name: 'Late-boil check', level: 1 }).waitFor();
    await expect(page.getByText('Hot wort and steam burn').isVisible()).resolves.toBe(true);
    // A visitor picks their units on the page (headless Chromium says en-US, so US is the guess).
    await page.getByRole('radio', { name: 'Litres, kg' }).click();

    await page.getByLabel('Brix').fill('11.4');
    await page.getByLabel('Wort in the kettle (hot)').fill('26');
    await page.getByLabel('Boil-off rate').fill('4');
    await page.getByLabel('Target OG').fill('1.050');
    await page.getByLabel('Into the fermenter').fill('23');

    const dme = page.getByRole('article').filter({ hasText: 'dry malt extract' });
    await dme.getByRole('heading', { name: 'Add 349 g dry malt extract' }).waitFor();
    await expect(page.getByTestId('gap').textContent()).resolves.toBe('About 5 points short');
    // The figure to act on is the biggest text on the screen.
    const amountPx = await dme.locator('h3 span').evaluate((el) => parseFloat(getComputedStyle(el).fontSize));
    const largestInput = await page.locator('input').evaluateAll((els) => Math.max(...els.map((el) => parseFloat(getComputedStyle(el).fontSize))));
    expect(amountPx).toBeGreaterThan(largestInput);

    // Back at the reading, the answer is below the screen: a bar at the bottom shows it as the brewer types.
    await page.evaluate(() => window.scrollTo(0, 0));
    const bar = page.getByTestId('answer-bar');
    await bar.waitFor();
    await expect(bar.textContent()).resolves.toMatch(/About 5 points short\s*Add 349\sg dry malt extract/);
    await bar.getByRole('button', { name: 'All options' }).click();
    await bar.waitFor({ state: 'detached' });

    // No sideways scroll on a 375 px phone.
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);

    // The public API gives the same answer from the same inputs.
    const res = await context.request.post('/api/calc/boil-correction', {
      data: { volumeL: 26, sg: 1.04402, minutesLeft: 10, boilOffLPerHour: 4, targetSg: 1.05, targetVolumeL: 23 },
    });
    expect(res.status()).toBe(200);
    const body = (await res.json()) as { options: { kind: string; extract?: string; kg?: number }[] };
    const kg = body.options.find((o) => o.kind === 'extract' && o.extract === 'dme')?.kg ?? NaN;
    expect(Math.round(kg * 1000)).toBe(349);

    // Without an account there is nothing to save to: an invitation instead of "Choose this".
    await expect(page.getByRole('button', { name: 'Choose this' }).count()).resolves.toBe(0);
    await expect(page.getByRole('link', { name: 'Sign up to keep a log of your brew days' }).isVisible()).resolves.toBe(true);

    expect(errors.filter((e) => !/Failed to load resource/.test(e))).toEqual([]);
    await context.close();
  });

  it('keeps what was typed and says what is wrong with an impossible reading', async () => {
    const { page, context } = await newPage(b.browser);
    await page.goto('/late-boil-check');
    await page.getByRole('radio', { name: 'Litres, kg' }).click();
    await page.getByRole('button', { name: 'Fill in an example' }).click();
    await page.getByRole('article').first().waitFor();
    await page.getByLabel('Brix').fill('60');
    await page.getByRole('alert').filter({ hasText: 'Brix 60 is outside 0 to 40 °Bx' }).waitFor();
    await expect(page.getByRole('article').count()).resolves.toBe(0);
    await expect(page.getByLabel('Wort in the kettle (hot)').inputValue()).resolves.toBe('26');
    await context.close();
  });

  it('serves a visitor the check as its own page, without the router, with links into the app; a brewer gets it inside the app', async () => {
    const { page, context, errors } = await newPage(b.browser);
    const scripts: string[] = [];
    page.on('response', (r) => {
      if (r.request().resourceType() === 'script') scripts.push(new URL(r.url()).pathname);
    });
    await page.goto('/late-boil-check');
    await page.getByRole('heading', { name: 'Late-boil check', level: 1 }).waitFor();
    await page.waitForLoadState('networkidle');
    await expect(page.title()).resolves.toBe('Late-boil check · Wortwise');
    // The check runs on React and the query cache; the router's chunk is never fetched.
    expect(scripts.some((s) => /^\/assets\/framework-/.test(s))).toBe(true);
    expect(scripts.filter((s) => /^\/assets\/router-/.test(s))).toEqual([]);
    // Its links are plain links into the app.
    await page.getByRole('banner').getByRole('link', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Sign in to Wortwise', level: 1 }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/sign-in');

    // Signed in, the same address is the app's page: its navigation, the brewer's own units.
    await signInViaApi(context, demoPeople.brewer.email, demoPassword);
    await page.goto('/late-boil-check');
    await page.getByRole('heading', { name: 'Late-boil check', level: 1 }).waitFor();
    await expect(page.title()).resolves.toBe('Wortwise');
    // The app's header: the brewer's sections behind the phone's menu button, no "Sign in".
    await expect(page.getByRole('banner').getByRole('button', { name: 'Menu' }).count()).resolves.toBe(1);
    await expect(page.getByRole('banner').getByRole('link', { name: 'Sign in' }).count()).resolves.toBe(0);
    await expect(page.getByRole('radio', { name: 'Litres, kg' }).count()).resolves.toBe(0);
    expect(errors.filter((e) => !/Failed to load resource/.test(e))).toEqual([]);
    await context.close();
  });
});
