import { Routes } from '@angular/router';

/** `/w/:workspaceId/coils/…`: the coil library and its editor. */
export const coilRoutes: Routes = [
  {
    path: '',
    title: 'Coil library · Couplet',
    loadComponent: () => import('./coils-page').then((m) => m.CoilsPage),
  },
  {
    path: 'new',
    title: 'New coil · Couplet',
    loadComponent: () => import('./coil-editor-page').then((m) => m.CoilEditorPage),
  },
  {
    path: ':coilId',
    title: 'Coil · Couplet',
    loadComponent: () => import('./coil-editor-page').then((m) => m.CoilEditorPage),
  },
];
