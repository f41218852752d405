import { and, desc, eq, inArray, isNull, max, sql } from 'drizzle-orm';
import {
  studyRevisions,
  sweepRuns,
  type StudyRevisionRow,
  type SweepRunRow,
} from '../../../schema/src/index';
import type { Executor } from '../db/database';

// The only place where study revisions meet Drizzle (and the sweep runs a revision freezes).

export async function nextRevisionNumber(ex: Executor, studyId: string): Promise<number> {
  const rows = await ex
    .select({ n: max(studyRevisions.number) })
    .from(studyRevisions)
    .where(eq(studyRevisions.studyId, studyId));
  return (rows[0]?.n ?? 0) + 1;
}

export async function insertRevision(
  ex: Executor,
  values: typeof studyRevisions.$inferInsert,
): Promise<StudyRevisionRow> {
  const rows = await ex.insert(studyRevisions).values(values).returning();
  return rows[0]!;
}

/** What a revision list shows: no coil snapshots and no result bodies (they can be megabytes). */
export async function listRevisions(ex: Executor, studyId: string) {
  return ex
    .select({
      id: studyRevisions.id,
      number: studyRevisions.number,
      summary: studyRevisions.summary,
      engineVersion: studyRevisions.engineVersion,
      inputsHash: sql<string>`${studyRevisions.inputs}->>'inputsHash'`,
      resultKinds: sql<string[] | null>`${studyRevisions.results}->'resultKinds'`,
      createdBy: studyRevisions.createdBy,
      createdAt: studyRevisions.createdAt,
    })
    .from(studyRevisions)
    .where(eq(studyRevisions.studyId, studyId))
    .orderBy(desc(studyRevisions.number));
}

export async function findRevision(ex: Executor, studyId: string, revisionId: string) {
  const rows = await ex
    .select()
    .from(studyRevisions)
    .where(and(eq(studyRevisions.id, revisionId), eq(studyRevisions.studyId, studyId)))
    .limit(1);
  return rows[0];
}

/**
 * The newest succeeded run of each sweep kind that computed from exactly these inputs (same
 * hash) with this engine version: what a revision freezes as its results.
 */
export async function matchingRuns(
  ex: Executor,
  studyId: string,
  inputsHash: string,
  engineVersion: string,
): Promise<SweepRunRow[]> {
  return ex
    .selectDistinctOn([sweepRuns.kind])
    .from(sweepRuns)
    .where(
      and(
        eq(sweepRuns.studyId, studyId),
        eq(sweepRuns.status, 'succeeded'),
        eq(sweepRuns.inputsHash, inputsHash),
        sql`${sweepRuns.spec}->>'engineVersion' = ${engineVersion}`,
      ),
    )
    .orderBy(
      sweepRuns.kind,
      sql`${sweepRuns.finishedAt} DESC NULLS LAST`,
      desc(sweepRuns.queuedAt),
      desc(sweepRuns.id),
    );
}

/**
 * Links runs to the revision that first froze them. A run already in an earlier revision keeps
 * that link; the later revision holds its own frozen copy of the run either way.
 */
export async function linkRunsToRevision(ex: Executor, runIds: string[], revisionId: string) {
  if (runIds.length === 0) return;
  await ex
    .update(sweepRuns)
    .set({ revisionId })
    .where(and(inArray(sweepRuns.id, runIds), isNull(sweepRuns.revisionId)));
}
