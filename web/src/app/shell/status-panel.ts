import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatProgressSpinnerModule } from '@angular/material/progress-spinner';
import { Icon } from './icon';

/**
 * The loading, error and empty states of a page or a section, drawn the same way everywhere.
 * The data state is the page's own markup.
 */
@Component({
  selector: 'app-status-panel',
  imports: [Icon, MatButtonModule, MatProgressSpinnerModule],
  template: `
    <div
      class="panel"
      [class.error]="kind() === 'error'"
      [attr.role]="kind() === 'error' ? 'alert' : 'status'"
      [attr.data-testid]="'status-' + kind()"
    >
      @switch (kind()) {
        @case ('loading') {
          <mat-progress-spinner mode="indeterminate" diameter="32" aria-hidden="true" />
        }
        @case ('error') {
          <app-icon name="alert" class="symbol" />
        }
        @case ('empty') {
          <app-icon name="inbox" class="symbol" />
        }
      }
      <p class="message">{{ text() }}</p>
      <ng-content />
      @if (kind() === 'error' && retryable()) {
        <button mat-stroked-button type="button" (click)="retry.emit()">Try again</button>
      }
    </div>
  `,
  styles: `
    .panel {
      display: flex;
      flex-direction: column;
      align-items: center;
      gap: 12px;
      padding: 32px 16px;
      text-align: center;
      color: var(--mat-sys-on-surface-variant);
    }
    .panel.error {
      color: var(--mat-sys-on-error-container);
      background: var(--mat-sys-error-container);
      border-radius: var(--mat-sys-corner-medium);
    }
    .symbol {
      --app-icon-size: 32px;
    }
    .message {
      margin: 0;
      font: var(--mat-sys-body-large);
      max-width: 48ch;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StatusPanel {
  readonly kind = input.required<'loading' | 'error' | 'empty'>();
  readonly message = input<string>('');
  readonly retryable = input(true);
  readonly retry = output<void>();

  protected readonly text = computed(
    () => this.message() || (this.kind() === 'loading' ? 'Loading…' : ''),
  );
}
