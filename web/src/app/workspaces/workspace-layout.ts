import { TitleCasePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatTabsModule } from '@angular/material/tabs';
import { RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';
import type { IconName } from '../shell/icon';
import { StatusPanel } from '../shell/status-panel';
import { workspaceFeatures } from '../shell/workspace-features';
import { WorkspaceContext } from './workspace-context';

interface NavLink {
  path: string;
  label: string;
  icon: IconName;
  exact: boolean;
  soon: boolean;
}

@Component({
  selector: 'app-workspace-layout',
  imports: [
    MatButtonModule,
    MatTabsModule,
    RouterLink,
    RouterLinkActive,
    RouterOutlet,
    StatusPanel,
    TitleCasePipe,
  ],
  providers: [WorkspaceContext],
  templateUrl: './workspace-layout.html',
  styleUrl: './workspace-layout.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WorkspaceLayout {
  /** Route parameter. */
  readonly workspaceId = input.required<string>();

  protected readonly context = inject(WorkspaceContext);

  protected readonly links = computed<NavLink[]>(() => [
    { path: '.', label: 'Home', icon: 'home', exact: true, soon: false },
    ...workspaceFeatures.map((f) => ({
      path: f.path,
      label: f.label,
      icon: f.icon,
      exact: false,
      soon: !f.ready,
    })),
    { path: 'members', label: 'Members', icon: 'people', exact: false, soon: false },
    ...(this.context.isOwner()
      ? [
          {
            path: 'settings',
            label: 'Settings',
            icon: 'settings' as const,
            exact: false,
            soon: false,
          },
        ]
      : []),
  ]);

  constructor() {
    this.context.bind(this.workspaceId);
  }
}
