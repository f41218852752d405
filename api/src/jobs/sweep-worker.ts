import type PgBoss from 'pg-boss';
import type pg from 'pg';
import type { Logger } from 'pino';
import type { SweepRunRow } from '../../../schema/src/index';
import { createDatabase, type DatabaseHandle } from '../db/database';
import type { FrozenSweepSpec } from '../sweeps/sweeps-dto';
import { clientTransaction } from './client-transaction';
import { tryLockRun, unlockRun } from './run-lock';
import {
  claimRun,
  finishRun,
  notifySweepRun,
  readRunControl,
  requeueRun,
  writeProgress,
  type RunControl,
  type RunEnding,
} from './sweep-jobs-repository';
import { SweepPool } from './sweep-pool';
import { SWEEP_QUEUE, type SweepJobData, type SweepQueue } from './sweep-queue';
import { SweepRecovery } from './sweep-recovery';
import type { ComputeOutcome } from './sweep-thread';

export interface SweepWorkerOptions {
  databaseUrl: string;
  /** A started queue (its pg-boss instance fetches the jobs). */
  queue: SweepQueue;
  /** Runs computed at once by this process, one worker thread each. */
  threads: number;
  logger: Logger;
  /** Progress is written (and announced) at most this often, ms. */
  progressIntervalMs?: number;
  /** How often unfinished runs are checked for vanished workers, ms. */
  recoveryIntervalMs?: number;
  /**
   * Poses per chunk: a cancel is honoured and progress arrives once per chunk. Default physics'
   * DEFAULT_SWEEP_CHUNK (1024): about 0.1 s of two 20-turn spirals, 1 s of large polygon coils.
   * Smaller chunks cost more on the coaxial route (one Bessel summary per gap and chunk: a
   * 41 × 41 spiral map takes ~65 ms in one chunk, ~110 ms in chunks of 256, measured here).
   */
  chunkSize?: number;
  pollingIntervalSeconds?: number;
}

/** Why a compute was stopped before its end. */
type StopReason = 'cancel' | 'shutdown' | 'lost';

/**
 * Computes queued sweep runs: pg-boss hands a job to one of `threads` polling loops; the worker
 * takes the run's advisory lock on a connection of its own (held until the run ends: this is
 * what tells recovery that the run is alive), claims the row queued → running, computes in the
 * thread pool and writes progress at most every `progressIntervalMs`, each write NOTIFYing the
 * run's channel and reading back a cancel request. It ends the row succeeded, cancelled or
 * failed. On stop, running computes are aborted and their runs requeued with new jobs, so the
 * next worker (here after a restart, or on another machine) starts them again.
 */
export class SweepWorker {
  private readonly database: DatabaseHandle;
  private readonly pool: SweepPool;
  private readonly recovery: SweepRecovery;
  private readonly active = new Map<
    string,
    { stop(reason: StopReason): void; done: Promise<void> }
  >();
  private workIds: string[] = [];
  private stopping = false;
  private recoveryTimer: NodeJS.Timeout | undefined;

  private constructor(private readonly options: SweepWorkerOptions) {
    this.database = createDatabase(options.databaseUrl, options.threads + 2, (err) =>
      options.logger.warn({ err: err.message }, 'sweep worker: idle connection lost'),
    );
    this.pool = new SweepPool({ threads: options.threads });
    this.recovery = new SweepRecovery(this.database.db, options.queue, options.logger);
  }

  static async start(options: SweepWorkerOptions): Promise<SweepWorker> {
    const worker = new SweepWorker(options);
    await worker.recovery.run();
    const boss = options.queue.boss;
    for (let i = 0; i < Math.max(1, options.threads); i++) {
      const id = await boss.work<SweepJobData>(
        SWEEP_QUEUE,
        { batchSize: 1, pollingIntervalSeconds: options.pollingIntervalSeconds ?? 1 },
        async ([job]) => (job ? worker.handle(job) : undefined),
      );
      worker.workIds.push(id);
    }
    worker.recoveryTimer = setInterval(
      () => void worker.recovery.run(),
      options.recoveryIntervalMs ?? 30_000,
    );
    return worker;
  }

  /** Fetch now rather than at the next poll (a run was just queued in this process). */
  wake(): void {
    for (const id of this.workIds) this.options.queue.boss.notifyWorker(id);
  }

  /** Checks unfinished runs now (tests; the timer does it every recoveryIntervalMs). */
  recover(): Promise<void> {
    return this.recovery.run();
  }

  async stop(): Promise<void> {
    if (this.stopping) return;
    this.stopping = true;
    clearInterval(this.recoveryTimer);
    const boss = this.options.queue.boss;
    await Promise.all(this.workIds.map((id) => boss.offWork({ id })));
    for (const run of this.active.values()) run.stop('shutdown');
    await Promise.all([...this.active.values()].map((run) => run.done));
    await this.recovery.idle();
    await this.pool.destroy();
    await this.database.close();
  }

