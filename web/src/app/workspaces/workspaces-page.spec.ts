import { HttpTestingController } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { Router } from '@angular/router';
import type { WorkspaceResponse } from '../api-types';
import {
  configurePageTest,
  resetAndVerify,
  settle,
  signInAs,
  testWorkspace,
} from '../testing/page-test-bed';
import { WorkspacesPage } from './workspaces-page';

const list = '/api/v1/workspaces';
const dockPad = testWorkspace;
const scooter: WorkspaceResponse = {
  id: '7a2b3c4d-5e6f-4a7b-8c9d-0e1f2a3b4c5d',
  name: 'Kestrel scooter charger',
  role: 'reviewer',
  createdAt: '2026-10-02T09:00:00.000Z',
};
const serverError = { status: 500, statusText: 'Error' };

describe('WorkspacesPage', () => {
  let fixture: ComponentFixture<WorkspacesPage>;
  let loader: HarnessLoader;
  let http: HttpTestingController;

  beforeEach(async () => {
    http = configurePageTest();
    // The list is asked for only once someone is signed in.
    signInAs();
    fixture = TestBed.createComponent(WorkspacesPage);
    loader = TestbedHarnessEnvironment.loader(fixture);
    await settle();
  });

  afterEach(() => resetAndVerify(http));

  const page = (): HTMLElement => fixture.nativeElement as HTMLElement;
  const text = (testId: string): string =>
    page().querySelector(`[data-testid=${testId}]`)?.textContent?.replace(/\s+/g, ' ').trim() ?? '';
  const nameField = () =>
    loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: 'Workspace name' }));
  const nameInput = () =>
    loader.getHarness(MatInputHarness.with({ selector: '[data-testid=workspace-name-input]' }));
  const createButton = () => loader.getHarness(MatButtonHarness.with({ text: /Create workspace/ }));

  async function answerList(items: WorkspaceResponse[]): Promise<void> {
    http.expectOne(list).flush({ items });
    await settle();
  }

  it('shows loading, then each workspace with the role and a link into it', async () => {
    expect(text('status-loading')).toBe('Loading your workspaces…');
    await answerList([dockPad, scooter]);

    expect(page().querySelector('[data-testid=status-loading]')).toBeNull();
    const links = [...page().querySelectorAll<HTMLAnchorElement>('[data-testid=workspace-link]')];
    expect(links.map((a) => a.getAttribute('href'))).toEqual([
      `/w/${dockPad.id}`,
      `/w/${scooter.id}`,
    ]);
    expect(links[0].textContent).toContain('Halden dock pad');
    expect(links[0].textContent).toContain('Owner · since');
    expect(links[1].textContent).toContain('Reviewer · since');
  });

  it('says so when the user is in no workspace yet', async () => {
    await answerList([]);
    expect(text('status-empty')).toBe(
      "You are in no workspace yet. Create one, or open a colleague's invitation.",
    );
    expect(page().querySelector('[data-testid=workspace-list]')).toBeNull();
  });

  it('shows a failed load with a retry that loads the list', async () => {
    http
      .expectOne(list)
      .flush({ code: 'internal', message: 'The database is restarting.' }, serverError);
    await settle();
    expect(text('status-error')).toContain('The database is restarting.');

    // A plain click: a harness click would wait for the reload, which this test answers below.
    page().querySelector<HTMLButtonElement>('[data-testid=status-error] button')?.click();
    await settle();
    expect(text('status-loading')).toBe('Loading your workspaces…');
    await answerList([scooter]);
    expect(page().querySelector('[data-testid=status-error]')).toBeNull();
    expect(page().querySelectorAll('[data-testid=workspace-link]')).toHaveLength(1);
  });

  it('says how long a name may be, and sends nothing for an empty or blank one', async () => {
    await answerList([dockPad]);

    await (await createButton()).click();
    expect(await (await nameField()).getTextErrors()).toEqual(['Name: 1 to 80 characters.']);

    await (await nameInput()).setValue('   ');
    await (await createButton()).click();
    expect(await (await nameField()).getTextErrors()).toEqual(['Name: 1 to 80 characters.']);

    await (await nameInput()).setValue('Halden');
    expect(await (await nameField()).getTextHints()).toEqual(['6 / 80']);
    await (await nameInput()).setValue('x'.repeat(81));
    expect(await (await nameField()).getTextErrors()).toEqual(['Name: 1 to 80 characters.']);
    await (await createButton()).click();
    http.expectNone(list);
  });

  it('creates the workspace under the trimmed name and opens it', async () => {
    await answerList([dockPad]);
    await (await nameInput()).setValue('  Kestrel scooter charger  ');
    await (await createButton()).click();

    const post = http.expectOne({ method: 'POST', url: list });
    expect(post.request.body).toEqual({ name: 'Kestrel scooter charger' });
    post.flush(scooter, { status: 201, statusText: 'Created' });
    await settle();

    expect(TestBed.inject(Router).url).toBe(`/w/${scooter.id}`);
    // The switcher's list learns of the new workspace.
    await answerList([dockPad, scooter]);
  });

  it("puts the server's objection to the name at the field", async () => {
    await answerList([]);
    await (await nameInput()).setValue('Halden dock pad');
    await (await createButton()).click();

    http.expectOne({ method: 'POST', url: list }).flush(
      {
        code: 'validation_failed',
        message: 'name: must be at most 80 characters',
        field: 'name',
      },
      { status: 400, statusText: 'Bad Request' },
    );
    await settle();
    expect(await (await nameField()).getTextErrors()).toEqual([
      'name: must be at most 80 characters',
    ]);
    expect(text('problem-banner')).toBe('');
    expect(await (await createButton()).isDisabled()).toBe(false);
  });

  it('shows a problem with no field in the banner', async () => {
    await answerList([]);
    await (await nameInput()).setValue('Halden dock pad');
    await (await createButton()).click();

    http.expectOne({ method: 'POST', url: list }).flush(
      { code: 'rate_limited', message: 'Too many workspaces today.' },
      {
        status: 429,
        statusText: 'Too Many Requests',
      },
    );
    await settle();
    expect(text('problem-banner')).toBe('Too many workspaces today.');
    expect(await (await nameField()).getTextErrors()).toEqual([]);
  });

  it('puts the cursor in the name field when asked for a new workspace', async () => {
    fixture.componentRef.setInput('new', '');
    await answerList([]);
    expect(document.activeElement).toBe(page().querySelector('[data-testid=workspace-name-input]'));
  });
});
