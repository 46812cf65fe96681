/**
 * The installable app and the brew day without a connection: the service worker serves the app,
 * entries made offline wait on the device and are stored exactly once, with the time they were
 * made, when the connection (and, if it ran out, the session) is back.
 */
import type { BrowserContext, Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import type { BrewDetail } from '../../shared/schemas/brews';
import { newPage, signInViaApi, useBrowser } from '../support/browser';

const b = useBrowser();

const brewer = { email: 'priya@hollow-oak.example', password: 'wortwise-demo' };

async function startBrew(context: BrowserContext, name: string): Promise<number> {
  const recipes = ((await (await context.request.get('/api/recipes')).json()) as { items: { id: number; name: string }[] }).items;
  const recipe = recipes.find((r) => r.name === 'Hollow Oak Harvest Pale');
  if (!recipe) throw new Error('demo recipe missing');
  const res = await context.request.post('/api/brews', { data: { recipeId: recipe.id, name } });
  expect(res.status()).toBe(201);
  return ((await res.json()) as BrewDetail).id;
}

/** Waits until the service worker has installed and controls the page (it claims it on first install). */
async function waitForServiceWorker(page: Page) {
  await page.evaluate(() => navigator.serviceWorker.ready.then(() => undefined));
  await expect.poll(() => page.evaluate(() => Boolean(navigator.serviceWorker.controller)), { timeout: 20_000 }).toBe(true);
}

/** The brew as the server has it, read in a separate signed-in context (the page's session may have ended). */
async function storedBrew(page: Page, brewId: number): Promise<BrewDetail> {
  const context = await page.context().browser()!.newContext({ baseURL: new URL(page.url()).origin });
  try {
    await signInViaApi(context, brewer.email, brewer.password);
    const res = await context.request.get(`/api/brews/${brewId}`);
    expect(res.status()).toBe(200);
    return (await res.json()) as BrewDetail;
  } finally {
    await context.close();
  }
}

interface Logged {
  kind: string;
  before: number;
  after: number;
}

/**
 * Offline: three mash readings and one late-boil decision, each shown at once as waiting to send.
 * Returns the time window of each, to compare with what the server stores later.
 */
async function logOffline(page: Page): Promise<{ readings: Logged[]; decision: Logged }> {
  const readings: Logged[] = [];
  const mashTemp = page.getByRole('form', { name: 'New reading' }).filter({ has: page.getByLabel('Mash temperature, as read') });
  const mashPh = page.getByRole('form', { name: 'New reading' }).filter({ has: page.getByLabel('Mash pH, as read') });
  const queued = page.getByTestId('queued-item');

  for (const [form, label, value, kind] of [
    [mashTemp, 'Mash temperature, as read', '66.6', 'mash_temp'],
    [mashPh, 'Mash pH, as read', '5.35', 'mash_ph'],
    [mashTemp, 'Mash temperature, as read', '65.8', 'mash_temp'],
  ] as const) {
    const count = await queued.count();
    const before = Date.now();
    await form.getByLabel(label).fill(value);
    await form.getByRole('button', { name: 'Save reading' }).click();
    await form.getByText('kept on this device: waiting to send.').waitFor();
    await expect.poll(() => queued.count()).toBe(count + 1);
    readings.push({ kind, before, after: Date.now() });
    // Each entry gets its own second, so the stored times can tell them apart.
    await page.waitForTimeout(1100);
  }

  await page.getByRole('tab', { name: /Boil/ }).click();
  const check = page.getByRole('form', { name: 'Late-boil check' });
  await check.waitFor();
  await check.getByLabel('Brix').fill('11.6');
  await check.getByLabel('Wort correction factor').fill('1.04');
  await check.getByLabel('Wort in the kettle (hot)').fill('25.5');
  await check.getByLabel('Minutes left').fill('10');
  await check.getByLabel('Boil-off rate').fill('4');
  const dme = check.getByRole('article').filter({ hasText: 'dry malt extract' });
  const before = Date.now();
  await dme.getByRole('button', { name: 'Choose this' }).click();
  await dme.getByText('Kept on this device: waiting to send.').waitFor();
  const decision = { kind: 'decision', before, after: Date.now() };
  await expect.poll(() => queued.count()).toBe(4);
  await expect.poll(() => page.getByTestId('queue-count').textContent()).toContain('4 waiting');
  await expect.poll(() => page.getByTestId('offline-status').textContent()).toContain('Offline');
  // The count in the header and the waiting list fit a 375 px phone: no sideways scroll.
  expect(await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth)).toBeLessThanOrEqual(0);
  return { readings, decision };
}

