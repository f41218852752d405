import { inject } from '@angular/core';
import { CanActivateFn, Router } from '@angular/router';
import { AuthSession } from './auth-session';
import { returnUrl } from './return-url';

/** Sign-in and sign-up are pointless when signed in: go where the user was heading instead. */
export const signedOutGuard: CanActivateFn = (route) => {
  if (!inject(AuthSession).isSignedIn()) return true;
  return inject(Router).parseUrl(returnUrl(route.queryParamMap.get('returnUrl')));
};
