import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { Router, RouterLink } from '@angular/router';
import { apiProblem } from '../api-problem';
import { formProblem } from '../form-problem';
import { Icon } from '../shell/icon';
import { ProblemBanner } from '../shell/problem-banner';
import { AuthCard } from './auth-card';
import { AuthSession } from './auth-session';
import { returnUrl } from './return-url';

@Component({
  selector: 'app-sign-in-page',
  imports: [
    AuthCard,
    Icon,
    MatButtonModule,
    MatFormFieldModule,
    MatInputModule,
    ProblemBanner,
    ReactiveFormsModule,
    RouterLink,
  ],
  templateUrl: './sign-in-page.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignInPage {
  /** Where to go after signing in (query parameter `returnUrl`). */
  readonly returnUrl = input<string>();

  private readonly session = inject(AuthSession);
  private readonly router = inject(Router);

  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [Validators.required, Validators.email, Validators.maxLength(254)]],
    password: ['', [Validators.required, Validators.maxLength(200)]],
  });
  protected readonly submitting = signal(false);
  protected readonly banner = signal<string | null>(null);
  protected readonly hidePassword = signal(true);

  protected submit(): void {
    this.banner.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.submitting.set(true);
    this.session.signIn(this.form.getRawValue()).subscribe({
      next: () => void this.router.navigateByUrl(returnUrl(this.returnUrl())),
      error: (error: unknown) => {
        this.submitting.set(false);
        const problem = apiProblem(error);
        this.banner.set(
          problem.code === 'invalid_credentials'
            ? 'That e-mail and password do not match an account. Check both and try again.'
            : formProblem(this.form, problem),
        );
      },
    });
  }
}
