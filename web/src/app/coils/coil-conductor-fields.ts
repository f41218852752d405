import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { ControlContainer, ReactiveFormsModule } from '@angular/forms';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { COIL_LIMITS } from '../../../../physics/src/index';
import { QuantityField } from '../units/quantity-field';
import { coilFieldHints } from './coil-field-hints';
import type { CoilFormValue } from './coil-form';

/** The conductor (round wire, Litz, PCB trace) and the optional ferrite backing. */
@Component({
  selector: 'app-coil-conductor-fields',
  imports: [MatButtonToggleModule, MatCheckboxModule, QuantityField, ReactiveFormsModule],
  viewProviders: [
    { provide: ControlContainer, useFactory: () => inject(ControlContainer, { skipSelf: true }) },
  ],
  template: `
    @if (hasConductor()) {
      <h4 class="group-title">Conductor</h4>
      <mat-button-toggle-group
        formControlName="conductorType"
        aria-label="Conductor"
        data-testid="coil-conductor-type"
      >
        <mat-button-toggle value="round">Round wire</mat-button-toggle>
        <mat-button-toggle value="litz">Litz</mat-button-toggle>
        <mat-button-toggle value="trace">PCB trace</mat-button-toggle>
      </mat-button-toggle-group>
      <div class="grid">
        @switch (value().conductorType) {
          @case ('round') {
            <app-quantity-field
              formControlName="wireDiameter"
              label="Wire diameter"
              unit="m"
              bare="mm"
              [hint]="hints.wireDiameter"
              [min]="limits.conductorSize.min"
              [max]="limits.conductorSize.max"
            />
          }
          @case ('litz') {
            <app-quantity-field
              formControlName="strands"
              label="Strands"
              unit="1"
              [hint]="hints.strands"
              [min]="limits.strands.min"
              [max]="limits.strands.max"
            />
            <app-quantity-field
              formControlName="strandDiameter"
              label="Strand diameter"
              unit="m"
              bare="mm"
              [hint]="hints.strandDiameter"
              [min]="limits.conductorSize.min"
              [max]="limits.conductorSize.max"
            />
            <app-quantity-field
              formControlName="bundleDiameter"
              label="Bundle diameter"
              unit="m"
              bare="mm"
              [hint]="hints.bundleDiameter"
              [min]="limits.conductorSize.min"
              [max]="limits.conductorSize.max"
            />
          }
          @case ('trace') {
            <app-quantity-field
              formControlName="traceWidth"
              label="Trace width"
              unit="m"
              bare="mm"
              [hint]="hints.traceWidth"
              [min]="limits.conductorSize.min"
              [max]="limits.conductorSize.max"
            />
            <app-quantity-field
              formControlName="traceThickness"
              label="Copper thickness"
              unit="m"
              bare="um"
              [hint]="hints.traceThickness"
              [min]="limits.conductorSize.min"
              [max]="limits.conductorSize.max"
            />
          }
        }
      </div>
    }

    <h4 class="group-title">Ferrite backing</h4>
    <mat-checkbox formControlName="hasBacking" data-testid="field-hasBacking">
      A ferrite plate behind the winding
    </mat-checkbox>
    @if (value().hasBacking) {
      <div class="grid">
        <app-quantity-field
          formControlName="mur"
          label="Relative permeability μr"
          unit="1"
          [hint]="hints.mur"
          [min]="limits.mur.min"
          [max]="limits.mur.max"
        />
        <app-quantity-field
          formControlName="backingDistance"
          label="Distance to ferrite"
          unit="m"
          bare="mm"
          [hint]="hints.backingDistance"
          [min]="limits.backingDistance.min"
          [max]="limits.backingDistance.max"
        />
      </div>
      <p class="note">
        Modelled as an infinite permeable plate by the method of images (image current scaled by (μr
        − 1)/(μr + 1)): an approximation. Real ferrite is finite, saturates and has losses.
      </p>
    }
  `,
  styleUrl: './coil-fields.scss',
  styles: `
    .group-title {
      margin: 8px 0 0;
      font: var(--mat-sys-title-small);
    }
    .note {
      margin: 0;
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CoilConductorFields {
  readonly value = input.required<CoilFormValue>();

  protected readonly hints = coilFieldHints;
  protected readonly limits = COIL_LIMITS;
  /** Single rings and ring lists give a wire radius instead of a conductor. */
  protected readonly hasConductor = computed(
    () => this.value().kind !== 'ring' && this.value().kind !== 'rings',
  );
}
