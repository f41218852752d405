import PgBoss from 'pg-boss';
import type { Logger } from 'pino';

/** The pg-boss queue of sweep runs; its tables live in their own schema of the app's database. */
export const SWEEP_QUEUE = 'sweep-run';
export const SWEEP_QUEUE_SCHEMA = 'pgboss';

/**
 * pg-boss fails a job whose handler runs longer than this. Liveness is not judged by it (a
 * worker holds an advisory lock per run, see SweepWorker), so it is set near pg-boss's 24-hour
 * ceiling: a 250 000-pose run of large polygon coils takes minutes, never hours.
 */
const JOB_EXPIRE_SECONDS = 23 * 3600;

/** What a job carries: the run, and how many workers have started it (crash recovery counts). */
export interface SweepJobData {
  runId: string;
  attempt: number;
}

export interface SweepJobState {
  state: 'created' | 'retry' | 'active' | 'completed' | 'cancelled' | 'failed';
  startedOn: Date | null;
  attempt: number;
}

/** A connection to send on: the caller's transaction, so the job and the run commit together. */
export interface SqlClient {
  query(text: string, values?: unknown[]): Promise<{ rows: unknown[] }>;
}

const onClient = (client: SqlClient) => ({
  executeSql: async (text: string, values: unknown[]) => ({
    rows: (await client.query(text, values)).rows as never[],
  }),
});

export interface SweepQueueOptions {
  /** Run pg-boss maintenance (expiry, archiving) in this process: on where workers run. */
  supervise: boolean;
  /** Connections of pg-boss's own pool (fetching, completing, maintenance). */
  connections?: number;
  logger?: Logger;
}

/**
 * pg-boss on the app's database. `start` creates the schema and the queue (idempotent, under
 * pg-boss's own advisory lock, so many processes may start at once). Jobs are sent on a caller's
 * connection (`send`), never on pg-boss's pool, so that a run row and its job are one commit.
 */
export class SweepQueue {
  readonly boss: PgBoss;
  private started = false;

  constructor(databaseUrl: string, options: SweepQueueOptions) {
    this.boss = new PgBoss({
      connectionString: databaseUrl,
      schema: SWEEP_QUEUE_SCHEMA,
      max: options.connections ?? 3,
      application_name: 'couplet-sweep-queue',
      supervise: options.supervise,
      // No cron jobs: the queue only carries sweep runs.
      schedule: false,
      migrate: true,
    });
    // Unhandled, an 'error' event (a dropped pool connection) would crash the process.
    this.boss.on('error', (err) => options.logger?.warn({ err: err.message }, 'pg-boss error'));
  }

  get ready(): boolean {
    return this.started;
  }

  async start(): Promise<void> {
    if (this.started) return;
    await this.boss.start();
    // retryLimit 0: pg-boss never reruns a failed job by itself; SweepWorker's recovery decides
    // (a run whose worker vanished is requeued with a new job, at most a few times).
    await this.boss.createQueue(SWEEP_QUEUE, {
      name: SWEEP_QUEUE,
      retryLimit: 0,
      expireInSeconds: JOB_EXPIRE_SECONDS,
    });
    this.started = true;
  }

  /** Sends a job on `client` (inside its transaction); null when the queue refused it. */
  async send(client: SqlClient, data: SweepJobData): Promise<string | null> {
    return this.boss.send(SWEEP_QUEUE, data, {
      db: onClient(client),
      retryLimit: 0,
      expireInSeconds: JOB_EXPIRE_SECONDS,
    });
  }

  /** Cancels a job that has not finished (no effect on a finished or missing one). */
  async cancel(client: SqlClient, jobId: string): Promise<void> {
    await this.boss.cancel(SWEEP_QUEUE, jobId, { db: onClient(client) });
  }

  /** The job's state, start time and attempt as pg-boss keeps them (null once archived). */
  async jobState(jobId: string): Promise<SweepJobState | null> {
    const job = await this.boss.getJobById<SweepJobData>(SWEEP_QUEUE, jobId);
    if (!job) return null;
    return { state: job.state, startedOn: job.startedOn ?? null, attempt: job.data?.attempt ?? 1 };
  }

  async stop(): Promise<void> {
    if (!this.started) return;
    this.started = false;
    // Workers have stopped before this (SweepWorker.stop), so nothing is left to wait for.
    await this.boss.stop({ graceful: true, wait: true, timeout: 5_000 });
  }
}
