import { describe, expect, it } from 'vitest';
import { demoPassword, demoPeople } from '../../server/db/seed';
import { mailTo, newPage, signInViaApi, useBrowser } from '../support/browser';

const b = useBrowser();

/** The path of the first link to `/<kind>/<token>` in a caught message's text. */
function linkPath(text: string, kind: 'invitations' | 'reset-password') {
  const match = new RegExp(`/${kind}/[A-Za-z0-9_-]+`).exec(text);
  if (!match) throw new Error(`No /${kind}/ link in: ${text}`);
  return match[0];
}

async function waitForMailTo(address: string, timeoutMs = 10_000) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const found = await mailTo(address);
    if (found.length > 0) return found[0];
    if (Date.now() > deadline) throw new Error(`No mail to ${address}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

async function noSidewaysScroll(page: import('playwright-core').Page) {
  return page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
}

describe('club invitations, on a phone-sized window', () => {
  it('an organiser invites a new address; the newcomer signs up through the link and lands in the club', async () => {
    const clubName = 'Hollow Oak Homebrew Circle';
    const newcomer = `newcomer-${Date.now()}@example.org`;

    const organiser = await newPage(b.browser);
    await signInViaApi(organiser.context, demoPeople.organiser.email, demoPassword);
    await organiser.page.goto('/clubs');
    await organiser.page.getByRole('link', { name: new RegExp(clubName) }).click();
    await organiser.page.getByRole('heading', { name: clubName }).waitFor();
    await organiser.page.getByLabel('E-mail address').fill(newcomer);
    await organiser.page.getByLabel('Joins as').selectOption('member');
    await organiser.page.getByRole('button', { name: 'Send invitation' }).click();
    await organiser.page.getByText(`Invitation sent to ${newcomer}.`).waitFor();
    await organiser.page.getByRole('button', { name: `Withdraw the invitation to ${newcomer}` }).waitFor();
    expect(await noSidewaysScroll(organiser.page)).toBeLessThanOrEqual(0);

    const mail = await waitForMailTo(newcomer);
    expect(mail.subject).toBe(`${demoPeople.organiser.displayName} invites you to ${clubName} on Wortwise`);

    const guest = await newPage(b.browser);
    await guest.page.goto(linkPath(mail.text, 'invitations'));
    await guest.page.getByRole('heading', { name: `Join ${clubName}` }).waitFor();
    await guest.page.getByRole('strong').getByText(newcomer, { exact: true }).waitFor();
    // Submitting empty shows the same messages the API would send, inline.
    await guest.page.getByRole('button', { name: `Create my account and join ${clubName}` }).click();
    await guest.page.getByText('Tell us what to call you.').waitFor();
    await guest.page.getByLabel('Your name').fill('Wynn Carrow');
    await guest.page.getByLabel('Password').fill('a-long-password');
    await guest.page.getByRole('button', { name: `Create my account and join ${clubName}` }).click();
    await guest.page.waitForURL(/\/clubs\/\d+$/);
    await guest.page.getByRole('heading', { name: clubName }).waitFor();
    await guest.page.getByText('You are a member here.').waitFor();
    await guest.page.getByText('Wynn Carrow (you)').waitFor();
    expect(await noSidewaysScroll(guest.page)).toBeLessThanOrEqual(0);

    // Nothing failed on the way in (the 401 is the client learning nobody was signed in yet).
    expect(guest.errors.filter((e) => !/Failed to load resource.*401/.test(e))).toEqual([]);

    // The link is single-use: opening it again says so.
    await guest.page.goto(linkPath(mail.text, 'invitations'));
    await guest.page.getByText('This invitation has already been used.', { exact: false }).waitFor();

    // The organiser sees the newcomer among the members, and the invitation gone from the waiting list.
    await organiser.page.reload();
    await organiser.page.getByText('Wynn Carrow').waitFor();
    expect(await organiser.page.getByRole('button', { name: `Withdraw the invitation to ${newcomer}` }).count()).toBe(0);

    const unexpected = [...organiser.errors, ...guest.errors].filter((e) => !/Failed to load resource.*(401|410)/.test(e));
    expect(unexpected).toEqual([]);
    await organiser.context.close();
    await guest.context.close();
  });

  it('a brewer who forgot their password gets a link by e-mail and chooses a new one', async () => {
    const email = `forgetful-${Date.now()}@example.org`;
    const setup = await newPage(b.browser);
    const created = await setup.context.request.post('/api/auth/signup', { data: { email, password: 'the-old-password', displayName: 'Arden Pell' } });
    expect(created.status()).toBe(201);
    await setup.context.close();

    const { page, context, errors } = await newPage(b.browser);
    await page.goto('/sign-in');
    await page.getByRole('link', { name: 'Forgot your password?' }).click();
    // The sign-in page has an E-mail field too: wait for the next page before typing.
    await page.getByRole('heading', { name: 'Forgot your password?' }).waitFor();
    await page.getByLabel('E-mail').fill(email);
    await page.getByRole('button', { name: 'Send me a link' }).click();
    await page.getByText('Check your e-mail').waitFor();

    const mail = await waitForMailTo(email);
    expect(mail.subject).toBe('Choose a new Wortwise password');
    await page.goto(linkPath(mail.text, 'reset-password'));
    await page.getByLabel('New password', { exact: true }).fill('the-new-password');
    await page.getByLabel('New password again').fill('the-new-passwort');
    await page.getByRole('button', { name: 'Save my new password' }).click();
    await page.getByText('The two passwords differ.').waitFor();
    await page.getByLabel('New password again').fill('the-new-password');
    await page.getByRole('button', { name: 'Save my new password' }).click();
    await page.getByRole('heading', { name: 'Welcome back, Arden Pell' }).waitFor();
    expect(await noSidewaysScroll(page)).toBeLessThanOrEqual(0);

    const old = await context.request.post('/api/auth/login', { data: { email, password: 'the-old-password' } });
    expect(old.status()).toBe(401);
    expect(errors.filter((e) => !/Failed to load resource.*401/.test(e))).toEqual([]);
    await context.close();
  });
});
