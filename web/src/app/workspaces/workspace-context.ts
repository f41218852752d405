import { Injectable, computed, inject, signal } from '@angular/core';
import { apiProblem } from '../api-problem';
import { WorkspacesApi } from './workspaces-api';

/**
 * The workspace that a `/w/:workspaceId` page shows, and the caller's role in it, fetched once by
 * the workspace layout and shared with the pages inside it. Provided by `WorkspaceLayout`.
 */
@Injectable()
export class WorkspaceContext {
  private readonly api = inject(WorkspacesApi);
  private readonly source = signal<(() => string) | null>(null);

  readonly id = computed(() => this.source()?.());
  readonly workspace = this.api.workspaceResource(() => this.id());
  readonly current = computed(() => (this.workspace.hasValue() ? this.workspace.value() : null));
  readonly role = computed(() => this.current()?.role ?? null);
  readonly isOwner = computed(() => this.role() === 'owner');
  readonly problem = computed(() => {
    const error = this.workspace.error();
    return error ? apiProblem(error) : null;
  });

  /** Follows the given id (the layout's route parameter). */
  bind(id: () => string): void {
    this.source.set(id);
  }
}
