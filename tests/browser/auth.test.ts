import { describe, expect, it } from 'vitest';
import { goToSection, newPage, useBrowser } from '../support/browser';

const b = useBrowser();

describe('an account, on a phone-sized window', () => {
  it('signs up, signs out and signs in again', async () => {
    const { page, context, errors } = await newPage(b.browser);
    const email = `newcomer-${Date.now()}@example.org`;

    // A visitor's first page says what Wortwise is, and never fetches the signed-in home's code.
    const scripts: string[] = [];
    page.on('request', (r) => {
      if (r.resourceType() === 'script') scripts.push(new URL(r.url()).pathname);
    });
    await page.goto('/');
    await page.getByRole('heading', { name: 'Brew to the numbers you planned', level: 1 }).waitFor();
    await page.waitForLoadState('networkidle');
    expect(new URL(page.url()).pathname).toBe('/');
    expect(scripts.filter((s) => /\/assets\/home-[\w-]+\.js$/.test(s))).toEqual([]);
    expect(scripts.some((s) => /\/assets\/front-page-[\w-]+\.js$/.test(s))).toBe(true);
    await expect(page.getByRole('link', { name: 'Try the late-boil check' }).isVisible()).resolves.toBe(true);
    await page.getByRole('link', { name: 'Create an account' }).click();
    await page.getByLabel('Your name').fill('Wren Halloway');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill('a-long-password');
    await page.getByRole('button', { name: 'Create my account' }).click();
    // A new account's first visit is a welcome, not a welcome back.
    await page.getByRole('heading', { name: 'Welcome, Wren Halloway' }).waitFor();

    // No sideways scroll on a 375 px phone.
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);

    await page.getByRole('button', { name: 'Account and units' }).click();
    await page.getByRole('menuitem', { name: 'Sign out', exact: true }).click();
    await page.waitForURL(/\/sign-in/);

    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill('wrong-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page.getByText('That e-mail and password do not match an account.').textContent()).resolves.toBeTruthy();

    await page.getByLabel('Password').fill('a-long-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Welcome back, Wren Halloway' }).waitFor();

    // On a phone the sections sit behind one Menu button; following a link folds it again.
    await goToSection(page, 'Recipes');
    await page.getByRole('heading', { name: 'Recipes', level: 1 }).waitFor();
    expect(await page.getByRole('button', { name: 'Menu' }).getAttribute('aria-expanded')).toBe('false');
    expect(await page.getByRole('navigation', { name: 'Main' }).isVisible()).toBe(false);

    const loginErrors = errors.filter((e) => !/Failed to load resource/.test(e));
    expect(loginErrors).toEqual([]);
    await context.close();
  });
});
