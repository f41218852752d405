import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { Icon } from '../shell/icon';
import { formatQuantity } from '../units/format-quantity';

/**
 * Above this Tx tank voltage (rms) the caution is raised: the usual touch-safe extra-low-voltage
 * line of electrical practice (common practice, no source given here; local codes set the real
 * limit).
 */
export const HIGH_TANK_VOLTAGE = 60;

/**
 * The cautions beside a study's figures, in the style of the workspace's safety notes but about
 * this study: its own tank voltage, the exposure reference level at its frequency, foreign
 * objects, and the model's limits for its coils.
 */
@Component({
  selector: 'app-study-cautions',
  imports: [Icon],
  template: `
    <aside
      class="caution-panel"
      aria-labelledby="study-cautions-title"
      data-testid="study-cautions"
    >
      <h3 class="caution-title" id="study-cautions-title">
        <app-icon name="shield" /> Cautions for this study
      </h3>
      <ul>
        <li [class.raised]="high()" data-testid="caution-voltage">
          @if (tank(); as v) {
            @if (high()) {
              <strong>
                The Tx coil and its series capacitor see {{ v.rms }} rms ({{ v.peak }} peak) at
                {{ amps() }}.
              </strong>
              Above {{ threshold }} V: treat the tank as live, rate capacitors and insulation for
              it, and discharge before touching.
            } @else {
              The Tx tank sees {{ v.rms }} rms at {{ amps() }}; it grows in proportion to the
              current and to ωL1.
            }
          } @else {
            The Tx tank voltage ωL1·I1 appears here once the pair is computed.
          }
        </li>
        <li data-testid="caution-exposure">{{ exposure() }}</li>
        <li>
          A coin, key or foil between the coils heats up: half a watt to a watt absorbed can take it
          above 80 °C. Plan foreign-object detection into the power stage.
        </li>
        <li>
          k, M and Q come from filament models: no ferrite saturation or loss, no eddy currents in
          nearby metal, no self-resonance of the windings.
          @if (backed()) {
            The Tx ferrite is modelled as an infinite plate (method of images); the real tile is
            finite, so figures near and beyond its edge are approximate.
          }
          Confirm with bench data.
        </li>
      </ul>
      <p class="defer">
        Defer to the local electrical codes, the exposure rules where the product is sold, and
        licensed practice.
      </p>
    </aside>
  `,
  styles: `
    .raised {
      color: var(--mat-sys-error);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StudyCautions {
  /** ωL1·I1, V rms; null until computed. */
  readonly tankVoltage = input<number | null>(null);
  readonly currentA = input.required<number>();
  readonly frequencyHz = input.required<number>();
  /** Whether the Tx has a ferrite backing. */
  readonly backed = input(false);

  protected readonly threshold = HIGH_TANK_VOLTAGE;
  protected readonly amps = computed(() =>
    formatQuantity(this.currentA(), 'A', { trim: true, digits: 4 }),
  );
  protected readonly high = computed(() => (this.tankVoltage() ?? 0) > HIGH_TANK_VOLTAGE);
  protected readonly tank = computed(() => {
    const v = this.tankVoltage();
    // A sine's peak is √2 times its rms value.
    return v === null
      ? null
      : { rms: formatQuantity(v, 'V'), peak: formatQuantity(v * Math.SQRT2, 'V') };
  });

  /** The public reference level that applies at the study's frequency. */
  protected readonly exposure = computed(() => {
    const f = this.frequencyHz();
    const at = formatQuantity(f, 'Hz');
    const tail =
      'Couplet does not compute stray fields: measure or simulate them where people are.';
    if (f >= 3e3 && f <= 10e6) {
      // ICNIRP 2010, Health Physics 99:818–836: 27 µT rms public, 100 µT occupational,
      // 3 kHz – 10 MHz. ICNIRP 1998 (Health Physics 74:494–522) gave 6.25 µT for 0.8–150 kHz
      // (from memory).
      const older =
        f <= 150e3
          ? ' Some rules still use the older ICNIRP 1998 level of 6.25 µT in this band.'
          : '';
      return (
        `At ${at} the ICNIRP 2010 public reference level for magnetic flux density is 27 µT rms ` +
        `(100 µT for workers).${older} ${tail}`
      );
    }
    return (
      `At ${at} the ICNIRP 2010 low-frequency levels for 3 kHz – 10 MHz do not apply; look up ` +
      `the exposure rules for this band where the product is sold. ${tail}`
    );
  });
}
