// The platform's main path in a real browser: sign up, create a workspace, invite a colleague as a
// viewer, open the invitation from the captured mail, accept it, and check that the viewer sees
// the members but none of the editing controls the owner sees.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, screenshot } from './support/browser';
import { openCapturedMail } from './support/captured-mail';

const baseUrl = inject('baseUrl');
const run = Date.now().toString(36);
const owner = {
  name: 'Ilse Marchetti',
  email: `ilse.${run}@fernhollow-devices.example`,
  password: 'copper-winding-42',
};
const colleague = {
  name: 'Tomas Okonkwo',
  email: `tomas.${run}@fernhollow-devices.example`,
  password: 'ferrite-plate-77',
};
const workspaceName = `Fernhollow wrist charger ${run}`;
const editingControls = ['invite-form', 'member-role-select', 'remove-member', 'revoke-invitation'];

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

async function signUp(page: Page, who: typeof owner): Promise<void> {
  await page.getByTestId('display-name').fill(who.name);
  await page.getByTestId('email').fill(who.email);
  await page.getByTestId('password').fill(who.password);
  await page.getByTestId('sign-up-submit').click();
}

async function countControls(page: Page): Promise<Record<string, number>> {
  const counts: Record<string, number> = {};
  for (const id of editingControls) counts[id] = await page.getByTestId(id).count();
  return counts;
}

describe('team invitation in the browser', () => {
  it('lets an owner invite a viewer who then sees no editing controls', async () => {
    const ownerPage = await (await browser.newContext()).newPage();
    await ownerPage.goto(`${baseUrl}/sign-up`);
    await signUp(ownerPage, owner);

    await ownerPage.getByTestId('workspace-name-input').fill(workspaceName);
    await ownerPage.getByTestId('create-workspace').click();
    await expect
      .poll(() => ownerPage.getByTestId('workspace-name').textContent())
      .toContain(workspaceName);

    await ownerPage.getByTestId('nav-members').click();
    await ownerPage.getByTestId('invite-email').fill(colleague.email);
    await ownerPage.getByTestId('invite-role').click();
    await ownerPage.getByRole('option', { name: 'Viewer', exact: true }).click();
    await ownerPage.getByTestId('invite-submit').click();
    await expect
      .poll(() => ownerPage.getByTestId('pending-invitations').textContent())
      .toContain(colleague.email);
    const ownerControls = await countControls(ownerPage);
    expect(ownerControls['invite-form']).toBe(1);
    expect(ownerControls['revoke-invitation']).toBeGreaterThan(0);
    await screenshot(ownerPage, 'members-owner');

    // The colleague, in a browser of their own, reads the mail the fake SMTP server captured.
    const colleaguePage = await (await browser.newContext()).newPage();
    const mail = await openCapturedMail(colleaguePage, baseUrl, colleague.email);
    await screenshot(colleaguePage, 'dev-mail');
    await mail.locator('a[href*="/invitations/"]').first().click();

    await expect
      .poll(() => colleaguePage.getByTestId('invitation-workspace').textContent())
      .toContain(workspaceName);
    await expect
      .poll(() => colleaguePage.getByTestId('invitation-role').textContent())
      .toBe('Viewer');
    await colleaguePage.getByTestId('invitation-sign-up').click();
    await signUp(colleaguePage, colleague);
    await colleaguePage.getByTestId('accept-invitation').click();
    await expect
      .poll(() => colleaguePage.getByTestId('workspace-name').textContent(), { timeout: 15_000 })
      .toContain(workspaceName);
    await expect.poll(() => colleaguePage.getByTestId('my-role').textContent()).toContain('Viewer');

    await colleaguePage.getByTestId('nav-members').click();
    await expect
      .poll(() => colleaguePage.getByTestId('members-table').textContent())
      .toContain(owner.email);
    expect(await colleaguePage.getByTestId('members-table').textContent()).toContain(
      colleague.email,
    );
    expect(await countControls(colleaguePage)).toEqual({
      'invite-form': 0,
      'member-role-select': 0,
      'remove-member': 0,
      'revoke-invitation': 0,
    });
    await screenshot(colleaguePage, 'members-viewer');
  });
});
