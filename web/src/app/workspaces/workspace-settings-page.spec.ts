import { HttpTestingController } from '@angular/common/http/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { MatSnackBarHarness } from '@angular/material/snack-bar/testing';
import { RouterTestingHarness } from '@angular/router/testing';
import type { AuditEventResponse, WorkspaceResponse } from '../api-types';
import {
  configurePageTest,
  resetAndVerify,
  settle,
  signInAs,
  testWorkspace,
} from '../testing/page-test-bed';
import { WorkspaceLayout } from './workspace-layout';
import { WorkspaceSettingsPage } from './workspace-settings-page';

const workspace: WorkspaceResponse = testWorkspace;
const workspaceId = workspace.id;
const base = `/api/v1/workspaces/${workspaceId}`;
const events: AuditEventResponse[] = [
  {
    id: 'c0000000-0000-4000-8000-000000000002',
    action: 'invitation.sent',
    actor: { userId: 'a0000000-0000-4000-8000-000000000001', displayName: 'Inês Ferreira' },
    subject: 'test-lab@kestrel-labs.example',
    createdAt: '2026-12-01T10:00:00.000Z',
    details: {},
  },
  {
    id: 'c0000000-0000-4000-8000-000000000001',
    action: 'workspace.created',
    actor: null,
    subject: 'Halden dock pad',
    createdAt: '2026-11-30T09:00:00.000Z',
    details: {},
  },
];

