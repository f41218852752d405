import { ChangeDetectionStrategy, Component, OnInit, inject, input, signal } from '@angular/core';
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
import { passwordMax, passwordMin } from './password-rules';
import { returnUrl } from './return-url';

@Component({
  selector: 'app-sign-up-page',
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
  templateUrl: './sign-up-page.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignUpPage implements OnInit {
  readonly returnUrl = input<string>();
  /** Pre-filled from an invitation's address (query parameter `email`). */
  readonly email = input<string>();

  private readonly session = inject(AuthSession);
  private readonly router = inject(Router);

  protected readonly passwordMin = passwordMin;
  protected readonly passwordMax = passwordMax;
  protected readonly form = inject(NonNullableFormBuilder).group({
    displayName: ['', [Validators.required, Validators.maxLength(80), Validators.pattern(/\S/)]],
    email: ['', [Validators.required, Validators.email, Validators.maxLength(254)]],
    password: [
      '',
      [Validators.required, Validators.minLength(passwordMin), Validators.maxLength(passwordMax)],
    ],
  });
  protected readonly submitting = signal(false);
  protected readonly banner = signal<string | null>(null);
  protected readonly hidePassword = signal(true);

  ngOnInit(): void {
    const email = this.email();
    if (email) this.form.controls.email.setValue(email);
  }

  protected submit(): void {
    this.banner.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.submitting.set(true);
    const { displayName, email, password } = this.form.getRawValue();
    this.session.signUp({ displayName: displayName.trim(), email, password }).subscribe({
      next: () => void this.router.navigateByUrl(returnUrl(this.returnUrl())),
      error: (error: unknown) => {
        this.submitting.set(false);
        const problem = apiProblem(error);
        if (problem.code === 'conflict' && !problem.field) {
          // The one conflict sign-up can meet is an address already registered.
          problem.field = 'email';
        }
        this.banner.set(
          formProblem(this.form, problem, {
            email: { conflict: 'An account with this e-mail already exists. Sign in instead.' },
          }),
        );
      },
    });
  }
}
