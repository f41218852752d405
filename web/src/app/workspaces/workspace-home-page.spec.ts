import { HttpTestingController } from '@angular/common/http/testing';
import { RouterTestingHarness } from '@angular/router/testing';
import type { Role, WorkspaceResponse } from '../api-types';
import {
  BlankPage,
  configurePageTest,
  resetAndVerify,
  settle,
  testWorkspace,
} from '../testing/page-test-bed';
import { WorkspaceHomePage } from './workspace-home-page';
import { WorkspaceLayout } from './workspace-layout';

const workspaceId = testWorkspace.id;
const base = `/api/v1/workspaces/${workspaceId}`;
const workspace = (role: Role): WorkspaceResponse => ({ ...testWorkspace, role });

/** The home page inside its workspace layout, which loads the workspace for every page in it. */
describe('WorkspaceHomePage', () => {
  let harness: RouterTestingHarness;
  let http: HttpTestingController;

  beforeEach(async () => {
    http = configurePageTest({
      routes: [
        {
          path: 'w/:workspaceId',
          component: WorkspaceLayout,
          children: [
            { path: '', component: WorkspaceHomePage },
            { path: '**', component: BlankPage },
          ],
        },
        { path: '**', component: BlankPage },
      ],
      routeInputs: true,
    });
    harness = await RouterTestingHarness.create();
    await harness.navigateByUrl(`/w/${workspaceId}`);
    await settle();
  });

  afterEach(() => resetAndVerify(http));

  const page = (): HTMLElement => harness.fixture.nativeElement as HTMLElement;
  const text = (selector: string): string =>
    page().querySelector(selector)?.textContent?.replace(/\s+/g, ' ').trim() ?? '';
  const tabs = (): string[] =>
    [...page().querySelectorAll('[data-testid^=nav-]')].map((a) => a.getAttribute('data-testid')!);

  async function answer(role: Role): Promise<void> {
    http.expectOne(base).flush(workspace(role));
    await settle();
  }

  it('shows the workspace opening, then its name, my role and what the role allows', async () => {
    expect(text('[data-testid=status-loading]')).toBe('Opening the workspace…');
    await answer('editor');

    expect(page().querySelector('[data-testid=status-loading]')).toBeNull();
    expect(text('[data-testid=workspace-name]')).toBe('Halden dock pad');
    expect(text('[data-testid=my-role]')).toBe('You: Editor');
    expect(text('.page-lede')).toBe(
      'Builds coils and studies, runs sweeps, uploads bench data — that is what your role as ' +
        'editor lets you do here.',
    );
    expect(text('[data-testid=home-members]')).toContain(
      'See who else works in this workspace and in which role.',
    );
  });

  it('links to members and to each coming screen, saying which ones are not ready', async () => {
    await answer('viewer');

    expect(page().querySelector('[data-testid=home-members]')?.getAttribute('href')).toBe(
      `/w/${workspaceId}/members`,
    );
    const ready = [...page().querySelectorAll('a.tile.ready:not([data-testid=home-members])')];
    expect(ready.map((a) => a.getAttribute('href'))).toEqual(
      ['coils', 'studies'].map((path) => `/w/${workspaceId}/${path}`),
    );
    for (const tile of ready) expect(tile.textContent).not.toContain('later release');
    const later = [...page().querySelectorAll('a.tile:not(.ready)')];
    expect(later.map((a) => a.getAttribute('href'))).toEqual(
      ['compare', 'review'].map((path) => `/w/${workspaceId}/${path}`),
    );
    for (const tile of later) expect(tile.textContent).toContain('Coming in a later release');
  });

  it('shows the safety cautions and the deference to local codes', async () => {
    await answer('reviewer');
    const notes = text('[data-testid=safety-notes]');
    expect(notes).toContain('Treat the compensation network as live.');
    expect(notes).toContain('exposure reference levels');
    expect(notes).toContain('foreign-object detection');
    expect(notes).toContain('Local codes and licensed practice take precedence');
  });

  it('offers the owner invitations and the settings tab; nobody else gets the tab', async () => {
    await answer('owner');
    expect(text('[data-testid=home-members]')).toContain(
      'Invite engineers, reviewers and viewers, and set their roles.',
    );
    expect(tabs()).toContain('nav-settings');

    await harness.navigateByUrl('/elsewhere');
    await harness.navigateByUrl(`/w/${workspaceId}`);
    await answer('editor');
    expect(tabs()).not.toContain('nav-settings');
    expect(tabs()).toEqual([
      'nav-home',
      'nav-coils',
      'nav-studies',
      'nav-compare',
      'nav-review',
      'nav-members',
    ]);
  });

  it('tells a non-member the workspace is not theirs, with a way back and no retry', async () => {
    http
      .expectOne(base)
      .flush({ code: 'not_found', message: 'no' }, { status: 404, statusText: 'Not Found' });
    await settle();

    expect(text('[data-testid=status-error]')).toContain(
      'This workspace does not exist, or you are not one of its members.',
    );
    expect(page().querySelector('a[href="/workspaces"]')?.textContent?.trim()).toBe(
      'Your workspaces',
    );
    expect(page().querySelector('[data-testid=status-error] button')).toBeNull();
    expect(page().querySelector('[data-testid=workspace-name]')).toBeNull();
  });

  it('shows a failed load with a retry that opens the workspace', async () => {
    http.expectOne(base).flush('', { status: 0, statusText: 'Unknown Error' });
    await settle();
    expect(text('[data-testid=status-error]')).toContain(
      'Couplet cannot reach its server. Check your connection, then try again.',
    );

    // A plain click: a harness click would wait for the reload, which this test answers below.
    page().querySelector<HTMLButtonElement>('[data-testid=status-error] button')?.click();
    await settle();
    expect(text('[data-testid=status-loading]')).toBe('Opening the workspace…');
    await answer('owner');
    expect(text('[data-testid=workspace-name]')).toBe('Halden dock pad');
  });
});
