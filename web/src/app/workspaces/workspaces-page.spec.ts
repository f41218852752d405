import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { Component } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { Router, provideRouter } from '@angular/router';
import type { WorkspaceResponse } from '../api-types';
import { AuthSession } from '../auth/auth-session';
import { WorkspacesPage } from './workspaces-page';

@Component({ selector: 'app-blank-workspaces-page', template: '' })
class Blank {}

const list = '/api/v1/workspaces';
const dockPad: WorkspaceResponse = {
  id: '6f1c2d3e-4b5a-4c6d-8e7f-901a2b3c4d5e',
  name: 'Halden dock pad',
  role: 'owner',
  createdAt: '2026-11-30T09:00:00.000Z',
};
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

  /** Lets resources issue their requests and take their answers. */
  async function settle(): Promise<void> {
    for (let i = 0; i < 3; i++) {
      TestBed.tick();
      await new Promise((resolve) => setTimeout(resolve));
    }
  }

  beforeEach(async () => {
    TestBed.configureTestingModule({
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        provideRouter([{ path: '**', component: Blank }]),
      ],
    });
    http = TestBed.inject(HttpTestingController);
    // The list is asked for only once someone is signed in.
    TestBed.inject(AuthSession)
      .signIn({ email: 'ines@halden-robotics.example', password: 'x' })
      .subscribe();
    http.expectOne('/api/v1/auth/sign-in').flush({
      user: {
        id: 'a0000000-0000-4000-8000-000000000001',
        email: 'ines@halden-robotics.example',
        displayName: 'Inês Ferreira',
        createdAt: '2026-11-30T09:00:00.000Z',
      },
      accessToken: 't',
      expiresAt: new Date(Date.now() + 900_000).toISOString(),
    });
    fixture = TestBed.createComponent(WorkspacesPage);
    loader = TestbedHarnessEnvironment.loader(fixture);
    await settle();
  });

  afterEach(() => {
    // Reset first: a failed verify would leave the module set up and fail every later test.
    TestBed.resetTestingModule();
    http.verify();
  });

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
