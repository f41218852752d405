import { HttpTestingController } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { HarnessLoader } from '@angular/cdk/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { MatButtonHarness } from '@angular/material/button/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { configurePageTest, resetAndVerify } from '../testing/page-test-bed';
import { SignUpPage } from './sign-up-page';

describe('SignUpPage', () => {
  let fixture: ComponentFixture<SignUpPage>;
  let loader: HarnessLoader;
  let http: HttpTestingController;

  const input = (testId: string) =>
    loader.getHarness(MatInputHarness.with({ selector: `[data-testid=${testId}]` }));
  const errorsOf = async (label: string) =>
    (
      await loader.getHarness(MatFormFieldHarness.with({ floatingLabelText: label }))
    ).getTextErrors();

  beforeEach(async () => {
    http = configurePageTest();
    fixture = TestBed.createComponent(SignUpPage);
    loader = TestbedHarnessEnvironment.loader(fixture);
    await fixture.whenStable();
  });

  afterEach(() => resetAndVerify(http));

  it('states the allowed password length when the password is too short', async () => {
    const password = await input('password');
    await password.setValue('short');
    await password.blur();
    expect(await errorsOf('Password')).toEqual(['Password: 10 to 200 characters.']);
  });

  it('puts a taken e-mail address at the e-mail field', async () => {
    await (await input('display-name')).setValue('Marta Okafor');
    await (await input('email')).setValue('marta@halden-robotics.example');
    await (await input('password')).setValue('solenoid pitch 0.4 mm');
    await (await loader.getHarness(MatButtonHarness.with({ text: 'Create account' }))).click();

    http
      .expectOne('/api/v1/auth/sign-up')
      .flush(
        { code: 'conflict', message: 'e-mail is already registered', field: 'email' },
        { status: 409, statusText: 'Conflict' },
      );
    await fixture.whenStable();
    expect(await errorsOf('E-mail')).toEqual([
      'An account with this e-mail already exists. Sign in instead.',
    ]);
  });
});
