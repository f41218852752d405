import { httpResource } from '@angular/common/http';
import { Injectable, computed, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { NavigationEnd, Router } from '@angular/router';
import { filter, map } from 'rxjs';
import type { ListWorkspacesResponse } from '../api-types';
import { AuthSession } from '../auth/auth-session';
import { workspacesBase } from './workspaces-api';

/** The id in a `/w/:workspaceId/…` address, else null. */
export function workspaceIdInUrl(url: string): string | null {
  const match = /^\/w\/([^/?#;]+)/.exec(url);
  return match ? decodeURIComponent(match[1]) : null;
}

/**
 * The signed-in user's workspaces, for the switcher, and which one the address bar is in. Loaded
 * when a user signs in, dropped when they sign out.
 */
@Injectable({ providedIn: 'root' })
export class WorkspaceList {
  private readonly session = inject(AuthSession);
  private readonly router = inject(Router);

  readonly resource = httpResource<ListWorkspacesResponse>(() =>
    this.session.isSignedIn() ? workspacesBase : undefined,
  );
  readonly items = computed(() => (this.resource.hasValue() ? this.resource.value().items : []));

  readonly currentId = toSignal(
    this.router.events.pipe(
      filter((event) => event instanceof NavigationEnd),
      map(() => workspaceIdInUrl(this.router.url)),
    ),
    { initialValue: workspaceIdInUrl(this.router.url) },
  );
  readonly current = computed(() => this.items().find((w) => w.id === this.currentId()) ?? null);

  reload(): void {
    this.resource.reload();
  }
}
