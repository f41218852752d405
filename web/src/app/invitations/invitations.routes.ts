import { Routes } from '@angular/router';

export const invitationsRoutes: Routes = [
  {
    path: ':token',
    title: 'Invitation · Couplet',
    loadComponent: () => import('./accept-invitation-page').then((m) => m.AcceptInvitationPage),
  },
];
