import type { Logger } from 'pino';
import type { Database } from '../db/database';
import { clientTransaction } from './client-transaction';
import { tryLockRun, unlockRun } from './run-lock';
import {
  failAbandonedRun,
  listUnfinishedRuns,
  notifySweepRun,
  requeueRun,
} from './sweep-jobs-repository';
import type { SweepQueue } from './sweep-queue';

/**
 * A run is started at most this many times by workers that then vanished (crash, kill, lost
 * machine) before it is failed: a run that takes its worker down every time (say, out of
 * memory) must not cycle forever. A clean shutdown hands the run on without counting.
 */
export const MAX_RUN_ATTEMPTS = 3;

/**
 * A job fetched by a worker whose run is still queued this long afterwards: that worker died
 * between fetching and claiming (which takes milliseconds when it lives).
 */
const STALE_FETCH_MS = 120_000;

/** Thrown inside a hand-over transaction to roll it back when the run changed meanwhile. */
class RunChanged extends Error {}

/**
 * Finds runs that no worker will finish and hands them to new jobs:
 * - running, but nobody holds the run's advisory lock: its worker's connection is gone (process
 *   crashed or killed, machine lost) → requeued with attempt + 1, failed after MAX_RUN_ATTEMPTS;
 * - queued without a job (queued while the queue was not set up), or whose job is finished,
 *   archived, or fetched long ago by a worker that never claimed it → requeued.
 * Runs on every worker at start-up and then periodically, so a crash on one machine is repaired
 * by a worker on another without a restart. Each hand-over is one transaction (new job + row).
 */
export class SweepRecovery {
  private current: Promise<void> | undefined;

  constructor(
    private readonly db: Database,
    private readonly queue: SweepQueue,
    private readonly logger: Logger,
  ) {}

  /** One scan; a call while a scan is running joins it. */
  run(): Promise<void> {
    this.current ??= this.scan()
      .catch((err: unknown) => this.logger.warn({ err }, 'sweep recovery failed'))
      .finally(() => (this.current = undefined));
    return this.current;
  }

  idle(): Promise<void> {
    return this.current ?? Promise.resolve();
  }

  private async scan(): Promise<void> {
    for (const run of await listUnfinishedRuns(this.db)) {
      try {
        if (run.status === 'running') await this.checkRunning(run.id, run.jobId);
        else await this.checkQueued(run.id, run.jobId);
      } catch (error) {
        if (!(error instanceof RunChanged)) throw error;
      }
    }
  }

  private async checkRunning(runId: string, jobId: string | null): Promise<void> {
    await clientTransaction(this.db, async (tx, client) => {
      if (!(await tryLockRun(client, runId))) return; // its worker is alive
      try {
        const job = jobId ? await this.queue.jobState(jobId) : null;
        const attempt = (job?.attempt ?? 1) + 1;
        if (attempt > MAX_RUN_ATTEMPTS) {
          const error =
            `the run's worker stopped ${MAX_RUN_ATTEMPTS} times while computing it ` +
            '(crash or kill); it was not retried again';
          if (!(await failAbandonedRun(tx, runId, jobId, error))) throw new RunChanged();
          this.logger.warn({ runId }, 'sweep run failed after repeated worker loss');
        } else {
          await this.handOver(tx, client, runId, { status: 'running', jobId }, attempt);
          this.logger.warn({ runId, attempt }, 'sweep run requeued: its worker is gone');
        }
        if (jobId) await this.queue.cancel(client, jobId);
        await notifySweepRun(tx, runId);
      } finally {
        await unlockRun(client, runId);
      }
    });
  }

  private async checkQueued(runId: string, jobId: string | null): Promise<void> {
    const job = jobId ? await this.queue.jobState(jobId) : null;
    const waiting = job?.state === 'created' || job?.state === 'retry';
    const fetchedRecently =
      job?.state === 'active' &&
      job.startedOn !== null &&
      Date.now() - job.startedOn.getTime() < STALE_FETCH_MS;
    if (waiting || fetchedRecently) return;
    await clientTransaction(this.db, async (tx, client) => {
      await this.handOver(tx, client, runId, { status: 'queued', jobId }, job?.attempt ?? 1);
      if (jobId && job?.state === 'active') await this.queue.cancel(client, jobId);
      await notifySweepRun(tx, runId);
    });
    this.logger.info({ runId }, 'queued sweep run given a new job');
  }

  private async handOver(
    tx: Database,
    client: Parameters<SweepQueue['send']>[0],
    runId: string,
    expected: { status: 'queued' | 'running'; jobId: string | null },
    attempt: number,
  ): Promise<void> {
    const newJob = await this.queue.send(client, { runId, attempt });
    if (!newJob) throw new Error('the sweep queue refused a job');
    if (!(await requeueRun(tx, runId, expected, newJob))) throw new RunChanged();
  }
}
