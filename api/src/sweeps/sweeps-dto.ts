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

const isoTime = z.iso.datetime({ offset: true });

// Response shapes restate stored values without the request's limits (a limit tightened later
// must not turn a stored run into a 500); the route layer parses every response through them.

export const sweepEstimateResponse = z.object({
  poses: z.number().int(),
  /** Measured on this server: preparing the pair once plus a timed sample of poses. */
  prepareSeconds: z.number(),
  perPoseMicroseconds: z.number(),
  estimatedSeconds: z.number(),
});
export type SweepEstimateResponse = z.infer<typeof sweepEstimateResponse>;

const point = z.object({ x: z.number(), y: z.number() });

/** One gap's tolerance envelope (physics' toleranceEnvelope, positions in metres). */
export const sweepEnvelope = z.object({
  z: z.number(),
  /** The k the envelope is drawn at (η_min is turned into k with the coils' Q at the frequency). */
  thresholdK: z.number(),
  polygons: z.array(z.array(z.array(point))),
  /** m². */
  area: z.number(),
  /** Radius of the largest circle about the nominal point inside the envelope, m. */
  chargeRadius: z.number(),
  chargeRadiusLimitedByMap: z.boolean(),
  worst: point.extend({ value: z.number() }).nullable(),
  nominal: point.extend({ value: z.number().nullable(), meets: z.boolean() }),
});
export type SweepEnvelope = z.infer<typeof sweepEnvelope>;

const numbers = z.array(z.number());
const sweepAxesOut = z.object({
  x: numbers,
  y: numbers,
  z: numbers,
  tiltX: numbers,
  tiltY: numbers,
});

/** A finished sweep's numbers. Arrays follow physics' grid order (x fastest, then y, z, tilts). */
export const sweepResultBody = z.object({
  axes: sweepAxesOut,
  count: z.number().int(),
  /** H, per pose. */
  M: numbers,
  /** Coupling coefficient per pose. */
  k: numbers,
  /** Maximum link efficiency per pose at the study frequency (coil losses only). */
  etaMax: numbers,
  /** Tx self-inductance, H; Rx self-inductance per pose (constant unless a Tx backing), H. */
  L1: z.number(),
  L2: numbers,
  /** Coil resistances and Q at the frequency (Q2 of the Rx on its own). */
  R1: z.number(),
  R2: z.number(),
  Q1: z.number(),
  Q2: z.number(),
  /** Per gap of an xy-map or xy-stack; empty for gap and tilt sweeps. */
  envelopes: z.array(sweepEnvelope),
  kMin: z.number(),
  kMax: z.number(),
});
export type SweepResultBody = Omit<z.infer<typeof sweepResultBody>, 'axes'> & { axes: SweepAxes };

const axisOut = z.union([
  z.number(),
  z.object({ from: z.number(), to: z.number(), steps: z.number().int() }),
]);
const gridOut = z.object({
  x: axisOut.optional(),
  y: axisOut.optional(),
  z: axisOut,
  tiltX: axisOut.optional(),
  tiltY: axisOut.optional(),
});

export const sweepRunResponse = z.object({
  id: uuid,
  studyId: uuid,
  kind: sweepKindSchema,
  grid: gridOut,
  status: z.enum(sweepStatuses),
  pointsTotal: z.number().int(),
  pointsDone: z.number().int(),
  /** 0 … 1. */
  progressFraction: z.number(),
  inputsHash: z.string(),
  /** False once the study's inputs or coils changed after the run was queued. */
  current: z.boolean(),
  engineVersion: z.string(),
  queuedAt: isoTime,
  startedAt: isoTime.nullable(),
  finishedAt: isoTime.nullable(),
  computeTimeS: z.number().nullable(),
  error: z.string().nullable(),
  cancelRequested: z.boolean(),
  requestedBy: z.object({ userId: uuid, displayName: z.string() }).nullable(),
  /** Only on GET of one run (and in revisions), only once succeeded. */
  result: sweepResultBody.optional(),
});
export type SweepRunResponse = Omit<z.infer<typeof sweepRunResponse>, 'grid' | 'result'> & {
  grid: SweepSpec;
  result?: SweepResultBody;
};

/** Newest first, without result bodies. */
export const listSweepRunsResponse = z.object({ items: z.array(sweepRunResponse) });
export interface ListSweepRunsResponse {
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
  inputs: import('../studies/studies-dto').StudyComputeInputs;
  coilNames: { tx: string; rx: string };
  engineVersion: string;
  inputsHash: string;
}
