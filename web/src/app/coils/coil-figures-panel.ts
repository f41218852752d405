import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { formatQuantity } from '../units/format-quantity';
import type { LiveCoilFigures } from './coil-figures-request';

/** Where the live figures stand: waiting for a valid spec, computing, shown, or refused. */
export type FiguresState =
  | { status: 'waiting' }
  | { status: 'computing'; previous: LiveCoilFigures | null }
  | { status: 'ready'; figures: LiveCoilFigures }
  | { status: 'error'; message: string };

interface FigureRow {
  id: string;
  /** The label, with an optional subscript and text after it ("R" "dc" " (20 °C)"). */
  label: string;
  sub?: string;
  after?: string;
  value: string;
  note?: string;
}

/** The coil's figures as the editor computes them while the user types. */
@Component({
  selector: 'app-coil-figures-panel',
  imports: [MatProgressBarModule],
  template: `
    <section class="panel" aria-labelledby="figures-title" data-testid="coil-figures">
      <h3 id="figures-title" class="section-title">Figures</h3>
      <div class="progress">
        @if (state().status === 'computing') {
          <mat-progress-bar mode="indeterminate" aria-label="Computing the figures" />
        }
      </div>
      @switch (state().status) {
        @case ('waiting') {
          <p class="muted" data-testid="figures-waiting">
            The figures appear once the geometry and conductor are complete and valid.
          </p>
        }
        @case ('error') {
          <p class="error" role="alert" data-testid="figures-error">{{ errorMessage() }}</p>
        }
      }
      @if (rows().length) {
        <dl [class.stale]="state().status === 'computing'">
          @for (row of rows(); track row.id) {
            <div class="row" [attr.data-testid]="'figure-' + row.id">
              <dt>
                {{ row.label }}<sub>{{ row.sub }}</sub
                >{{ row.after }}
              </dt>
              <dd>{{ row.value }}</dd>
              @if (row.note) {
                <dd class="note">{{ row.note }}</dd>
              }
            </div>
          }
        </dl>
        <p class="caution">
          R<sub>ac</sub> counts skin effect only, not proximity effect: read it as a lower bound and
          Q as an upper bound. The filament model ignores self-resonance; ferrite is an infinite
          plate. At resonance the capacitor sees the coil voltage too: treat the tank as live and
          follow local codes and licensed practice.
        </p>
      }
    </section>
  `,
  styles: `
    .panel {
      display: grid;
      gap: 8px;
    }
    .progress {
      height: 4px;
    }
    dl {
      margin: 0;
      display: grid;
      gap: 6px;
      transition: opacity 120ms;
    }
    dl.stale {
      opacity: 0.6;
    }
    .row {
      display: grid;
      grid-template-columns: 1fr auto;
      gap: 0 12px;
      padding: 4px 0;
      border-bottom: 1px solid var(--mat-sys-outline-variant);
    }
    dt {
      color: var(--mat-sys-on-surface-variant);
    }
    dd {
      margin: 0;
      font: var(--mat-sys-title-small);
      font-variant-numeric: tabular-nums;
      text-align: right;
    }
    dd.note {
      grid-column: 1 / -1;
      text-align: left;
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
    }
    .error {
      margin: 0;
      padding: 8px 12px;
      border-radius: var(--mat-sys-corner-small);
      background: var(--mat-sys-error-container);
      color: var(--mat-sys-on-error-container);
    }
    .caution {
      margin: 4px 0 0;
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CoilFiguresPanel {
  readonly state = input.required<FiguresState>();

  protected readonly errorMessage = computed(() => {
    const state = this.state();
    return state.status === 'error' ? state.message : '';
  });

  protected readonly rows = computed<FigureRow[]>(() => {
    const state = this.state();
    const f =
      state.status === 'ready'
        ? state.figures
        : state.status === 'computing'
          ? state.previous
          : null;
    if (!f) return [];
    const at = f.frequency === null ? null : formatQuantity(f.frequency, 'Hz');
    const dcOnly = 'Give an operating frequency';
    const current = formatQuantity(f.current, 'A');
    return [
      { id: 'L', label: 'Inductance L', value: formatQuantity(f.L, 'H') },
      {
        id: 'Rdc',
        label: 'Resistance R',
        sub: 'dc',
        after: ' (20 °C)',
        value: formatQuantity(f.Rdc, 'Ω'),
      },
      {
        id: 'Rac',
        label: 'Resistance R',
        sub: 'ac',
        after: at ? ` at ${at}` : '',
        value: f.Rac === null ? '—' : formatQuantity(f.Rac, 'Ω'),
        note: f.Rac === null ? dcOnly : undefined,
      },
      {
        id: 'Q',
        label: at ? `Quality factor Q at ${at}` : 'Quality factor Q',
        value: f.Q === null ? '—' : formatQuantity(f.Q, '1'),
        note: f.Q === null ? dcOnly : undefined,
      },
      {
        id: 'energy',
        label: `Stored energy at ${current}`,
        value: formatQuantity(f.storedEnergy, 'J'),
      },
      {
        id: 'tau',
        label: 'Time constant L/R',
        sub: 'dc',
        value: formatQuantity(f.timeConstant, 's'),
      },
      { id: 'wire', label: 'Wire length', value: formatQuantity(f.wireLength, 'm') },
      {
        id: 'skin',
        label: at ? `Skin depth in copper at ${at}` : 'Skin depth in copper',
        value: f.skinDepth === null ? '—' : formatQuantity(f.skinDepth, 'm'),
      },
      {
        id: 'voltage',
        label: `Coil voltage ωLI at ${current}`,
        value: f.coilVoltage === null ? '—' : formatQuantity(f.coilVoltage, 'V'),
      },
    ];
  });
}
