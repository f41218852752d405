import type { RequestHandler } from 'express';
import { z } from 'zod';
import { defineRoute, type RouteDefinition } from '../http/route-definition';
import { currentUser } from '../http/request-context';
import type { WorkspacesService } from '../workspaces/workspaces-service';
import {
  forgotPasswordRequest,
  meResponse,
  resetPasswordRequest,
  sessionResponse,
  signInRequest,
  signUpRequest,
} from './auth-dto';
import type { AuthService, IssuedSession } from './auth-service';
import { clearRefreshCookie, readRefreshCookie, setRefreshCookie } from './refresh-cookie';

export interface AuthRouteDeps {
  auth: AuthService;
  workspaces: WorkspacesService;
  secureCookies: boolean;
  signInLimiter: RequestHandler;
  forgotPasswordLimiter: RequestHandler;
}

export function authRoutes(deps: AuthRouteDeps): RouteDefinition[] {
  const { auth, secureCookies } = deps;
  const withCookie = (res: Parameters<typeof setRefreshCookie>[0], session: IssuedSession) => {
    setRefreshCookie(res, session.refreshToken, secureCookies);
    return { user: session.user, accessToken: session.accessToken, expiresAt: session.expiresAt };
  };
  return [
    defineRoute({
      method: 'post',
      path: '/auth/sign-up',
      summary: 'Create an account and start a session',
      tag: 'auth',
      access: 'public',
      body: signUpRequest,
      success: { status: 201, description: 'Signed up and signed in', schema: sessionResponse },
      errors: [409],
      handle: async ({ body }, _req, res) => withCookie(res, await auth.signUp(body)),
    }),
    defineRoute({
      method: 'post',
      path: '/auth/sign-in',
      summary: 'Sign in with e-mail and password',
      tag: 'auth',
      access: 'public',
      before: [deps.signInLimiter],
      body: signInRequest,
      success: { status: 200, description: 'Signed in', schema: sessionResponse },
      errors: [401, 429],
      handle: async ({ body }, _req, res) => withCookie(res, await auth.signIn(body)),
    }),
    defineRoute({
      method: 'post',
      path: '/auth/refresh',
      summary: 'Exchange the refresh cookie for a new access token and a new cookie',
      tag: 'auth',
      access: 'public',
      success: { status: 200, description: 'Session renewed', schema: sessionResponse },
      errors: [401],
      handle: async (_input, req, res) => {
        try {
          return withCookie(res, await auth.refresh(readRefreshCookie(req)));
        } catch (err) {
          clearRefreshCookie(res, secureCookies);
          throw err;
        }
      },
    }),
    defineRoute({
      method: 'post',
      path: '/auth/sign-out',
      summary: 'End the session of the refresh cookie; its access tokens stop working too',
      tag: 'auth',
      access: 'public',
      success: { status: 204, description: 'Signed out' },
      handle: async (_input, req, res) => {
        await auth.signOut(readRefreshCookie(req));
        clearRefreshCookie(res, secureCookies);
        return undefined;
      },
    }),
    defineRoute({
      method: 'post',
      path: '/auth/forgot-password',
      summary: 'Mail a password-reset link if the account exists',
      tag: 'auth',
      access: 'public',
      before: [deps.forgotPasswordLimiter],
      body: forgotPasswordRequest,
      success: { status: 202, description: 'Accepted (whether or not the account exists)' },
      errors: [429],
      handle: async ({ body }) => {
        await auth.forgotPassword(body.email);
        return undefined;
      },
    }),
    defineRoute({
      method: 'post',
      path: '/auth/reset-password',
      summary: 'Set a new password with a reset token; ends every session and access token',
      tag: 'auth',
      access: 'public',
      body: resetPasswordRequest,
      success: { status: 204, description: 'Password changed' },
      handle: async ({ body }) => {
        await auth.resetPassword(body.token, body.password);
        return undefined;
      },
    }),
    defineRoute({
      method: 'get',
      path: '/me',
      summary: 'The signed-in user and their workspaces',
      tag: 'auth',
      access: 'user',
      query: z.object({}).strict(),
      success: { status: 200, description: 'The caller', schema: meResponse },
      handle: async (_input, req) => {
        const user = currentUser(req);
        return {
          user: await auth.getUser(user.id),
          workspaces: await deps.workspaces.listForUser(user.id),
        };
      },
    }),
  ];
}
