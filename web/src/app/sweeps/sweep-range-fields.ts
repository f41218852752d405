import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule } from '@angular/forms';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { QuantityField } from '../units/quantity-field';
import type { QuantityUnit } from '../units/parse-quantity';

/** The controls of one range: from and to in the stored unit, and a count of steps. */
export type RangeGroup = FormGroup<{
  from: FormControl<number | null>;
  to: FormControl<number | null>;
  steps: FormControl<number | null>;
}>;

/** From, to and steps of one swept axis, on one row. */
@Component({
  selector: 'app-sweep-range-fields',
  imports: [MatFormFieldModule, MatInputModule, QuantityField, ReactiveFormsModule],
  template: `
    <fieldset class="range" [formGroup]="group()">
      <legend>{{ legend() }}</legend>
      <app-quantity-field
        formControlName="from"
        [label]="name() + ' from'"
        [unit]="unit()"
        [bare]="bare()"
        [min]="lower()"
        [max]="limit()"
      />
      <app-quantity-field
        formControlName="to"
        [label]="name() + ' to'"
        [unit]="unit()"
        [bare]="bare()"
        [min]="lower()"
        [max]="limit()"
      />
      <mat-form-field appearance="outline" subscriptSizing="dynamic" class="steps">
        <mat-label>{{ name() }} steps</mat-label>
        <input matInput type="number" formControlName="steps" min="2" step="1" />
        <mat-hint>{{ stepsHint() }}</mat-hint>
      </mat-form-field>
    </fieldset>
  `,
  styles: `
    .range {
      display: grid;
      grid-template-columns: 1fr 1fr minmax(96px, 0.7fr);
      gap: 8px 12px;
      margin: 0;
      padding: 0;
      border: 0;
      min-width: 0;
    }
    legend {
      padding: 0;
      margin-bottom: 6px;
      font: var(--mat-sys-title-small);
      color: var(--mat-sys-on-surface);
    }
    .steps {
      width: 100%;
    }
    @media (max-width: 560px) {
      .range {
        grid-template-columns: 1fr 1fr;
      }
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SweepRangeFields {
  readonly group = input.required<RangeGroup>();
  readonly legend = input.required<string>();
  /** Short name in the labels: "x", "Gap", "Tilt". */
  readonly name = input.required<string>();
  readonly unit = input<QuantityUnit>('m');
  readonly bare = input<string>('mm');
  /** |value| allowed, in the stored unit (the engine's ranges: ±10 m, ±180°). */
  readonly limit = input<number | undefined>(undefined);
  readonly stepsHint = input('2 or more, both ends included');

  protected readonly lower = computed(() => {
    const limit = this.limit();
    return limit === undefined ? undefined : -limit;
  });
}
