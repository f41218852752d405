import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import type { SweepProgressEvent, SweepRunResponse } from '../api-types';
import { formatDuration } from './format-duration';
import { sweepKindLabels, sweepStatusLabels } from './sweep-labels';

/** A queued or running sweep: how far it is, how long it has taken and has to go, and Cancel. */
@Component({
  selector: 'app-sweep-progress',
  imports: [MatButtonModule, MatProgressBarModule],
  template: `
    <section class="progress" data-testid="sweep-progress" aria-live="polite">
      <div class="head">
        <strong>{{ kindLabel() }}</strong>
        <span class="status" [attr.data-status]="status()">{{ statusLabel() }}</span>
        <span class="spacer"></span>
        @if (canCancel()) {
          <button
            mat-stroked-button
            type="button"
            [disabled]="cancelling()"
            (click)="cancelRun.emit()"
            data-testid="sweep-cancel"
          >
            {{ cancelling() ? 'Cancelling…' : 'Cancel' }}
          </button>
        }
      </div>
      <mat-progress-bar
        [mode]="status() === 'queued' ? 'query' : 'determinate'"
        [value]="percent()"
        [attr.aria-label]="'Sweep progress ' + percent() + ' %'"
      />
      <p class="numbers">
        <span data-testid="sweep-points">{{ points() }}</span>
        @if (elapsed(); as e) {
          <span>elapsed {{ e }}</span>
        }
        @if (remaining(); as r) {
          <span data-testid="sweep-remaining">about {{ r }} to go</span>
        }
      </p>
      @if (status() === 'queued') {
        <p class="muted note">Waiting for a free worker. The run keeps going if you leave.</p>
      }
    </section>
  `,
  styles: `
    .progress {
      display: grid;
      gap: 8px;
      padding: 16px;
      border-radius: var(--mat-sys-corner-medium);
      background: var(--mat-sys-surface-container-low);
    }
    .head {
      display: flex;
      align-items: center;
      gap: 12px;
    }
    .spacer {
      flex: 1;
    }
    .status {
      font: var(--mat-sys-label-large);
      color: var(--mat-sys-primary);
    }
    .numbers {
      display: flex;
      flex-wrap: wrap;
      gap: 4px 20px;
      margin: 0;
      font: var(--mat-sys-body-medium);
      font-variant-numeric: tabular-nums;
    }
    .note {
      margin: 0;
      font: var(--mat-sys-body-small);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SweepProgress {
  readonly run = input.required<SweepRunResponse>();
  /** The latest event of the run's stream, once one came. */
  readonly progress = input<SweepProgressEvent | null>(null);
  readonly canCancel = input(false);
  readonly cancelRun = output<void>();

  protected readonly status = computed(() => this.progress()?.status ?? this.run().status);
  protected readonly statusLabel = computed(() => sweepStatusLabels[this.status()]);
  protected readonly kindLabel = computed(() => sweepKindLabels[this.run().kind]);
  protected readonly cancelling = computed(() => this.run().cancelRequested);

  private readonly done = computed(() => this.progress()?.pointsDone ?? this.run().pointsDone);
  private readonly total = computed(() => this.progress()?.pointsTotal ?? this.run().pointsTotal);
  protected readonly percent = computed(() => {
    const total = this.total();
    return total > 0 ? Math.floor((100 * this.done()) / total) : 0;
  });
  protected readonly points = computed(
    () => `${this.done().toLocaleString('en')} of ${this.total().toLocaleString('en')} poses`,
  );
  protected readonly elapsed = computed(() => {
    const p = this.progress();
    return p && p.status === 'running' ? formatDuration(p.elapsedS) : null;
  });
  protected readonly remaining = computed(() => {
    const r = this.progress()?.remainingS;
    return r === null || r === undefined ? null : formatDuration(r);
  });
}
