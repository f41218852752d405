import { and, asc, count, desc, eq, inArray } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import {
  coils,
  studies,
  studyRevisions,
  sweepRuns,
  users,
  type StudyRow,
} from '../../../schema/src/index';
import type { Executor } from '../db/database';

// The only place where studies (and the coils, revisions and runs a study shows) meet Drizzle.
// The coil and sweep tables are read here directly: their own features are separate folders.

export type StudyColumns = Omit<
  typeof studies.$inferInsert,
  'id' | 'workspaceId' | 'version' | 'createdAt' | 'updatedAt' | 'createdBy' | 'updatedBy'
>;

/**
 * The coils of a workspace with the given ids. `FOR KEY SHARE` holds them until the transaction
 * ends, so a coil cannot be deleted between this check and the study row that points at it.
 */
export async function findWorkspaceCoils(ex: Executor, workspaceId: string, ids: string[]) {
  return ex
    .select()
    .from(coils)
    .where(and(eq(coils.workspaceId, workspaceId), inArray(coils.id, ids)))
    .for('key share');
}

/** Both coils of a study as the library holds them now (same workspace by construction). */
export async function findCoilsById(ex: Executor, ids: string[]) {
  return ex.select().from(coils).where(inArray(coils.id, ids));
}

export async function insertStudy(
  ex: Executor,
  values: StudyColumns & { workspaceId: string; createdBy: string },
): Promise<StudyRow> {
  const rows = await ex
    .insert(studies)
    .values({ ...values, updatedBy: values.createdBy })
    .returning();
  return rows[0]!;
}

/**
 * Replaces a study's fields if its version is still `version`; the row lock an UPDATE takes
 * makes a racing save re-check the version after the first commits, so only one of them wins.
 */
export async function updateStudyIfVersion(
  ex: Executor,
  where: { workspaceId: string; studyId: string; version: number },
  values: StudyColumns & { updatedBy: string },
): Promise<StudyRow | undefined> {
  const rows = await ex
    .update(studies)
    .set({ ...values, version: where.version + 1, updatedAt: new Date() })
    .where(
      and(
        eq(studies.id, where.studyId),
        eq(studies.workspaceId, where.workspaceId),
        eq(studies.version, where.version),
      ),
    )
    .returning();
  return rows[0];
}

export async function findStudy(
  ex: Executor,
  workspaceId: string,
  studyId: string,
  lock: 'update' | null = null,
): Promise<StudyRow | undefined> {
  const query = ex
    .select()
    .from(studies)
    .where(and(eq(studies.id, studyId), eq(studies.workspaceId, workspaceId)))
    .limit(1);
  const rows = lock ? await query.for(lock) : await query;
  return rows[0];
}

export async function deleteStudy(ex: Executor, studyId: string): Promise<void> {
  await ex.delete(studies).where(eq(studies.id, studyId));
}

/** Display names of the given users (authors, savers), keyed by id. */
export async function displayNames(ex: Executor, ids: (string | null)[]) {
  const wanted = [...new Set(ids.filter((id): id is string => id !== null))];
  if (wanted.length === 0) return new Map<string, string>();
  const rows = await ex
    .select({ id: users.id, displayName: users.displayName })
    .from(users)
    .where(inArray(users.id, wanted));
  return new Map(rows.map((r) => [r.id, r.displayName]));
}

export async function latestRevision(ex: Executor, studyId: string) {
  const rows = await ex
    .select({
      id: studyRevisions.id,
      number: studyRevisions.number,
      createdAt: studyRevisions.createdAt,
    })
    .from(studyRevisions)
    .where(eq(studyRevisions.studyId, studyId))
    .orderBy(desc(studyRevisions.number))
    .limit(1);
  return rows[0];
}

export async function countRevisions(ex: Executor, studyId: string): Promise<number> {
  const rows = await ex
    .select({ n: count() })
    .from(studyRevisions)
    .where(eq(studyRevisions.studyId, studyId));
  return rows[0]?.n ?? 0;
}

const txCoils = alias(coils, 'tx_coil');
const rxCoils = alias(coils, 'rx_coil');

/** A workspace's studies with their coils' names, the most recently saved first. */
export async function listStudies(ex: Executor, workspaceId: string) {
  return ex
    .select({
      id: studies.id,
      name: studies.name,
      txCoilId: studies.txCoilId,
      txCoilName: txCoils.name,
      rxCoilId: studies.rxCoilId,
      rxCoilName: rxCoils.name,
      operatingFrequencyHz: studies.operatingFrequencyHz,
      thresholdKind: studies.thresholdKind,
      minCouplingK: studies.minCouplingK,
      minEfficiency: studies.minEfficiency,
      updatedAt: studies.updatedAt,
    })
    .from(studies)
    .leftJoin(txCoils, eq(txCoils.id, studies.txCoilId))
    .leftJoin(rxCoils, eq(rxCoils.id, studies.rxCoilId))
    .where(eq(studies.workspaceId, workspaceId))
    .orderBy(desc(studies.updatedAt), asc(studies.id));
}

export async function revisionCounts(ex: Executor, studyIds: string[]) {
  if (studyIds.length === 0) return new Map<string, number>();
  const rows = await ex
    .select({ studyId: studyRevisions.studyId, n: count() })
    .from(studyRevisions)
    .where(inArray(studyRevisions.studyId, studyIds))
    .groupBy(studyRevisions.studyId);
  return new Map(rows.map((r) => [r.studyId, r.n]));
}

/** The newest sweep run (by queue time) of each of the given studies. */
export async function lastRuns(ex: Executor, studyIds: string[]) {
  if (studyIds.length === 0) return new Map<string, never>();
  const rows = await ex
    .selectDistinctOn([sweepRuns.studyId], {
      studyId: sweepRuns.studyId,
      id: sweepRuns.id,
      kind: sweepRuns.kind,
      status: sweepRuns.status,
      finishedAt: sweepRuns.finishedAt,
    })
    .from(sweepRuns)
    .where(inArray(sweepRuns.studyId, studyIds))
    .orderBy(sweepRuns.studyId, desc(sweepRuns.queuedAt), desc(sweepRuns.id));
  return new Map(rows.map((r) => [r.studyId, r]));
}

/** True when a database error is the violation of the named unique constraint. */
export function isUniqueViolation(error: unknown, constraint: string): boolean {
  for (let e: unknown = error; e instanceof Error; e = e.cause) {
    const pg = e as Error & { code?: string; constraint?: string };
    if (pg.code === '23505') return pg.constraint === constraint;
  }
  return false;
}
