import { inject } from '@angular/core';
import { CanActivateFn, Router } from '@angular/router';
import { catchError, map, of } from 'rxjs';
import { WorkspacesApi } from './workspaces-api';

/**
 * Owner-only pages. The role is asked of the server on each visit (roles can change while the app
 * is open); the server checks again on every write, so this only spares others a dead end.
 */
export const ownerGuard: CanActivateFn = (route) => {
  const router = inject(Router);
  const workspaceId = route.paramMap.get('workspaceId');
  if (!workspaceId) return router.createUrlTree(['/workspaces']);
  return inject(WorkspacesApi)
    .get(workspaceId)
    .pipe(
      map((workspace) =>
        workspace.role === 'owner' ? true : router.createUrlTree(['/w', workspaceId]),
      ),
      catchError(() => of(router.createUrlTree(['/w', workspaceId]))),
    );
};
