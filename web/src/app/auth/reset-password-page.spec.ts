import { HttpTestingController } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { configurePageTest, resetAndVerify } from '../testing/page-test-bed';
import { ResetPasswordPage } from './reset-password-page';

const url = '/api/v1/auth/reset-password';
const token = 'rst_4f7c1a9e2b';
const goodPassword = 'litz wire 0.1 mm x 100';

describe('ResetPasswordPage', () => {
  let fixture: ComponentFixture<ResetPasswordPage>;
  let loader: HarnessLoader;
  let http: HttpTestingController;

  const page = (): HTMLElement => fixture.nativeElement as HTMLElement;
  const text = (selector: string): string =>
    page().querySelector(selector)?.textContent?.replace(/\s+/g, ' ').trim() ?? '';
  const input = async (label: string): Promise<MatInputHarness> => {
    const field = await loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: label }));
    const control = await field.getControl(MatInputHarness);
    if (!control) throw new Error(`no input in the field "${label}"`);
    return control;
  };
  const errors = async (label: string) =>
    (
      await loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: label }))
    ).getTextErrors();
  const save = () => loader.getHarness(MatButtonHarness.with({ text: 'Save new password' }));

  async function render(withToken: string | undefined): Promise<void> {
    http = configurePageTest();
    fixture = TestBed.createComponent(ResetPasswordPage);
    if (withToken !== undefined) fixture.componentRef.setInput('token', withToken);
    loader = TestbedHarnessEnvironment.loader(fixture);
    await fixture.whenStable();
  }

  async function fill(password: string, repeat: string): Promise<void> {
    await (await input('New password')).setValue(password);
    await (await input('Repeat the new password')).setValue(repeat);
    await (await save()).click();
  }

  afterEach(() => resetAndVerify(http));

  it('without a token, points to a new reset link and offers no form', async () => {
    await render(undefined);
    expect(text('[data-testid=status-error]')).toBe(
      'This page needs the link from the reset e-mail. Request a new one if it is lost.',
    );
    expect(page().querySelector('form')).toBeNull();
    expect(page().querySelector('a[href="/forgot-password"]')?.textContent?.trim()).toBe(
      'Request a reset link',
    );
  });

  it('states the allowed length and asks for the repeat, sending nothing', async () => {
    await render(token);
    await (await save()).click();
    expect(await errors('New password')).toEqual(['Password: 10 to 200 characters.']);
    expect(await errors('Repeat the new password')).toEqual(['Type the same password again.']);

    await fill('coil', 'coil');
    expect(await errors('New password')).toEqual(['Password: 10 to 200 characters.']);
    await (await input('New password')).setValue('x'.repeat(201));
    expect(await errors('New password')).toEqual(['Password: 10 to 200 characters.']);
    http.expectNone(url);
  });

  it('says "The two passwords differ." and sends nothing', async () => {
    await render(token);
    await fill(goodPassword, goodPassword + '!');

    expect(text('.mismatch')).toBe('The two passwords differ.');
    http.expectNone(url);

    await (await input('Repeat the new password')).setValue(goodPassword);
    expect(page().querySelector('.mismatch')).toBeNull();
  });

  it('sends the token and the new password, then says every other session ended', async () => {
    await render(token);
    await fill(goodPassword, goodPassword);

    const request = http.expectOne(url);
    expect(request.request.method).toBe('POST');
    expect(request.request.body).toEqual({ token, password: goodPassword });
    request.flush(null, { status: 204, statusText: 'No Content' });
    await fixture.whenStable();

    expect(text('[data-testid=reset-done]')).toBe(
      'Your password is changed. Every other session has been signed out.',
    );
    expect(page().querySelector('a[href="/sign-in"]')?.textContent?.trim()).toBe('Sign in');
  });

  it('tells the user a spent or expired link cannot be used again', async () => {
    await render(token);
    await fill(goodPassword, goodPassword);
    http.expectOne(url).flush(
      {
        code: 'validation_failed',
        message: 'token: is invalid, used already or expired',
        field: 'token',
      },
      { status: 400, statusText: 'Bad Request' },
    );
    await fixture.whenStable();

    expect(text('[data-testid=status-error]')).toBe(
      'This reset link has expired or was already used. Links work once, for one hour.',
    );
    expect(page().querySelector('form')).toBeNull();
    expect(page().querySelector('a[href="/forgot-password"]')?.textContent?.trim()).toBe(
      'Request a new link',
    );
  });

  it("puts the server's objection to the password at the password field", async () => {
    await render(token);
    await fill(goodPassword, goodPassword);
    http.expectOne(url).flush(
      {
        code: 'validation_failed',
        message: 'password: must be at most 200 characters',
        field: 'password',
      },
      { status: 400, statusText: 'Bad Request' },
    );
    await fixture.whenStable();

    expect(await errors('New password')).toEqual(['password: must be at most 200 characters']);
    expect(page().querySelector('[data-testid=status-error]')).toBeNull();
    expect(page().querySelector('[data-testid=problem-banner]')).toBeNull();
  });

  it('shows any other failure in the banner and keeps the form to try again', async () => {
    await render(token);
    await fill(goodPassword, goodPassword);
    http.expectOne(url).flush('upstream down', { status: 502, statusText: 'Bad Gateway' });
    await fixture.whenStable();

    expect(text('[data-testid=problem-banner]')).toBe(
      'The server failed to answer. Try again in a moment.',
    );
    await (await save()).click();
    http.expectOne(url).flush(null, { status: 204, statusText: 'No Content' });
    await fixture.whenStable();
    expect(page().querySelector('[data-testid=reset-done]')).not.toBeNull();
  });
});
