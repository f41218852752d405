import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import {
  AbstractControl,
  NonNullableFormBuilder,
  ReactiveFormsModule,
  ValidationErrors,
  Validators,
} from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { RouterLink } from '@angular/router';
import { apiProblem } from '../api-problem';
import { Icon } from '../shell/icon';
import { ProblemBanner } from '../shell/problem-banner';
import { StatusPanel } from '../shell/status-panel';
import { AuthCard } from './auth-card';
import { AuthSession } from './auth-session';
import { passwordMax, passwordMin } from './password-rules';

function samePasswords(group: AbstractControl): ValidationErrors | null {
  const { password, repeat } = group.value as { password: string; repeat: string };
  return repeat && password !== repeat ? { mismatch: true } : null;
}

@Component({
  selector: 'app-reset-password-page',
  imports: [
    AuthCard,
    Icon,
    MatButtonModule,
    MatFormFieldModule,
    MatInputModule,
    ProblemBanner,
    ReactiveFormsModule,
    RouterLink,
    StatusPanel,
  ],
  templateUrl: './reset-password-page.html',
  styles: `
    .done {
      display: flex;
      gap: 12px;
      align-items: flex-start;
      padding: 16px;
      margin-bottom: 16px;
      border-radius: var(--mat-sys-corner-medium);
      background: var(--mat-sys-primary-container);
      color: var(--mat-sys-on-primary-container);
    }
    .done p {
      margin: 0;
    }
    .mismatch {
      margin: -4px 0 8px 16px;
      color: var(--mat-sys-error);
      font: var(--mat-sys-body-small);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ResetPasswordPage {
  /** The single-use token from the e-mailed link (query parameter `token`). */
  readonly token = input<string>();

  private readonly session = inject(AuthSession);

  protected readonly passwordMin = passwordMin;
  protected readonly passwordMax = passwordMax;
  protected readonly hasToken = computed(() => !!this.token());
  protected readonly form = inject(NonNullableFormBuilder).group(
    {
      password: [
        '',
        [Validators.required, Validators.minLength(passwordMin), Validators.maxLength(passwordMax)],
      ],
      repeat: ['', [Validators.required]],
    },
    { validators: samePasswords },
  );
  protected readonly submitting = signal(false);
  protected readonly banner = signal<string | null>(null);
  protected readonly linkSpent = signal(false);
  protected readonly done = signal(false);
  protected readonly hidePassword = signal(true);

  protected submit(): void {
    this.banner.set(null);
    const token = this.token();
    if (!token) return;
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.submitting.set(true);
    this.session.resetPassword({ token, password: this.form.getRawValue().password }).subscribe({
      next: () => {
        this.submitting.set(false);
        this.done.set(true);
      },
      error: (error: unknown) => {
        this.submitting.set(false);
        const problem = apiProblem(error);
        if (problem.field === 'password') {
          this.form.controls.password.setErrors({ server: problem.message });
        } else if (problem.status === 400 || problem.status === 404 || problem.status === 409) {
          // Anything wrong with the token itself: it is unknown, used, or older than an hour.
          this.linkSpent.set(true);
        } else {
          this.banner.set(problem.message);
        }
      },
    });
  }
}
