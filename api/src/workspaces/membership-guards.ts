import type { RequestHandler } from 'express';
import { z } from 'zod';
import { ForbiddenError, NotFoundError, ValidationError } from '../errors/app-errors';
import { currentUser } from '../http/request-context';
import { roleAtLeast } from './role-rank';
import type { Role } from './workspaces-dto';
import type { WorkspacesService } from './workspaces-service';

const workspaceIdSchema = z.uuid();

/**
 * Loads the caller's membership of `:workspaceId` from the database on every request. A
 * non-member gets 404, so the response never tells whether the workspace exists.
 */
export function loadMembership(workspaces: WorkspacesService): RequestHandler {
  return async (req, _res, next) => {
    const raw = req.params.workspaceId;
    const parsed = workspaceIdSchema.safeParse(raw);
    if (!parsed.success) {
      next(new ValidationError('workspaceId: must be a UUID', 'workspaceId'));
      return;
    }
    const role = await workspaces.roleOf(parsed.data, currentUser(req).id);
    if (!role) {
      next(new NotFoundError('No such workspace'));
      return;
    }
    req.membership = { workspaceId: parsed.data, role };
    next();
  };
}

export function requireRole(required: Role): RequestHandler {
  return (req, _res, next) => {
    const role = req.membership?.role;
    if (!role || !roleAtLeast(role, required)) {
      next(new ForbiddenError(`This needs the ${required} role or higher`));
      return;
    }
    next();
  };
}
