import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { ControlContainer, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { COIL_LIMITS } from '../../../../physics/src/index';
import { Icon } from '../shell/icon';
import { QuantityField } from '../units/quantity-field';
import { coilFieldHints } from './coil-field-hints';
import { ringRow, type CoilForm, type CoilFormValue } from './coil-form';

/**
 * The geometry fields of the chosen coil kind, bound to the editor's form (the form directive is
 * the editor's, so its submitted state reaches these fields too).
 */
@Component({
  selector: 'app-coil-geometry-fields',
  imports: [
    Icon,
    MatButtonModule,
    MatButtonToggleModule,
    MatCheckboxModule,
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
    QuantityField,
    ReactiveFormsModule,
  ],
  viewProviders: [
    { provide: ControlContainer, useFactory: () => inject(ControlContainer, { skipSelf: true }) },
  ],
  templateUrl: './coil-geometry-fields.html',
  styleUrl: './coil-fields.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CoilGeometryFields {
  readonly form = input.required<CoilForm>();
  /** The form's latest raw value (the editor follows valueChanges). */
  readonly value = input.required<CoilFormValue>();
  /** A problem of the rings list as a whole (too few, too many), if any. */
  readonly ringsError = input<string | null>(null);
  readonly readonly = input(false);

  protected readonly hints = coilFieldHints;
  protected readonly limits = COIL_LIMITS;
  protected readonly kind = computed(() => this.value().kind);
  protected readonly sizing = computed(() => this.value().sizing);
  protected readonly layered = computed(() => (this.value().layers ?? 1) > 1);

  protected addRing(): void {
    const rings = this.form().controls.rings;
    const last = rings.length ? rings.at(rings.length - 1).getRawValue() : null;
    // The next ring one and a half wire diameters further out: clear of the last one.
    const step = 3 * (this.form().controls.wireRadius.value ?? 0.5e-3);
    rings.push(ringRow(last?.r != null ? last.r + step : 0.01, last?.z ?? 0));
    rings.markAsDirty();
  }

  protected removeRing(index: number): void {
    const rings = this.form().controls.rings;
    rings.removeAt(index);
    rings.markAsDirty();
  }
}