function expectStoredOnce(brew: BrewDetail, logged: { readings: Logged[]; decision: Logged }, sentAfter: number) {
  expect(brew.readings.map((r) => r.kind)).toEqual(logged.readings.map((r) => r.kind));
  brew.readings.forEach((r, i) => {
    const at = Date.parse(r.takenAt);
    // Stored with the time it was read on the phone (the server keeps whole seconds or better),
    // not the later time it reached the server.
    expect(at).toBeGreaterThanOrEqual(Math.floor(logged.readings[i].before / 1000) * 1000);
    expect(at).toBeLessThanOrEqual(logged.readings[i].after);
    expect(at).toBeLessThan(sentAfter);
  });
  expect(brew.decisions).toHaveLength(1);
  const decidedAt = Date.parse(brew.decisions[0].decidedAt);
  expect(decidedAt).toBeGreaterThanOrEqual(Math.floor(logged.decision.before / 1000) * 1000);
  expect(decidedAt).toBeLessThanOrEqual(logged.decision.after);
  expect(decidedAt).toBeLessThan(sentAfter);
}

describe('the brew day without a connection', () => {
  it('opens offline after a reload, keeps three readings and a decision on the device, and stores each once with its own time when the connection returns', async () => {
    const { page, context, errors } = await newPage(b.browser);
    await signInViaApi(context, brewer.email, brewer.password);
    const brewId = await startBrew(context, 'Harvest Pale, offline test');
    await page.goto(`/brews/${brewId}`);
    await page.getByRole('heading', { name: 'Harvest Pale, offline test' }).waitFor();
    await waitForServiceWorker(page);

    await context.setOffline(true);
    await page.reload();
    await page.getByRole('heading', { name: 'Harvest Pale, offline test' }).waitFor();
    const logged = await logOffline(page);
    expect((await storedBrew(page, brewId)).readings).toHaveLength(0);

    await page.waitForTimeout(1100);
    const sentAfter = Date.now();
    await context.setOffline(false);
    await expect.poll(() => page.getByTestId('queued-item').count(), { timeout: 15_000 }).toBe(0);
    await expect.poll(() => page.getByTestId('queue-count').count()).toBe(0);

    expectStoredOnce(await storedBrew(page, brewId), logged, sentAfter);
    // The log shows the server's version now.
    await page.getByRole('tab', { name: /Mash/ }).click();
    await expect.poll(() => page.getByRole('article', { name: 'Mash temperature' }).count()).toBe(2);
    // A reload does not send anything again.
    await page.reload();
    await page.getByRole('heading', { name: 'Harvest Pale, offline test' }).waitFor();
    await page.waitForTimeout(500);
    expectStoredOnce(await storedBrew(page, brewId), logged, sentAfter);
    expect(errors.filter((e) => !/ERR_INTERNET_DISCONNECTED|Failed to load resource/.test(e))).toEqual([]);
    await context.close();
  });

  it('keeps the queue while the session has expired, and sends it once the brewer signs in again', async () => {
    const { page, context, errors } = await newPage(b.browser);
    await signInViaApi(context, brewer.email, brewer.password);
    const brewId = await startBrew(context, 'Harvest Pale, session test');
    await page.goto(`/brews/${brewId}`);
    await page.getByRole('heading', { name: 'Harvest Pale, session test' }).waitFor();
    await waitForServiceWorker(page);

    await context.setOffline(true);
    await page.reload();
    await page.getByRole('heading', { name: 'Harvest Pale, session test' }).waitFor();
    const logged = await logOffline(page);

    // The session runs out while the phone is offline.
    await context.clearCookies();
    await page.waitForTimeout(1100);
    const sentAfter = Date.now();
    await context.setOffline(false);
    // Either the page asks to sign in again, or a refreshed page sends the brewer to sign in.
    const signInAgain = page.getByRole('link', { name: 'Sign in again' });
    await expect.poll(async () => page.url().includes('/sign-in') || (await signInAgain.isVisible()), { timeout: 15_000 }).toBe(true);
    expect((await storedBrew(page, brewId)).readings).toHaveLength(0);
    if (!page.url().includes('/sign-in')) await signInAgain.click();
    await page.waitForURL(/\/sign-in/);

    await page.getByLabel('E-mail').fill(brewer.email);
    await page.getByLabel('Password').fill(brewer.password);
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await page.waitForURL(new RegExp(`/brews/${brewId}`));
    await page.getByRole('heading', { name: 'Harvest Pale, session test' }).waitFor();
    await expect.poll(() => page.getByTestId('queued-item').count(), { timeout: 15_000 }).toBe(0);
    expectStoredOnce(await storedBrew(page, brewId), logged, sentAfter);
    expect(errors.filter((e) => !/ERR_INTERNET_DISCONNECTED|Failed to load resource/.test(e))).toEqual([]);
    await context.close();
  });
});

