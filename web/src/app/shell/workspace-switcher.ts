import { TitleCasePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatDividerModule } from '@angular/material/divider';
import { MatMenuModule } from '@angular/material/menu';
import { RouterLink } from '@angular/router';
import { WorkspaceList } from '../workspaces/workspace-list';
import { Icon } from './icon';

/** The toolbar's menu of the user's workspaces, with a way to start a new one. */
@Component({
  selector: 'app-workspace-switcher',
  imports: [Icon, MatDividerModule, MatMenuModule, RouterLink, TitleCasePipe],
  template: `
    <button
      type="button"
      class="trigger"
      [matMenuTriggerFor]="menu"
      [attr.aria-label]="'Workspace: ' + (list.current()?.name ?? 'none chosen') + '. Switch'"
      data-testid="workspace-switcher"
    >
      <span class="label">{{ list.current()?.name ?? 'Choose a workspace' }}</span>
      <app-icon name="chevron-down" class="chevron" />
    </button>
    <mat-menu #menu="matMenu" class="workspace-menu">
      @if (list.resource.isLoading() && list.items().length === 0) {
        <button mat-menu-item disabled>Loading workspaces…</button>
      } @else if (list.resource.error()) {
        <button mat-menu-item (click)="list.reload()">Could not load workspaces — retry</button>
      } @else {
        @for (workspace of list.items(); track workspace.id) {
          <a
            mat-menu-item
            [routerLink]="['/w', workspace.id]"
            [class.current]="workspace.id === list.currentId()"
            data-testid="switcher-workspace"
          >
            <span class="item">
              <span>{{ workspace.name }}</span>
              <span class="role">{{ workspace.role | titlecase }}</span>
            </span>
          </a>
        } @empty {
          <button mat-menu-item disabled>No workspaces yet</button>
        }
      }
      <mat-divider />
      <a
        mat-menu-item
        routerLink="/workspaces"
        [queryParams]="{ new: '' }"
        data-testid="switcher-new"
      >
        <app-icon name="plus" class="menu-icon" /> New workspace
      </a>
      <a mat-menu-item routerLink="/workspaces">All workspaces</a>
    </mat-menu>
  `,
  styles: `
    :host {
      min-width: 0;
    }
    .trigger {
      display: inline-flex;
      align-items: center;
      gap: 4px;
      max-width: min(360px, 40vw);
      height: 40px;
      padding: 0 12px 0 16px;
      border: 1px solid color-mix(in srgb, var(--mat-sys-on-primary) 40%, transparent);
      border-radius: var(--mat-sys-corner-full);
      background: color-mix(in srgb, var(--mat-sys-on-primary) 8%, transparent);
      color: var(--mat-sys-on-primary);
      font: var(--mat-sys-label-large);
      cursor: pointer;
    }
    .trigger:hover,
    .trigger:focus-visible {
      background: color-mix(in srgb, var(--mat-sys-on-primary) 16%, transparent);
    }
    .trigger:focus-visible {
      outline: 2px solid var(--mat-sys-on-primary);
      outline-offset: 2px;
    }
    .label {
      min-width: 0;
      overflow: hidden;
      text-overflow: ellipsis;
      white-space: nowrap;
    }
    .chevron {
      --app-icon-size: 18px;
      flex: none;
    }
    .item {
      display: flex;
      justify-content: space-between;
      gap: 24px;
      width: 100%;
    }
    .role {
      color: var(--mat-sys-on-surface-variant);
      font: var(--mat-sys-label-medium);
    }
    .current {
      background: var(--mat-sys-secondary-container);
    }
    .menu-icon {
      --app-icon-size: 18px;
      margin-right: 8px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WorkspaceSwitcher {
  protected readonly list = inject(WorkspaceList);
}
