import type { Request, RequestHandler, Response, Router } from 'express';
import type { z } from 'zod';
import type { Role } from '../workspaces/workspaces-dto';
import { validate } from './validate';

/** Who may call a route: anyone, any signed-in user, or a workspace member of at least a role. */
export type Access = 'public' | 'user' | { role: Role };

type Schema = z.ZodType | undefined;
type Infer<S extends Schema> = S extends z.ZodType ? z.output<S> : undefined;

export interface RouteInput<P extends Schema, Q extends Schema, B extends Schema> {
  params: Infer<P>;
  query: Infer<Q>;
  body: Infer<B>;
}

export interface RouteDefinition<
  P extends Schema = Schema,
  Q extends Schema = Schema,
  B extends Schema = Schema,
> {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  /** Express path below /api/v1, e.g. `/workspaces/:workspaceId`. */
  path: string;
  summary: string;
  tag: string;
  access: Access;
  params?: P;
  query?: Q;
  body?: B;
  success: { status: number; description: string; schema?: z.ZodType };
  /** Error statuses beyond the ones implied by validation and access, for the docs. */
  errors?: number[];
  /** Runs before validation (rate limits). */
  before?: RequestHandler[];
  /** Thin handler: calls a service and returns the response body (undefined for no body). */
  handle(input: RouteInput<P, Q, B>, req: Request, res: Response): Promise<unknown>;
}

/** Identity function that lets TypeScript infer the handler's input types from the schemas. */
export function defineRoute<P extends Schema, Q extends Schema, B extends Schema>(
  def: RouteDefinition<P, Q, B>,
): RouteDefinition {
  return def as unknown as RouteDefinition;
}

export interface AccessGuards {
  authenticate: RequestHandler;
  loadMembership: RequestHandler;
  requireRole(role: Role): RequestHandler;
}

function guardsFor(access: Access, guards: AccessGuards): RequestHandler[] {
  if (access === 'public') return [];
  if (access === 'user') return [guards.authenticate];
  return [guards.authenticate, guards.loadMembership, guards.requireRole(access.role)];
}

/** Mounts route definitions on a router: guards, then validation, handler and response DTO. */
export function mountRoutes(router: Router, routes: RouteDefinition[], guards: AccessGuards): void {
  for (const route of routes) {
    const run: RequestHandler = async (req, res) => {
      const input = {
        params: route.params ? validate(route.params, req.params, 'params') : undefined,
        query: route.query ? validate(route.query, req.query, 'query') : undefined,
        body: route.body ? validate(route.body, req.body, 'body') : undefined,
      };
      const result = await route.handle(input, req, res);
      res.status(route.success.status);
      if (route.success.schema === undefined) {
        res.end();
        return;
      }
      // Parsing the outgoing body strips any field the DTO does not name (no leaked columns).
      res.json(route.success.schema.parse(result));
    };
    router[route.method](
      route.path,
      ...(route.before ?? []),
      ...guardsFor(route.access, guards),
      run,
    );
  }
}
