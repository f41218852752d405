import { Routes } from '@angular/router';

/** `/w/:workspaceId/studies/…`: the study list and one study's workbench. */
export const studiesRoutes: Routes = [
  {
    path: '',
    title: 'Studies · Couplet',
    loadComponent: () => import('./studies-page').then((m) => m.StudiesPage),
  },
  {
    path: ':studyId',
    title: 'Study workbench · Couplet',
    // Its own chunk: three.js and the worker load only when a study is opened.
    loadComponent: () => import('./study-workbench-page').then((m) => m.StudyWorkbenchPage),
  },
];
