// Debian's Chromium through playwright-core; never a browser download by the test tool.
import { chromium, type Browser, type Page } from 'playwright-core';
import fs from 'node:fs';
import path from 'node:path';

export const shotDir = path.resolve('.couplet/screenshots');

export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    // Without the background-networking flags Chromium keeps dialling out on a closed network.
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

export async function screenshot(page: Page, name: string): Promise<string> {
  fs.mkdirSync(shotDir, { recursive: true });
  const file = path.join(shotDir, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}
