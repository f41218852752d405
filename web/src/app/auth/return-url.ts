/**
 * The in-app path to go back to after signing in. Only same-origin paths pass: a return URL comes
 * from the address bar, and an absolute or protocol-relative one would make Couplet an open
 * redirect.
 */
export function returnUrl(candidate: string | null | undefined, fallback = '/workspaces'): string {
  if (!candidate || !candidate.startsWith('/') || candidate.startsWith('//')) return fallback;
  if (candidate.startsWith('/\\') || candidate.startsWith('/sign-in')) return fallback;
  return candidate;
}
