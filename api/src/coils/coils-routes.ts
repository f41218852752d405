import { z } from 'zod';
import { defineRoute, type RouteDefinition } from '../http/route-definition';
import { currentUser } from '../http/request-context';
import {
  coilParams,
  coilResponse,
  createCoilRequest,
  deleteCoilQuery,
  duplicateCoilRequest,
  listCoilsQuery,
  listCoilsResponse,
  updateCoilRequest,
} from './coils-dto';
import type { CoilsService } from './coils-service';

const workspaceParams = coilParams.pick({ workspaceId: true });
const noQuery = z.object({}).strict();

/** The coil library of a workspace: members read it, editors and owners change it. */
export function coilsRoutes(coils: CoilsService): RouteDefinition[] {
  const base = { tag: 'coils' } as const;
  const path = '/workspaces/:workspaceId/coils';
  return [
    defineRoute({
      ...base,
      method: 'get',
      path,
      summary: 'Coils of the workspace, last changed first (q: part of name or description)',
      access: { role: 'viewer' },
      params: workspaceParams,
      query: listCoilsQuery,
      success: { status: 200, description: 'Coils with their figures', schema: listCoilsResponse },
      handle: async ({ params, query }) => ({ items: await coils.list(params.workspaceId, query) }),
    }),
    defineRoute({
      ...base,
      method: 'post',
      path,
      summary: 'Add a coil; its figures are computed on save',
      access: { role: 'editor' },
      params: workspaceParams,
      body: createCoilRequest,
      success: { status: 201, description: 'Created', schema: coilResponse },
      errors: [409],
      handle: ({ params, body }, req) =>
        coils.create(params.workspaceId, currentUser(req).id, body),
    }),
    defineRoute({
      ...base,
      method: 'get',
      path: `${path}/:coilId`,
      summary: 'One coil with its figures and the studies that use it',
      access: { role: 'viewer' },
      params: coilParams,
      query: noQuery,
      success: { status: 200, description: 'The coil', schema: coilResponse },
      handle: ({ params }) => coils.get(params.workspaceId, params.coilId),
    }),
    defineRoute({
      ...base,
      method: 'put',
      path: `${path}/:coilId`,
      summary: 'Replace a coil; refused (stale_version) unless `version` is the stored one',
      access: { role: 'editor' },
      params: coilParams,
      body: updateCoilRequest,
      success: { status: 200, description: 'Saved', schema: coilResponse },
      errors: [409],
      handle: ({ params, body }, req) =>
        coils.update(params.workspaceId, params.coilId, currentUser(req).id, body),
    }),
    defineRoute({
      ...base,
      method: 'post',
      path: `${path}/:coilId/duplicate`,
      summary: 'Copy a coil under a new name (default "<name> (copy)", "(copy 2)" …)',
      access: { role: 'editor' },
      params: coilParams,
      // No body at all is allowed: the name is optional.
      body: duplicateCoilRequest.optional(),
      success: { status: 201, description: 'The copy', schema: coilResponse },
      errors: [409],
      handle: ({ params, body }, req) =>
        coils.duplicate(params.workspaceId, params.coilId, currentUser(req).id, body?.name),
    }),
    defineRoute({
      ...base,
      method: 'delete',
      path: `${path}/:coilId`,
      summary: 'Delete a coil no study uses (in_use otherwise); ?version must be current if given',
      access: { role: 'editor' },
      params: coilParams,
      query: deleteCoilQuery,
      success: { status: 204, description: 'Deleted' },
      errors: [409],
      handle: async ({ params, query }, req) => {
        await coils.delete(params.workspaceId, params.coilId, currentUser(req).id, query.version);
        return undefined;
      },
    }),
  ];
}
