import type { Locator, Page } from 'playwright-core';

/**
 * Opens the development mail page and reloads it until a message to `address` is listed: the
 * outbox sends in the background, so the mail may arrive a moment after the action that caused it.
 */
export async function openCapturedMail(
  page: Page,
  baseUrl: string,
  address: string,
): Promise<Locator> {
  const deadline = Date.now() + 20_000; // the outbox sender polls every second or so
  for (;;) {
    await page.goto(`${baseUrl}/dev/mail`);
    await page
      .getByTestId('captured-mail')
      .first()
      .waitFor({ timeout: 2_000 })
      .catch(() => {});
    const mail = page.getByTestId('captured-mail').filter({ hasText: address }).first();
    if ((await mail.count()) === 1) return mail;
    if (Date.now() > deadline) throw new Error(`no captured mail to ${address} within 20 s`);
    await page.waitForTimeout(500);
  }
}