describe('the fermentation log without a connection', () => {
  it('opens offline after a reload, keeps a hydrometer reading on the device with the time typed, and stores it once when back online', async () => {
    const { page, context } = await newPage(b.browser);
    await signInViaApi(context, brewer.email, brewer.password);
    const brewId = await startBrew(context, 'Harvest Pale, offline fermentation');
    const pitchedAt = new Date(Math.floor((Date.now() - 13 * 86_400_000) / 60_000) * 60_000);
    const pitched = await context.request.post(`/api/brews/${brewId}/readings`, { data: { kind: 'pitch_temp', tempC: 19, takenAt: pitchedAt.toISOString(), pitched: true } });
    expect(pitched.status()).toBe(201);
    await page.goto(`/brews/${brewId}/fermentation`);
    await page.getByLabel('Hydrometer reading').waitFor();
    await waitForServiceWorker(page);

    await context.setOffline(true);
    await page.reload();
    await page.getByLabel('Hydrometer reading').waitFor();
    // Day 12 after pitching, typed in the brewer's local time.
    const takenAt = new Date(pitchedAt.getTime() + 12 * 86_400_000);
    const local = await page.evaluate((ms) => {
      const d = new Date(ms);
      const pad = (n: number) => String(n).padStart(2, '0');
      return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}T${pad(d.getHours())}:${pad(d.getMinutes())}`;
    }, takenAt.getTime());
    await page.getByLabel('Hydrometer reading').fill('1.012');
    await page.getByLabel('Sample temperature').fill('20');
    await page.getByLabel('Taken at').fill(local);
    await page.getByRole('button', { name: 'Save reading' }).click();
    await page.getByText(/Kept on this device: waiting to send/).waitFor();
    await expect.poll(() => page.getByTestId('queued-item').count()).toBe(1);

    await context.setOffline(false);
    await expect.poll(() => page.getByTestId('queued-item').count(), { timeout: 15_000 }).toBe(0);
    const res = await context.request.get(`/api/brews/${brewId}/fermentation`);
    const log = (await res.json()) as { readings: { takenAt: string }[] };
    expect(log.readings).toHaveLength(1);
    expect(Date.parse(log.readings[0].takenAt)).toBe(takenAt.getTime());
    await context.close();
  });
});

describe('two tabs on one brew day', () => {
  it('send each waiting entry once when the connection returns to both at the same moment', async () => {
    const { page, context } = await newPage(b.browser);
    await signInViaApi(context, brewer.email, brewer.password);
    const brewId = await startBrew(context, 'Harvest Pale, two tabs');
    await page.goto(`/brews/${brewId}`);
    await page.getByRole('heading', { name: 'Harvest Pale, two tabs' }).waitFor();
    await waitForServiceWorker(page);
    const other = await context.newPage();
    await other.goto(`/brews/${brewId}`);
    await other.getByRole('heading', { name: 'Harvest Pale, two tabs' }).waitFor();

    await context.setOffline(true);
    const mashTemp = page.getByRole('form', { name: 'New reading' }).filter({ has: page.getByLabel('Mash temperature, as read') });
    for (const value of ['66.1', '66.4', '66.9']) {
      await mashTemp.getByLabel('Mash temperature, as read').fill(value);
      await mashTemp.getByRole('button', { name: 'Save reading' }).click();
      await mashTemp.getByText('kept on this device: waiting to send.').waitFor();
    }
    // The other tab hears of the queue through the BroadcastChannel.
    await expect.poll(() => other.getByTestId('queued-item').count()).toBe(3);

    // Both tabs hear "online" and both start catching up; the Web Lock lets one send.
    await context.setOffline(false);
    await expect.poll(() => page.getByTestId('queued-item').count(), { timeout: 15_000 }).toBe(0);
    await expect.poll(() => other.getByTestId('queued-item').count(), { timeout: 15_000 }).toBe(0);
    await page.waitForTimeout(500);
    const stored = await storedBrew(page, brewId);
    expect(stored.readings).toHaveLength(3);
    await context.close();
  });
});

describe('the public late-boil check without a connection', () => {
  it('answers the worked example offline after a reload', async () => {
    const { page, context } = await newPage(b.browser);
    await page.goto('/late-boil-check');
    await page.getByRole('heading', { name: 'Late-boil check', level: 1 }).waitFor();
    await waitForServiceWorker(page);
    await context.setOffline(true);
    await page.reload();
    await page.getByRole('heading', { name: 'Late-boil check', level: 1 }).waitFor();
    await page.getByRole('radio', { name: 'Litres, kg' }).click();
    // The worked example of tests/browser/late-boil-check.test.ts (hand calculation, gravity points × litres): 349 g.
    await page.getByLabel('Brix').fill('11.4');
    await page.getByLabel('Wort in the kettle (hot)').fill('26');
    await page.getByLabel('Boil-off rate').fill('4');
    await page.getByLabel('Target OG').fill('1.050');
    await page.getByLabel('Into the fermenter').fill('23');
    await page.getByRole('article').filter({ hasText: 'dry malt extract' }).getByRole('heading', { name: 'Add 349 g dry malt extract' }).waitFor();
    await context.close();
  });
});

describe('the installable app as the server serves it', () => {
  it('serves our manifest and icons, and a service worker that is never cached for long', async () => {
    const { page, context } = await newPage(b.browser);
    const manifestRes = await context.request.get('/manifest.webmanifest');
    expect(manifestRes.status()).toBe(200);
    expect(manifestRes.headers()['content-type']).toMatch(/^application\/manifest\+json/);
    expect(manifestRes.headers()['cache-control']).toBe('no-cache');
    const manifest = (await manifestRes.json()) as { name: string; theme_color: string; start_url: string; display: string; icons: { src: string; sizes: string; type: string; purpose: string }[] };
    expect(manifest.name).toBe('Wortwise');
    expect(manifest.display).toBe('standalone');
    // tailwind.config.js: cellar-700.
    expect(manifest.theme_color).toBe('#1f3b36');
    for (const size of ['192x192', '512x512']) expect(manifest.icons.some((i) => i.sizes === size && i.type === 'image/png' && i.purpose === 'any')).toBe(true);
    expect(manifest.icons.some((i) => i.purpose === 'maskable')).toBe(true);
    for (const icon of manifest.icons) {
      const res = await context.request.get(icon.src);
      expect(res.status(), icon.src).toBe(200);
      expect(res.headers()['content-type']).toContain(icon.type);
    }

    const sw = await context.request.get('/sw.js');
    expect(sw.status()).toBe(200);
    expect(sw.headers()['content-type']).toMatch(/javascript/);
    expect(sw.headers()['cache-control']).toBe('no-cache');
    expect(await sw.text()).toContain('precacheAndRoute');

    await page.goto('/late-boil-check');
    expect(await page.locator('link[rel="manifest"]').getAttribute('href')).toBe('/manifest.webmanifest');
    await waitForServiceWorker(page);
    const scope = await page.evaluate(() => navigator.serviceWorker.ready.then((r) => r.scope));
    expect(new URL(scope).pathname).toBe('/');
    await context.close();
  });
});
