import { ChangeDetectionStrategy, Component } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { FormControl, FormGroup, ReactiveFormsModule } from '@angular/forms';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { HarnessLoader } from '@angular/cdk/testing';
import { MatFormFieldHarness } from '@angular/material/form-field/testing';
import { MatInputHarness } from '@angular/material/input/testing';
import { QuantityField } from './quantity-field';

@Component({
  imports: [QuantityField, ReactiveFormsModule],
  template: `
    <form [formGroup]="form">
      <app-quantity-field
        formControlName="outerDiameter"
        label="Outer diameter"
        hint="Centre line of the outermost turn; phone pads 30–50 mm"
        unit="m"
        bare="mm"
        [min]="1e-4"
        [max]="10"
      />
    </form>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
class HostForm {
  readonly form = new FormGroup({ outerDiameter: new FormControl<number | null>(null) });
}

describe('QuantityField', () => {
  let loader: HarnessLoader;
  let host: HostForm;
  let element: HTMLElement;

  beforeEach(() => {
    const fixture = TestBed.createComponent(HostForm);
    host = fixture.componentInstance;
    element = fixture.nativeElement;
    loader = TestbedHarnessEnvironment.loader(fixture);
  });

  const control = () => host.form.controls.outerDiameter;
  const input = () => loader.getHarness(MatInputHarness);
  const field = () => loader.getHarness(MatFormFieldHarness);
  const type = async (text: string) => {
    const harness = await input();
    await harness.setValue(text);
    await harness.blur();
  };
  const shown = () => element.textContent?.replace(/\s+/g, ' ') ?? '';

  it('reads “45 mm” as 0.045 m and shows the value it read', async () => {
    await type('45 mm');
    expect(control().value).toBeCloseTo(0.045, 15);
    expect(control().valid).toBe(true);
    expect(shown()).toContain('= 0.045 m');
    expect(await (await field()).getTextHints()).toEqual([
      'Centre line of the outermost turn; phone pads 30–50 mm',
    ]);
  });

  it('reads “0.2 in” and a bare number in millimetres', async () => {
    await type('0.2 in');
    // 1 in = 25.4 mm exactly (international inch, 1959).
    expect(control().value).toBeCloseTo(0.00508, 15);
    await type('12');
    expect(control().value).toBeCloseTo(0.012, 15);
  });

  it('refuses “45 kHz” in a length field and says why', async () => {
    await type('45 kHz');
    expect(control().value).toBeNull();
    expect(control().invalid).toBe(true);
    expect(await (await field()).getTextErrors()).toEqual([
      '“45 kHz” is a frequency; expected a length, e.g. 45 mm',
    ]);
  });

  it('refuses a value out of range with the allowed range', async () => {
    await type('20 m');
    expect(control().invalid).toBe(true);
    expect(await (await field()).getTextErrors()).toEqual(['Allowed: from 100 µm to 10 m']);
  });

  it('holds null when emptied, and shows no error before the user leaves the field', async () => {
    const harness = await input();
    await harness.setValue('45 kHz');
    expect(await (await field()).getTextErrors()).toEqual([]);
    await harness.setValue('');
    await harness.blur();
    expect(control().value).toBeNull();
    expect(control().valid).toBe(true);
  });

  it('shows a value the form writes in the display unit', async () => {
    control().setValue(0.045);
    expect(await (await input()).getValue()).toBe('45 mm');
    control().setValue(null);
    expect(await (await input()).getValue()).toBe('');
  });

  it('shows an error the form puts on the control (a cross-field rule)', async () => {
    await type('45 mm');
    control().setErrors({ geometry: 'pitch 0.3 mm is below the wire diameter 0.5 mm' });
    expect(await (await field()).getTextErrors()).toEqual([
      'pitch 0.3 mm is below the wire diameter 0.5 mm',
    ]);
  });

  it('is named for browser tests after its form control', async () => {
    await input();
    expect(element.querySelector('[data-testid=field-outerDiameter] input')).not.toBeNull();
  });

  it('follows the control being disabled', async () => {
    control().disable();
    expect(await (await input()).isDisabled()).toBe(true);
  });
});
