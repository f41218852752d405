import { HttpTestingController } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { Router } from '@angular/router';
import { configurePageTest, resetAndVerify, settle } from '../testing/page-test-bed';
import { DevMailPage } from './dev-mail-page';

describe('DevMailPage', () => {
  let fixture: ComponentFixture<DevMailPage>;
  let http: HttpTestingController;

  beforeEach(async () => {
    http = configurePageTest();
    fixture = TestBed.createComponent(DevMailPage);
    await settle();
  });

  afterEach(() => resetAndVerify(http));

  const page = (): HTMLElement => fixture.nativeElement as HTMLElement;

  it('says it is for development only, lists mail, follows in-app links', async () => {
    expect(page().querySelector('[data-testid=dev-only-notice]')?.textContent).toContain(
      'Development only',
    );
    const link = `${window.location.origin}/invitations/tok-42`;
    http.expectOne('/api/v1/dev/mail').flush({
      items: [
        {
          id: 'm1',
          to: 'tove@kestrel-labs.example',
          subject: 'Join "Kestrel Labs" on Couplet',
          text: `Marta Okafor invites you.\nOpen the invitation: ${link}`,
          html: null,
          receivedAt: '2026-12-02T10:00:00.000Z',
        },
      ],
    });
    await settle();

    expect(page().querySelector('[data-testid=mail-to]')?.textContent).toBe(
      'tove@kestrel-labs.example',
    );
    const anchor = page().querySelector<HTMLAnchorElement>('[data-testid=mail-text] a');
    expect(anchor?.href).toBe(link);
    expect(anchor?.target).toBe('');
    const navigate = vi.spyOn(TestBed.inject(Router), 'navigateByUrl');
    anchor?.click();
    expect(navigate).toHaveBeenCalledWith('/invitations/tok-42');
  });

  it('explains the empty inbox, and a production server', async () => {
    http.expectOne('/api/v1/dev/mail').flush({ items: [] });
    await settle();
    expect(page().querySelector('[data-testid=status-empty]')?.textContent).toContain(
      'No mail caught yet',
    );

    (page().querySelector('button') as HTMLButtonElement).click();
    await settle();
    http
      .expectOne('/api/v1/dev/mail')
      .flush({ code: 'not_found', message: 'no' }, { status: 404, statusText: 'Not Found' });
    await settle();
    expect(page().querySelector('[data-testid=status-error]')?.textContent).toContain(
      'production mode',
    );
  });
});
