import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { RouterLink } from '@angular/router';
import { StatusPanel } from './status-panel';

@Component({
  selector: 'app-not-found-page',
  imports: [MatButtonModule, RouterLink, StatusPanel],
  template: `
    <main class="page page-narrow">
      <app-status-panel
        kind="empty"
        [retryable]="false"
        message="There is no page at this address. It may have moved, or the link was cut short."
      >
        <a mat-flat-button routerLink="/workspaces">Go to your workspaces</a>
      </app-status-panel>
    </main>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NotFoundPage {}
