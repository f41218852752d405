// Test support for the sweep specs (and the workbench's): a study and sweep runs of our own
// invented scenario, a wrist-band charger of "Tarnholm Instruments". The numbers are demo data,
// shaped like the API's answers; they check the screens, not the physics. Nothing in the app
// imports this file, so it stays out of the bundle.
import type { StudyCoil, StudyResponse, SweepEnvelope, SweepRunResponse } from '../api-types';

export const testWorkspaceId = '6f1c2d3e-4b5a-4c6d-8e7f-901a2b3c4d5e';

const figures: StudyCoil['figures'] = {
  L: 6.1e-6,
  Rdc: 0.21,
  Rac: 0.26,
  Q: 21,
  storedEnergy: 3e-6,
  timeConstant: 2.9e-5,
  wireLength: 1.3,
  skinDepth: 1.7e-4,
};

export const testStudy: StudyResponse = {
  id: 'b1000000-0000-4000-8000-000000000001',
  workspaceId: testWorkspaceId,
  name: 'FP-7 cradle, band pad',
  txCoil: {
    id: 'c1000000-0000-4000-8000-000000000001',
    name: 'Cradle Tx 40 mm',
    kind: 'circular-spiral',
    spec: {
      kind: 'circular-spiral',
      turns: 10,
      innerDiameter: 0.016,
      outerDiameter: 0.04,
      conductor: { type: 'round', diameter: 6e-4 },
    },
    version: 1,
    figures,
  },
  rxCoil: {
    id: 'c1000000-0000-4000-8000-000000000002',
    name: 'Band Rx 30 mm',
    kind: 'circular-spiral',
    spec: {
      kind: 'circular-spiral',
      turns: 8,
      innerDiameter: 0.012,
      outerDiameter: 0.03,
      conductor: { type: 'round', diameter: 4e-4 },
    },
    version: 1,
    figures,
  },
  frequencyHz: 140e3,
  txCurrentA: 1,
  threshold: { kind: 'k', value: 0.2 },
  compensation: 'series-series',
  notes: '',
  nominalPose: { x: 0, y: 0, z: 0.004, tiltX: 0, tiltY: 0 },
  inputsHash: 'hash-now',
  version: 3,
  latestRevision: null,
  createdBy: { userId: 'a0000000-0000-4000-8000-000000000001', displayName: 'Inês Ferreira' },
  updatedBy: null,
  createdAt: '2026-11-30T09:00:00.000Z',
  updatedAt: '2026-12-01T09:00:00.000Z',
};

let serial = 0;

/** A run as the list shows it (no result). */
export function testRun(change: Partial<SweepRunResponse> = {}): SweepRunResponse {
  serial++;
  return {
    id: `d1000000-0000-4000-8000-${String(serial).padStart(12, '0')}`,
    studyId: testStudy.id,
    kind: 'xy-map',
    grid: {
      x: { from: -0.01, to: 0.01, steps: 3 },
      y: { from: -0.01, to: 0.01, steps: 3 },
      z: 0.004,
    },
    status: 'succeeded',
    pointsTotal: 9,
    pointsDone: 9,
    progressFraction: 1,
    inputsHash: 'hash-now',
    current: true,
    engineVersion: 'test-1',
    queuedAt: '2026-12-01T10:00:00.000Z',
    startedAt: '2026-12-01T10:00:01.000Z',
    finishedAt: '2026-12-01T10:00:03.000Z',
    computeTimeS: 2,
    error: null,
    cancelRequested: false,
    requestedBy: { userId: 'a0000000-0000-4000-8000-000000000001', displayName: 'Inês Ferreira' },
    ...change,
  };
}

/** A 3 × 3 map at one gap, k rising along x then y, with an envelope square 10 mm across. */
export function testMapResult(run: SweepRunResponse): SweepRunResponse {
  const k = [0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9];
  const envelope: SweepEnvelope = {
    z: 0.004,
    thresholdK: 0.2,
    polygons: [
      [
        [
          { x: -0.005, y: -0.005 },
          { x: 0.005, y: -0.005 },
          { x: 0.005, y: 0.005 },
          { x: -0.005, y: 0.005 },
          { x: -0.005, y: -0.005 },
        ],
      ],
    ],
    area: 1e-4,
    chargeRadius: 0.005,
    chargeRadiusLimitedByMap: true,
    worst: { x: 0, y: -0.01, value: 0.2 },
    nominal: { x: 0, y: 0, value: 0.5, meets: true },
  };
  return {
    ...run,
    result: {
      axes: { x: [-0.01, 0, 0.01], y: [-0.01, 0, 0.01], z: [0.004], tiltX: [0], tiltY: [0] },
      count: 9,
      M: k.map((v) => v * 6e-6),
      k,
      etaMax: k.map((v) => v / 2),
      L1: 6.1e-6,
      L2: k.map(() => 5.2e-6),
      R1: 0.26,
      R2: 0.22,
      Q1: 21,
      Q2: 20,
      envelopes: [envelope],
      kMin: 0.1,
      kMax: 0.9,
    },
  };
}

/** A gap sweep of four gaps at the nominal offset. */
export function testGapResult(run: SweepRunResponse): SweepRunResponse {
  const k = [0.6, 0.45, 0.33, 0.25];
  return {
    ...run,
    result: {
      axes: { x: [0], y: [0], z: [0.002, 0.004, 0.006, 0.008], tiltX: [0], tiltY: [0] },
      count: 4,
      M: k.map((v) => v * 6e-6),
      k,
      etaMax: [0.9, 0.87, 0.83, 0.79],
      L1: 6.1e-6,
      L2: k.map(() => 5.2e-6),
      R1: 0.26,
      R2: 0.22,
      Q1: 21,
      Q2: 20,
      envelopes: [],
      kMin: 0.25,
      kMax: 0.6,
    },
  };
}
