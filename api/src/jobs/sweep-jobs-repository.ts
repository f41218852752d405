import { and, eq, inArray, sql } from 'drizzle-orm';
import { sweepRuns, type SweepRunRow } from '../../../schema/src/index';
import type { Executor } from '../db/database';

// The only place where the sweep worker meets Drizzle. Every write a worker makes is guarded by
// the job it holds (`job_id`): once recovery has handed the run to another job, the old worker's
// writes match no row and it stops.

/** PostgreSQL channel on which every change of a run is announced (payload: the run id). */
export const SWEEP_RUN_CHANNEL = 'couplet_sweep_run';

export async function notifySweepRun(ex: Executor, runId: string): Promise<void> {
  await ex.execute(sql`SELECT pg_notify(${SWEEP_RUN_CHANNEL}, ${runId})`);
}

/** queued → running for the job that was sent for it; undefined if it is not that job's to run. */
export async function claimRun(
  ex: Executor,
  runId: string,
  jobId: string,
): Promise<SweepRunRow | undefined> {
  const rows = await ex
    .update(sweepRuns)
    .set({
      status: 'running',
      startedAt: new Date(),
      pointsDone: 0,
      progressFraction: 0,
      error: null,
    })
    .where(and(eq(sweepRuns.id, runId), eq(sweepRuns.status, 'queued'), eq(sweepRuns.jobId, jobId)))
    .returning();
  return rows[0];
}

/** What a running worker learns on each write: whether it still owns the run, and a cancel. */
export interface RunControl {
  owned: boolean;
  cancelRequested: boolean;
}

const controlOf = (rows: { cancelRequestedAt: Date | null }[]): RunControl =>
  rows[0]
    ? { owned: true, cancelRequested: rows[0].cancelRequestedAt !== null }
    : { owned: false, cancelRequested: false };

const ownedBy = (runId: string, jobId: string) =>
  and(eq(sweepRuns.id, runId), eq(sweepRuns.status, 'running'), eq(sweepRuns.jobId, jobId));

export async function writeProgress(
  ex: Executor,
  runId: string,
  jobId: string,
  progress: { done: number; total: number },
): Promise<RunControl> {
  const rows = await ex
    .update(sweepRuns)
    .set({
      pointsDone: progress.done,
      progressFraction: progress.total > 0 ? progress.done / progress.total : 0,
    })
    .where(ownedBy(runId, jobId))
    .returning({ cancelRequestedAt: sweepRuns.cancelRequestedAt });
  return controlOf(rows);
}

export async function readRunControl(
  ex: Executor,
  runId: string,
  jobId: string,
): Promise<RunControl> {
  const rows = await ex
    .select({ cancelRequestedAt: sweepRuns.cancelRequestedAt })
    .from(sweepRuns)
    .where(ownedBy(runId, jobId));
  return controlOf(rows);
}

export type RunEnding =
  | { status: 'succeeded'; result: Record<string, unknown>; pointsTotal: number }
  | { status: 'cancelled'; pointsDone: number }
  | { status: 'failed'; error: string };

/** running → succeeded | cancelled | failed; false if the run is no longer this job's. */
export async function finishRun(
  ex: Executor,
  runId: string,
  jobId: string,
  ending: RunEnding,
  computeTimeS: number | null,
): Promise<boolean> {
  const common = { status: ending.status, finishedAt: new Date(), computeTimeS };
  const values =
    ending.status === 'succeeded'
      ? {
          ...common,
          result: ending.result,
          pointsDone: ending.pointsTotal,
          progressFraction: 1,
        }
      : ending.status === 'cancelled'
        ? { ...common, pointsDone: ending.pointsDone }
        : { ...common, error: ending.error };
  const rows = await ex
    .update(sweepRuns)
    .set(values)
    .where(ownedBy(runId, jobId))
    .returning({ id: sweepRuns.id });
  return rows.length === 1;
}

/**
 * Hands a queued or running run to a new job (the old one is gone, or its worker is). A run
 * whose cancel was requested meanwhile ends as cancelled instead. False if the run changed.
 */
export async function requeueRun(
  ex: Executor,
  runId: string,
  expected: { status: 'queued' | 'running'; jobId: string | null },
  newJobId: string,
): Promise<boolean> {
  const rows = await ex.execute<{ id: string }>(sql`
    UPDATE ${sweepRuns} SET
      status = CASE WHEN cancel_requested_at IS NULL THEN 'queued' ELSE 'cancelled' END::sweep_status,
      finished_at = CASE WHEN cancel_requested_at IS NULL THEN NULL ELSE now() END,
      job_id = ${newJobId},
      started_at = NULL,
      points_done = 0,
      progress_fraction = 0
    WHERE id = ${runId} AND status = ${expected.status}
      AND job_id IS NOT DISTINCT FROM ${expected.jobId}
    RETURNING id`);
  return rows.rows.length === 1;
}

/** running → failed by recovery (its workers kept vanishing). */
export async function failAbandonedRun(
  ex: Executor,
  runId: string,
  jobId: string | null,
  error: string,
): Promise<boolean> {
  const rows = await ex.execute<{ id: string }>(sql`
    UPDATE ${sweepRuns} SET status = 'failed', finished_at = now(), error = ${error}
    WHERE id = ${runId} AND status = 'running' AND job_id IS NOT DISTINCT FROM ${jobId}
    RETURNING id`);
  return rows.rows.length === 1;
}

/** Every run that is not finished, oldest first: what recovery looks at. */
export async function listUnfinishedRuns(ex: Executor) {
  return ex
    .select({ id: sweepRuns.id, status: sweepRuns.status, jobId: sweepRuns.jobId })
    .from(sweepRuns)
    .where(inArray(sweepRuns.status, ['queued', 'running']))
    .orderBy(sweepRuns.queuedAt);
}
