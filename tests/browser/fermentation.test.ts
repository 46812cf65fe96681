import type { BrowserContext } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { newPage, signInViaApi, useBrowser } from '../support/browser';
import { DAY_MS } from '../../shared/dates';

const b = useBrowser();

/** A brew day of the demo brewer's own recipe whose yeast went in some days ago. */
async function pitchedBrew(context: BrowserContext, name: string, daysAgo: number) {
  const recipes = ((await (await context.request.get('/api/recipes')).json()) as { items: { id: number }[] }).items;
  const started = await context.request.post('/api/brews', { data: { recipeId: recipes[0].id, name } });
  expect(started.status()).toBe(201);
  const brewId = ((await started.json()) as { id: number }).id;
  const pitchedAt = new Date(Math.floor((Date.now() - daysAgo * DAY_MS) / 60_000) * 60_000);
  const pitched = await context.request.post(`/api/brews/${brewId}/readings`, { data: { kind: 'pitch_temp', tempC: 19, takenAt: pitchedAt.toISOString(), pitched: true } });
  expect(pitched.status()).toBe(201);
  return { brewId, pitchedAt };
}

describe('the fermentation log, on a phone-sized window', () => {
  it('logs three hydrometer readings and watches the verdict go from no reading to still moving to stable', async () => {
    const { page, context, errors } = await newPage(b.browser);
    await signInViaApi(context, 'priya@hollow-oak.example', 'wortwise-demo');

    const { brewId, pitchedAt } = await pitchedBrew(context, 'Verdict walk-through', 17);

    await page.goto(`/brews/${brewId}/fermentation`);
    const banner = page.locator('section[data-state]');
    await expect(banner.getAttribute('data-state')).resolves.toBe('no-reading');
    await page.getByRole('heading', { name: 'No reading yet' }).waitFor();
    await page.getByText('Bottles can burst').waitFor();

    // Common practice, no source: readings on day 12 and 14 that differ by half a scale step or
    // more are still moving; two equal readings two days apart after day 12 are stable.
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
    await expect(page.getByTestId('verdict-reason').textContent()).resolves.toMatch(/One reading since day 12 so far \(1\.016 on day 12\)/);

    await log(14, '1.012');
    await page.getByRole('heading', { name: 'Still moving' }).waitFor();
    await expect(page.getByTestId('verdict-reason').textContent()).resolves.toMatch(/1\.016 on day 12 and 1\.012 on day 14, 2 days apart: the gravity fell by 0\.004/);

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

  // Common practice, no source: a beer still falling about half a point a day (1.0128, 1.0119,
  // 1.0110 on days 12, 14, 16) is not finished, however small each step looks.
  it('never offers a slowly falling beer as safe to package', async () => {
    const { page, context, errors } = await newPage(b.browser);
    await signInViaApi(context, 'priya@hollow-oak.example', 'wortwise-demo');
    const { brewId, pitchedAt } = await pitchedBrew(context, 'Slow finisher', 17);
    for (const [day, sg] of [
      [12, 1.0128],
      [14, 1.0119],
      [16, 1.011],
    ]) {
      const res = await context.request.post(`/api/brews/${brewId}/fermentation/readings`, {
        data: { method: 'hydrometer', sg, sampleTempC: 20, takenAt: new Date(pitchedAt.getTime() + day * DAY_MS).toISOString() },
      });
      expect(res.status()).toBe(201);
    }
    await page.goto(`/brews/${brewId}/fermentation`);
    await page.getByRole('heading', { name: 'Still moving' }).waitFor();
    await expect(page.locator('section[data-state]').getAttribute('data-state')).resolves.toBe('moving');
    expect(await page.getByText('Stable: safe to package').count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Record packaging', exact: true }).count()).toBe(0);
    await page.getByRole('button', { name: 'Record packaging anyway' }).waitFor();
    expect(errors).toEqual([]);
    await context.close();
  });

  it('imports a logger file through the column mapping and the preview', async () => {
    const { page, context, errors } = await newPage(b.browser);
    await signInViaApi(context, 'priya@hollow-oak.example', 'wortwise-demo');
    const { brewId, pitchedAt } = await pitchedBrew(context, 'Logger import', 15);
    const at = (day: number) => new Date(pitchedAt.getTime() + day * DAY_MS).toISOString().slice(0, 16).replace('T', ' ');
    // A semicolon file with its own column names and decimal commas, as a spreadsheet in many countries writes it.
    const file = ['When;Reading;Comment', `${at(12)};1,011;logger`, `${at(14)};1,011;logger`].join('\n');

    await page.goto(`/brews/${brewId}/fermentation`);
    await page.getByLabel('CSV file').setInputFiles({ name: 'logger.csv', mimeType: 'text/csv', buffer: Buffer.from(file) });
    await page.getByText('Choose the unit column, or the unit every row is in.').waitFor();
    await expect(page.getByLabel('Date and time').inputValue()).resolves.toBe('0');
    await page.getByLabel('Every value is in').selectOption('sg');
    await page.getByRole('button', { name: 'Import 2 readings' }).click();
    await page.getByText('Imported 2 readings.').waitFor();
    // Common practice, no source: equal hydrometer readings on days 12 and 14 are stable.
    await page.getByRole('heading', { name: 'Stable: safe to package' }).waitFor();

    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    expect(errors).toEqual([]);
    await context.close();
  });
});
