import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { AxeResults } from 'axe-core';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { demoPassword, demoPeople } from '../../server/db/seed';
import { DEMO_BREW_NAME } from '../../server/brews/demo-seed';
import { testRecipe } from '../../server/brews/test-scene';
import { newPage, phone, signInViaApi, useBrowser } from '../support/browser';

const b = useBrowser();

/**
 * axe-core (Deque's accessibility engine, WCAG 2.x rules) over the main pages, at desktop and phone
 * size: no serious or critical violation may come back. The script is evaluated through the
 * DevTools protocol, so the app's Content-Security-Policy stays as it is.
 */
const axeSource = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');
const desktop = { width: 1280, height: 900 };

type Found = { page: string; size: string; id: string; impact: string | null | undefined; help: string; targets: string[] };

/** Besides every serious or critical finding, these moderate ones fail too: landmarks and headings. */
const alsoFail = new Set(['heading-order', 'landmark-unique', 'landmark-no-duplicate-banner', 'landmark-no-duplicate-contentinfo', 'landmark-no-duplicate-main', 'page-has-heading-one']);

async function audit(page: Page, label: string, size: string): Promise<Found[]> {
  // Let lazy chunks, queries and fonts settle before judging colours and names.
  await page.waitForLoadState('networkidle');
  await page.locator('[aria-busy="true"]').waitFor({ state: 'detached', timeout: 5_000 }).catch(() => undefined);
  await page.evaluate(axeSource);
  const results = (await page.evaluate(() =>
    (window as unknown as { axe: { run: (ctx: Document, opts: object) => Promise<unknown> } }).axe.run(document, {
      resultTypes: ['violations'],
      // Off by default in axe 4 (experimental): a control's visible words must be in its accessible name.
      rules: { 'label-content-name-mismatch': { enabled: true } },
    }),
  )) as AxeResults;
  return results.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical' || alsoFail.has(v.id) || v.id === 'label-content-name-mismatch')
    .map((v) => ({ page: label, size, id: v.id, impact: v.impact, help: v.help, targets: v.nodes.slice(0, 5).map((n) => `${n.target.join(' ')} ${n.failureSummary ?? ''}`.slice(0, 300)) }));
}

/**
 * Controls a brewer taps with wet hands: at least 44 × 44 CSS px (WCAG 2.2 success criterion
 * 2.5.5, target size, enhanced). Links inside a sentence are exempt, as that criterion allows.
 */
async function smallTargets(page: Page, label: string, size: string): Promise<Found[]> {
  const small = await page.evaluate(() => {
    const out: string[] = [];
    for (const el of document.querySelectorAll<HTMLElement>('a[href], button, input:not([type=hidden]), select, textarea, summary, [role=tab], [role=radio]')) {
      const r = el.getBoundingClientRect();
      if (r.width === 0 || r.height === 0 || getComputedStyle(el).visibility === 'hidden') continue;
      // An input drawn as its label (a visually hidden radio, checkbox or file input) counts by the label, which is what the finger hits.
      const hit = (el instanceof HTMLInputElement && (el.closest('label') ?? (r.width <= 2 ? el.labels?.[0] : null))) || el;
      const h = hit.getBoundingClientRect();
      if (h.width >= 43.5 && h.height >= 43.5) continue;
      const inSentence = el.tagName === 'A' && el.parentElement && getComputedStyle(el).display === 'inline' && (el.parentElement.textContent ?? '').trim().length > (el.textContent ?? '').trim().length;
      if (inSentence) continue;
      out.push(`${el.tagName.toLowerCase()} "${(el.textContent || el.getAttribute('aria-label') || (el as HTMLInputElement).name || '').trim().slice(0, 40)}" ${Math.round(h.width)}×${Math.round(h.height)}`);
    }
    return out;
  });
  return small.length ? [{ page: label, size, id: 'touch-target-44', impact: 'serious', help: 'Controls at least 44 × 44 px', targets: small }] : [];
}

async function signedIn(browser: Browser, email: string, viewport: { width: number; height: number }) {
  const opened = await newPage(browser, viewport);
  await signInViaApi(opened.context, email, demoPassword);
  return opened;
}

async function ids(context: BrowserContext) {
  const recipes = ((await (await context.request.get('/api/recipes?scope=mine')).json()) as { items: { id: number }[] }).items;
  const brews = ((await (await context.request.get('/api/brews?pageSize=100')).json()) as { items: { id: number; name: string }[] }).items;
  const clubs = (await (await context.request.get('/api/clubs')).json()) as { id: number; name: string }[];
  return {
    recipeId: recipes[0].id,
    brewId: brews.find((x) => x.name === DEMO_BREW_NAME)!.id,
    clubId: clubs.find((c) => c.name === 'Hollow Oak Homebrew Circle')!.id,
  };
}

