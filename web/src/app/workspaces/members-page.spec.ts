import { HttpTestingController } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import { MatRowHarness, MatTableHarness } from '@angular/material/table/testing';
import type { InvitationResponse, MemberResponse, Role } from '../api-types';
import {
  configurePageTest,
  resetAndVerify,
  settle,
  signInAs,
  testUser,
  testWorkspace,
} from '../testing/page-test-bed';
import { MembersPage } from './members-page';
import { WorkspaceContext } from './workspace-context';

const workspaceId = testWorkspace.id;
const base = `/api/v1/workspaces/${workspaceId}`;
const me = { id: testUser.id, name: testUser.displayName };

const member = (userId: string, displayName: string, role: Role): MemberResponse => ({
  userId,
  displayName,
  role,
  email: `${displayName.split(' ')[0].toLowerCase()}@halden-robotics.example`,
  joinedAt: '2026-11-30T09:00:00.000Z',
});
const members = (myRole: Role): MemberResponse[] => [
  member(me.id, me.name, myRole),
  member(
    'a0000000-0000-4000-8000-000000000002',
    'Marta Okafor',
    myRole === 'owner' ? 'editor' : 'owner',
  ),
  member('a0000000-0000-4000-8000-000000000003', 'Jonas Lindqvist', 'reviewer'),
];
const invitation: InvitationResponse = {
  id: 'b0000000-0000-4000-8000-000000000009',
  email: 'test-lab@kestrel-labs.example',
  role: 'viewer',
  invitedBy: { userId: me.id, displayName: me.name },
  createdAt: '2026-12-01T09:00:00.000Z',
  expiresAt: new Date(Date.now() + 7 * 86_400_000).toISOString(),
  acceptedAt: null,
  revokedAt: null,
};

describe('MembersPage', () => {
  let fixture: ComponentFixture<MembersPage>;
  let loader: HarnessLoader;
  let http: HttpTestingController;

  /** Opens the page on the workspace and answers its load: I hold `myRole` there. */
  async function open(myRole: Role): Promise<void> {
    TestBed.inject(WorkspaceContext).bind(() => workspaceId);
    fixture = TestBed.createComponent(MembersPage);
    loader = TestbedHarnessEnvironment.loader(fixture);
    await settle();
    http.expectOne(base).flush({ ...testWorkspace, role: myRole });
  }

  async function render(myRole: Role): Promise<void> {
    http = configurePageTest({ providers: [WorkspaceContext] });
    signInAs();
    await open(myRole);
    http.expectOne(`${base}/members`).flush({ items: members(myRole) });
    // The toolbar's workspace list loads once someone is signed in.
    http.expectOne('/api/v1/workspaces').flush({ items: [] });
    await settle();
    if (myRole === 'owner') {
      http.expectOne(`${base}/invitations`).flush({ items: [invitation] });
      // The captured-mail hint asks whether this is a development server: here it is not.
      http
        .expectOne('/api/v1/dev/mail')
        .flush({ code: 'not_found', message: 'no' }, { status: 404, statusText: 'Not Found' });
      await settle();
    }
  }

  const page = (): HTMLElement => fixture.nativeElement as HTMLElement;
  const rowTexts = async (): Promise<string[]> => {
    const table = await loader.getHarness(MatTableHarness);
    const rows: MatRowHarness[] = await table.getRows();
    return Promise.all(rows.map(async (row) => (await row.getCellTextByIndex())[0]));
  };

  afterEach(() => resetAndVerify(http));

  it('gives the owner the invite form, role selects, remove and revoke', async () => {
    await render('owner');

    expect(await rowTexts()).toEqual(['Inês Ferreirayou', 'Marta Okafor', 'Jonas Lindqvist']);
    const selects = await loader.getAllHarnesses(
      MatSelectHarness.with({ selector: '[data-testid=member-role-select]' }),
    );
    expect(await Promise.all(selects.map((s) => s.getValueText()))).toEqual([
      'Owner',
      'Editor',
      'Reviewer',
    ]);
    expect(page().querySelectorAll('[data-testid=remove-member]')).toHaveLength(3);
    expect(page().querySelector('[data-testid=invite-form]')).not.toBeNull();
    expect(page().querySelector('[data-testid=pending-invitation]')?.textContent).toContain(
      'test-lab@kestrel-labs.example',
    );
    expect(page().querySelectorAll('[data-testid=revoke-invitation]')).toHaveLength(1);
  });

  it('sends a role change chosen in the select', async () => {
    await render('owner');
    const selects = await loader.getAllHarnesses(
      MatSelectHarness.with({ selector: '[data-testid=member-role-select]' }),
    );
    await selects[2].open();
    await selects[2].clickOptions({ text: 'Viewer' });

    const patch = http.expectOne(`${base}/members/a0000000-0000-4000-8000-000000000003`);
    expect(patch.request.method).toBe('PATCH');
    expect(patch.request.body).toEqual({ role: 'viewer' });
    patch.flush(member('a0000000-0000-4000-8000-000000000003', 'Jonas Lindqvist', 'viewer'));
    await settle();
    http.expectOne(`${base}/members`).flush({ items: members('owner') });
    await settle();
  });

  it('shows a viewer the members and roles with no editing control at all', async () => {
    await render('viewer');

    expect(await rowTexts()).toEqual(['Marta Okafor', 'Jonas Lindqvist', 'Inês Ferreirayou']);
    const roleBadges = [...page().querySelectorAll('[data-testid=member-role]')].map((e) =>
      e.textContent?.trim(),
    );
    expect(roleBadges).toEqual(['Owner', 'Reviewer', 'Viewer']);
    expect(await loader.getAllHarnesses(MatSelectHarness)).toHaveLength(0);
    for (const testId of [
      'invite-form',
      'member-role-select',
      'remove-member',
      'revoke-invitation',
    ]) {
      expect(page().querySelector(`[data-testid=${testId}]`)).toBeNull();
    }
    expect(await loader.getAllHarnesses(MatButtonHarness)).toHaveLength(0);
    expect(page().textContent).toContain('Only an owner can invite people or change roles.');
    // A viewer never asks for the invitation list.
    http.expectNone(`${base}/invitations`);
  });

  it('offers a retry when the members cannot be loaded', async () => {
    http = configurePageTest({ providers: [WorkspaceContext] });
    await open('editor');
    http
      .expectOne(`${base}/members`)
      .flush(
        { code: 'internal', message: 'The server failed.' },
        { status: 500, statusText: 'Error' },
      );
    await settle();

    expect(page().querySelector('[data-testid=status-error]')?.textContent).toContain(
      'The server failed.',
    );
    const retry = page().querySelector<HTMLButtonElement>('[data-testid=status-error] button');
    expect(retry?.textContent?.trim()).toBe('Try again');
    // A plain click: a harness click would wait for the reload, which this test answers below.
    retry?.click();
    await settle();
    http.expectOne(`${base}/members`).flush({ items: members('editor') });
    await settle();
    expect(page().querySelectorAll('[data-testid=member-row]')).toHaveLength(3);
  });
});
