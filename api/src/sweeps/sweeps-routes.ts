import type { Logger } from 'pino';
import { z } from 'zod';
import { defineRoute, type RouteDefinition } from '../http/route-definition';
import { currentUser } from '../http/request-context';
import { studyParams } from '../studies/studies-dto';
import { streamSweepEvents } from './stream-sweep-events';
import type { SweepsRuntime } from './sweeps-runtime';
import type { SweepsService } from './sweeps-service';
import {
  createSweepRequest,
  listSweepRunsResponse,
  sweepEstimateResponse,
  sweepRunParams,
  sweepRunResponse,
} from './sweeps-dto';

const noQuery = z.object({}).strict();
const base = '/workspaces/:workspaceId/studies/:studyId/sweeps';

export interface SweepsRoutesOptions {
  logger?: Logger;
}

export function sweepsRoutes(
  sweeps: SweepsService,
  runtime: SweepsRuntime,
  options: SweepsRoutesOptions = {},
): RouteDefinition[] {
  const common = { tag: 'sweeps' } as const;
  return [
    defineRoute({
      ...common,
      method: 'post',
      path: base,
      summary: 'Queue a sweep of the study (its inputs and coils are frozen into the run)',
      access: { role: 'editor' },
      params: studyParams,
      body: createSweepRequest,
      success: { status: 202, description: 'Queued', schema: sweepRunResponse },
      errors: [409],
      handle: ({ params, body }, req) =>
        sweeps.create(params.workspaceId, params.studyId, currentUser(req), body),
    }),
    defineRoute({
      ...common,
      method: 'post',
      path: `${base}/estimate`,
      summary: 'Measure what a sweep would cost: the pair prepared once, a sample of poses timed',
      access: { role: 'editor' },
      params: studyParams,
      body: createSweepRequest,
      success: { status: 200, description: 'The estimate', schema: sweepEstimateResponse },
      errors: [409],
      handle: ({ params, body }) => sweeps.estimate(params.workspaceId, params.studyId, body),
    }),
    defineRoute({
      ...common,
      method: 'get',
      path: base,
      summary: "The study's sweep runs, newest first, without their results",
      access: { role: 'viewer' },
      params: studyParams,
      query: noQuery,
      success: { status: 200, description: 'Runs', schema: listSweepRunsResponse },
      handle: ({ params }) => sweeps.list(params.workspaceId, params.studyId),
    }),
    defineRoute({
      ...common,
      method: 'get',
      path: `${base}/:runId`,
      summary: 'One sweep run, with its result once it succeeded',
      access: { role: 'viewer' },
      params: sweepRunParams,
      query: noQuery,
      success: { status: 200, description: 'The run', schema: sweepRunResponse },
      handle: ({ params }) => sweeps.get(params.workspaceId, params.studyId, params.runId),
    }),
    defineRoute({
      ...common,
      method: 'post',
      path: `${base}/:runId/cancel`,
      summary: 'Cancel a run: a queued one at once, a running one at its next chunk',
      access: { role: 'editor' },
      params: sweepRunParams,
      success: { status: 202, description: 'Cancel requested', schema: sweepRunResponse },
      errors: [409],
      handle: ({ params }) => sweeps.cancel(params.workspaceId, params.studyId, params.runId),
    }),
    defineRoute({
      ...common,
      method: 'get',
      path: `${base}/:runId/events`,
      summary:
        'Progress of a run as server-sent events (text/event-stream): `progress` events at ' +
        'most every 250 ms while it changes, then `end` with the run, then the stream closes',
      access: { role: 'viewer' },
      params: sweepRunParams,
      query: noQuery,
      // No JSON body: the handler writes the stream itself and resolves when it has closed
      // (the route layer then only ends a response that is already ended).
      success: { status: 200, description: 'text/event-stream of progress and end events' },
      handle: async ({ params }, _req, res) => {
        const source = await sweeps.streamSource(params.workspaceId, params.studyId, params.runId);
        await streamSweepEvents(res, source, runtime.events, options.logger, runtime.streamTiming);
      },
    }),
  ];
}
