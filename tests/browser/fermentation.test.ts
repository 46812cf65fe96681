import { describe, expect, it } from 'vitest';
import { newPage, signInViaApi, useBrowser } from '../support/browser';

const b = useBrowser();
const DAY_MS = 86_400_000;

describe('the fermentation log, on a phone-sized window', () => {
  it('logs three hydrometer readings and watches the verdict go from too early to still moving to stable', async () => {
    const { page, context, errors } = await newPage(b.browser);
    await signInViaApi(context, 'priya@hollow-oak.example', 'wortwise-demo');

    // A brew day of her own recipe whose yeast went in 17 days ago.
    const recipes = ((await (await context.request.get('/api/recipes')).json()) as { items: { id: number }[] }).items;
    const started = await context.request.post('/api/brews', { data: { recipeId: recipes[0].id, name: 'Verdict walk-through' } });
    expect(started.status()).toBe(201);
    const brewId = ((await started.json()) as { id: number }).id;
    const pitchedAt = new Date(Math.floor((Date.now() - 17 * DAY_MS) / 60_000) * 60_000);
    const pitched = await context.request.post(`/api/brews/${brewId}/readings`, { data: { kind: 'pitch_temp', tempC: 19, takenAt: pitchedAt.toISOString(), pitched: true } });
    expect(pitched.status()).toBe(201);

    await page.goto(`/brews/${brewId}/fermentation`);
    const banner = page.locator('section[data-state]');
    await expect(banner.getAttribute('data-state')).resolves.toBe('too-early');
    await page.getByText('Bottles can burst').waitFor();

    // Common practice, no source: readings on day 12 and 14 that differ by more than 0.001 are
    // still moving; two equal readings two days apart after day 12 are stable.
    const log = async (day: number, sg: string) => {
      const local = await page.evaluate((ms) => {
        const d = new Date(ms);
        const pad = (n: number) => String(n).padStart(2, '0');
        return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}T${pad(d.getHours())}:${pad(d.getMinutes())}`;
      }, pitchedAt.getTime() + day * DAY_MS);
      await page.getByLabel('Hydrometer reading').fill(sg);
      await page.getByLabel('Sample temperature').fill('20');
      await page.getByLabel('Taken at').fill(local);
      await page.getByRole('button', { name: 'Save reading' }).click();
      await page.getByText(`Saved: Day ${day}, ${sg}.`).waitFor();
    };

    await log(12, '1.016');
    await page.getByRole('heading', { name: 'Too early to tell' }).waitFor();
    await expect(page.getByTestId('verdict-reason').textContent()).resolves.toMatch(/Only one reading since day 12/);

    await log(14, '1.012');
    await page.getByRole('heading', { name: 'Still moving' }).waitFor();
    await expect(page.getByTestId('verdict-reason').textContent()).resolves.toMatch(/dropped 0.004 over 2 days/);

    await log(16, '1.012');
    await page.getByRole('heading', { name: 'Stable: safe to package' }).waitFor();
    await expect(banner.getAttribute('data-state')).resolves.toBe('stable');
    expect(await page.getByTestId('fermentation-reading').count()).toBe(3);

    // With the verdict stable, packaging needs no override; the priming sugar is worked out live.
    await expect(page.getByTestId('priming-grams').textContent()).resolves.toMatch(/^\d+\sg$/);
    await page.getByRole('button', { name: 'Record packaging' }).click();
    await page.getByText('Packaged with a stable final gravity.').waitFor();

    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    expect(errors).toEqual([]);
    await context.close();
  });
});
