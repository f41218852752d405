import { z } from 'zod';
import { sweepSpecSchema, type SweepAxes, type SweepSpec } from '../../../physics/src/index';

// Request and response shapes of the sweep routes (contract of issue 4). A sweep run is a durable
// job: queued → running → succeeded | failed | cancelled. Its spec freezes the study inputs and
// both coil specs it was computed from, so a stored result always says what produced it.

const uuid = z.uuid({ message: 'must be a UUID' });

export const sweepKinds = ['xy-map', 'gap', 'tilt', 'xy-stack'] as const;
export const sweepKindSchema = z.enum(sweepKinds, {
  message: 'must be one of xy-map, gap, tilt, xy-stack',
});
export type SweepKind = z.infer<typeof sweepKindSchema>;

export const sweepStatuses = ['queued', 'running', 'succeeded', 'failed', 'cancelled'] as const;
export type SweepStatus = (typeof sweepStatuses)[number];

export const sweepRunParams = z.object({ workspaceId: uuid, studyId: uuid, runId: uuid }).strict();

/**
 * What to sweep. The grid is the physics engine's sweep spec (metres, degrees). Shape rules per
 * kind, checked by the API with a message naming the axis:
 * - xy-map: x and y ranges, z a single gap, no tilt ranges;
 * - gap: a z range, x, y and tilts single values (or absent);
 * - tilt: a tiltX or tiltY range (not both), z a single gap;
 * - xy-stack: x, y and z ranges (z: 2 … 12 gaps), no tilt ranges.
 * Stored results are capped at 250 000 poses per run (the JSON is kept in PostgreSQL).
 */
export const createSweepRequest = z
  .object({ kind: sweepKindSchema, grid: sweepSpecSchema })
  .strict();
export type CreateSweepRequest = z.input<typeof createSweepRequest>;

export const MAX_STORED_SWEEP_POSES = 250_000;

export interface SweepEstimateResponse {
  poses: number;
  /** Measured on this server: preparing the pair once plus a timed sample of poses. */
  prepareSeconds: number;
  perPoseMicroseconds: number;
  estimatedSeconds: number;
}

/** One gap's tolerance envelope (physics' toleranceEnvelope, positions in metres). */
export interface SweepEnvelope {
  z: number;
  /** The k the envelope is drawn at (η_min is turned into k with the coils' Q at the frequency). */
  thresholdK: number;
  polygons: { x: number; y: number }[][][];
  /** m². */
  area: number;
  /** Radius of the largest circle about the nominal point inside the envelope, m. */
  chargeRadius: number;
  chargeRadiusLimitedByMap: boolean;
  worst: { x: number; y: number; value: number } | null;
  nominal: { x: number; y: number; value: number | null; meets: boolean };
}

/** A finished sweep's numbers. Arrays follow physics' grid order (x fastest, then y, z, tilts). */
export interface SweepResultBody {
  axes: SweepAxes;
  count: number;
  /** H, per pose. */
  M: number[];
  /** Coupling coefficient per pose. */
  k: number[];
  /** Maximum link efficiency per pose at the study frequency (coil losses only). */
  etaMax: number[];
  /** Tx self-inductance, H; Rx self-inductance per pose (constant unless a Tx backing), H. */
  L1: number;
  L2: number[];
  /** Coil resistances and Q at the frequency. */
  R1: number;
  R2: number;
  Q1: number;
  Q2: number;
  /** Per gap of an xy-map or xy-stack; empty for gap and tilt sweeps. */
  envelopes: SweepEnvelope[];
  kMin: number;
  kMax: number;
}

export interface SweepRunResponse {
  id: string;
  studyId: string;
  kind: SweepKind;
  grid: SweepSpec;
  status: SweepStatus;
  pointsTotal: number;
  pointsDone: number;
  /** 0 … 1. */
  progressFraction: number;
  inputsHash: string;
  /** False once the study's inputs or coils changed after the run was queued. */
  current: boolean;
  engineVersion: string;
  queuedAt: string;
  startedAt: string | null;
  finishedAt: string | null;
  computeTimeS: number | null;
  error: string | null;
  cancelRequested: boolean;
  requestedBy: { userId: string; displayName: string } | null;
  /** Only on GET of one run (and in revisions), only once succeeded. */
  result?: SweepResultBody;
}

export interface ListSweepRunsResponse {
  /** Newest first, without result bodies. */
  items: SweepRunResponse[];
}

/**
 * Server-sent events of `GET …/sweeps/:runId/events` (text/event-stream, bearer token in the
 * Authorization header like every other route; the web reads it with fetch, not EventSource):
 * - `event: progress` with `data: SweepProgressEvent`, at most every 250 ms while it changes;
 * - `event: end` with `data: SweepRunResponse` (no result) once the run is finished, then the
 *   stream closes. A client that connects after the end gets the `end` event at once.
 */
export interface SweepProgressEvent {
  runId: string;
  status: SweepStatus;
  pointsDone: number;
  pointsTotal: number;
  fraction: number;
  elapsedS: number;
  /** Estimated from the rate so far; null before the first chunk. */
  remainingS: number | null;
}

/**
 * What a run computes from, frozen into `sweep_runs.spec` when it is queued: the request, the
 * study's compute inputs, both coil specs and the engine version. Workers read only this.
 */
export interface FrozenSweepSpec {
  kind: SweepKind;
  grid: SweepSpec;
  inputs: import('../studies/study-inputs-hash').StudyComputeInputs;
  coilNames: { tx: string; rx: string };
  engineVersion: string;
  inputsHash: string;
}
