import { DatePipe, TitleCasePipe } from '@angular/common';
import {
  ChangeDetectionStrategy,
  Component,
  ElementRef,
  computed,
  effect,
  inject,
  input,
  signal,
  viewChild,
} from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { Router, RouterLink } from '@angular/router';
import { apiProblem } from '../api-problem';
import { formProblem } from '../form-problem';
import { Icon } from '../shell/icon';
import { ProblemBanner } from '../shell/problem-banner';
import { StatusPanel } from '../shell/status-panel';
import { WorkspaceList } from './workspace-list';
import { WorkspacesApi } from './workspaces-api';

@Component({
  selector: 'app-workspaces-page',
  imports: [
    DatePipe,
    Icon,
    MatButtonModule,
    MatFormFieldModule,
    MatInputModule,
    ProblemBanner,
    ReactiveFormsModule,
    RouterLink,
    StatusPanel,
    TitleCasePipe,
  ],
  templateUrl: './workspaces-page.html',
  styleUrl: './workspaces-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WorkspacesPage {
  /** Query parameter `new`: the switcher's "New workspace" puts the cursor in the form. */
  readonly new = input<string>();

  private readonly api = inject(WorkspacesApi);
  private readonly router = inject(Router);
  protected readonly list = inject(WorkspaceList);

  private readonly nameInput = viewChild<ElementRef<HTMLInputElement>>('nameInput');

  protected readonly form = inject(NonNullableFormBuilder).group({
    name: ['', [Validators.required, Validators.maxLength(80), Validators.pattern(/\S/)]],
  });
  protected readonly creating = signal(false);
  protected readonly banner = signal<string | null>(null);
  protected readonly problem = computed(() => {
    const error = this.list.resource.error();
    return error ? apiProblem(error) : null;
  });

  constructor() {
    effect(() => {
      const input = this.nameInput();
      if (this.new() !== undefined && input) input.nativeElement.focus();
    });
  }

  protected create(): void {
    this.banner.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.creating.set(true);
    this.api.create(this.form.getRawValue().name.trim()).subscribe({
      next: (workspace) => {
        this.list.reload();
        void this.router.navigate(['/w', workspace.id]);
      },
      error: (error: unknown) => {
        this.creating.set(false);
        this.banner.set(formProblem(this.form, apiProblem(error)));
      },
    });
  }
}