describe('WorkspaceSettingsPage', () => {
  let harness: RouterTestingHarness;
  let loader: HarnessLoader;
  let http: HttpTestingController;

  /** Opens the page inside its workspace layout, as the router does; the activity stays open. */
  beforeEach(async () => {
    http = configurePageTest({
      routes: [
        {
          path: 'w/:workspaceId',
          component: WorkspaceLayout,
          children: [{ path: 'settings', component: WorkspaceSettingsPage }],
        },
      ],
      routeInputs: true,
    });
    signInAs();
    harness = await RouterTestingHarness.create();
    await harness.navigateByUrl(`/w/${workspaceId}/settings`);
    loader = TestbedHarnessEnvironment.loader(harness.fixture);
    await settle();
    http.expectOne(base).flush(workspace);
    await settle();
    // The switcher's list, which a rename refreshes.
    http.expectOne('/api/v1/workspaces').flush({ items: [workspace] });
  });

  afterEach(() => resetAndVerify(http));

  const page = (): HTMLElement => harness.routeNativeElement ?? document.body;
  const text = (testId: string): string =>
    harness.fixture.nativeElement
      .querySelector(`[data-testid=${testId}]`)
      ?.textContent?.replace(/\s+/g, ' ')
      .trim() ?? '';
  const nameField = () =>
    loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: 'Workspace name' }));
  const nameInput = async (): Promise<MatInputHarness> =>
    (await (await nameField()).getControl(MatInputHarness)) as MatInputHarness;
  const renameButton = () => loader.getHarness(MatButtonHarness.with({ text: 'Rename' }));

  async function answerAudit(items: AuditEventResponse[]): Promise<void> {
    http.expectOne(`${base}/audit`).flush({ items });
    await settle();
  }

  it('shows the activity loading, then who did what, newest first', async () => {
    expect(text('status-loading')).toBe('Loading activity…');
    await answerAudit(events);

    // Name, action and subject are set apart by the action's margin, not by spaces.
    const rows = [...page().querySelectorAll('[data-testid=audit-events] li > span')].map(
      (span) => [
        span.querySelector('strong')?.textContent,
        span.querySelector('code')?.textContent,
        span.lastChild?.textContent?.trim(),
      ],
    );
    expect(rows).toEqual([
      ['Inês Ferreira', 'invitation.sent', 'test-lab@kestrel-labs.example'],
      // An event with no actor was Couplet's own doing.
      ['Couplet', 'workspace.created', 'Halden dock pad'],
    ]);
    expect(page().querySelector('time')?.getAttribute('datetime')).toBe(events[0].createdAt);
  });

  it('says when nothing has happened yet', async () => {
    await answerAudit([]);
    expect(text('status-empty')).toBe('Nothing has happened here yet.');
    expect(page().querySelector('[data-testid=audit-events]')).toBeNull();
  });

  it('shows a failed activity load with a retry that loads it', async () => {
    http.expectOne(`${base}/audit`).flush(
      { code: 'internal', message: 'The audit log is unavailable.' },
      {
        status: 503,
        statusText: 'Unavailable',
      },
    );
    await settle();
    expect(text('status-error')).toContain('The audit log is unavailable.');

    // A plain click: a harness click would wait for the reload, which this test answers below.
    page().querySelector<HTMLButtonElement>('[data-testid=status-error] button')?.click();
    await settle();
    await answerAudit(events);
    expect(page().querySelector('[data-testid=status-error]')).toBeNull();
    expect(page().querySelectorAll('[data-testid=audit-events] li')).toHaveLength(2);
  });

  it('starts from the current name, with Rename off until the name is changed', async () => {
    await answerAudit(events);
    expect(await (await nameInput()).getValue()).toBe('Halden dock pad');
    expect(await (await renameButton()).isDisabled()).toBe(true);
    await (await nameInput()).setValue('Halden dock pad v2');
    expect(await (await renameButton()).isDisabled()).toBe(false);
  });

  it('says how long a name may be, and sends nothing for an empty or blank one', async () => {
    await answerAudit(events);
    await (await nameInput()).setValue('');
    await (await renameButton()).click();
    expect(await (await nameField()).getTextErrors()).toEqual(['Name: 1 to 80 characters.']);

    await (await nameInput()).setValue('    ');
    await (await renameButton()).click();
    expect(await (await nameField()).getTextErrors()).toEqual(['Name: 1 to 80 characters.']);
    http.expectNone({ method: 'PATCH', url: base });
  });

  it('renames: the header, the field and the switcher show the new name', async () => {
    await answerAudit(events);
    expect(text('workspace-name')).toBe('Halden dock pad');
    await (await nameInput()).setValue('  Halden dock pad, rev B  ');
    await (await renameButton()).click();

    const patch = http.expectOne({ method: 'PATCH', url: base });
    expect(patch.request.body).toEqual({ name: 'Halden dock pad, rev B' });
    const renamed = { ...workspace, name: 'Halden dock pad, rev B' };
    patch.flush(renamed);
    await settle();
    http.expectOne({ method: 'GET', url: base }).flush(renamed);
    http.expectOne('/api/v1/workspaces').flush({ items: [renamed] });
    await answerAudit(events);

    expect(text('workspace-name')).toBe('Halden dock pad, rev B');
    expect(await (await nameInput()).getValue()).toBe('Halden dock pad, rev B');
    expect(await (await renameButton()).isDisabled()).toBe(true);
    const snackBar = await TestbedHarnessEnvironment.documentRootLoader(harness.fixture).getHarness(
      MatSnackBarHarness,
    );
    expect(await snackBar.getMessage()).toBe('Renamed to Halden dock pad, rev B.');
  });

  it("puts the server's objection at the field, any other problem in the banner", async () => {
    await answerAudit(events);
    await (await nameInput()).setValue('Halden dock pad, rev B');
    await (await renameButton()).click();
    http.expectOne({ method: 'PATCH', url: base }).flush(
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

    await (await nameInput()).setValue('Halden dock pad, rev C');
    await (await renameButton()).click();
    http.expectOne({ method: 'PATCH', url: base }).flush(
      { code: 'forbidden', message: 'Only an owner may rename.' },
      {
        status: 403,
        statusText: 'Forbidden',
      },
    );
    await settle();
    expect(text('problem-banner')).toBe('Only an owner may rename.');
    expect(await (await nameField()).getTextErrors()).toEqual([]);
  });
});
