import { crc32, deflateSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { brixToSg, EXTRACT_POTENTIALS_POINTS_L_PER_KG, EXTRACT_VOLUME_L_PER_KG } from '../../shared/brewmath';
import { newPage, phone, signInViaApi, useBrowser } from '../support/browser';

const b = useBrowser();

/**
 * Worked example, gravity points × litres mass balance, hand calculation.
 * Late in the boil of "Hollow Oak Harvest Pale" (target OG 1.050, 23 L into the fermenter) a drop
 * reads 11.6 °Brix on a refractometer with wort correction factor 1.04; 25.5 L hot in the kettle,
 * 10 minutes left, boiling off 4 L/h; wort shrinks 4 % on cooling (common practice, no source).
 * - 11.6 / 1.04 = 11.154 °P → SG 1.04483 (the ASBC extract-table cubic in shared/brewmath, itself
 *   checked against the ASBC table; the rational approximation 1 + P / (258.6 − P / 258.2 × 227.1)
 *   gives 1.04483 too), i.e. 44.83 gravity points.
 * - End of boil: 25.5 − 4 × 10/60 = 24.833 L hot; × 0.96 = 23.84 L cold.
 * - Extract in the kettle: 44.83 × 25.5 × 0.96 = 1097.3 points·L.
 * - Dry malt extract, 367 points·L/kg, adding 0.62 L/kg (shared/brewmath's
 *   EXTRACT_POTENTIALS_POINTS_L_PER_KG and EXTRACT_VOLUME_L_PER_KG):
 *   kg = (50 × 23.84 − 1097.3) / (367 − 50 × 0.62) = 94.7 / 336 = 0.2818 kg → 282 g.
 */
function handWorkedDmeGrams(): number {
  const points = (brixToSg(11.6, 1.04) - 1) * 1000;
  const approxPoints = (11.6 / 1.04 / (258.6 - (11.6 / 1.04 / 258.2) * 227.1)) * 1000;
  expect(points).toBeCloseTo(approxPoints, 1);
  const coldEndL = (25.5 - (4 * 10) / 60) * 0.96;
  const pointsL = points * 25.5 * 0.96;
  const kg = (50 * coldEndL - pointsL) / (EXTRACT_POTENTIALS_POINTS_L_PER_KG.dme - 50 * EXTRACT_VOLUME_L_PER_KG.dme);
  return Math.round(kg * 1000);
}

/** A real 1 × 1 PNG by the PNG specification (W3C, 2nd edition): signature, IHDR, IDAT, IEND, each chunk with its CRC-32. */
function tinyPng(): Buffer {
  const chunk = (type: string, data: Buffer) => {
    const length = Buffer.alloc(4);
    length.writeUInt32BE(data.length);
    const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(crc32(body));
    return Buffer.concat([length, body, crc]);
  };
  const ihdr = Buffer.from([0, 0, 0, 1, 0, 0, 0, 1, 8, 2, 0, 0, 0]);
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', ihdr),
    chunk('IDAT', deflateSync(Buffer.from([0, 200, 140, 40]))),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

const nbsp = (s: string | null) => (s ?? '').replace(/\u00a0/g, ' ').replace(/\s+/g, ' ').trim();

describe('a brew day on a phone-sized window', () => {
  it('starts from a demo recipe, logs a reading through a lost connection, runs the late-boil check, chooses dry malt extract and finds the decision in the log', async () => {
    const grams = handWorkedDmeGrams();
    expect(grams).toBe(282);
    const { page, context, errors } = await newPage(b.browser);
    await signInViaApi(context, 'priya@hollow-oak.example', 'wortwise-demo');

    // Start a brew day from the demo recipe.
    await page.goto('/brews');
    await page.getByRole('heading', { name: 'Brew days', level: 1 }).waitFor();
    const start = page.getByRole('form', { name: 'Start a brew day' });
    await start.getByLabel('Recipe').selectOption({ label: 'Hollow Oak Harvest Pale' });
    await start.getByLabel('Name (optional)').fill('Harvest Pale, browser test');
    await start.getByRole('button', { name: 'Start the brew day' }).click();
    await page.waitForURL(/\/brews\/\d+$/);
    await page.getByRole('heading', { name: 'Harvest Pale, browser test' }).waitFor();
    const brewId = Number(new URL(page.url()).pathname.split('/').pop());

    // The mash: raw and corrected side by side as the brewer types. Priya's probe read 0.4 °C
    // in an ice bath (0 °C), so 66.6 as read is 66.2 corrected.
    const mashTemp = page.getByRole('form', { name: 'New reading' }).filter({ has: page.getByLabel('Mash temperature, as read') });
    await mashTemp.getByLabel('Mash temperature, as read').fill('66.6');
    await expect.poll(async () => nbsp(await mashTemp.getByTestId('corrected-value').textContent())).toBe('66.2 °C');
    expect(nbsp(await mashTemp.getByTestId('raw-value').textContent())).toBe('66.6 °C');

    // The connection drops while saving: the reading waits on the phone and is sent when it returns.
    await context.setOffline(true);
    await mashTemp.getByRole('button', { name: 'Save reading' }).click();
    await mashTemp.getByText('Mash temperature kept on this device: waiting to send.').waitFor();
    await page.getByTestId('queued-item').filter({ hasText: 'Mash temperature' }).getByText('Waiting to send').waitFor();
    await context.setOffline(false);
    const card = page.getByRole('article', { name: 'Mash temperature' });
    await card.waitFor();
    await expect.poll(() => page.getByTestId('queued-item').count()).toBe(0);

    // A photo of the reading: a text file named .png is refused by its bytes; a real PNG is kept and shown.
    await card.getByLabel('Add a photo').setInputFiles({ name: 'thermometer.png', mimeType: 'image/png', buffer: Buffer.from('not really a picture') });
    await card.getByText('That file is not a JPEG, PNG or WebP image. Choose a photo taken with your camera.').waitFor();
    await card.getByLabel('Add a photo').setInputFiles({ name: 'thermometer.png', mimeType: 'image/png', buffer: tinyPng() });
    const photo = card.getByRole('img', { name: 'Photo of the mash temperature reading' });
    await photo.waitFor();
    await expect.poll(() => photo.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(1);

    // The boil: the late-boil check, prefilled from the brew day's snapshot.
    await page.getByRole('tab', { name: /Boil/ }).click();
    const check = page.getByRole('form', { name: 'Late-boil check' });
    await check.waitFor();
    await expect.poll(async () => check.getByLabel('Target OG').inputValue()).toBe('1.05');
    expect(await check.getByLabel('Into the fermenter').inputValue()).toBe('23');
    await check.getByLabel('Brix').fill('11.6');
    await check.getByLabel('Wort correction factor').fill('1.04');
    await check.getByLabel('Wort in the kettle (hot)').fill('25.5');
    await check.getByLabel('Minutes left').fill('10');
    await check.getByLabel('Boil-off rate').fill('4');

    const dme = check.getByRole('article').filter({ hasText: 'dry malt extract' });
    await expect.poll(async () => nbsp(await dme.getByRole('heading', { level: 3 }).textContent())).toBe(`Add ${grams} g dry malt extract`);

    // Chosen on a dropped connection: kept on the phone, sent when the connection returns.
    await context.setOffline(true);
    await dme.getByRole('button', { name: 'Choose this' }).click();
    await dme.getByText('Kept on this device: waiting to send.').waitFor();
    expect(await check.getByLabel('Brix').inputValue()).toBe('11.6');
    await context.setOffline(false);
    const decisions = page.getByTestId('decision');
    await expect.poll(() => decisions.count()).toBe(1);
    expect(nbsp(await decisions.first().getByRole('heading').textContent())).toBe(`Add ${grams} g dry malt extract`);

    // No sideways scroll on a 375 px phone.
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);

    // The decision in the log, with the numbers the server recomputed.
    await page.getByRole('link', { name: 'Log and brew sheet' }).click();
    await page.waitForURL(new RegExp(`/brews/${brewId}/log$`));
    const timeline = page.getByRole('list', { name: 'Timeline' });
    await timeline.waitFor();
    const logged = timeline.getByTestId('decision');
    expect(nbsp(await logged.getByRole('heading').textContent())).toBe(`Add ${grams} g dry malt extract`);
    expect(nbsp(await logged.textContent())).toContain('Predicted OG 1.050');
    expect(nbsp(await timeline.textContent())).toContain('As read 66.6 °C · corrected 66.2 °C');
    await page.getByTestId('brew-chart').waitFor();
    expect(await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth)).toBeLessThanOrEqual(0);

    // The refused upload (415) and the dropped connection show up as failed requests in the console.
    const unexpected = errors.filter((e) => !/Failed to load resource|ERR_INTERNET_DISCONNECTED/.test(e));
    expect(unexpected).toEqual([]);
    await context.close();
  });

  it('prints the brew sheet within the width of A4 and US Letter, without the navigation', async () => {
    const { page, context } = await newPage(b.browser);
    await signInViaApi(context, 'priya@hollow-oak.example', 'wortwise-demo');
    const list = await context.request.get('/api/brews?pageSize=100');
    const demo = ((await list.json()) as { items: { id: number; name: string }[] }).items.find((x) => x.name === 'Hollow Oak Harvest Pale, first batch');
    expect(demo).toBeDefined();
    await page.goto(`/brews/${demo!.id}/log`);
    await page.getByRole('list', { name: 'Timeline' }).waitFor();
    await page.emulateMedia({ media: 'print' });
    // Printable width at 96 CSS px per inch with 12 mm margins each side: A4 210 mm → 186 mm, Letter 8.5 in → 191.9 mm.
    for (const [paper, widthMm] of [
      ['A4', 186],
      ['US Letter', 191.9],
    ] as const) {
      await page.setViewportSize({ width: Math.floor((widthMm / 25.4) * 96), height: 1000 });
      const layout = await page.evaluate(() => ({
        overflow: document.documentElement.scrollWidth - window.innerWidth,
        navShown: document.querySelector('nav[aria-label="Main"]')?.checkVisibility() ?? false,
        buttonsShown: [...document.querySelectorAll('button')].filter((el) => el.checkVisibility()).length,
      }));
      expect(layout, paper).toEqual({ overflow: 0, navShown: false, buttonsShown: 0 });
    }
    await page.setViewportSize(phone);
    await context.close();
  });
});
