import { provideHttpClient, withFetch, withInterceptors } from '@angular/common/http';
import {
  ApplicationConfig,
  inject,
  provideAppInitializer,
  provideBrowserGlobalErrorListeners,
} from '@angular/core';
import {
  provideRouter,
  withComponentInputBinding,
  withInMemoryScrolling,
  withRouterConfig,
} from '@angular/router';
import { appRoutes } from './app.routes';
import { authInterceptor } from './auth/auth-interceptor';
import { AuthSession } from './auth/auth-session';

export const appConfig: ApplicationConfig = {
  providers: [
    provideBrowserGlobalErrorListeners(),
    provideHttpClient(withFetch(), withInterceptors([authInterceptor])),
    provideRouter(
      appRoutes,
      withComponentInputBinding(),
      // Pages under /w/:workspaceId read the id as an input too.
      withRouterConfig({ paramsInheritanceStrategy: 'always' }),
      withInMemoryScrolling({ scrollPositionRestoration: 'top' }),
    ),
    // The refresh cookie, if any, signs the user back in before the first route is chosen, so
    // guards see the real session.
    provideAppInitializer(() => inject(AuthSession).restore()),
  ],
};
