import { HttpTestingController } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { configurePageTest, resetAndVerify } from '../testing/page-test-bed';
import { ForgotPasswordPage } from './forgot-password-page';

const url = '/api/v1/auth/forgot-password';
const address = 'marta.okafor@halden-robotics.example';

describe('ForgotPasswordPage', () => {
  let fixture: ComponentFixture<ForgotPasswordPage>;
  let loader: HarnessLoader;
  let http: HttpTestingController;

  const page = (): HTMLElement => fixture.nativeElement as HTMLElement;
  const text = (testId: string): string =>
    page().querySelector(`[data-testid=${testId}]`)?.textContent?.replace(/\s+/g, ' ').trim() ?? '';
  const email = () => loader.getHarness(MatInputHarness);
  const errors = async () =>
    (
      await loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: 'E-mail' }))
    ).getTextErrors();
  const send = () => loader.getHarness(MatButtonHarness.with({ text: 'Send reset link' }));

  beforeEach(async () => {
    http = configurePageTest();
    fixture = TestBed.createComponent(ForgotPasswordPage);
    loader = TestbedHarnessEnvironment.loader(fixture);
    await fixture.whenStable();
  });

  afterEach(() => resetAndVerify(http));

  it('asks for the address when the empty form is sent, and sends nothing', async () => {
    await (await send()).click();
    expect(await errors()).toEqual(['Enter the e-mail address of your account.']);
    http.expectNone(url);
  });

  it('says what an address looks like, and how long it may be', async () => {
    await (await email()).setValue('marta.okafor');
    await (await email()).blur();
    expect(await errors()).toEqual(['E-mail: an address such as name@example.com.']);

    // 255 characters, one over 254: RFC 5321's 256-octet path less its angle brackets
    // (section 4.5.3.1.3, from memory).
    await (
      await email()
    ).setValue('m'.repeat(64) + '@' + Array(3).fill('h'.repeat(60)).join('.') + '.example');
    expect(await errors()).toEqual(['E-mail: at most 254 characters.']);
    await (await send()).click();
    http.expectNone(url);
  });

  it('sends the address and says a link is on its way, account or not', async () => {
    await (await email()).setValue(address);
    await (await send()).click();

    const request = http.expectOne(url);
    expect(request.request.method).toBe('POST');
    expect(request.request.body).toEqual({ email: address });
    request.flush(null, { status: 204, statusText: 'No Content' });
    await fixture.whenStable();
    // The captured-mail hint asks whether this is a development server: here it is.
    http.expectOne('/api/v1/dev/mail').flush({ items: [] });
    await fixture.whenStable();

    expect(text('reset-sent')).toBe(
      `If an account exists for ${address}, a reset link is on its way. Check your inbox.`,
    );
    expect(text('dev-mail-hint')).toContain('Open the captured mail');

    await (await loader.getHarness(MatButtonHarness.with({ text: 'Use another address' }))).click();
    expect(page().querySelector('[data-testid=reset-sent]')).toBeNull();
    expect(await (await email()).getValue()).toBe(address);
  });

  it("shows the server's problem in the banner and lets the user send again", async () => {
    await (await email()).setValue(address);
    await (await send()).click();
    http
      .expectOne(url)
      .flush(
        { code: 'rate_limited', message: 'Too many reset requests. Wait a minute.' },
        { status: 429, statusText: 'Too Many Requests' },
      );
    await fixture.whenStable();

    expect(text('problem-banner')).toBe('Too many reset requests. Wait a minute.');
    expect(await (await send()).isDisabled()).toBe(false);
    await (await send()).click();
    expect(text('problem-banner')).toBe('');
    http.expectOne(url).flush(null, { status: 204, statusText: 'No Content' });
    await fixture.whenStable();
    http.expectOne('/api/v1/dev/mail').flush(
      { code: 'not_found', message: 'no' },
      {
        status: 404,
        statusText: 'Not Found',
      },
    );
    await fixture.whenStable();
    expect(text('reset-sent')).toContain(address);
  });

  it("puts the server's objection to the address at the field", async () => {
    await (await email()).setValue(address);
    await (await send()).click();
    http.expectOne(url).flush(
      {
        code: 'validation_failed',
        message: 'email: must be a valid e-mail address',
        field: 'email',
      },
      { status: 400, statusText: 'Bad Request' },
    );
    await fixture.whenStable();

    expect(await errors()).toEqual(['email: must be a valid e-mail address']);
    expect(text('problem-banner')).toBe('');
  });
});
