import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { StudyCoil } from '../api-types';
import { formatQuantity } from '../units/format-quantity';
import type { LiveCoilFigures } from './live-link-messages';

/** Each coil on its own at the study's frequency: L, R_ac and Q, as the worker computed them. */
@Component({
  selector: 'app-coil-figures-table',
  template: `
    <table class="figures" data-testid="coil-figures">
      <caption class="visually-hidden">
        Coil figures at
        {{
          frequency()
        }}
      </caption>
      <thead>
        <tr>
          <th scope="col">Coil</th>
          <th scope="col">L</th>
          <th scope="col">R<sub>ac</sub></th>
          <th scope="col">Q</th>
        </tr>
      </thead>
      <tbody>
        @for (row of rows(); track row.side) {
          <tr [attr.data-testid]="'coil-figures-' + row.side">
            <th scope="row">
              <span [class]="row.side">{{ row.side === 'tx' ? 'Tx' : 'Rx' }}</span> {{ row.name }}
            </th>
            <td>{{ row.L }}</td>
            <td>{{ row.R }}</td>
            <td>{{ row.Q }}</td>
          </tr>
        }
      </tbody>
    </table>
    <p class="note">
      At {{ frequency() }}, 20 °C copper, skin effect only.
      @if (txBacked()) {
        L of the Tx includes its ferrite backing;
      }
      L of the Rx is the coil alone.
    </p>
  `,
  styles: `
    .figures {
      width: 100%;
      border-collapse: collapse;
      font-variant-numeric: tabular-nums;
    }
    th,
    td {
      padding: 6px 8px;
      text-align: right;
      border-bottom: 1px solid var(--mat-sys-outline-variant);
      font: var(--mat-sys-body-medium);
    }
    th[scope='row'],
    th:first-child {
      text-align: left;
    }
    thead th {
      font: var(--mat-sys-label-medium);
      color: var(--mat-sys-on-surface-variant);
    }
    .tx {
      color: var(--mat-sys-tertiary);
      font-weight: 600;
    }
    .rx {
      color: var(--mat-sys-primary);
      font-weight: 600;
    }
    .note {
      margin: 8px 0 0;
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CoilFiguresTable {
  readonly txCoil = input.required<StudyCoil>();
  readonly rxCoil = input.required<StudyCoil>();
  readonly tx = input<LiveCoilFigures | null>(null);
  readonly rx = input<LiveCoilFigures | null>(null);
  readonly frequencyHz = input.required<number>();

  protected readonly txBacked = computed(() => this.txCoil().spec.backing !== undefined);
  protected readonly frequency = computed(() =>
    formatQuantity(this.frequencyHz(), 'Hz', { digits: 4, trim: true }),
  );
  protected readonly rows = computed(() =>
    (
      [
        ['tx', this.txCoil(), this.tx()],
        ['rx', this.rxCoil(), this.rx()],
      ] as const
    ).map(([side, coil, f]) => ({
      side,
      name: coil.name,
      L: f ? formatQuantity(f.L, 'H') : '—',
      R: f ? formatQuantity(f.R, 'Ω') : '—',
      Q: f ? f.Q.toPrecision(3) : '—',
    })),
  );
}
