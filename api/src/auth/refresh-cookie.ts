import type { CookieOptions, Request, Response } from 'express';

export const refreshCookieName = 'couplet_refresh';
// Fourteen days of inactivity ends a session; every refresh starts the fourteen days again.
export const refreshTokenLifetimeMs = 14 * 24 * 3600_000;

function cookieOptions(secure: boolean): CookieOptions {
  // Strict same-site and a path limited to the auth routes keep the cookie away from every other
  // request, which is what makes cookie-based refresh safe without a CSRF token.
  return { httpOnly: true, sameSite: 'strict', secure, path: '/api/v1/auth' };
}

export function setRefreshCookie(res: Response, token: string, secure: boolean): void {
  res.cookie(refreshCookieName, token, {
    ...cookieOptions(secure),
    maxAge: refreshTokenLifetimeMs,
  });
}

export function clearRefreshCookie(res: Response, secure: boolean): void {
  res.clearCookie(refreshCookieName, cookieOptions(secure));
}

export function readRefreshCookie(req: Request): string | undefined {
  const value: unknown = (req.cookies as Record<string, unknown> | undefined)?.[refreshCookieName];
  return typeof value === 'string' && value.length > 0 && value.length <= 200 ? value : undefined;
}
