import { DatePipe } from '@angular/common';
import {
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  inject,
  signal,
} from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSnackBar } from '@angular/material/snack-bar';
import { apiProblem } from '../api-problem';
import { formProblem } from '../form-problem';
import { ProblemBanner } from '../shell/problem-banner';
import { StatusPanel } from '../shell/status-panel';
import { WorkspaceContext } from './workspace-context';
import { WorkspaceList } from './workspace-list';
import { WorkspacesApi } from './workspaces-api';

/** Owner only (guarded): the workspace's name and its record of who changed what. */
@Component({
  selector: 'app-workspace-settings-page',
  imports: [
    DatePipe,
    MatButtonModule,
    MatFormFieldModule,
    MatInputModule,
    ProblemBanner,
    ReactiveFormsModule,
    StatusPanel,
  ],
  templateUrl: './workspace-settings-page.html',
  styleUrl: './workspace-settings-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WorkspaceSettingsPage {
  private readonly api = inject(WorkspacesApi);
  private readonly list = inject(WorkspaceList);
  private readonly snackBar = inject(MatSnackBar);
  protected readonly context = inject(WorkspaceContext);

  protected readonly audit = this.api.auditResource(() => this.context.id());
  protected readonly auditProblem = computed(() => {
    const error = this.audit.error();
    return error ? apiProblem(error) : null;
  });
  protected readonly events = computed(() =>
    this.audit.hasValue() ? this.audit.value().items : [],
  );

  protected readonly form = inject(NonNullableFormBuilder).group({
    name: ['', [Validators.required, Validators.maxLength(80), Validators.pattern(/\S/)]],
  });
  protected readonly saving = signal(false);
  protected readonly banner = signal<string | null>(null);

  constructor() {
    effect(() => {
      const workspace = this.context.current();
      if (workspace && this.form.pristine) this.form.controls.name.setValue(workspace.name);
    });
  }

  protected rename(): void {
    const workspaceId = this.context.id();
    this.banner.set(null);
    if (!workspaceId) return;
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.saving.set(true);
    this.api.rename(workspaceId, this.form.getRawValue().name.trim()).subscribe({
      next: (workspace) => {
        this.saving.set(false);
        this.form.markAsPristine();
        this.context.workspace.reload();
        this.list.reload();
        this.audit.reload();
        this.snackBar.open(`Renamed to ${workspace.name}.`, undefined, { duration: 4000 });
      },
      error: (error: unknown) => {
        this.saving.set(false);
        this.banner.set(formProblem(this.form, apiProblem(error)));
      },
    });
  }
}
