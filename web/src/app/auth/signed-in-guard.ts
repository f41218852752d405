import { inject } from '@angular/core';
import { CanActivateFn, Router } from '@angular/router';
import { AuthSession } from './auth-session';

/** Pages for members only; the session was restored before the first navigation. */
export const signedInGuard: CanActivateFn = (_route, state) => {
  if (inject(AuthSession).isSignedIn()) return true;
  return inject(Router).createUrlTree(['/sign-in'], { queryParams: { returnUrl: state.url } });
};
