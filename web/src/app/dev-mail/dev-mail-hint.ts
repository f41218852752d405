import { ChangeDetectionStrategy, Component, OnInit, inject } from '@angular/core';
import { RouterLink } from '@angular/router';
import { Icon } from '../shell/icon';
import { DevMailApi } from './dev-mail-api';

/** Points to the captured-mail page, on development servers only. */
@Component({
  selector: 'app-dev-mail-hint',
  imports: [Icon, RouterLink],
  template: `
    @if (devMail.available()) {
      <p class="hint" data-testid="dev-mail-hint">
        <app-icon name="inbox" />
        <span>
          Development server: no real mail leaves it.
          <a routerLink="/dev/mail">Open the captured mail</a>.
        </span>
      </p>
    }
  `,
  styles: `
    .hint {
      display: flex;
      gap: 8px;
      align-items: center;
      margin: 12px 0;
      padding: 8px 12px;
      border-radius: var(--mat-sys-corner-small);
      border: 1px dashed var(--mat-sys-tertiary);
      color: var(--mat-sys-on-surface-variant);
      font: var(--mat-sys-body-small);
      --app-icon-size: 18px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DevMailHint implements OnInit {
  protected readonly devMail = inject(DevMailApi);

  ngOnInit(): void {
    this.devMail.probe();
  }
}
