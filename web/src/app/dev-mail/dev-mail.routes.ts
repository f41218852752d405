import { Routes } from '@angular/router';

export const devMailRoutes: Routes = [
  {
    path: '',
    title: 'Captured mail (development) · Couplet',
    loadComponent: () => import('./dev-mail-page').then((m) => m.DevMailPage),
  },
];
