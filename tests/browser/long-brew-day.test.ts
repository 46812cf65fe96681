/**
 * A brew day with 2,000 readings (a logger left running): the log opens with the latest 50 and
 * builds the older ones only when asked, a page at a time.
 */
import mysql from 'mysql2/promise';
import { describe, expect, inject, it } from 'vitest';
import type { BrewDetail } from '../../shared/schemas/brews';
import { newPage, signInViaApi, useBrowser } from '../support/browser';

const b = useBrowser();

const lateBoil = { kind: 'late_boil_gravity', method: 'hydrometer', sg: 1.046, sampleTempC: 20, volumeL: 24, minutesLeft: 10, takenAt: '2025-09-20T10:00:00.000Z' };

describe('a brew day of 2,000 readings', () => {
  it('opens its log with the latest 50 and adds 50 older ones per “Show older readings”', async () => {
    const { page, context } = await newPage(b.browser);
    await signInViaApi(context, 'priya@hollow-oak.example', 'wortwise-demo');
    const recipes = ((await (await context.request.get('/api/recipes')).json()) as { items: { id: number; name: string }[] }).items;
    const recipe = recipes.find((r) => r.name === 'Hollow Oak Harvest Pale')!;
    const brew = (await (await context.request.post('/api/brews', { data: { recipeId: recipe.id, name: 'Logger left running' } })).json()) as BrewDetail;
    const first = await context.request.post(`/api/brews/${brew.id}/readings`, { data: lateBoil });
    expect(first.status()).toBe(201);
    // 1,999 copies a second apart, straight into the table (MariaDB's sequence engine).
    const conn = await mysql.createConnection(inject('databaseUrl'));
    try {
      await conn.query(
        `insert into brew_readings (brew_id, stage, kind, instrument_id, instrument_snapshot, raw, corrected_value, correction, warnings, volume_l, taken_at, note, instrument_note)
         select brew_id, stage, kind, instrument_id, instrument_snapshot, raw, corrected_value, correction, warnings, volume_l, taken_at + interval s.seq second, note, instrument_note
         from brew_readings r join seq_1_to_1999 s where r.id = ?`,
        [((await first.json()) as { id: number }).id],
      );
    } finally {
      await conn.end();
    }

    await page.goto(`/brews/${brew.id}/log`);
    const timeline = page.getByRole('list', { name: 'Timeline' });
    await timeline.waitFor();
    const readingEntries = () => timeline.getByText('Late-boil gravity', { exact: true }).count();
    expect(await readingEntries()).toBe(50);
    await expect.poll(() => page.getByText('Showing the latest 50 of 2,000 readings.').isVisible()).toBe(true);
    const elements = await page.evaluate(() => document.querySelectorAll('*').length);
    console.info(`log of 2,000 readings: ${elements} DOM elements on opening`);
    expect(elements).toBeLessThan(3000);

    const older = page.getByRole('button', { name: 'Show older readings' });
    const box = (await older.boundingBox())!;
    expect(box.height).toBeGreaterThanOrEqual(44);
    await older.click();
    await expect.poll(readingEntries).toBe(100);
    await expect.poll(() => page.getByText('Showing the latest 100 of 2,000 readings.').isVisible()).toBe(true);
    await context.close();
  });
});
