import {
  OpenAPIRegistry,
  OpenApiGeneratorV31,
  type RouteConfig,
} from '@asteasolutions/zod-to-openapi';
import { z } from 'zod';
import * as authDto from '../auth/auth-dto';
import { problemResponse } from '../errors/problem-dto';
import type { RouteDefinition } from '../http/route-definition';
import * as workspacesDto from '../workspaces/workspaces-dto';

type OpenApiDocument = ReturnType<OpenApiGeneratorV31['generateDocument']>;

const problemDescriptions: Record<number, string> = {
  400: 'Invalid input (validation_failed, malformed_json)',
  401: 'Not signed in, or the token is invalid or expired',
  403: 'Your role in the workspace is too low',
  404: 'Not found, or not a member of the workspace',
  409: 'Conflict with the current state',
  413: 'Body too large',
  429: 'Too many attempts',
};

function pascal(name: string): string {
  return name.charAt(0).toUpperCase() + name.slice(1);
}

/** `/workspaces/:workspaceId` → `/workspaces/{workspaceId}`. */
export function openApiPath(expressPath: string): string {
  return expressPath.replace(/:([A-Za-z0-9_]+)/g, '{$1}');
}

function errorStatuses(route: RouteDefinition): number[] {
  const statuses = new Set<number>(route.errors ?? []);
  if (route.params || route.query || route.body) statuses.add(400);
  if (route.body) statuses.add(413);
  if (route.access !== 'public') statuses.add(401);
  if (typeof route.access === 'object') [403, 404].forEach((s) => statuses.add(s));
  return [...statuses].sort();
}

/** The OpenAPI 3.1 document, generated from the same route table and zod schemas the API runs. */
export function buildOpenApiDocument(routes: RouteDefinition[], version: string): OpenApiDocument {
  const registry = new OpenAPIRegistry();
  const named = new Map<z.ZodType, z.ZodType>();
  for (const [name, value] of [...Object.entries(authDto), ...Object.entries(workspacesDto)]) {
    if (value instanceof z.ZodType && /(Request|Response)$/.test(name)) {
      // A `.meta` id makes the generator emit the schema once under components/schemas.
      named.set(value, value.meta({ id: pascal(name) }));
    }
  }
  const problem = problemResponse.meta({ id: 'ProblemResponse' });
  const ref = (schema: z.ZodType) => named.get(schema) ?? schema;
  const bearer = registry.registerComponent('securitySchemes', 'bearer', {
    type: 'http',
    scheme: 'bearer',
    bearerFormat: 'JWT',
  });

  for (const route of routes) {
    const responses: RouteConfig['responses'] = {
      [route.success.status]: route.success.schema
        ? {
            description: route.success.description,
            content: { 'application/json': { schema: ref(route.success.schema) } },
          }
        : { description: route.success.description },
    };
    for (const status of errorStatuses(route)) {
      responses[status] = {
        description: problemDescriptions[status] ?? 'Error',
        content: { 'application/problem+json': { schema: problem } },
      };
    }
    const request: RouteConfig['request'] = {};
    if (route.params) request.params = route.params as never;
    if (route.query) request.query = route.query as never;
    if (route.body) {
      request.body = { content: { 'application/json': { schema: ref(route.body) } } };
    }
    registry.registerPath({
      method: route.method,
      path: `/api/v1${openApiPath(route.path)}`,
      summary: route.summary,
      tags: [route.tag],
      security: route.access === 'public' ? [] : [{ [bearer.name]: [] }],
      request,
      responses,
    });
  }

  return new OpenApiGeneratorV31(registry.definitions).generateDocument({
    openapi: '3.1.0',
    info: {
      title: 'Couplet API',
      version,
      description: 'Coil-pair design workbench for inductive chargers. Errors are RFC 9457 bodies.',
    },
  });
}
