import type { Request } from 'express';
import type { Role } from '../workspaces/workspaces-dto';
import { UnauthenticatedError } from '../errors/app-errors';

/** The signed-in user as the auth middleware loads it from the database. */
export interface AuthUser {
  id: string;
  email: string;
  displayName: string;
}

/** The caller's membership in the workspace named by `:workspaceId`, read on every request. */
export interface MembershipContext {
  workspaceId: string;
  role: Role;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // Passport puts the verified principal on req.user; ours is an AuthUser.
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends AuthUser {}
    interface Request {
      membership?: MembershipContext;
    }
  }
}

export function currentUser(req: Request): AuthUser {
  if (!req.user) throw new UnauthenticatedError();
  return req.user;
}

export function currentMembership(req: Request): MembershipContext {
  if (!req.membership) throw new Error('membership middleware did not run for this route');
  return req.membership;
}
