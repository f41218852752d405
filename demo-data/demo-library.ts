import type { CreateCoilRequest } from '../api/src/coils/coils-dto';
import type { CreateStudyRequest } from '../api/src/studies/studies-dto';
import type { CreateSweepRequest } from '../api/src/sweeps/sweeps-dto';

// The demo workspace's coil library and its one study: Tarnholm's FP-7 charging cradle (an
// invented product). The probe drops into a desk or van cradle; the Tx sits in the cradle base,
// the Rx behind the probe's back cover, a few millimetres of plastic apart. Every number here is
// invented for the demo, chosen to look like a small consumer-size charger (tens of mm, 100–200
// kHz, 1–2 A); none is a measurement or a design recommendation.

export interface DemoCoil {
  /** Fixed ids, so links in the demo (and its tests) stay valid across reloads. */
  id: string;
  request: CreateCoilRequest;
}

/** 105 strands of 80 µm copper: a common Litz build for this frequency band (invented). */
const litz = { type: 'litz', strands: 105, strandDiameter: 8e-5 } as const;
/** Manganese-zinc ferrite tile under the Tx, 1 mm below the winding (invented values). */
const ferrite = { mur: 2300, distance: 0.001 } as const;

export const demoCoils = {
  txSpiral: {
    id: '7a3e0c52-4d1b-4f2e-9a6c-0de1c0a1c001',
    request: {
      name: 'FP-7 Tx — Litz spiral on ferrite',
      description:
        'Cradle base, candidate A. 11 turns of 105 × 80 µm Litz, 18–44 mm across, on a 1 mm ' +
        'ferrite tile. Baseline Tx of the design review.',
      spec: {
        kind: 'circular-spiral',
        turns: 11,
        innerDiameter: 0.018,
        outerDiameter: 0.044,
        conductor: litz,
        backing: ferrite,
      },
      operatingFrequencyHz: 140e3,
      ratedCurrentA: 1.5,
    },
  },
  txRectangular: {
    id: '7a3e0c52-4d1b-4f2e-9a6c-0de1c0a1c002',
    request: {
      name: 'FP-7 Tx — rectangular Litz spiral (candidate B)',
      description:
        'Cradle base, candidate B: fits the base moulding better. 9 turns of the same Litz, ' +
        '48 × 38 mm outer turn with 5 mm corners, 1.3 mm pitch, same ferrite tile.',
      spec: {
        kind: 'rectangular-spiral',
        outerWidth: 0.048,
        outerHeight: 0.038,
        cornerRadius: 0.005,
        pitch: 0.0013,
        turns: 9,
        conductor: litz,
        backing: ferrite,
      },
      operatingFrequencyHz: 140e3,
      ratedCurrentA: 1.5,
    },
  },
  txBare: {
    id: '7a3e0c52-4d1b-4f2e-9a6c-0de1c0a1c003',
    request: {
      name: 'FP-7 Tx — Litz spiral, no ferrite (bench sample)',
      description:
        'The candidate A winding as the first bench sample was built, before the ferrite tile ' +
        'arrived. Kept to compare with the bench measurements.',
      spec: {
        kind: 'circular-spiral',
        turns: 11,
        innerDiameter: 0.018,
        outerDiameter: 0.044,
        conductor: litz,
      },
      operatingFrequencyHz: 140e3,
      ratedCurrentA: 1.5,
    },
  },
  rxPcb: {
    id: '7a3e0c52-4d1b-4f2e-9a6c-0de1c0a1c004',
    request: {
      name: 'FP-7 Rx — PCB spiral in the probe back',
      description:
        'Two-layer board behind the back cover: 7 turns per layer, 14–32 mm across, 0.9 mm ' +
        'traces of 70 µm copper, layers 0.8 mm apart.',
      spec: {
        kind: 'circular-spiral',
        turns: 7,
        innerDiameter: 0.014,
        outerDiameter: 0.032,
        layers: 2,
        layerSpacing: 0.0008,
        conductor: { type: 'trace', width: 9e-4, thickness: 7e-5 },
      },
      operatingFrequencyHz: 140e3,
      ratedCurrentA: 1,
    },
  },
  rxSolenoid: {
    id: '7a3e0c52-4d1b-4f2e-9a6c-0de1c0a1c005',
    request: {
      name: 'FP-7 Rx — small solenoid (alternative)',
      description:
        'Alternative for the probe tip: 16 turns of 0.45 mm wire on a 12 mm former, 8 mm long.',
      spec: {
        kind: 'solenoid',
        radius: 0.006,
        length: 0.008,
        turns: 16,
        conductor: { type: 'round', diameter: 4.5e-4 },
      },
      operatingFrequencyHz: 140e3,
      ratedCurrentA: 1,
    },
  },
} satisfies Record<string, DemoCoil>;

/** 4 mm: 2.5 mm cradle wall plus 1.5 mm probe back cover (invented). */
const nominalGap = 0.004;

export const demoStudy = {
  id: '7a3e0c52-4d1b-4f2e-9a6c-0de1c0a1d001',
  request: {
    name: 'FP-7 cradle — baseline',
    txCoilId: demoCoils.txSpiral.id,
    rxCoilId: demoCoils.rxPcb.id,
    frequencyHz: 140e3,
    txCurrentA: 1.2,
    // The power stage's (invented) lowest workable coupling; at 4 mm it leaves ~8 mm of offset.
    threshold: { kind: 'k', value: 0.5 },
    compensation: 'series-series',
    notes:
      'Baseline for the FP-7 design review: Litz spiral on ferrite in the cradle base, PCB ' +
      'spiral in the probe back, 4 mm nominal gap. Field requirement: charging must hold with ' +
      'the probe up to 4 mm off-centre and tilted in a muddy cradle. Model limits: filament ' +
      'model, ferrite as an infinite plate, no metal nearby; check against bench data.',
    nominalPose: { x: 0, y: 0, z: nominalGap, tiltX: 0, tiltY: 0 },
  } satisfies CreateStudyRequest,
};

/** The stored runs of the baseline study, sized so that the demo loads in about a second. */
export const demoSweeps: CreateSweepRequest[] = [
  {
    kind: 'xy-map',
    grid: {
      x: { from: -0.015, to: 0.015, steps: 41 },
      y: { from: -0.015, to: 0.015, steps: 41 },
      z: nominalGap,
    },
  },
  { kind: 'gap', grid: { z: { from: 0.002, to: 0.012, steps: 21 } } },
  { kind: 'tilt', grid: { tiltX: { from: -12, to: 12, steps: 25 }, z: nominalGap } },
  {
    kind: 'xy-stack',
    grid: {
      x: { from: -0.015, to: 0.015, steps: 21 },
      y: { from: -0.015, to: 0.015, steps: 21 },
      z: { from: 0.003, to: 0.006, steps: 4 },
    },
  },
];

export const demoRevisionSummary = 'Baseline for the design review';
