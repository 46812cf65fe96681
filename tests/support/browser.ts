/** Browser-test helpers: Debian's Chromium through playwright-core, and a fast sign-in. */
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { afterAll, beforeAll, inject } from 'vitest';
import { chromiumArgs, chromiumPath } from '../../scripts/lib/chromium';

export const phone = { width: 375, height: 740 };

export function useBrowser() {
  const state = {} as { browser: Browser };
  beforeAll(async () => {
    state.browser = await chromium.launch({ executablePath: chromiumPath, headless: true, args: chromiumArgs });
  });
  afterAll(async () => {
    await state.browser?.close();
  });
  return state;
}

export const baseUrl = () => inject('baseUrl');

/** A new context whose page fails the test on any console error or uncaught exception. */
export async function newPage(browser: Browser, viewport = phone): Promise<{ context: BrowserContext; page: Page; errors: string[] }> {
  const context = await browser.newContext({ viewport, baseURL: baseUrl() });
  const page = await context.newPage();
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(String(e)));
  page.on('console', (m) => {
    // 401 from /api/auth/me on first load is how the client learns nobody is signed in.
    if (m.type() === 'error' && !/401/.test(m.text())) errors.push(m.text());
  });
  return { context, page, errors };
}

/** Signs in through the API (fast), leaving the session cookie in the context. */
export async function signInViaApi(context: BrowserContext, email: string, password: string) {
  const res = await context.request.post('/api/auth/login', { data: { email, password } });
  if (!res.ok()) throw new Error(`sign-in failed: ${res.status()} ${await res.text()}`);
}

export async function mailTo(address: string) {
  const res = await fetch(`${inject('fakeSmtpApiUrl')}/messages?to=${encodeURIComponent(address)}`);
  return (await res.json()) as { subject: string; text: string; html: string | null }[];
}

/** Follows a main-navigation link, opening the phone's folded menu first when it is folded. */
export async function goToSection(page: Page, label: string) {
  const nav = page.getByRole('navigation', { name: 'Main', includeHidden: true });
  await nav.waitFor({ state: 'attached' });
  const menu = page.getByRole('button', { name: 'Menu' });
  if (await menu.isVisible()) await menu.click();
  await nav.getByRole('link', { name: label, exact: true }).click();
}
