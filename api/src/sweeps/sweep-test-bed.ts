import { randomBytes } from 'node:crypto';
import type { Express } from 'express';
import pg from 'pg';
import pino from 'pino';
import { coilFigures, type Coil } from '../../../physics/src/index';
import { coils, studies } from '../../../schema/src/index';
import { createApp } from '../app';
import type { AppConfig } from '../config/config';
import { createDatabase, type Database, type DatabaseHandle } from '../db/database';
import { migrate } from '../db/migrate';
import { SweepWorker, type SweepWorkerOptions } from '../jobs/sweep-worker';
import type { Threshold } from '../studies/studies-dto';
import { testConfig, testDatabaseUrl } from '../testing/test-app';
import { SweepsRuntime } from './sweeps-runtime';

// Test support for the sweep routes and the worker. Each test file gets a database of its own
// (created on the test cluster, migrated, dropped at the end): pg-boss workers take any job of
// their queue in their database, so files sharing one would run each other's sweeps.

const silent = pino({ level: 'silent' });

async function adminQuery(text: string): Promise<void> {
  const client = new pg.Client({ connectionString: testDatabaseUrl() });
  await client.connect();
  try {
    await client.query(text);
  } finally {
    await client.end();
  }
}

export interface RunningApp {
  app: Express;
  runtime: SweepsRuntime;
  worker: SweepWorker | undefined;
  database: DatabaseHandle;
}

export class SweepTestBed {
  private current: RunningApp | undefined;
  /** One signing secret for every app instance, so tokens survive a restart as in production. */
  private readonly config: AppConfig;

  private constructor(
    readonly databaseUrl: string,
    private readonly name: string,
    /** A pool of the test bed's own, for fixtures and checks; outlives the app instances. */
    readonly database: DatabaseHandle,
  ) {
    this.config = testConfig({ databaseUrl });
  }

  static async open(label: string): Promise<SweepTestBed> {
    const name = `couplet_${label}_${randomBytes(4).toString('hex')}`;
    await adminQuery(`CREATE DATABASE ${name}`);
    const url = new URL(testDatabaseUrl());
    url.pathname = `/${name}`;
    await migrate(url.href);
    return new SweepTestBed(url.href, name, createDatabase(url.href, 3));
  }

  get db(): Database {
    return this.database.db;
  }

  get app(): RunningApp {
    if (!this.current) throw new Error('no app running; call startApp first');
    return this.current;
  }

  /**
   * Builds an app as main.ts does: the queue started, and a worker in the process or not
   * (RUN_SWEEP_WORKER=0). Its own pool, so stopping it leaves nothing of it behind.
   */
  async startApp(
    options: { worker: boolean; workerOptions?: Partial<SweepWorkerOptions> } = { worker: false },
  ): Promise<RunningApp> {
    if (this.current) throw new Error('an app is already running');
    const database = createDatabase(this.databaseUrl, 4);
    const runtime = new SweepsRuntime({ databaseUrl: this.databaseUrl, supervise: options.worker });
    await runtime.start();
    const worker = options.worker
      ? await SweepWorker.start({
          databaseUrl: this.databaseUrl,
          queue: runtime.queue,
          threads: 1,
          logger: silent,
          ...options.workerOptions,
        })
      : undefined;
    if (worker) runtime.onQueued = () => worker.wake();
    const { app } = createApp({
      config: this.config,
      db: database.db,
      logger: silent,
      sweeps: runtime,
    });
    this.current = { app, runtime, worker, database };
    return this.current;
  }

  /** Stops the app completely: worker (running runs handed back), queue, streams, pool. */
  async stopApp(): Promise<void> {
    const current = this.current;
    this.current = undefined;
    if (!current) return;
    await current.runtime.events.close();
    await current.worker?.stop();
    await current.runtime.close();
    await current.database.close();
  }

  async close(): Promise<void> {
    await this.stopApp();
    await this.database.close();
    await adminQuery(`DROP DATABASE IF EXISTS ${this.name} WITH (FORCE)`);
  }
}

/** A library coil row with the engine's figures cached, as the coil routes would store it. */
export async function insertLibraryCoil(
  db: Database,
  workspaceId: string,
  name: string,
  spec: Coil,
  frequencyHz: number,
): Promise<string> {
  const f = coilFigures(spec, { frequency: frequencyHz });
  const rows = await db
    .insert(coils)
    .values({
      workspaceId,
      name,
      kind: spec.kind,
      spec: spec as unknown as Record<string, unknown>,
      operatingFrequencyHz: frequencyHz,
      ratedCurrentA: 1,
      selfInductanceH: f.L,
      dcResistanceOhm: f.Rdc,
      acResistanceOhm: f.Rac,
      qualityFactor: f.Q,
      wireLengthM: f.wireLength,
    })
    .returning({ id: coils.id });
  return rows[0]!.id;
}

export interface StudyFixture {
  workspaceId: string;
  name: string;
  txCoilId: string;
  rxCoilId: string;
  frequencyHz: number;
  threshold: Threshold;
  nominalPose: { x: number; y: number; z: number; tiltX: number; tiltY: number };
}

/** A study row with every column the study routes fill. */
export async function insertStudy(db: Database, study: StudyFixture): Promise<string> {
  const rows = await db
    .insert(studies)
    .values({
      workspaceId: study.workspaceId,
      name: study.name,
      txCoilId: study.txCoilId,
      rxCoilId: study.rxCoilId,
      operatingFrequencyHz: study.frequencyHz,
      txCurrentA: 1,
      thresholdKind: study.threshold.kind,
      minCouplingK: study.threshold.kind === 'k' ? study.threshold.value : null,
      minEfficiency: study.threshold.kind === 'eta' ? study.threshold.value : null,
      compensation: 'series-series',
      nominalPose: study.nominalPose,
    })
    .returning({ id: studies.id });
  return rows[0]!.id;
}

/** Polls until `check` returns a value (not undefined), or fails after `timeoutMs`. */
export async function eventually<T>(
  check: () => Promise<T | undefined>,
  what: string,
  timeoutMs = 20_000,
): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await check();
    if (value !== undefined) return value;
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
}
