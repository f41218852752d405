import type { Logger } from 'pino';
import { SweepPool } from '../jobs/sweep-pool';
import { SweepQueue } from '../jobs/sweep-queue';
import { defaultStreamTiming, type SweepStreamTiming } from './stream-sweep-events';
import { SweepEventHub } from './sweep-event-hub';

export interface SweepsRuntimeOptions {
  databaseUrl: string;
  logger?: Logger;
  /** Run pg-boss maintenance here (on where a worker runs). */
  supervise?: boolean;
}

/**
 * What the sweep routes need beyond the database: the queue they send jobs to, the thread that
 * times estimates, and the hub that wakes event streams. Nothing here holds a connection or a
 * thread until used (the estimate thread exits when idle, the LISTEN connection closes with the
 * last stream), so an app built without `start()` (most tests) needs no clean-up; main.ts starts
 * the queue and closes everything on shutdown.
 */
export class SweepsRuntime {
  readonly queue: SweepQueue;
  readonly events: SweepEventHub;
  /** Called after a run was queued (main.ts wakes this process's worker). */
  onQueued: () => void = () => {};
  /** Event-stream intervals (tests shorten them). */
  streamTiming: SweepStreamTiming = { ...defaultStreamTiming };
  private pool: SweepPool | undefined;

  constructor(options: SweepsRuntimeOptions) {
    this.queue = new SweepQueue(options.databaseUrl, {
      supervise: options.supervise ?? false,
      logger: options.logger,
    });
    this.events = new SweepEventHub(options.databaseUrl, options.logger);
  }

  /** One thread for estimates, apart from the compute threads so a long run never delays one. */
  get estimatePool(): SweepPool {
    this.pool ??= new SweepPool({ threads: 1, idleTimeoutMs: 60_000 });
    return this.pool;
  }

  /** Creates the queue's schema and queue (idempotent); sends work without it if another did. */
  start(): Promise<void> {
    return this.queue.start();
  }

  async close(): Promise<void> {
    await this.pool?.destroy();
    this.pool = undefined;
    await this.events.close();
    await this.queue.stop();
  }
}
