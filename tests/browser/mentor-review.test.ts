import type { BrowserContext, Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { demoPassword, demoPeople } from '../../server/db/seed';
import { mailTo, newPage, signInViaApi, useBrowser, goToSection } from '../support/browser';
import { DEMO_SHARED_RECIPE_NAME } from '../../server/recipes/demo-seed';

const b = useBrowser();

/**
 * The late-boil check of the API tests (worked in server/brews/decisions.test.ts, hand
 * calculation): a cooled sample at 1.046 and the hydrometer's own 20 °C, 24 L hot with 10 minutes
 * left at 3 L/h, 4 % shrinkage: left as is it ends at 1059.84 points·L / 22.56 L = 46.98 points,
 * 3 points short of the recipe's 1.050.
 */
const lateBoilInput = {
  reading: { kind: 'hydrometer', sg: 1.046, sampleTempC: 20, calibrationTempC: 20 },
  volumeL: 24,
  minutesLeft: 10,
  boilOffLPerHour: 3,
  targetSg: 1.05,
  targetVolumeL: 21,
  targetFg: 1.011,
  extractsOnHand: ['dme', 'sucrose'],
  coolingShrinkage: 0.04,
};

/** A brew day of the demo brewer's, with a late-boil reading and an "as is" decision, shared with her club. */
async function sharedBrewDay(context: BrowserContext, name: string) {
  // The demo recipe by name: other browser tests add recipes of their own to the same brewer.
  const recipes = ((await (await context.request.get('/api/recipes?scope=mine')).json()) as { items: { id: number; name: string }[] }).items;
  const recipe = recipes.find((r) => r.name === DEMO_SHARED_RECIPE_NAME)!;
  const started = await context.request.post('/api/brews', { data: { recipeId: recipe.id, name } });
  expect(started.status()).toBe(201);
  const brewId = ((await started.json()) as { id: number }).id;
  const reading = await context.request.post(`/api/brews/${brewId}/readings`, {
    data: { kind: 'late_boil_gravity', method: 'hydrometer', sg: 1.046, sampleTempC: 20, volumeL: 24, minutesLeft: 10 },
  });
  expect(reading.status()).toBe(201);
  const decision = await context.request.post(`/api/brews/${brewId}/decisions`, { data: { input: lateBoilInput, choice: { kind: 'as-is' }, note: 'No extract in the house.' } });
  expect(decision.status()).toBe(201);
  const clubs = (await (await context.request.get('/api/clubs')).json()) as { id: number; name: string }[];
  const club = clubs.find((c) => c.name === 'Hollow Oak Homebrew Circle')!;
  expect((await context.request.put(`/api/brews/${brewId}/sharing`, { data: { clubIds: [club.id] } })).status()).toBe(200);
  return brewId;
}

async function waitForNotice(address: string, subject: string, timeoutMs = 10_000) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const found = (await mailTo(address)).find((m) => m.subject === subject);
    if (found) return found;
    if (Date.now() > deadline) throw new Error(`No mail "${subject}" to ${address}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

const sideways = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);

describe('a mentor’s review, on a phone-sized window', () => {
  it('the mentor opens a member’s shared brew day from the queue, comments on the late-boil decision, and the brewer is mailed', async () => {
    const brewName = `Review walk-through ${Date.now()}`;
    const brewer = await newPage(b.browser);
    await signInViaApi(brewer.context, demoPeople.brewer.email, demoPassword);
    const brewId = await sharedBrewDay(brewer.context, brewName);

    const mentor = await newPage(b.browser);
    await signInViaApi(mentor.context, demoPeople.mentor.email, demoPassword);
    const { page } = mentor;
    await page.goto('/');
    await goToSection(page, 'Reviews');
    await page.getByRole('heading', { name: 'Reviews' }).waitFor();
    await page.getByText('Brew days shared with clubs where you are a mentor').waitFor();
    const item = page.getByTestId('queue-item').filter({ hasText: brewName });
    await expect(item.textContent()).resolves.toMatch(/Priya Lindqvist · Hollow Oak Harvest Pale · Hollow Oak Homebrew Circle/);
    expect(await sideways(page)).toBeLessThanOrEqual(0);
    await item.click();
    await page.waitForURL(new RegExp(`/reviews/${brewId}$`));
    await page.getByRole('heading', { name: brewName }).waitFor();

    // The deviations are called out at the top, in the mentor's own units (Ivo reads SG).
    const deviations = page.getByTestId('review-deviations');
    await expect(deviations.textContent()).resolves.toContain('Left as is, the wort was projected to finish at 1.047, 3 points short of the target 1.050.');
    await expect(deviations.textContent()).resolves.toContain('No hydrometer of your own was picked');

    // A mentor has no way to change the brew day: no reading, note or stage controls.
    for (const name of [/Save reading/, /Delete this note/, /Save note/, /Complete/, /Share/]) {
      expect(await page.getByRole('button', { name }).count(), String(name)).toBe(0);
    }

    const comment = 'Three points short and left as is: fine this time. Keep a bag of dry malt extract by the kettle for the next one.';
    await page.getByRole('button', { name: /^Comment on the late-boil decision/ }).click();
    const form = page.getByRole('form', { name: /^Your comment on the late-boil decision/ });
    await form.getByRole('textbox').fill(comment);
    await form.getByRole('button', { name: 'Post comment' }).click();
    const posted = page.locator('#entry-d-' + (await decisionId(brewer.context, brewId))).getByTestId('comment');
    await posted.filter({ hasText: comment }).waitFor();
    await expect(posted.textContent()).resolves.toMatch(/Ivo Brannock · mentor/);
    expect(await sideways(page)).toBeLessThanOrEqual(0);

    // The brewer's notice, read back from the fake SMTP server.
    const mail = await waitForNotice(demoPeople.brewer.email, `${demoPeople.mentor.displayName} commented on ${brewName}`);
    expect(mail.text).toContain(`> ${comment}`);
    const link = /\/brews\/\d+\/log#comments/.exec(mail.text)?.[0];
    expect(link).toBe(`/brews/${brewId}/log#comments`);

    // The brewer follows the link and reads the comment on her own log, under the decision.
    await brewer.page.goto(link!);
    const section = brewer.page.locator('#comments');
    await section.getByText(comment).waitFor();
    await expect(section.textContent()).resolves.toMatch(/Late-boil decision/);

    // With a mentor's comment, the brew day has left the queue.
    await page.goto('/reviews');
    await page.getByRole('heading', { name: 'Reviews' }).waitFor();
    await page.waitForLoadState('networkidle');
    expect(await page.getByTestId('queue-item').filter({ hasText: brewName }).count()).toBe(0);
    // ...and is found again under "Reviewed".
    await page.getByRole('heading', { name: 'Reviewed' }).waitFor();
    await page.getByTestId('reviewed-item').filter({ hasText: brewName }).waitFor();

    expect([...mentor.errors, ...brewer.errors]).toEqual([]);
    await mentor.context.close();
    await brewer.context.close();
  });

  it('keeps the mentor’s words and says why when the brewer stopped sharing a moment before the comment was posted', async () => {
    const brewName = `Unshared walk-through ${Date.now()}`;
    const brewer = await newPage(b.browser);
    await signInViaApi(brewer.context, demoPeople.brewer.email, demoPassword);
    const brewId = await sharedBrewDay(brewer.context, brewName);

    const mentor = await newPage(b.browser);
    await signInViaApi(mentor.context, demoPeople.mentor.email, demoPassword);
    const { page } = mentor;
    await page.goto(`/reviews/${brewId}`);
    await page.getByRole('heading', { name: brewName }).waitFor();
    const form = page.getByRole('form', { name: 'Your comment on the brew day' });
    const words = 'Nice and tidy overall.';
    await form.getByRole('textbox').fill(words);

    expect((await brewer.context.request.put(`/api/brews/${brewId}/sharing`, { data: { clubIds: [] } })).status()).toBe(200);
    await form.getByRole('button', { name: 'Post comment' }).click();
    await form.getByText('This brew day is no longer shared with your club.').waitFor();
    await expect(form.getByRole('textbox').inputValue()).resolves.toBe(words);
    const comments = (await (await brewer.context.request.get(`/api/brews/${brewId}/comments`)).json()) as unknown[];
    expect(comments).toEqual([]);

    // The refused POST shows in the console as a failed request; nothing else may.
    expect(mentor.errors.filter((e) => !/Failed to load resource.*404/.test(e))).toEqual([]);
    expect(brewer.errors).toEqual([]);
    await mentor.context.close();
    await brewer.context.close();
  });
});

async function decisionId(context: BrowserContext, brewId: number): Promise<number> {
  const brew = (await (await context.request.get(`/api/brews/${brewId}`)).json()) as { decisions: { id: number }[] };
  return brew.decisions[0].id;
}
