import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { Icon } from './icon';

/** A form's or a page's own error, when no single field is at fault. */
@Component({
  selector: 'app-problem-banner',
  imports: [Icon],
  template: `
    @if (message(); as text) {
      <div class="banner" role="alert" data-testid="problem-banner">
        <app-icon name="alert" />
        <span>{{ text }}</span>
      </div>
    }
  `,
  styles: `
    .banner {
      display: flex;
      align-items: flex-start;
      gap: 10px;
      padding: 12px 16px;
      margin-bottom: 16px;
      border-radius: var(--mat-sys-corner-medium);
      background: var(--mat-sys-error-container);
      color: var(--mat-sys-on-error-container);
      font: var(--mat-sys-body-medium);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProblemBanner {
  readonly message = input<string | null>(null);
}
