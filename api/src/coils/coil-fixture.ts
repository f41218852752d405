import { randomUUID } from 'node:crypto';
import { asc, eq, sql } from 'drizzle-orm';
import type { Express } from 'express';
import request from 'supertest';
import { auditEvents, coils, studies } from '../../../schema/src/index';
import type { Database } from '../db/database';
import { bearer, type TestUser } from '../testing/test-app';
import type { CoilResponse, CreateCoilRequest } from './coils-dto';

// Shared by the coil library's test files: sample requests, a way to add a coil through the API,
// a study row that holds on to coils, and a snapshot of everything a refused request must leave.

/** A 10-turn circular spiral of 0.5 mm round wire, 20–45 mm across, at 140 kHz (invented). */
export function spiralRequest(name = `Spiral ${randomUUID().slice(0, 8)}`): CreateCoilRequest {
  return {
    name,
    description: 'test spiral',
    spec: {
      kind: 'circular-spiral',
      turns: 10,
      innerDiameter: 0.02,
      outerDiameter: 0.045,
      conductor: { type: 'round', diameter: 5e-4 },
    },
    operatingFrequencyHz: 140e3,
    ratedCurrentA: 1.5,
  };
}

/** A single round-wire ring, the case with a published closed form (invented size). */
export function ringRequest(name = `Ring ${randomUUID().slice(0, 8)}`): CreateCoilRequest {
  return {
    name,
    spec: { kind: 'ring', radius: 0.02, wireRadius: 5e-4 },
    operatingFrequencyHz: null,
    ratedCurrentA: null,
  };
}

export const coilsUrl = (workspaceId: string, suffix = '') =>
  `/api/v1/workspaces/${workspaceId}/coils${suffix}`;

export async function createCoil(
  app: Express,
  workspaceId: string,
  user: TestUser,
  body: CreateCoilRequest = spiralRequest(),
): Promise<CoilResponse> {
  const res = await request(app)
    .post(coilsUrl(workspaceId))
    .set('Authorization', bearer(user))
    .send(body);
  if (res.status !== 201) throw new Error(`coil create failed: ${res.status} ${res.text}`);
  return res.body as CoilResponse;
}

/** A study row that uses the coils as Tx and Rx, written straight to the table. */
export async function insertStudy(
  db: Database,
  workspaceId: string,
  txCoilId: string,
  rxCoilId: string,
  name = `Study ${randomUUID().slice(0, 8)}`,
): Promise<{ id: string; name: string }> {
  const rows = await db
    .insert(studies)
    .values({ workspaceId, name, txCoilId, rxCoilId, operatingFrequencyHz: 140e3 })
    .returning({ id: studies.id, name: studies.name });
  return rows[0]!;
}

/** The library and audit trail of a workspace, for before/after comparison. */
export async function librarySnapshot(db: Database, workspaceId: string) {
  const rows = await db
    .select()
    .from(coils)
    .where(eq(coils.workspaceId, workspaceId))
    .orderBy(asc(coils.id));
  const audit = await db
    .select({ n: sql<number>`count(*)::int` })
    .from(auditEvents)
    .where(eq(auditEvents.workspaceId, workspaceId));
  return { coils: rows, auditEvents: audit[0]!.n };
}
