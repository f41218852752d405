import { Routes } from '@angular/router';
import { signedInGuard } from './auth/signed-in-guard';
import { NotFoundPage } from './shell/not-found-page';

export const appRoutes: Routes = [
  { path: '', pathMatch: 'full', redirectTo: 'workspaces' },
  {
    path: 'workspaces',
    canActivate: [signedInGuard],
    loadChildren: () => import('./workspaces/workspaces.routes').then((m) => m.workspaceListRoutes),
  },
  {
    path: 'w/:workspaceId',
    canActivate: [signedInGuard],
    loadChildren: () => import('./workspaces/workspaces.routes').then((m) => m.workspaceRoutes),
  },
  {
    path: 'invitations',
    loadChildren: () => import('./invitations/invitations.routes').then((m) => m.invitationsRoutes),
  },
  {
    path: 'dev/mail',
    loadChildren: () => import('./dev-mail/dev-mail.routes').then((m) => m.devMailRoutes),
  },
  // Sign-in, sign-up and the password pages sit at the top level of the address space.
  { path: '', loadChildren: () => import('./auth/auth.routes').then((m) => m.authRoutes) },
  { path: '**', title: 'Not found · Couplet', component: NotFoundPage },
];
