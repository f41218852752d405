import { TitleCasePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, inject, input, output, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import {
  FormGroupDirective,
  NonNullableFormBuilder,
  ReactiveFormsModule,
  Validators,
} from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { apiProblem } from '../api-problem';
import type { InvitationResponse, Role } from '../api-types';
import { roleDescriptions, roles } from '../api-types';
import { formProblem } from '../form-problem';
import { Icon } from '../shell/icon';
import { ProblemBanner } from '../shell/problem-banner';
import { WorkspacesApi } from './workspaces-api';

/** The owner's form to invite someone by e-mail with a role. */
@Component({
  selector: 'app-invite-form',
  imports: [
    Icon,
    MatButtonModule,
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
    ProblemBanner,
    ReactiveFormsModule,
    TitleCasePipe,
  ],
  templateUrl: './invite-form.html',
  styleUrl: './invite-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InviteForm {
  readonly workspaceId = input.required<string>();
  readonly invited = output<InvitationResponse>();

  private readonly api = inject(WorkspacesApi);

  protected readonly roles = roles;
  protected readonly roleDescriptions = roleDescriptions;
  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [Validators.required, Validators.email, Validators.maxLength(254)]],
    role: ['editor' as Role, [Validators.required]],
  });
  /** A signal, so the hint follows a choice made in the select's overlay. */
  protected readonly chosenRole = toSignal(this.form.controls.role.valueChanges, {
    initialValue: this.form.controls.role.value,
  });
  protected readonly sending = signal(false);
  protected readonly banner = signal<string | null>(null);

  protected submit(directive: FormGroupDirective): void {
    this.banner.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.sending.set(true);
    this.api.invite(this.workspaceId(), this.form.getRawValue()).subscribe({
      next: (invitation) => {
        this.sending.set(false);
        // Resetting the directive too clears `submitted`, so the emptied field shows no error.
        directive.resetForm({ email: '', role: this.form.controls.role.value });
        this.invited.emit(invitation);
      },
      error: (error: unknown) => {
        this.sending.set(false);
        const problem = apiProblem(error);
        if (problem.code === 'conflict' && !problem.field) problem.field = 'email';
        this.banner.set(
          formProblem(this.form, problem, {
            email: { conflict: 'This person is already a member or has a pending invitation.' },
          }),
        );
      },
    });
  }
}
