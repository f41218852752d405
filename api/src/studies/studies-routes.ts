import { z } from 'zod';
import { defineRoute, type RouteDefinition } from '../http/route-definition';
import { currentMembership, currentUser } from '../http/request-context';
import { workspaceParams } from '../workspaces/workspaces-dto';
import type { RevisionsService } from './revisions-service';
import {
  createRevisionRequest,
  createStudyRequest,
  deleteStudyQuery,
  listRevisionsResponse,
  listStudiesResponse,
  revisionParams,
  revisionResponse,
  studyParams,
  studyResponse,
  updateStudyRequest,
} from './studies-dto';
import type { StudiesService } from './studies-service';

const noQuery = z.object({}).strict();
const studyPath = '/workspaces/:workspaceId/studies/:studyId';

export function studiesRoutes(
  studies: StudiesService,
  revisions: RevisionsService,
): RouteDefinition[] {
  const base = { tag: 'studies' } as const;
  return [
    defineRoute({
      ...base,
      method: 'get',
      path: '/workspaces/:workspaceId/studies',
      summary: 'Studies of the workspace, the most recently saved first',
      access: { role: 'viewer' },
      params: workspaceParams,
      query: noQuery,
      success: { status: 200, description: 'Studies', schema: listStudiesResponse },
      handle: async ({ params }) => ({ items: await studies.list(params.workspaceId) }),
    }),
    defineRoute({
      ...base,
      method: 'post',
      path: '/workspaces/:workspaceId/studies',
      summary: 'Create a study from a Tx and an Rx coil of the library (they may be the same coil)',
      access: { role: 'editor' },
      params: workspaceParams,
      body: createStudyRequest,
      success: { status: 201, description: 'Created', schema: studyResponse },
      errors: [409],
      handle: ({ params, body }, req) =>
        studies.create(params.workspaceId, currentUser(req).id, body),
    }),
    defineRoute({
      ...base,
      method: 'get',
      path: studyPath,
      summary: "One study with both coils' current library specs and figures",
      access: { role: 'viewer' },
      params: studyParams,
      query: noQuery,
      success: { status: 200, description: 'The study', schema: studyResponse },
      handle: ({ params }) => studies.get(params.workspaceId, params.studyId),
    }),
    defineRoute({
      ...base,
      method: 'put',
      path: studyPath,
      summary: 'Replace a study (the version loaded must still be current)',
      access: { role: 'editor' },
      params: studyParams,
      body: updateStudyRequest,
      success: { status: 200, description: 'Saved', schema: studyResponse },
      errors: [409],
      handle: ({ params, body }, req) =>
        studies.update(params.workspaceId, params.studyId, currentUser(req).id, body),
    }),
    defineRoute({
      ...base,
      method: 'delete',
      path: studyPath,
      summary: 'Delete a study with its runs and revisions (with revisions: owner only)',
      access: { role: 'editor' },
      params: studyParams,
      query: deleteStudyQuery,
      success: { status: 204, description: 'Deleted' },
      errors: [409],
      handle: async ({ params, query }, req) => {
        const actor = { id: currentUser(req).id, role: currentMembership(req).role };
        await studies.delete(params.workspaceId, params.studyId, actor, query.version);
        return undefined;
      },
    }),
    defineRoute({
      ...base,
      method: 'post',
      path: `${studyPath}/revisions`,
      summary: 'Freeze the study, both coils and its current results as a new revision',
      access: { role: 'editor' },
      params: studyParams,
      body: createRevisionRequest,
      success: { status: 201, description: 'Revision saved', schema: revisionResponse },
      errors: [409],
      handle: ({ params, body }, req) =>
        revisions.create(params.workspaceId, params.studyId, currentUser(req).id, body),
    }),
    defineRoute({
      ...base,
      method: 'get',
      path: `${studyPath}/revisions`,
      summary: 'Revisions of a study, the newest first (without result bodies)',
      access: { role: 'viewer' },
      params: studyParams,
      query: noQuery,
      success: { status: 200, description: 'Revisions', schema: listRevisionsResponse },
      handle: async ({ params }) => ({
        items: await revisions.list(params.workspaceId, params.studyId),
      }),
    }),
    defineRoute({
      ...base,
      method: 'get',
      path: `${studyPath}/revisions/:revisionId`,
      summary: 'One revision in full: inputs, coil snapshots and frozen results',
      access: { role: 'viewer' },
      params: revisionParams,
      query: noQuery,
      success: { status: 200, description: 'The revision', schema: revisionResponse },
      handle: ({ params }) => revisions.get(params.workspaceId, params.studyId, params.revisionId),
    }),
  ];
}
