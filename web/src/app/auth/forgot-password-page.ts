import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { RouterLink } from '@angular/router';
import { apiProblem } from '../api-problem';
import { formProblem } from '../form-problem';
import { DevMailHint } from '../dev-mail/dev-mail-hint';
import { Icon } from '../shell/icon';
import { ProblemBanner } from '../shell/problem-banner';
import { AuthCard } from './auth-card';
import { AuthSession } from './auth-session';

@Component({
  selector: 'app-forgot-password-page',
  imports: [
    AuthCard,
    DevMailHint,
    Icon,
    MatButtonModule,
    MatFormFieldModule,
    MatInputModule,
    ProblemBanner,
    ReactiveFormsModule,
    RouterLink,
  ],
  template: `
    <app-auth-card
      heading="Forgot your password?"
      lede="We will e-mail you a link to choose a new one. The link works once, for one hour."
    >
      @if (sentTo(); as address) {
        <div class="sent" role="status" data-testid="reset-sent">
          <app-icon name="mail" />
          <p>
            If an account exists for <strong>{{ address }}</strong>, a reset link is on its way.
            Check your inbox.
          </p>
        </div>
        <app-dev-mail-hint />
        <div class="form-actions">
          <a mat-flat-button routerLink="/sign-in">Back to sign-in</a>
          <button mat-button type="button" (click)="sentTo.set(null)">Use another address</button>
        </div>
      } @else {
        <app-problem-banner [message]="banner()" />
        <form class="form-stack" [formGroup]="form" (ngSubmit)="submit()" novalidate>
          <mat-form-field appearance="outline">
            <mat-label>E-mail</mat-label>
            <input matInput formControlName="email" type="email" autocomplete="email" />
            @if (form.controls.email.hasError('server')) {
              <mat-error>{{ form.controls.email.getError('server') }}</mat-error>
            } @else if (form.controls.email.hasError('required')) {
              <mat-error>Enter the e-mail address of your account.</mat-error>
            } @else if (form.controls.email.hasError('maxlength')) {
              <mat-error>E-mail: at most 254 characters.</mat-error>
            } @else {
              <mat-error>E-mail: an address such as name&#64;example.com.</mat-error>
            }
          </mat-form-field>
          <div class="form-actions">
            <button mat-flat-button type="submit" [disabled]="submitting()">
              {{ submitting() ? 'Sending…' : 'Send reset link' }}
            </button>
            <a mat-button routerLink="/sign-in">Back to sign-in</a>
          </div>
        </form>
      }
    </app-auth-card>
  `,
  styles: `
    .sent {
      display: flex;
      gap: 12px;
      align-items: flex-start;
      padding: 16px;
      border-radius: var(--mat-sys-corner-medium);
      background: var(--mat-sys-primary-container);
      color: var(--mat-sys-on-primary-container);
    }
    .sent p {
      margin: 0;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ForgotPasswordPage {
  private readonly session = inject(AuthSession);

  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [Validators.required, Validators.email, Validators.maxLength(254)]],
  });
  protected readonly submitting = signal(false);
  protected readonly banner = signal<string | null>(null);
  protected readonly sentTo = signal<string | null>(null);

  protected submit(): void {
    this.banner.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.submitting.set(true);
    const { email } = this.form.getRawValue();
    this.session.forgotPassword({ email }).subscribe({
      next: () => {
        this.submitting.set(false);
        this.sentTo.set(email);
      },
      error: (error: unknown) => {
        this.submitting.set(false);
        this.banner.set(formProblem(this.form, apiProblem(error)));
      },
    });
  }
}