for (const [size, viewport] of [
  ['desktop', desktop],
  ['phone', phone],
] as const) {
  describe(`axe-core over the main pages at ${size} size`, () => {
    it('finds no serious or critical violation on the signed-out pages', async () => {
      const { page, context, errors } = await newPage(b.browser, viewport);
      const found: Found[] = [];
      for (const path of ['/', '/late-boil-check', '/sign-in', '/sign-up', '/no-such-page']) {
        await page.goto(path);
        await page.locator('h1').first().waitFor();
        if (path === '/late-boil-check') {
          await page.getByRole('button', { name: 'Fill in an example' }).click();
          await page.getByRole('article').first().waitFor();
        }
        found.push(...(await audit(page, path, size)), ...(await smallTargets(page, path, size)));
      }
      expect(found, JSON.stringify(found, null, 1)).toEqual([]);
      expect(errors.filter((e) => !/Failed to load resource/.test(e))).toEqual([]);
      await context.close();
    }, 120_000);

    it('finds no serious or critical violation on the brewer’s pages', async () => {
      const { page, context, errors } = await signedIn(b.browser, demoPeople.brewer.email, viewport);
      const { recipeId, brewId, clubId } = await ids(context);
      // A kettle sour with one souring pH in, so the souring stage and its progress are judged too.
      const sour = await (await context.request.post('/api/recipes', { data: { ...testRecipe, name: `Axe sour ${size}`, souringTargetPh: 3.4 } })).json();
      const sourBrew = await (await context.request.post('/api/brews', { data: { recipeId: sour.id } })).json();
      expect((await context.request.post(`/api/brews/${sourBrew.id}/readings`, { data: { kind: 'souring_ph', ph: 4.4 } })).status()).toBe(201);
      const found: Found[] = [];
      const paths = [
        '/',
        '/recipes',
        `/recipes/${recipeId}`,
        `/recipes/${recipeId}/edit`,
        '/recipes/new',
        '/brews',
        ...['mash', 'boil', 'chill', 'og'].map((stage) => `/brews/${brewId}?stage=${stage}`),
        `/brews/${brewId}/log`,
        `/brews/${brewId}/fermentation`,
        `/brews/${sourBrew.id}?stage=souring`,
        '/instruments',
        '/clubs',
        `/clubs/${clubId}`,
      ];
      for (const path of paths) {
        await page.goto(path);
        await page.locator('h1').first().waitFor();
        if (path.endsWith('stage=boil')) {
          // With a reading in, the options and their "Choose this" buttons are judged too.
          const check = page.getByRole('form', { name: 'Late-boil check' });
          await check.getByLabel('Brix').fill('11.4');
          await check.getByLabel('Wort in the kettle (hot)').fill('26');
          await check.getByRole('button', { name: 'Choose this' }).first().waitFor();
          // The "why" is written before a choice is saved, so it comes before the first "Choose this".
          const whyFirst = await page.evaluate(() => {
            const why = [...document.querySelectorAll('label')].find((l) => l.textContent?.startsWith('Why (optional)'));
            const choose = [...document.querySelectorAll('button')].find((b) => b.textContent?.includes('Choose this'));
            return Boolean(why && choose && why.compareDocumentPosition(choose) & Node.DOCUMENT_POSITION_FOLLOWING);
          });
          expect(whyFirst).toBe(true);
        }
        found.push(...(await audit(page, path, size)), ...(await smallTargets(page, path, size)));
      }
      expect(found, JSON.stringify(found, null, 1)).toEqual([]);
      expect(errors.filter((e) => !/Failed to load resource/.test(e))).toEqual([]);
      await context.close();
    }, 240_000);

    it('finds no serious or critical violation on the mentor’s and the admin’s pages', async () => {
      const found: Found[] = [];
      const mentor = await signedIn(b.browser, demoPeople.mentor.email, viewport);
      const brewer = await signedIn(b.browser, demoPeople.brewer.email, viewport);
      const { brewId } = await ids(brewer.context);
      await brewer.context.close();
      for (const path of ['/reviews', `/reviews/${brewId}`]) {
        await mentor.page.goto(path);
        await mentor.page.locator('h1').first().waitFor();
        found.push(...(await audit(mentor.page, path, size)), ...(await smallTargets(mentor.page, path, size)));
      }
      const admin = await signedIn(b.browser, demoPeople.admin.email, viewport);
      for (const path of ['/admin/users', '/admin/mail']) {
        await admin.page.goto(path);
        await admin.page.locator('h1').first().waitFor();
        found.push(...(await audit(admin.page, path, size)), ...(await smallTargets(admin.page, path, size)));
      }
      expect(found, JSON.stringify(found, null, 1)).toEqual([]);
      expect([...mentor.errors, ...admin.errors].filter((e) => !/Failed to load resource/.test(e))).toEqual([]);
      await mentor.context.close();
      await admin.context.close();
    }, 120_000);
  });
}
