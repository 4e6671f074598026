import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import { openBrowser, shot } from '../support/browser';

const base = inject('e2eBaseUrl');
const ADMIN = { email: 'admin@fernhollow.example', password: 'maple-walk-demo' };

let browser: Awaited<ReturnType<typeof openBrowser>>;
let page: Page;

beforeAll(async () => {
  browser = await openBrowser();
  page = browser.page;
});
afterAll(async () => browser?.close());

async function signIn(p: Page, email: string, password: string) {
  await p.goto(`${base}/sign-in`);
  await p.getByLabel('E-mail').fill(email);
  await p.getByLabel('Password').fill(password);
  await p.getByRole('button', { name: 'Sign in' }).click();
}

async function signOut(p: Page) {
  await p.context().clearCookies();
}

describe('a new member signs up, confirms by e-mail and is made an author', () => {
  const email = `hazel.${Date.now()}@test.example`;
  const name = 'Hazel Rowan';

  it('signs up', async () => {
    await page.goto(`${base}/`);
    await expect.poll(() => page.getByRole('heading', { level: 1 }).count()).toBe(1);
    await shot(page, 'accounts', '01-home');
    await page.goto(`${base}/sign-up`);
    await page.getByLabel('Display name').fill(name);
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill('short');
    await page.getByRole('button', { name: 'Create account' }).click();
    // The shared schema refuses it in the browser before anything is sent.
    await expect.poll(() => page.getByText(/at least 10/).count()).toBeGreaterThan(0);
    await page.getByLabel('Password').fill('a-long-garden-password');
    await page.getByRole('button', { name: 'Create account' }).click();
    await expect.poll(() => page.getByText(/check your e-mail/i).count()).toBeGreaterThan(0);
    await shot(page, 'accounts', '02-signed-up');
  });

  it('opens the link from the Outbox', async () => {
    await signIn(page, ADMIN.email, ADMIN.password);
    await page.waitForURL((u) => !u.pathname.startsWith('/sign-in'));
    await page.goto(`${base}/admin/outbox`);
    const message = page.getByRole('button', { name: /Confirm your e-mail address/ }).or(page.getByRole('link', { name: /Confirm your e-mail address/ })).first();
    await message.waitFor();
    await message.click();
    const link = page.locator('a[href*="/verify?token="]').first();
    await link.waitFor();
    const href = await link.getAttribute('href');
    expect(href).toContain('/verify?token=');
    await shot(page, 'accounts', '03-outbox');
    await signOut(page);
    await page.goto(href!.startsWith('http') ? href! : `${base}${href}`);
    await expect.poll(() => page.getByText(/confirmed|verified/i).count(), { timeout: 10_000 }).toBeGreaterThan(0);
    await shot(page, 'accounts', '04-verified');
  });

  it('signs in', async () => {
    await signOut(page);
    await signIn(page, email, 'a-long-garden-password');
    await page.waitForURL((u) => !u.pathname.startsWith('/sign-in'));
    await page.goto(`${base}/account`);
    await expect.poll(() => page.getByText(email).count()).toBeGreaterThan(0);
    await shot(page, 'accounts', '05-account');
  });

  it('an admin makes them an author', async () => {
    await signOut(page);
    await signIn(page, ADMIN.email, ADMIN.password);
    await page.waitForURL((u) => !u.pathname.startsWith('/sign-in'));
    await page.goto(`${base}/admin/users?q=${encodeURIComponent('Hazel')}`);
    const select = page.getByLabel(`Role for ${name}`);
    await select.waitFor();
    await select.selectOption('author');
    // Confirm dialogs, if any, are accepted.
    const confirm = page.getByRole('dialog').getByRole('button', { name: /change|confirm|yes|save/i });
    if (await confirm.count()) await confirm.first().click();
    await expect.poll(async () => {
      const r = await page.evaluate(async (q) => (await fetch(`/api/admin/users?q=${q}`)).json(), 'Hazel');
      return r.items[0]?.role;
    }).toBe('author');
    await shot(page, 'accounts', '06-role-changed');
  });
});
