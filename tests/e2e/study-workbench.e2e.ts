// The workbench's main path in a real browser: an editor builds two coils in the library, makes a
// study of them, moves the Rx in the workbench and sees k change, runs an x–y sweep and watches
// its progress, then reloads the page and finds the stored coupling map drawn without a new run.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, screenshot } from './support/browser';

const baseUrl = inject('baseUrl');
const run = Date.now().toString(36);
const editor = {
  name: 'Runa Falkvik',
  email: `runa.${run}@brackwater-tools.example`,
  password: 'litz-bundle-2026',
};
const workspaceName = `Brackwater drill dock ${run}`;

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

/** Types into the text input of a quantity field (data-testid `field-<control>`). */
async function fillQuantity(page: Page, control: string, text: string): Promise<void> {
  const input = page.getByTestId(`field-${control}`).locator('input');
  await input.fill(text);
  await input.blur();
}

async function createCoil(
  page: Page,
  workspacePath: string,
  coil: { name: string; kind?: string; sizes: Record<string, string> },
): Promise<void> {
  await page.goto(`${baseUrl}${workspacePath}/coils`);
  await page.getByTestId('new-coil').click();
  await page.getByTestId('coil-name').fill(coil.name);
  if (coil.kind) {
    await page.getByTestId('coil-kind').click();
    await page.getByRole('option', { name: coil.kind, exact: true }).click();
  }
  for (const [control, text] of Object.entries(coil.sizes)) await fillQuantity(page, control, text);
  // The live figures come from the web worker before anything is saved.
  await expect.poll(() => page.getByTestId('coil-figures').textContent()).toMatch(/µH/);
  await page.getByTestId('coil-save').click();
  try {
    await expect.poll(() => page.getByTestId('coil-meta').textContent()).toContain('Version 1');
  } catch (error) {
    await screenshot(page, 'coil-save-failed');
    throw error;
  }
}

/** Opens a mat-select and picks an option, waiting for its panel to close again. */
async function pickOption(page: Page, testId: string, option: string): Promise<void> {
  await page.getByTestId(testId).click({ force: true }); // its floating label overlays it
  await page.getByRole('listbox').getByRole('option', { name: option }).click();
  await page.getByRole('listbox').waitFor({ state: 'detached' });
}

/** The coupling coefficient shown in the live panel, as a number. */
async function liveK(page: Page): Promise<number> {
  return Number((await page.getByTestId('live-k').textContent())?.trim());
}

describe('study workbench in the browser', () => {
  it('builds two coils and a study, moves the Rx, runs a sweep and finds the stored map', async () => {
    const page = await (
      await browser.newContext({ viewport: { width: 1440, height: 900 } })
    ).newPage();
    await page.goto(`${baseUrl}/sign-up`);
    await page.getByTestId('display-name').fill(editor.name);
    await page.getByTestId('email').fill(editor.email);
    await page.getByTestId('password').fill(editor.password);
    await page.getByTestId('sign-up-submit').click();
    await page.getByTestId('workspace-name-input').fill(workspaceName);
    await page.getByTestId('create-workspace').click();
    await expect
      .poll(() => page.getByTestId('workspace-name').textContent())
      .toContain(workspaceName);
    const workspacePath = new URL(page.url()).pathname.match(/^\/w\/[^/]+/)![0];

    // Two coils of our own invented dock: a rectangular Tx pad and a round Rx spiral.
    await createCoil(page, workspacePath, {
      name: 'Dock pad Tx',
      kind: 'Rectangular spiral',
      sizes: {},
    });
    await screenshot(page, 'coil-editor');
    await createCoil(page, workspacePath, {
      name: 'Handle Rx',
      sizes: { turns: '6', innerDiameter: '10 mm', outerDiameter: '30 mm' },
    });
    await page.goto(`${baseUrl}${workspacePath}/coils`);
    await expect.poll(() => page.getByTestId('coil-row').count()).toBe(2);

    // A study of the pair.
    await page.goto(`${baseUrl}${workspacePath}/studies`);
    await page.getByTestId('new-study').click();
    await page.getByTestId('study-form-name').fill('Dock pad vs handle');
    await pickOption(page, 'study-form-tx', 'Dock pad Tx');
    await pickOption(page, 'study-form-rx', 'Handle Rx');
    await fillQuantity(page, 'frequencyHz', '128 kHz');
    await fillQuantity(page, 'txCurrentA', '1.5 A');
    await fillQuantity(page, 'thresholdValue', '0.2');
    await fillQuantity(page, 'z', '5 mm');
    await page.getByTestId('study-form-save').click();
    await expect
      .poll(() => page.getByTestId('study-name').textContent(), { timeout: 15_000 })
      .toContain('Dock pad vs handle')
      .catch(async (error: unknown) => {
        await screenshot(page, 'study-form-failed');
        throw error;
      });

    // Moving the Rx sideways lowers k; the figures come from the worker, not the server.
    await expect.poll(() => liveK(page), { timeout: 15_000 }).toBeGreaterThan(0);
    const centred = await liveK(page);
    const x = page.getByTestId('pose-x');
    await x.fill('12');
    await x.press('Enter');
    await expect.poll(() => liveK(page)).not.toBe(centred);
    const offset = await liveK(page);
    expect(offset).toBeLessThan(centred);
    await expect.poll(() => page.getByTestId('pair-view').locator('canvas').count()).toBe(1);
    await screenshot(page, 'workbench');

    // An x–y map: the estimate first, then the run with its progress, then the map.
    await expect
      .poll(() => page.getByTestId('sweep-estimate').textContent(), { timeout: 20_000 })
      .toMatch(/poses/);
    const statuses = new Set<string>();
    await page.getByTestId('sweep-run').click();
    const status = page.getByTestId('sweep-status');
    await expect
      .poll(
        async () => {
          const now = (await status.count())
            ? ((await status.getAttribute('data-status')) ?? '')
            : '';
          statuses.add(now);
          if (await page.getByTestId('sweep-progress').count()) statuses.add('progress shown');
          return now;
        },
        { timeout: 60_000, interval: 50 },
      )
      .toBe('succeeded');
    expect([...statuses].some((s) => s === 'queued' || s === 'running')).toBe(true);
    const map = page.getByTestId('coupling-map');
    await expect
      .poll(() => map.locator('.main-svg').count(), { timeout: 20_000 })
      .toBeGreaterThan(0);
    const area = await page.getByTestId('envelope-area').textContent();
    expect(area).toMatch(/mm²/);
    await screenshot(page, 'coupling-map');

    // Reopening the study shows the stored map at once, from PostgreSQL, without a new run.
    let sweepsStarted = 0;
    page.on('request', (request) => {
      if (request.method() === 'POST' && /\/sweeps$/.test(new URL(request.url()).pathname)) {
        sweepsStarted += 1;
      }
    });
    await page.reload();
    await expect
      .poll(() => map.locator('.main-svg').count(), { timeout: 20_000 })
      .toBeGreaterThan(0);
    expect(await page.getByTestId('envelope-area').textContent()).toBe(area);
    expect(sweepsStarted).toBe(0);
  });
});
