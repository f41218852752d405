import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { RevisionResponse, StudyCoil } from '../api-types';
import { formatQuantity } from '../units/format-quantity';
import { thresholdText } from './threshold-text';

/** The inputs a study computes from (a revision freezes the same set). */
export type StudyInputs = RevisionResponse['inputs'];

const compensationNames = {
  'series-series': 'Series–series',
  'series-parallel': 'Series–parallel (Rx parallel)',
} as const;

/** A study's inputs as a compact list: the pair, the operating point, threshold and pose. */
@Component({
  selector: 'app-study-inputs-summary',
  template: `
    <dl class="inputs" data-testid="study-inputs">
      <div>
        <dt>Tx</dt>
        <dd>
          <span class="tx">{{ tx().name }}</span>
          <span class="kind">{{ tx().kind }}</span>
        </dd>
      </div>
      <div>
        <dt>Rx</dt>
        <dd>
          <span class="rx">{{ rx().name }}</span>
          <span class="kind">{{ rx().kind }}</span>
        </dd>
      </div>
      @for (row of rows(); track row[0]) {
        <div>
          <dt>{{ row[0] }}</dt>
          <dd>{{ row[1] }}</dd>
        </div>
      }
    </dl>
    @if (inputs().notes) {
      <p class="notes">{{ inputs().notes }}</p>
    }
  `,
  styles: `
    .inputs {
      margin: 0;
      display: grid;
      grid-template-columns: repeat(auto-fill, minmax(150px, 1fr));
      gap: 10px 16px;
    }
    dt {
      font: var(--mat-sys-label-medium);
      color: var(--mat-sys-on-surface-variant);
    }
    dd {
      margin: 2px 0 0;
      font: var(--mat-sys-body-large);
      font-variant-numeric: tabular-nums;
    }
    .tx {
      color: var(--mat-sys-tertiary);
    }
    .rx {
      color: var(--mat-sys-primary);
    }
    .kind {
      display: block;
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
    }
    .notes {
      margin: 12px 0 0;
      white-space: pre-wrap;
      font: var(--mat-sys-body-medium);
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StudyInputsSummary {
  readonly inputs = input.required<StudyInputs>();
  readonly tx = input.required<Pick<StudyCoil, 'name' | 'kind'>>();
  readonly rx = input.required<Pick<StudyCoil, 'name' | 'kind'>>();

  protected readonly rows = computed<[string, string][]>(() => {
    const s = this.inputs();
    const p = s.nominalPose;
    // Poses read in millimetres whatever their size, as the pose controls show them.
    const mm = (v: number) => `${Number((v * 1000).toFixed(3))} mm`;
    const tilt = p.tiltX || p.tiltY ? `, tilt ${p.tiltX}° / ${p.tiltY}°` : ', untilted';
    return [
      ['Frequency', formatQuantity(s.frequencyHz, 'Hz', { digits: 4, trim: true })],
      ['Tx current', `${formatQuantity(s.txCurrentA, 'A', { digits: 4, trim: true })} rms`],
      ['Threshold', thresholdText(s.threshold)],
      ['Compensation', compensationNames[s.compensation]],
      ['Nominal pose', `gap ${mm(p.z)}, x ${mm(p.x)}, y ${mm(p.y)}${tilt}`],
    ];
  });
}
