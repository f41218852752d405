import pg from 'pg';
import type { Logger } from 'pino';
import { SWEEP_RUN_CHANNEL } from '../jobs/sweep-jobs-repository';

/** Pause before another LISTEN attempt after a failed one, ms (streams poll meanwhile). */
const RETRY_MS = 1_000;

/**
 * Fans PostgreSQL notifications about sweep runs out to the event streams of this process. One
 * LISTEN connection serves every stream; it is opened with the first subscriber and closed with
 * the last, so a server nobody watches holds no extra connection. The worker NOTIFYs on every
 * progress write and status change wherever it runs, so a stream here sees a worker on another
 * machine as soon as it writes. A notification lost while the connection is re-established only
 * delays an update: every stream also re-reads its run on a slow timer.
 */
export class SweepEventHub {
  private readonly listeners = new Map<string, Set<() => void>>();
  private client: pg.Client | undefined;
  private connecting: Promise<void> | undefined;
  private shut = false;

  constructor(
    private readonly databaseUrl: string,
    private readonly logger?: Logger,
  ) {}

  /** Calls `listener` whenever the run changes; returns the unsubscribe function. */
  subscribe(runId: string, listener: () => void): () => void {
    const set = this.listeners.get(runId) ?? new Set();
    set.add(listener);
    this.listeners.set(runId, set);
    if (!this.shut) this.connect();
    return () => {
      set.delete(listener);
      if (set.size === 0) this.listeners.delete(runId);
      if (this.listeners.size === 0) void this.disconnect();
    };
  }

  /** Streams listening now (every stream unsubscribes when its client leaves). */
  get subscribers(): number {
    let n = 0;
    for (const set of this.listeners.values()) n += set.size;
    return n;
  }

  /** Whether the LISTEN connection is open (only while someone listens). */
  get listening(): boolean {
    return this.client !== undefined;
  }

  /** True once closed: streams end (the server is shutting down). */
  get closed(): boolean {
    return this.shut;
  }

  /** Wakes every stream so it sees `closed` and ends, then drops the connection. */
  async close(): Promise<void> {
    this.shut = true;
    const all = [...this.listeners.values()].flatMap((set) => [...set]);
    this.listeners.clear();
    all.forEach((listener) => listener());
    await this.disconnect();
  }

  private connect(): void {
    if (this.client || this.connecting) return;
    const client = new pg.Client({
      connectionString: this.databaseUrl,
      application_name: 'couplet-sweep-events',
    });
    const drop = () => {
      if (this.client === client) this.client = undefined;
    };
    client.on('notification', (message) => {
      for (const listener of this.listeners.get(message.payload ?? '') ?? []) listener();
    });
    // A dropped connection must not crash the server; the next subscriber reconnects.
    client.on('error', (err) => {
      this.logger?.warn({ err: err.message }, 'sweep event connection lost');
      drop();
    });
    client.on('end', drop);
    this.connecting = (async () => {
      let failed = false;
      try {
        await client.connect();
        await client.query(`LISTEN ${SWEEP_RUN_CHANNEL}`);
        if (this.listeners.size > 0) this.client = client;
        else await client.end(); // the last stream left while connecting
      } catch (err) {
        failed = true;
        this.logger?.warn({ err: (err as Error).message }, 'sweep event connection failed');
        await client.end().catch(() => undefined);
      } finally {
        this.connecting = undefined;
      }
      // A stream may have subscribed while this attempt was ending (it found it in progress and
      // left the connecting to it): connect again for it, after a pause if the attempt failed.
      if (!this.client && this.listeners.size > 0 && !this.shut) {
        if (failed) setTimeout(() => this.listeners.size > 0 && this.connect(), RETRY_MS).unref();
        else this.connect();
      }
    })();
  }

  private async disconnect(): Promise<void> {
    await this.connecting;
    if (this.listeners.size > 0) return;
    const client = this.client;
    this.client = undefined;
    await client?.end().catch(() => undefined);
  }
}
