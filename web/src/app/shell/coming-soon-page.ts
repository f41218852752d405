import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { RouterLink } from '@angular/router';
import { Icon } from './icon';
import { workspaceFeatures } from './workspace-features';

/** The deliberate placeholder of a workspace screen that ships in a later release. */
@Component({
  selector: 'app-coming-soon-page',
  imports: [Icon, RouterLink],
  template: `
    @if (info(); as f) {
      <section class="soon" data-testid="coming-soon">
        <div class="badge"><app-icon [name]="f.icon" /></div>
        <h1 class="page-headline">{{ f.label }}</h1>
        <p class="tag">Coming in a later release</p>
        <p class="summary">{{ f.summary }}</p>
        <p class="muted">
          Meanwhile, set up the team on the <a routerLink="../members">Members</a> page so that
          everyone is in place when it arrives.
        </p>
      </section>
    }
  `,
  styles: `
    .soon {
      max-width: 560px;
      margin: 32px auto;
      padding: 40px 32px;
      text-align: center;
      border: 1px dashed var(--mat-sys-outline);
      border-radius: var(--mat-sys-corner-extra-large);
      background: var(--mat-sys-surface);
    }
    .badge {
      display: inline-flex;
      padding: 16px;
      border-radius: 50%;
      background: var(--mat-sys-tertiary-container);
      color: var(--mat-sys-on-tertiary-container);
      --app-icon-size: 36px;
      margin-bottom: 16px;
    }
    .tag {
      display: inline-block;
      margin: 8px 0 16px;
      padding: 4px 12px;
      border-radius: var(--mat-sys-corner-full);
      background: var(--mat-sys-secondary-container);
      color: var(--mat-sys-on-secondary-container);
      font: var(--mat-sys-label-large);
    }
    .summary {
      font: var(--mat-sys-body-large);
      margin: 0 0 16px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ComingSoonPage {
  /** Route data `feature`: which screen this stands in for. */
  readonly feature = input.required<string>();
  protected readonly info = computed(
    () => workspaceFeatures.find((f) => f.key === this.feature()) ?? null,
  );
}
