import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { Component } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import { MatRowHarness, MatTableHarness } from '@angular/material/table/testing';
import { provideRouter } from '@angular/router';
import type { InvitationResponse, MemberResponse, Role } from '../api-types';
import { AuthSession } from '../auth/auth-session';
import { MembersPage } from './members-page';
import { WorkspaceContext } from './workspace-context';

@Component({ selector: 'app-blank-members-page', template: '' })
class Blank {}

const workspaceId = '6f1c2d3e-4b5a-4c6d-8e7f-901a2b3c4d5e';
const base = `/api/v1/workspaces/${workspaceId}`;
const me = { id: 'a0000000-0000-4000-8000-000000000001', name: 'Inês Ferreira' };

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

  /** Lets resources issue their requests and take their answers. */
  async function settle(): Promise<void> {
    for (let i = 0; i < 3; i++) {
      TestBed.tick();
      await new Promise((resolve) => setTimeout(resolve));
    }
  }

  async function render(myRole: Role): Promise<void> {
    TestBed.configureTestingModule({
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        provideRouter([{ path: '**', component: Blank }]),
        WorkspaceContext,
      ],
    });
    http = TestBed.inject(HttpTestingController);
    TestBed.inject(AuthSession)
      .signIn({ email: 'ines@halden-robotics.example', password: 'x' })
      .subscribe();
    http.expectOne('/api/v1/auth/sign-in').flush({
      user: {
        id: me.id,
        email: 'ines@halden-robotics.example',
        displayName: me.name,
        createdAt: '2026-11-30T09:00:00.000Z',
      },
      accessToken: 't',
      expiresAt: new Date(Date.now() + 900_000).toISOString(),
    });
    TestBed.inject(WorkspaceContext).bind(() => workspaceId);

    fixture = TestBed.createComponent(MembersPage);
    loader = TestbedHarnessEnvironment.loader(fixture);
    await settle();
    http.expectOne(base).flush({
      id: workspaceId,
      name: 'Halden dock pad',
      role: myRole,
      createdAt: '2026-11-30T09:00:00.000Z',
    });
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

  afterEach(() => http.verify());

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
    TestBed.configureTestingModule({
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        provideRouter([{ path: '**', component: Blank }]),
        WorkspaceContext,
      ],
    });
    http = TestBed.inject(HttpTestingController);
    TestBed.inject(WorkspaceContext).bind(() => workspaceId);
    fixture = TestBed.createComponent(MembersPage);
    loader = TestbedHarnessEnvironment.loader(fixture);
    await settle();
    http.expectOne(base).flush({
      id: workspaceId,
      name: 'Halden dock pad',
      role: 'editor',
      createdAt: '2026-11-30T09:00:00.000Z',
    });
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
