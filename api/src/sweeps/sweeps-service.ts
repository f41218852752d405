import { checkClearance, ENGINE_VERSION, type Coil } from '../../../physics/src/index';
import type { StudyRow, SweepRunRow } from '../../../schema/src/index';
import type { Database } from '../db/database';
import { ConflictError, NotFoundError, ValidationError } from '../errors/app-errors';
import { clientTransaction } from '../jobs/client-transaction';
import { notifySweepRun } from '../jobs/sweep-jobs-repository';
import { studyInputs } from '../studies/study-columns';
import { studyInputsHash, type StudyComputeInputs } from '../studies/study-inputs-hash';
import { checkSweepShape, clearanceProbes, sweepPoseCount } from './check-sweep-shape';
import * as repo from './sweeps-repository';
import { toSweepRunResponse } from './sweep-run-response';
import type { SweepStreamSource } from './stream-sweep-events';
import type { SweepsRuntime } from './sweeps-runtime';
import type {
  CreateSweepRequest,
  FrozenSweepSpec,
  ListSweepRunsResponse,
  SweepEstimateResponse,
  SweepProgressEvent,
  SweepRunResponse,
} from './sweeps-dto';

type SweepRequest = { kind: CreateSweepRequest['kind']; grid: FrozenSweepSpec['grid'] };

/** A study as a sweep reads it: its compute inputs (frozen into each run) and their hash. */
interface StudyForSweep {
  row: StudyRow;
  inputs: StudyComputeInputs;
  inputsHash: string;
  coilNames: { tx: string; rx: string };
}

/** Poses timed by an estimate: enough to average out one pose's cost, a few ms of work. */
const ESTIMATE_SAMPLE = 64;

export class SweepsService {
  constructor(
    private readonly db: Database,
    private readonly runtime: SweepsRuntime,
  ) {}

  /** Freezes the study into a queued run and sends its job in the same transaction. */
  async create(
    workspaceId: string,
    studyId: string,
    user: { id: string; displayName: string },
    request: SweepRequest,
  ): Promise<SweepRunResponse> {
    checkSweepShape(request.kind, request.grid);
    const study = await this.loadStudy(workspaceId, studyId);
    checkPair(study.inputs, request.grid);
    const spec: FrozenSweepSpec = {
      kind: request.kind,
      grid: request.grid,
      inputs: study.inputs,
      coilNames: study.coilNames,
      engineVersion: ENGINE_VERSION,
      inputsHash: study.inputsHash,
    };
    const row = await clientTransaction(this.db, async (tx, client) => {
      const run = await repo.insertSweepRun(tx, {
        studyId,
        kind: request.kind,
        inputsHash: study.inputsHash,
        spec: spec as unknown as Record<string, unknown>,
        pointsTotal: sweepPoseCount(request.grid),
        requestedBy: user.id,
      });
      // In a savepoint: where the queue's tables do not exist yet (no worker ever started on
      // this database) the run is still queued, without a job; a worker's recovery sends one.
      await client.query('SAVEPOINT send_job');
      let jobId: string | null = null;
      try {
        jobId = await this.runtime.queue.send(client, { runId: run.id, attempt: 1 });
        await client.query('RELEASE SAVEPOINT send_job');
      } catch {
        await client.query('ROLLBACK TO SAVEPOINT send_job');
      }
      if (jobId) await repo.setSweepRunJob(tx, run.id, jobId);
      return { ...run, jobId };
    });
    this.runtime.onQueued();
    return toSweepRunResponse(row, {
      currentHash: study.inputsHash,
      requestedBy: { userId: user.id, displayName: user.displayName },
    });
  }

  /** Prepares the pair and times a sample of the grid's poses in the estimate thread. */
  async estimate(
    workspaceId: string,
    studyId: string,
    request: SweepRequest,
  ): Promise<SweepEstimateResponse> {
    checkSweepShape(request.kind, request.grid);
    const study = await this.loadStudy(workspaceId, studyId);
    checkPair(study.inputs, request.grid);
    const { tx, rx } = study.inputs;
    let measured;
    try {
      measured = await this.runtime.estimatePool.estimate(tx, rx, request.grid, ESTIMATE_SAMPLE);
    } catch (error) {
      // The engine names the pose or field it refuses (coils touching inside the grid).
      if (error instanceof RangeError) throw new ValidationError(`grid: ${error.message}`, 'grid');
      throw error;
    }
    return {
      ...measured,
      estimatedSeconds:
        measured.prepareSeconds + (measured.perPoseMicroseconds * measured.poses) / 1e6,
    };
  }

  async list(workspaceId: string, studyId: string): Promise<ListSweepRunsResponse> {
    const study = await this.loadStudy(workspaceId, studyId);
    const rows = await repo.listSweepRuns(this.db, studyId);
    return { items: rows.map((row) => response(row, study.inputsHash, false)) };
  }

