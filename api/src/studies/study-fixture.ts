import {
  coilFigures,
  ENGINE_VERSION,
  maxLinkEfficiency,
  preparePair,
  qualityFactor,
  coilResistance,
  runSweep,
  type Coil,
  type SweepSpec,
} from '../../../physics/src/index';
import { coils, sweepRuns, type SweepRunRow } from '../../../schema/src/index';
import type { Database } from '../db/database';
import type { FrozenSweepSpec, SweepKind, SweepResultBody } from '../sweeps/sweeps-dto';
import type { CreateStudyRequest } from './studies-dto';
import type { StudyComputeInputs } from './study-inputs-hash';

// Test data for the study and revision tests: coils written straight into the library table
// (the coil routes are a separate feature) and sweep runs with result bodies computed here by
// the physics engine, as a worker would store them. Geometry of our own, phone-pad size.

export const padTx: Coil = {
  kind: 'circular-spiral',
  turns: 10,
  innerDiameter: 0.02,
  outerDiameter: 0.05,
  conductor: { type: 'round', diameter: 6e-4 },
};
export const padRx: Coil = {
  kind: 'circular-spiral',
  turns: 8,
  innerDiameter: 0.016,
  outerDiameter: 0.04,
  conductor: { type: 'round', diameter: 5e-4 },
};

let coilSerial = 0;

/** A library coil with its figures computed by the engine, as the coil routes save it. */
export async function insertCoil(
  db: Database,
  workspaceId: string,
  spec: Coil,
  options: { name?: string; operatingFrequencyHz?: number | null; createdBy?: string } = {},
) {
  const frequency =
    options.operatingFrequencyHz === undefined ? 140e3 : options.operatingFrequencyHz;
  const figures = coilFigures(spec, { frequency: frequency ?? undefined });
  const rows = await db
    .insert(coils)
    .values({
      workspaceId,
      name: options.name ?? `Coil ${++coilSerial} ${Math.random().toString(36).slice(2, 8)}`,
      kind: spec.kind,
      spec: spec as unknown as Record<string, unknown>,
      operatingFrequencyHz: frequency,
      ratedCurrentA: null,
      selfInductanceH: figures.L,
      dcResistanceOhm: figures.Rdc,
      acResistanceOhm: figures.Rac,
      qualityFactor: figures.Q,
      wireLengthM: figures.wireLength,
      createdBy: options.createdBy ?? null,
      updatedBy: options.createdBy ?? null,
    })
    .returning();
  return rows[0]!;
}

/**
 * A study body: 140 kHz sits in the consumer inductive-charging band of about 110–205 kHz
 * (summaries of the WPC Qi specification, secondary) and the 4 mm gap in its typical 3–5 mm
 * (TI battery-management training, 2014, secondary); k_min = 0.3 is a demo value.
 */
export function studyBody(
  txCoilId: string,
  rxCoilId: string,
  overrides: Partial<CreateStudyRequest> = {},
): CreateStudyRequest {
  return {
    name: `FP-7 cradle ${Math.random().toString(36).slice(2, 8)}`,
    txCoilId,
    rxCoilId,
    frequencyHz: 140e3,
    txCurrentA: 1.5,
    threshold: { kind: 'k', value: 0.3 },
    compensation: 'series-series',
    notes: 'Cradle pocket, phone lying flat',
    nominalPose: { x: 0, y: 0, z: 0.004, tiltX: 0, tiltY: 0 },
    ...overrides,
  };
}

/** A gap sweep's result body, computed by the engine from the frozen inputs. */
export async function gapSweepResult(
  inputs: StudyComputeInputs,
  grid: SweepSpec,
): Promise<SweepResultBody> {
  const pair = preparePair(inputs.tx, inputs.rx);
  const sweep = await runSweep(pair, grid);
  const f = inputs.frequencyHz;
  const R1 = coilResistance(inputs.tx, { frequency: f }).Rac!;
  const R2 = coilResistance(inputs.rx, { frequency: f }).Rac!;
  const Q1 = qualityFactor(sweep.L1, R1, f);
  const Q2 = qualityFactor(sweep.L2, R2, f);
  const k = [...sweep.k];
  return {
    axes: sweep.axes,
    count: sweep.count,
    M: [...sweep.M],
    k,
    etaMax: k.map((kk) => maxLinkEfficiency(kk, Q1, Q2)),
    L1: sweep.L1,
    L2: k.map(() => sweep.L2),
    R1,
    R2,
    Q1,
    Q2,
    envelopes: [],
    kMin: Math.min(...k),
    kMax: Math.max(...k),
  };
}

/** A sweep run row as the sweep feature stores it (status, times and result given here). */
export async function insertSweepRun(
  db: Database,
  values: {
    studyId: string;
    kind: SweepKind;
    inputs: StudyComputeInputs;
    inputsHash: string;
    grid: SweepSpec;
    status?: SweepRunRow['status'];
    queuedAt?: Date;
    finishedAt?: Date | null;
    result?: SweepResultBody | null;
    engineVersion?: string;
    requestedBy?: string | null;
  },
): Promise<SweepRunRow> {
  const status = values.status ?? 'succeeded';
  const frozen: FrozenSweepSpec = {
    kind: values.kind,
    grid: values.grid,
    inputs: values.inputs,
    coilNames: { tx: 'Tx', rx: 'Rx' },
    engineVersion: values.engineVersion ?? ENGINE_VERSION,
    inputsHash: values.inputsHash,
  };
  const queuedAt = values.queuedAt ?? new Date();
  const finishedAt =
    values.finishedAt === undefined
      ? status === 'succeeded'
        ? new Date(queuedAt.getTime() + 1000)
        : null
      : values.finishedAt;
  const count = values.result?.count ?? 0;
  const rows = await db
    .insert(sweepRuns)
    .values({
      studyId: values.studyId,
      kind: values.kind,
      inputsHash: values.inputsHash,
      spec: frozen as unknown as Record<string, unknown>,
      status,
      pointsTotal: count,
      pointsDone: status === 'succeeded' ? count : 0,
      progressFraction: status === 'succeeded' ? 1 : 0,
      queuedAt,
      startedAt: queuedAt,
      finishedAt,
      computeTimeS: status === 'succeeded' ? 0.5 : null,
      result: (values.result ?? null) as unknown as Record<string, unknown> | null,
      requestedBy: values.requestedBy ?? null,
    })
    .returning();
  return rows[0]!;
}
