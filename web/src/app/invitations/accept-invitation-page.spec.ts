import { HttpTestingController } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { Router } from '@angular/router';
import type { InvitationPreviewResponse } from '../api-types';
import {
  configurePageTest,
  resetAndVerify,
  settle,
  signInAs,
  testUser,
} from '../testing/page-test-bed';
import { AcceptInvitationPage } from './accept-invitation-page';

const token = 'Zq9-x_1token';
const previewUrl = `/api/v1/invitations/${token}`;
const preview = (status: InvitationPreviewResponse['status']): InvitationPreviewResponse => ({
  workspaceName: 'Kestrel Labs — implant charger',
  email: 'tove@kestrel-labs.example',
  role: 'reviewer',
  invitedByName: 'Marta Okafor',
  expiresAt: '2026-12-09T10:00:00.000Z',
  status,
});
/** The invitee, signed in under the address the invitation was sent to. */
const tove = {
  ...testUser,
  id: 'a0000000-0000-4000-8000-000000000005',
  email: 'tove@kestrel-labs.example',
  displayName: 'Tove Kestrel',
};

describe('AcceptInvitationPage', () => {
  let fixture: ComponentFixture<AcceptInvitationPage>;
  let http: HttpTestingController;

  async function render(signedIn: boolean): Promise<void> {
    http = configurePageTest();
    if (signedIn) signInAs(tove);
    fixture = TestBed.createComponent(AcceptInvitationPage);
    fixture.componentRef.setInput('token', token);
    await settle();
  }

  const text = (testId: string): string =>
    (fixture.nativeElement as HTMLElement)
      .querySelector(`[data-testid=${testId}]`)
      ?.textContent?.replace(/\s+/g, ' ')
      .trim() ?? '';
  const has = (testId: string): boolean =>
    (fixture.nativeElement as HTMLElement).querySelector(`[data-testid=${testId}]`) !== null;

  afterEach(() => resetAndVerify(http));

  it('shows workspace, role and inviter; sign-in and sign-up come back here', async () => {
    await render(false);
    expect(has('status-loading')).toBe(true);
    http.expectOne(previewUrl).flush(preview('pending'));
    await settle();

    expect(text('invitation-workspace')).toBe('Kestrel Labs — implant charger');
    expect(text('invitation-role')).toBe('Reviewer');
    expect(text('invitation-facts')).toContain('Marta Okafor');
    const signIn = (fixture.nativeElement as HTMLElement).querySelector<HTMLAnchorElement>(
      '[data-testid=invitation-sign-in]',
    );
    const signUp = (fixture.nativeElement as HTMLElement).querySelector<HTMLAnchorElement>(
      '[data-testid=invitation-sign-up]',
    );
    expect(signIn?.getAttribute('href')).toBe(`/sign-in?returnUrl=%2Finvitations%2F${token}`);
    expect(signUp?.getAttribute('href')).toContain('email=tove@kestrel-labs.example');
    expect(has('accept-invitation')).toBe(false);
  });

  it('accepts for a signed-in user and opens the workspace', async () => {
    await render(true);
    const navigate = vi.spyOn(TestBed.inject(Router), 'navigate');
    http.expectOne(previewUrl).flush(preview('pending'));
    http.expectOne('/api/v1/workspaces').flush({ items: [] });
    await settle();

    (fixture.nativeElement as HTMLElement)
      .querySelector<HTMLButtonElement>('[data-testid=accept-invitation]')
      ?.click();
    const accept = http.expectOne(`${previewUrl}/accept`);
    expect(accept.request.method).toBe('POST');
    accept.flush({
      workspace: {
        id: '6f1c2d3e-4b5a-4c6d-8e7f-901a2b3c4d5e',
        name: 'Kestrel Labs — implant charger',
        role: 'reviewer',
        createdAt: '2026-11-30T09:00:00.000Z',
      },
    });
    await settle();
    http.expectOne('/api/v1/workspaces').flush({ items: [] });
    expect(navigate).toHaveBeenCalledWith(['/w', '6f1c2d3e-4b5a-4c6d-8e7f-901a2b3c4d5e']);
  });

  it('says plainly when an invitation was revoked, expired or used; no accept', async () => {
    for (const status of ['revoked', 'expired', 'accepted'] as const) {
      TestBed.resetTestingModule();
      await render(false);
      http.expectOne(previewUrl).flush(preview(status));
      await settle();
      expect(has(`invitation-status-${status}`)).toBe(true);
      expect(has('accept-invitation')).toBe(false);
      expect(has('invitation-sign-in')).toBe(false);
      http.verify();
    }
    expect(text('invitation-status-accepted')).toContain('cannot be used again');
  });

  it('tells an unknown link from a server failure', async () => {
    await render(false);
    http
      .expectOne(previewUrl)
      .flush({ code: 'not_found', message: 'no' }, { status: 404, statusText: 'Not Found' });
    await settle();
    expect(text('status-error')).toContain('This invitation link is not valid');
    expect(text('status-error')).not.toContain('Try again');
  });
});
