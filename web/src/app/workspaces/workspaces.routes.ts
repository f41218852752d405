import { Routes } from '@angular/router';
import { ownerGuard } from './owner-guard';

/** `/workspaces`: the user's workspaces and a new one. */
export const workspaceListRoutes: Routes = [
  {
    path: '',
    title: 'Workspaces · Couplet',
    loadComponent: () => import('./workspaces-page').then((m) => m.WorkspacesPage),
  },
];

/** `/w/:workspaceId/…`: one workspace, inside its navigation. */
export const workspaceRoutes: Routes = [
  {
    path: '',
    loadComponent: () => import('./workspace-layout').then((m) => m.WorkspaceLayout),
    children: [
      {
        path: '',
        title: 'Workspace · Couplet',
        loadComponent: () => import('./workspace-home-page').then((m) => m.WorkspaceHomePage),
      },
      {
        path: 'members',
        title: 'Members · Couplet',
        loadComponent: () => import('./members-page').then((m) => m.MembersPage),
      },
      {
        path: 'settings',
        title: 'Workspace settings · Couplet',
        canActivate: [ownerGuard],
        loadComponent: () =>
          import('./workspace-settings-page').then((m) => m.WorkspaceSettingsPage),
      },
      {
        path: 'coils',
        loadChildren: () => import('../coils/coils.routes').then((m) => m.coilRoutes),
      },
      {
        path: 'studies',
        loadChildren: () => import('../studies/studies.routes').then((m) => m.studiesRoutes),
      },
      {
        path: 'compare',
        title: 'Compare · Couplet',
        data: { feature: 'compare' },
        loadComponent: () => import('../shell/coming-soon-page').then((m) => m.ComingSoonPage),
      },
      {
        path: 'review',
        title: 'Review room · Couplet',
        data: { feature: 'review' },
        loadComponent: () => import('../shell/coming-soon-page').then((m) => m.ComingSoonPage),
      },
    ],
  },
];