  private async handle(job: PgBoss.Job<SweepJobData>): Promise<void> {
    const { runId } = job.data;
    const attempt = job.data.attempt ?? 1;
    if (this.stopping) {
      // Fetched while stopping: hand it straight to a new job for the next worker.
      await this.requeue(runId, job.id, attempt);
      return;
    }
    const client = await this.database.pool.connect();
    let broken: Error | undefined;
    try {
      // A second job for the same run (recovery raced a slow worker) finds the lock taken.
      if (!(await tryLockRun(client, runId))) return;
      try {
        const row = await claimRun(this.database.db, runId, job.id);
        if (!row) return; // cancelled while queued, or handed to another job
        await notifySweepRun(this.database.db, runId);
        await this.compute(row, job.id, attempt);
      } finally {
        await unlockRun(client, runId);
      }
    } catch (error) {
      broken = error as Error;
      throw error;
    } finally {
      client.release(broken);
    }
  }

  private async compute(row: SweepRunRow, jobId: string, attempt: number): Promise<void> {
    const { db } = this.database;
    const log = this.options.logger.child({ runId: row.id });
    const spec = row.spec as unknown as FrozenSweepSpec;
    let latest = { done: 0, total: row.pointsTotal };
    let written = 0;
    let lastCheck = Date.now();
    let reason: StopReason | undefined;
    const handle = this.pool.compute(spec, (p) => (latest = p), this.options.chunkSize);
    const stop = (why: StopReason) => {
      reason ??= why;
      handle.abort();
    };
    let finished!: () => void;
    this.active.set(row.id, { stop, done: new Promise<void>((r) => (finished = r)) });

    // One write at a time: a tick that finds the previous write still going is skipped.
    let ticking: Promise<void> | undefined;
    const tick = async () => {
      const progress = latest;
      let control: RunControl | undefined;
      if (progress.done !== written) {
        control = await writeProgress(db, row.id, jobId, progress);
        written = progress.done;
        await notifySweepRun(db, row.id);
        lastCheck = Date.now();
      } else if (Date.now() - lastCheck >= 500) {
        control = await readRunControl(db, row.id, jobId);
        lastCheck = Date.now();
      }
      if (control && !control.owned) stop('lost');
      else if (control?.cancelRequested) stop('cancel');
    };
    const timer = setInterval(() => {
      ticking ??= tick()
        .catch((err: unknown) => log.warn({ err }, 'progress write failed'))
        .finally(() => (ticking = undefined));
    }, this.options.progressIntervalMs ?? 250);

    try {
      let outcome: ComputeOutcome;
      try {
        outcome = await handle.outcome;
      } catch (error) {
        // The thread itself died (out of memory, or the pool destroyed while stopping).
        if (this.stopping) reason ??= 'shutdown';
        outcome = this.stopping
          ? { type: 'aborted', done: latest.done, computeTimeS: 0 }
          : {
              type: 'failed',
              error: `the compute thread stopped: ${message(error)}`,
              computeTimeS: 0,
            };
      }
      clearInterval(timer);
      await ticking;
      await this.end(row, jobId, attempt, outcome, reason);
    } finally {
      clearInterval(timer);
      this.active.delete(row.id);
      finished();
    }
  }

  private async end(
    row: SweepRunRow,
    jobId: string,
    attempt: number,
    outcome: ComputeOutcome,
    reason: StopReason | undefined,
  ): Promise<void> {
    const { db } = this.database;
    if (outcome.type === 'aborted' && reason === 'lost') return;
    if (outcome.type === 'aborted' && reason === 'shutdown') {
      await this.requeue(row.id, jobId, attempt, 'running');
      return;
    }
    const ending: RunEnding =
      outcome.type === 'succeeded'
        ? {
            status: 'succeeded',
            result: outcome.result as unknown as Record<string, unknown>,
            pointsTotal: outcome.result.count,
          }
        : outcome.type === 'aborted'
          ? { status: 'cancelled', pointsDone: outcome.done }
          : { status: 'failed', error: outcome.error };
    if (await finishRun(db, row.id, jobId, ending, outcome.computeTimeS)) {
      await notifySweepRun(db, row.id);
    }
  }

  /** A new job for the run, in one transaction with the row's hand-over. */
  private async requeue(
    runId: string,
    jobId: string,
    attempt: number,
    status: 'queued' | 'running' = 'queued',
  ): Promise<void> {
    const { queue } = this.options;
    await clientTransaction(this.database.db, async (tx, client: pg.PoolClient) => {
      const newJob = await queue.send(client, { runId, attempt });
      if (!newJob) throw new Error('the sweep queue refused a job');
      if (!(await requeueRun(tx, runId, { status, jobId }, newJob))) {
        await queue.cancel(client, newJob);
      }
      await notifySweepRun(tx, runId);
    });
  }
}

function message(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}
