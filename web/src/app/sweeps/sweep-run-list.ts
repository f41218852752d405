import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import type { SweepRunResponse } from '../api-types';
import { formatDuration } from './format-duration';
import { sweepKindLabels, sweepStatusLabels } from './sweep-labels';

/** The study's runs, newest first: kind, status, whether it is stale, cost, who asked for it. */
@Component({
  selector: 'app-sweep-run-list',
  imports: [DatePipe, MatButtonModule],
  template: `
    <ol class="runs" data-testid="sweep-runs">
      @for (run of runs(); track run.id) {
        <li [class.shown]="shownIds().includes(run.id)">
          <div class="what">
            <strong>{{ kindLabels[run.kind] }}</strong>
            <span class="chip" [attr.data-status]="run.status">{{ statusLabels[run.status] }}</span>
            @if (!run.current) {
              <span
                class="chip stale"
                data-testid="run-stale"
                title="The study's inputs or coils changed after this run was queued"
                >stale</span
              >
            }
          </div>
          <div class="detail muted">
            {{ run.pointsTotal.toLocaleString('en') }} poses
            @if (run.computeTimeS !== null) {
              · computed in {{ duration(run.computeTimeS) }}
            }
            · {{ run.queuedAt | date: 'medium' }}
            @if (run.requestedBy) {
              · {{ run.requestedBy.displayName }}
            }
          </div>
          @if (run.error) {
            <div class="error">{{ run.error }}</div>
          }
          @if (run.status === 'succeeded' && !shownIds().includes(run.id)) {
            <button mat-button type="button" (click)="showRun.emit(run)">Show</button>
          }
        </li>
      }
    </ol>
  `,
  styles: `
    .runs {
      list-style: none;
      margin: 0;
      padding: 0;
      display: grid;
      gap: 2px;
    }
    li {
      display: grid;
      grid-template-columns: 1fr auto;
      align-items: center;
      gap: 2px 12px;
      padding: 8px 12px;
      border-radius: var(--mat-sys-corner-small);
    }
    li.shown {
      background: var(--mat-sys-secondary-container);
    }
    .what {
      display: flex;
      align-items: center;
      gap: 8px;
    }
    .detail,
    .error {
      grid-column: 1;
      font: var(--mat-sys-body-small);
    }
    .error {
      color: var(--mat-sys-error);
    }
    button {
      grid-column: 2;
      grid-row: 1 / span 2;
    }
    .chip {
      padding: 1px 8px;
      border-radius: 999px;
      font: var(--mat-sys-label-small);
      background: var(--mat-sys-surface-container-high);
      color: var(--mat-sys-on-surface);
    }
    .chip[data-status='succeeded'] {
      background: var(--mat-sys-primary-container);
      color: var(--mat-sys-on-primary-container);
    }
    .chip[data-status='running'],
    .chip[data-status='queued'] {
      background: var(--mat-sys-tertiary-container);
      color: var(--mat-sys-on-tertiary-container);
    }
    .chip[data-status='failed'] {
      background: var(--mat-sys-error-container);
      color: var(--mat-sys-on-error-container);
    }
    .chip.stale {
      background: transparent;
      border: 1px solid var(--mat-sys-outline);
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SweepRunList {
  readonly runs = input.required<SweepRunResponse[]>();
  /** The runs whose results are on screen. */
  readonly shownIds = input<string[]>([]);
  readonly showRun = output<SweepRunResponse>();

  protected readonly kindLabels = sweepKindLabels;
  protected readonly statusLabels = sweepStatusLabels;
  protected readonly duration = formatDuration;
}
