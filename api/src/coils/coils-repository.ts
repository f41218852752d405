import { and, desc, eq, ilike, inArray, or, sql } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import { coils, studies, users, type CoilRow } from '../../../schema/src/index';
import type { Executor } from '../db/database';
import type { CoilKind } from './coils-dto';

// The only place where the coil library meets Drizzle.

/** What a save writes: the inputs and the engine's figures for them. */
export interface CoilValues {
  name: string;
  kind: CoilKind;
  description: string;
  spec: Record<string, unknown>;
  operatingFrequencyHz: number | null;
  ratedCurrentA: number | null;
  selfInductanceH: number;
  dcResistanceOhm: number;
  acResistanceOhm: number | null;
  qualityFactor: number | null;
  wireLengthM: number;
}

const creator = alias(users, 'coil_creator');
const updater = alias(users, 'coil_updater');

/** A coil row with the names of the people who created and last saved it. */
export type CoilWithPeople = CoilRow & {
  createdByName: string | null;
  updatedByName: string | null;
};

function selectWithPeople(ex: Executor) {
  return ex
    .select({
      coil: coils,
      createdByName: creator.displayName,
      updatedByName: updater.displayName,
    })
    .from(coils)
    .leftJoin(creator, eq(creator.id, coils.createdBy))
    .leftJoin(updater, eq(updater.id, coils.updatedBy));
}

function flatten(row: {
  coil: CoilRow;
  createdByName: string | null;
  updatedByName: string | null;
}): CoilWithPeople {
  return { ...row.coil, createdByName: row.createdByName, updatedByName: row.updatedByName };
}

/** `%` and `_` in a search text are literal characters, not wildcards. */
function likePattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

export async function listCoils(
  ex: Executor,
  workspaceId: string,
  filter: { q?: string; kind?: CoilKind },
): Promise<CoilWithPeople[]> {
  const q = filter.q?.trim();
  const rows = await selectWithPeople(ex)
    .where(
      and(
        eq(coils.workspaceId, workspaceId),
        filter.kind ? eq(coils.kind, filter.kind) : undefined,
        q
          ? or(ilike(coils.name, likePattern(q)), ilike(coils.description, likePattern(q)))
          : undefined,
      ),
    )
    .orderBy(desc(coils.updatedAt), desc(coils.id));
  return rows.map(flatten);
}

export async function findCoil(
  ex: Executor,
  workspaceId: string,
  coilId: string,
): Promise<CoilWithPeople | undefined> {
  const rows = await selectWithPeople(ex)
    .where(and(eq(coils.workspaceId, workspaceId), eq(coils.id, coilId)))
    .limit(1);
  return rows[0] ? flatten(rows[0]) : undefined;
}

/** Locks the coil row until the transaction ends (a study cannot start using it meanwhile). */
export async function lockCoil(
  ex: Executor,
  workspaceId: string,
  coilId: string,
): Promise<{ id: string; name: string; version: number } | undefined> {
  const rows = await ex
    .select({ id: coils.id, name: coils.name, version: coils.version })
    .from(coils)
    .where(and(eq(coils.workspaceId, workspaceId), eq(coils.id, coilId)))
    .for('update');
  return rows[0];
}

export async function insertCoil(
  ex: Executor,
  workspaceId: string,
  actorId: string,
  values: CoilValues,
): Promise<CoilRow> {
  const rows = await ex
    .insert(coils)
    .values({ ...values, workspaceId, createdBy: actorId, updatedBy: actorId })
    .returning();
  return rows[0]!;
}

/**
 * Saves a coil only if it is still at `version`: the check and the write are one statement, so of
 * two saves made from the same version exactly one matches a row. Undefined when none matched.
 */
export async function updateCoilAtVersion(
  ex: Executor,
  workspaceId: string,
  coilId: string,
  version: number,
  actorId: string,
  values: CoilValues,
): Promise<CoilRow | undefined> {
  const rows = await ex
    .update(coils)
    .set({
      ...values,
      updatedBy: actorId,
      updatedAt: sql`now()`,
      version: sql`${coils.version} + 1`,
    })
    .where(
      and(eq(coils.workspaceId, workspaceId), eq(coils.id, coilId), eq(coils.version, version)),
    )
    .returning();
  return rows[0];
}

export async function deleteCoil(ex: Executor, workspaceId: string, coilId: string) {
  const rows = await ex
    .delete(coils)
    .where(and(eq(coils.workspaceId, workspaceId), eq(coils.id, coilId)))
    .returning({ id: coils.id });
  return rows.length === 1;
}

/** Names in the workspace that begin with `prefix` (for picking a free "(copy n)" name). */
export async function namesStartingWith(
  ex: Executor,
  workspaceId: string,
  prefix: string,
): Promise<string[]> {
  const escaped = prefix.replace(/[\\%_]/g, (c) => `\\${c}`);
  const rows = await ex
    .select({ name: coils.name })
    .from(coils)
    .where(and(eq(coils.workspaceId, workspaceId), ilike(coils.name, `${escaped}%`)));
  return rows.map((r) => r.name);
}

/** Studies that use each of the coils as Tx or Rx, by coil id, ordered by study name. */
export async function studiesUsingCoils(
  ex: Executor,
  workspaceId: string,
  coilIds: string[],
): Promise<Map<string, { id: string; name: string }[]>> {
  const byCoil = new Map<string, { id: string; name: string }[]>();
  if (coilIds.length === 0) return byCoil;
  const rows = await ex
    .select({
      id: studies.id,
      name: studies.name,
      txCoilId: studies.txCoilId,
      rxCoilId: studies.rxCoilId,
    })
    .from(studies)
    .where(
      and(
        eq(studies.workspaceId, workspaceId),
        or(inArray(studies.txCoilId, coilIds), inArray(studies.rxCoilId, coilIds)),
      ),
    )
    .orderBy(studies.name, studies.id);
  for (const row of rows) {
    const ids = new Set([row.txCoilId, row.rxCoilId].filter((id) => id !== null));
    for (const coilId of ids) {
      const list = byCoil.get(coilId) ?? [];
      list.push({ id: row.id, name: row.name });
      byCoil.set(coilId, list);
    }
  }
  return byCoil;
}
