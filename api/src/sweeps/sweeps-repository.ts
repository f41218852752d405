import { and, desc, eq, getTableColumns, inArray, sql } from 'drizzle-orm';
import {
  coils,
  studies,
  sweepRuns,
  users,
  type CoilRow,
  type StudyRow,
  type SweepRunRow,
} from '../../../schema/src/index';
import type { Executor } from '../db/database';

// The only place where the sweep routes meet Drizzle. Studies and coils belong to their own
// features; the few reads a sweep needs of them are made here.

export async function findStudy(
  ex: Executor,
  workspaceId: string,
  studyId: string,
): Promise<StudyRow | undefined> {
  const rows = await ex
    .select()
    .from(studies)
    .where(and(eq(studies.id, studyId), eq(studies.workspaceId, workspaceId)))
    .limit(1);
  return rows[0];
}

export async function findCoils(ex: Executor, ids: string[]): Promise<CoilRow[]> {
  return ex.select().from(coils).where(inArray(coils.id, ids));
}

export async function insertSweepRun(
  ex: Executor,
  values: Pick<
    typeof sweepRuns.$inferInsert,
    'studyId' | 'kind' | 'inputsHash' | 'spec' | 'pointsTotal' | 'requestedBy'
  >,
): Promise<SweepRunRow> {
  const rows = await ex.insert(sweepRuns).values(values).returning();
  return rows[0]!;
}

export async function setSweepRunJob(ex: Executor, runId: string, jobId: string): Promise<void> {
  await ex.update(sweepRuns).set({ jobId }).where(eq(sweepRuns.id, runId));
}

/** A run row without its result body, and who queued it. */
export type SweepRunListRow = Omit<SweepRunRow, 'result'> & {
  result: null;
  requesterName: string | null;
};

const { result: _result, ...summaryColumns } = getTableColumns(sweepRuns);
const listColumns = {
  ...summaryColumns,
  result: sql<null>`NULL`,
  requesterName: users.displayName,
};

/** The runs of one study, newest first, without their result bodies (lists stay small). */
export async function listSweepRuns(ex: Executor, studyId: string): Promise<SweepRunListRow[]> {
  return ex
    .select(listColumns)
    .from(sweepRuns)
    .leftJoin(users, eq(users.id, sweepRuns.requestedBy))
    .where(eq(sweepRuns.studyId, studyId))
    .orderBy(desc(sweepRuns.queuedAt), desc(sweepRuns.id));
}

/** A run row and the display name of who queued it. */
export type SweepRunWithRequester = SweepRunRow & { requesterName: string | null };

/** One run of a study, with its result body only when asked for. */
export async function findSweepRun(
  ex: Executor,
  studyId: string,
  runId: string,
  withResult: boolean,
): Promise<SweepRunWithRequester | undefined> {
  const columns = withResult
    ? { ...getTableColumns(sweepRuns), requesterName: users.displayName }
    : listColumns;
  const rows = await ex
    .select(columns)
    .from(sweepRuns)
    .leftJoin(users, eq(users.id, sweepRuns.requestedBy))
    .where(and(eq(sweepRuns.id, runId), eq(sweepRuns.studyId, studyId)))
    .limit(1);
  return rows[0] as SweepRunWithRequester | undefined;
}

/**
 * Asks a queued or running run to stop: a queued run is cancelled at once, a running one keeps
 * running until its worker reads the request (at its next progress write). Undefined if the run
 * is not queued or running.
 */
export async function requestCancel(
  ex: Executor,
  studyId: string,
  runId: string,
): Promise<SweepRunWithRequester | undefined> {
  const rows = await ex.execute<{ id: string }>(sql`
    UPDATE ${sweepRuns} SET
      cancel_requested_at = COALESCE(cancel_requested_at, now()),
      status = CASE WHEN status = 'queued' THEN 'cancelled' ELSE status END,
      finished_at = CASE WHEN status = 'queued' THEN now() ELSE finished_at END
    WHERE id = ${runId} AND study_id = ${studyId} AND status IN ('queued', 'running')
    RETURNING id`);
  return rows.rows.length === 1 ? findSweepRun(ex, studyId, runId, false) : undefined;
}
