import { describe, expect, it } from 'vitest';
import { newPage, useBrowser, goToSection } from '../support/browser';

const b = useBrowser();

/*
 * Worked by hand with the ASBC cubic fit to the extract table, the formula shared/brewmath uses:
 *   °P = −616.868 + 1111.14·SG − 630.272·SG² + 135.997·SG³
 * Pairs of the same unfermented wort (refractometer Brix, hydrometer SG at its 20 °C calibration):
 *   SG 1.040 → 9.9935 °P; 10.6 °Bx / 9.9935 = 1.0607
 *   SG 1.048 → 11.9121 °P; 12.6 °Bx / 11.9121 = 1.0577
 *   SG 1.060 → 14.7414 °P; 15.6 °Bx / 14.7414 = 1.0582
 *   mean 1.0589 (shown 1.059), spread 1.0607 − 1.0577 = 0.003
 * The next reading, 20.0 °Bx: 20 / 1.0589 = 18.888 °P. The cubic gives 18.879 °P at SG 1.078 and
 * rises about 226 °P per unit of SG there, so SG = 1.078 + (18.888 − 18.879) / 226 = 1.07804 → "1.078".
 * With the common-practice 1.04 it would have been 20 / 1.04 = 19.231 °P → 1.078 + 0.352 / 226
 * = 1.07956 → "1.080", so the number on screen shows which factor was used.
 */
describe('instruments, on a phone-sized window', () => {
  it('calibrates a refractometer from three pairs and the next reading uses the new factor', async () => {
    const { page, context, errors } = await newPage(b.browser);
    const email = `refractometer-${Date.now()}@example.org`;
    const signup = await context.request.post('/api/auth/signup', { data: { email, password: 'a-long-password', displayName: 'Odile Fenwick' } });
    expect(signup.status()).toBe(201);

    await page.goto('/');
    await goToSection(page, 'Instruments');
    await page.getByRole('heading', { name: 'Instruments', level: 1 }).waitFor();

    // Add a refractometer: it starts on the common-practice factor.
    await page.getByRole('button', { name: 'Add an instrument' }).click();
    const add = page.getByRole('region', { name: 'Add an instrument' });
    await add.getByLabel('Refractometer').check();
    await add.getByLabel('Name').fill('Pocket refractometer');
    await add.getByRole('button', { name: 'Add instrument' }).click();
    const card = page.locator('article', { has: page.getByRole('heading', { name: 'Pocket refractometer' }) });
    await card.getByText('Factor not measured yet').waitFor();
    await expect(card.getByTestId('headline').textContent()).resolves.toBe('1.040');

    // Before calibrating, 20 °Bx reads with the default factor.
    await card.getByLabel('Refractometer reads').fill('20');
    await expect(card.getByTestId('corrected').textContent()).resolves.toBe('1.080');
    await card.getByLabel('Refractometer reads').fill('');

    // Three pairs; each pair's factor, then the mean and spread, before anything is saved.
    await card.getByRole('button', { name: 'Calibrate from paired readings' }).click();
    const pairs: [brix: string, sg: string][] = [
      ['10.6', '1.040'],
      ['12.6', '1.048'],
      ['15.6', '1.060'],
    ];
    for (const [i, [brix, sg]] of pairs.entries()) {
      const pair = card.locator('li', { has: page.getByRole('heading', { name: `Pair ${i + 1}` }) });
      await pair.getByLabel('Refractometer', { exact: true }).fill(brix);
      await pair.getByLabel('Hydrometer', { exact: true }).fill(sg);
    }
    await expect(card.getByTestId('pair-factor-0').textContent()).resolves.toMatch(/factor 1\.061/);
    await expect(card.getByTestId('pair-factor-1').textContent()).resolves.toMatch(/factor 1\.058/);
    await expect(card.getByTestId('pair-factor-2').textContent()).resolves.toMatch(/factor 1\.058/);
    await expect(card.getByTestId('wcf-mean').textContent()).resolves.toBe('1.059');
    await expect(card.getByTestId('wcf-spread').textContent()).resolves.toBe('0.003');
    // Not saved yet: the card still shows the default.
    await expect(card.getByTestId('headline').textContent()).resolves.toBe('1.040');

    await card.getByRole('button', { name: 'Use factor 1.059' }).click();
    await card.getByText('Saved: factor 1.059').waitFor();
    await card.getByTestId('headline').filter({ hasText: '1.059' }).waitFor();

    // The next reading uses it.
    await card.getByLabel('Refractometer reads').fill('20');
    await expect(card.getByTestId('raw').textContent()).resolves.toBe('20 °Bx');
    await expect(card.getByTestId('corrected').textContent()).resolves.toBe('1.078');
    await expect(card.getByTestId('correction').textContent()).resolves.toMatch(/÷ 1\.059/);

    // And it is the stored factor, not just the page's memory.
    await page.reload();
    const again = page.locator('article', { has: page.getByRole('heading', { name: 'Pocket refractometer' }) });
    await again.getByLabel('Refractometer reads').fill('20');
    await expect(again.getByTestId('corrected').textContent()).resolves.toBe('1.078');
    await again.getByRole('button', { name: 'Log' }).click();
    await again.getByText('Factor from paired readings').waitFor();

    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    expect(errors).toEqual([]);
    await context.close();
  });
});
