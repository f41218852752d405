// Password reset in a real browser: ask for a link, open it from the captured mail, choose a new
// password, and sign in with it while the old one is refused.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, screenshot } from './support/browser';
import { openCapturedMail } from './support/captured-mail';

const baseUrl = inject('baseUrl');
const run = Date.now().toString(36);
const person = {
  displayName: 'Ruth Almeida',
  email: `ruth.${run}@quillmere-tools.example`,
  password: 'litz-bundle-2026',
};
const newPassword = 'pitch-and-turns-88';

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
  const response = await fetch(`${baseUrl}/api/v1/auth/sign-up`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify(person),
  });
  expect(response.status).toBe(201);
});

afterAll(async () => {
  await browser?.close();
});

async function signIn(page: Page, password: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByTestId('email').fill(person.email);
  await page.getByTestId('password').fill(password);
  await page.getByTestId('sign-in-submit').click();
}

describe('password reset in the browser', () => {
  it('resets the password through the e-mailed link', async () => {
    const page = await (await browser.newContext()).newPage();
    await page.goto(`${baseUrl}/forgot-password`);
    await page.getByLabel('E-mail').fill(person.email);
    await page.getByRole('button', { name: 'Send reset link' }).click();
    await expect.poll(() => page.getByTestId('reset-sent').textContent()).toContain(person.email);

    const mail = await openCapturedMail(page, baseUrl, person.email);
    await mail.locator('a[href*="/reset-password"]').first().click();

    await page.getByLabel('New password', { exact: true }).fill(newPassword);
    await page.getByLabel('Repeat the new password', { exact: true }).fill(newPassword);
    await page.getByRole('button', { name: 'Save new password' }).click();
    await expect.poll(() => page.getByTestId('reset-done').count()).toBe(1);
    await screenshot(page, 'password-reset-done');

    await signIn(page, person.password);
    await expect.poll(() => page.getByTestId('problem-banner').count()).toBe(1);
    expect(new URL(page.url()).pathname).toBe('/sign-in');

    await signIn(page, newPassword);
    await expect.poll(() => new URL(page.url()).pathname, { timeout: 15_000 }).toBe('/workspaces');
  });
});
