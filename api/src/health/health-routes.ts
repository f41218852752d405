import { sql } from 'drizzle-orm';
import { z } from 'zod';
import type { Database } from '../db/database';
import { defineRoute, type RouteDefinition } from '../http/route-definition';

export const healthResponse = z.object({ status: z.literal('ok'), database: z.literal('ok') });

export function healthRoutes(db: Database): RouteDefinition[] {
  return [
    defineRoute({
      method: 'get',
      path: '/health',
      summary: 'Liveness, including a round trip to PostgreSQL',
      tag: 'health',
      access: 'public',
      success: { status: 200, description: 'Up', schema: healthResponse },
      handle: async () => {
        await db.execute(sql`SELECT 1`);
        return { status: 'ok', database: 'ok' };
      },
    }),
  ];
}