  async get(workspaceId: string, studyId: string, runId: string): Promise<SweepRunResponse> {
    const study = await this.loadStudy(workspaceId, studyId);
    const row = await repo.findSweepRun(this.db, studyId, runId, true);
    if (!row) throw new NotFoundError('No such sweep run');
    return response(row, study.inputsHash, true);
  }

  async cancel(workspaceId: string, studyId: string, runId: string): Promise<SweepRunResponse> {
    const study = await this.loadStudy(workspaceId, studyId);
    const row = await repo.requestCancel(this.db, studyId, runId);
    if (!row) {
      const existing = await repo.findSweepRun(this.db, studyId, runId, false);
      if (!existing) throw new NotFoundError('No such sweep run');
      throw new ConflictError(`The run has already finished (${existing.status})`, 'status');
    }
    await notifySweepRun(this.db, runId);
    return response(row, study.inputsHash, false);
  }

  /** What the event stream reads; 404 before the stream starts if the run is not there. */
  async streamSource(
    workspaceId: string,
    studyId: string,
    runId: string,
  ): Promise<SweepStreamSource> {
    await this.loadStudy(workspaceId, studyId);
    if (!(await repo.findSweepRun(this.db, studyId, runId, false))) {
      throw new NotFoundError('No such sweep run');
    }
    return {
      runId,
      progress: async () => {
        const row = await repo.findSweepRun(this.db, studyId, runId, false);
        return row ? progressEvent(row) : null;
      },
      final: async () => {
        const study = await this.loadStudy(workspaceId, studyId).catch(() => null);
        const row = await repo.findSweepRun(this.db, studyId, runId, false);
        return study && row ? response(row, study.inputsHash, false) : null;
      },
    };
  }

  /**
   * The study with its coils as the library holds them now. The compute inputs are built from
   * the study's own column mapping (studies/study-columns), so the hash equals the one the study
   * routes show and a run is `current` exactly when nothing it computed from has changed.
   */
  private async loadStudy(workspaceId: string, studyId: string): Promise<StudyForSweep> {
    const row = await repo.findStudy(this.db, workspaceId, studyId);
    if (!row) throw new NotFoundError('No such study');
    if (row.txCoilId === null || row.rxCoilId === null) {
      throw new ConflictError('The study needs a Tx and an Rx coil before it can be swept');
    }
    const coilRows = await repo.findCoils(this.db, [row.txCoilId, row.rxCoilId]);
    const tx = coilRows.find((c) => c.id === row.txCoilId);
    const rx = coilRows.find((c) => c.id === row.rxCoilId);
    if (!tx || !rx) throw new Error(`study ${row.id} points at a missing coil`);
    const fields = studyInputs(row);
    const inputs: StudyComputeInputs = {
      frequencyHz: fields.frequencyHz,
      txCurrentA: fields.txCurrentA,
      threshold: fields.threshold,
      compensation: fields.compensation,
      nominalPose: fields.nominalPose,
      tx: tx.spec as unknown as Coil,
      rx: rx.spec as unknown as Coil,
    };
    return {
      row,
      inputs,
      inputsHash: studyInputsHash(inputs),
      coilNames: { tx: tx.name, rx: rx.name },
    };
  }
}

/** Refusals the engine would only make inside the worker, made here with a clear message. */
function checkPair(inputs: StudyComputeInputs, grid: FrozenSweepSpec['grid']): void {
  if (inputs.rx.backing) {
    throw new ConflictError(
      'The Rx coil has a ferrite backing; a pair models the Tx backing only. Remove the Rx ' +
        'backing or swap the coils',
    );
  }
  for (const pose of clearanceProbes(grid)) {
    try {
      checkClearance(inputs.tx, inputs.rx, pose);
    } catch (error) {
      if (!(error instanceof RangeError)) throw error;
      const at = Object.entries(pose)
        .map(([axis, v]) => `${axis} = ${v}`)
        .join(', ');
      throw new ValidationError(`grid: at ${at}: ${error.message}`, 'grid');
    }
  }
}

function response(
  row: SweepRunRow & { requesterName: string | null },
  currentHash: string,
  withResult: boolean,
): SweepRunResponse {
  const requestedBy =
    row.requestedBy && row.requesterName !== null
      ? { userId: row.requestedBy, displayName: row.requesterName }
      : null;
  return toSweepRunResponse(row, { currentHash, requestedBy, withResult });
}

function progressEvent(row: SweepRunRow): SweepProgressEvent {
  const elapsedS = row.startedAt ? Math.max(0, (Date.now() - row.startedAt.getTime()) / 1000) : 0;
  const remainingS =
    row.status === 'running' && row.pointsDone > 0
      ? (elapsedS * (row.pointsTotal - row.pointsDone)) / row.pointsDone
      : null;
  return {
    runId: row.id,
    status: row.status,
    pointsDone: row.pointsDone,
    pointsTotal: row.pointsTotal,
    fraction: row.progressFraction,
    elapsedS,
    remainingS,
  };
}
