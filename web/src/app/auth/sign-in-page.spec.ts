import { HttpTestingController } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { Router } from '@angular/router';
import { configurePageTest, resetAndVerify, testSession } from '../testing/page-test-bed';
import { SignInPage } from './sign-in-page';

describe('SignInPage', () => {
  let fixture: ComponentFixture<SignInPage>;
  let loader: HarnessLoader;
  let http: HttpTestingController;

  const field = (label: string) =>
    loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: label }));
  const submit = () => loader.getHarness(MatButtonHarness.with({ text: 'Sign in' }));
  const banner = (): string =>
    (fixture.nativeElement as HTMLElement)
      .querySelector('[data-testid=problem-banner]')
      ?.textContent?.trim() ?? '';

  beforeEach(async () => {
    http = configurePageTest();
    fixture = TestBed.createComponent(SignInPage);
    loader = TestbedHarnessEnvironment.loader(fixture);
    await fixture.whenStable();
  });

  afterEach(() => resetAndVerify(http));

  it('says what is missing when the empty form is sent, and sends nothing', async () => {
    await (await submit()).click();

    expect(await (await field('E-mail')).getTextErrors()).toEqual(['Enter your e-mail address.']);
    expect(await (await field('Password')).getTextErrors()).toEqual(['Enter your password.']);
    http.expectNone('/api/v1/auth/sign-in');
  });

  it('says what an e-mail address looks like when the input is not one', async () => {
    const email = await loader.getHarness(
      MatInputHarness.with({ selector: '[data-testid=email]' }),
    );
    await email.setValue('ines.ferreira');
    await email.blur();

    expect(await (await field('E-mail')).getTextErrors()).toEqual([
      'E-mail: an address such as name@example.com.',
    ]);
  });

  it('shows a refused sign-in in the banner, in words', async () => {
    await (
      await loader.getHarness(MatInputHarness.with({ selector: '[data-testid=email]' }))
    ).setValue('ines.ferreira@halden-robotics.example');
    await (
      await loader.getHarness(MatInputHarness.with({ selector: '[data-testid=password]' }))
    ).setValue('not the password');
    await (await submit()).click();

    http
      .expectOne('/api/v1/auth/sign-in')
      .flush(
        { code: 'invalid_credentials', message: 'e-mail or password is wrong' },
        { status: 401, statusText: 'Unauthorized' },
      );
    await fixture.whenStable();
    expect(banner()).toContain('That e-mail and password do not match an account');
  });

  it('goes to the return URL after signing in', async () => {
    const navigate = vi.spyOn(TestBed.inject(Router), 'navigateByUrl');
    fixture.componentRef.setInput('returnUrl', '/invitations/tok-123');
    await (
      await loader.getHarness(MatInputHarness.with({ selector: '[data-testid=email]' }))
    ).setValue('ines.ferreira@halden-robotics.example');
    await (
      await loader.getHarness(MatInputHarness.with({ selector: '[data-testid=password]' }))
    ).setValue('tx-coil-2026!');
    await (await submit()).click();

    const request = http.expectOne('/api/v1/auth/sign-in');
    expect(request.request.body).toEqual({
      email: 'ines.ferreira@halden-robotics.example',
      password: 'tx-coil-2026!',
    });
    request.flush(testSession('token-a'));
    expect(navigate).toHaveBeenCalledWith('/invitations/tok-123');
  });
});
