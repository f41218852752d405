import {
  ChangeDetectionStrategy,
  Component,
  WritableSignal,
  computed,
  inject,
  signal,
} from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import type { Sort } from '@angular/material/sort';
import { RouterLink } from '@angular/router';
import { apiProblem } from '../api-problem';
import type { CoilKind, CoilResponse } from '../api-types';
import { Icon } from '../shell/icon';
import { StatusPanel } from '../shell/status-panel';
import { WorkspaceContext } from '../workspaces/workspace-context';
import { CoilActions } from './coil-actions';
import { coilKindOptions } from './coil-kind-labels';
import { canEditCoils } from './coil-role';
import { coilRows, type CoilSort } from './coil-rows';
import { CoilsApi } from './coils-api';
import { CoilsTable } from './coils-table';

/** `/w/:workspaceId/coils`: the workspace's coils, searchable by name and kind. */
@Component({
  selector: 'app-coils-page',
  imports: [
    CoilsTable,
    Icon,
    MatButtonModule,
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
    RouterLink,
    StatusPanel,
  ],
  templateUrl: './coils-page.html',
  styleUrl: './coils-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CoilsPage {
  private readonly api = inject(CoilsApi);
  private readonly actions = inject(CoilActions);
  protected readonly context = inject(WorkspaceContext);

  protected readonly coils = this.api.listResource(() => this.context.id());
  protected readonly problem = computed(() => {
    const error = this.coils.error();
    return error ? apiProblem(error) : null;
  });
  protected readonly editable = computed(() => canEditCoils(this.context.role()));
  protected readonly kindOptions = coilKindOptions;

  protected readonly search = signal('');
  protected readonly kind: WritableSignal<CoilKind | null> = signal(null);
  private readonly sort = signal<CoilSort>({ active: '', direction: '' });
  protected readonly busy = signal<ReadonlySet<string>>(new Set());

  private readonly all = computed(() => (this.coils.hasValue() ? this.coils.value().items : []));
  protected readonly rows = computed(() =>
    coilRows(this.all(), { text: this.search(), kind: this.kind() }, this.sort()),
  );
  protected readonly total = computed(() => this.all().length);

  protected sorted(sort: Sort): void {
    this.sort.set({ active: sort.active, direction: sort.direction });
  }

  protected clearFilters(): void {
    this.search.set('');
    this.kind.set(null);
  }

  protected duplicate(coil: CoilResponse): void {
    this.mark(coil.id, true);
    this.actions.duplicate(coil).subscribe({
      next: () => this.coils.reload(),
      complete: () => this.mark(coil.id, false),
    });
  }

  protected remove(coil: CoilResponse): void {
    this.mark(coil.id, true);
    this.actions.delete(coil).subscribe((outcome) => {
      this.mark(coil.id, false);
      if (outcome === 'deleted' || outcome === 'failed') this.coils.reload();
    });
  }

  private mark(id: string, on: boolean): void {
    const next = new Set(this.busy());
    if (on) next.add(id);
    else next.delete(id);
    this.busy.set(next);
  }
}
