import { Routes } from '@angular/router';
import { signedOutGuard } from './signed-out-guard';

export const authRoutes: Routes = [
  {
    path: 'sign-in',
    title: 'Sign in · Couplet',
    canActivate: [signedOutGuard],
    loadComponent: () => import('./sign-in-page').then((m) => m.SignInPage),
  },
  {
    path: 'sign-up',
    title: 'Create account · Couplet',
    canActivate: [signedOutGuard],
    loadComponent: () => import('./sign-up-page').then((m) => m.SignUpPage),
  },
  {
    path: 'forgot-password',
    title: 'Forgot password · Couplet',
    loadComponent: () => import('./forgot-password-page').then((m) => m.ForgotPasswordPage),
  },
  {
    path: 'reset-password',
    title: 'Choose a new password · Couplet',
    loadComponent: () => import('./reset-password-page').then((m) => m.ResetPasswordPage),
  },
];
