import {
  coilResistance,
  couplingForEfficiency,
  maxLinkEfficiency,
  preparePair,
  qualityFactor,
  sweepChunks,
  toleranceEnvelope,
  type Coil,
  type SweepAxes,
  type SweepPair,
  type SweepPose,
} from '../../../physics/src/index';
import type { Threshold } from '../studies/studies-dto';
import type { FrozenSweepSpec, SweepEnvelope, SweepResultBody } from './sweeps-dto';

export interface ComputeSweepOptions {
  /** Called after each chunk with the poses finished so far. */
  onProgress?: (progress: { done: number; total: number }) => void;
  /** Aborting rejects with physics' SweepCancelledError (name 'AbortError') at the next chunk. */
  signal?: AbortSignal;
  /** Poses per chunk (physics' default 1024); smaller chunks report progress more often. */
  chunkSize?: number;
}

/**
 * Everything a stored sweep shows, computed from its frozen spec alone: M, k, L2 and the maximum
 * link efficiency at every pose, both coils' R and Q at the study frequency, and for x–y maps the
 * tolerance envelope of every gap.
 *
 * Method: physics' preparePair(tx, rx) once (clearance checked at every pose), then sweepChunks
 * over the grid (x fastest, then y, z, tilts), k = M / sqrt(L1 L2(pose)). R1, R2 are the AC
 * resistances at the frequency (coilResistance: skin effect only, so Q is an upper bound);
 * Q1 = ωL1/R1; the reported Q2 = ωL2/R2 is the Rx on its own, while η_max at each pose uses
 * Q2 = ωL2(pose)/R2 (a Tx ferrite backing raises L2 near the plate). η_max = x/(1 + sqrt(1 + x))²,
 * x = k² Q1 Q2 (maxLinkEfficiency). Envelopes: per gap of an xy-map or xy-stack, toleranceEnvelope
 * of |k| (the link does not care about the sign of M) at the study's threshold; an η threshold
 * becomes k_min = couplingForEfficiency(η, Q1, Q2 at that gap). The nominal point is the study's
 * nominal x, y.
 *
 * References: see preparePair, maxLinkEfficiency (M. Kiani, M. Ghovanloo, IEEE Trans. Industrial
 * Electronics 60(11), 2013), couplingForEfficiency and toleranceEnvelope.
 *
 * @param frozen the run's frozen spec (SI units, degrees)
 * @param options progress callback, abort signal, chunk size
 * @returns the result body stored in sweep_runs.result
 */
export async function computeSweepResult(
  frozen: FrozenSweepSpec,
  options: ComputeSweepOptions = {},
): Promise<SweepResultBody> {
  const { inputs, grid } = frozen;
  const frequency = inputs.frequencyHz;
  const pair = preparePair(inputs.tx, inputs.rx);
  const L1 = pair.L1;
  const R1 = acResistance(inputs.tx, frequency);
  const R2 = acResistance(inputs.rx, frequency);
  const Q1 = qualityFactor(L1, R1, frequency);
  const Q2 = qualityFactor(pair.L2, R2, frequency);

  // L2 at each pose is needed twice (for k inside sweepChunks, and here for η): remember the
  // value per pose object, since L2At near a backing with a tilted Rx costs a full mutual sum.
  const l2ByPose = new WeakMap<SweepPose, number>();
  let chunkPoses: SweepPose[] = [];
  const recording: SweepPair = {
    L1,
    L2: pair.L2,
    L2At: (pose) => {
      const value = pair.L2At(pose);
      l2ByPose.set(pose, value);
      return value;
    },
    mutualMany: (poses) => {
      chunkPoses = poses;
      return pair.mutualMany(poses);
    },
  };

  let axes: SweepAxes | undefined;
  let M = new Float64Array(0);
  let k = new Float64Array(0);
  let L2 = new Float64Array(0);
  const chunks = sweepChunks(recording, grid, {
    signal: options.signal,
    chunkSize: options.chunkSize,
  });
  for await (const chunk of chunks) {
    if (!axes) {
      axes = chunk.axes;
      M = new Float64Array(chunk.total);
      k = new Float64Array(chunk.total);
      L2 = new Float64Array(chunk.total);
    }
    M.set(chunk.M, chunk.start);
    k.set(chunk.k, chunk.start);
    chunkPoses.forEach((pose, j) => (L2[chunk.start + j] = l2ByPose.get(pose) ?? pair.L2At(pose)));
    options.onProgress?.({ done: chunk.done, total: chunk.total });
  }
  if (!axes) throw new Error('the sweep produced no poses'); // the schema forbids empty axes

  const etaMax = Array.from(k, (kj, j) =>
    maxLinkEfficiency(kj, Q1, qualityFactor(L2[j], R2, frequency)),
  );
  const mapKind = frozen.kind === 'xy-map' || frozen.kind === 'xy-stack';
  const envelopes =
    mapKind && axes.x.length >= 2 && axes.y.length >= 2
      ? axes.z.map((z, iz) =>
          gapEnvelope(axes as SweepAxes, iz, {
            k,
            L2,
            threshold: inputs.threshold,
            Q1,
            R2,
            frequency,
            nominal: { x: inputs.nominalPose.x, y: inputs.nominalPose.y },
            z,
          }),
        )
      : [];

  let kMin = Infinity;
  let kMax = -Infinity;
  for (const value of k) {
    kMin = Math.min(kMin, value);
    kMax = Math.max(kMax, value);
  }
  return {
    axes,
    count: k.length,
    M: Array.from(M),
    k: Array.from(k),
    etaMax,
    L1,
    L2: Array.from(L2),
    R1,
    R2,
    Q1,
    Q2,
    envelopes,
    kMin,
    kMax,
  };
}

function acResistance(coil: Coil, frequency: number): number {
  const { Rac } = coilResistance(coil, { frequency });
  if (Rac === null) throw new Error('coilResistance gave no AC resistance at a frequency');
  return Rac;
}

interface GapInputs {
  k: Float64Array;
  L2: Float64Array;
  threshold: Threshold;
  Q1: number;
  R2: number;
  frequency: number;
  nominal: { x: number; y: number };
  z: number;
}

/** The tolerance envelope of one gap's x–y slice (only untilted grids reach here). */
function gapEnvelope(axes: SweepAxes, iz: number, g: GapInputs): SweepEnvelope {
  const nx = axes.x.length;
  const ny = axes.y.length;
  const start = iz * nx * ny;
  const values = Array.from(g.k.subarray(start, start + nx * ny), Math.abs);
  // Every pose of an untilted gap shares one L2 (the Rx's image depends on its height only).
  const Q2 = qualityFactor(g.L2[start], g.R2, g.frequency);
  const thresholdK =
    g.threshold.kind === 'k' ? g.threshold.value : couplingFor(g.threshold.value, g.Q1, Q2);
  const envelope = toleranceEnvelope({ xs: axes.x, ys: axes.y, values }, thresholdK, g.nominal);
  return {
    z: g.z,
    thresholdK,
    polygons: envelope.polygons.map((polygon) =>
      polygon.map((ring) => ring.map(([x, y]) => ({ x, y }))),
    ),
    area: envelope.area,
    chargeRadius: envelope.chargeRadius,
    chargeRadiusLimitedByMap: envelope.chargeRadiusLimitedByMap,
    worst: envelope.worst,
    nominal: envelope.nominal,
  };
}

/**
 * k_min for an efficiency target. When the target needs k > 1 (Q too low) physics refuses it;
 * the envelope is then simply empty, so the k it would take is still reported: k scales as
 * 1/sqrt(Q1 Q2), so asking with both Q raised by c and multiplying by c gives the same value.
 */
function couplingFor(eta: number, Q1: number, Q2: number): number {
  try {
    return couplingForEfficiency(eta, Q1, Q2);
  } catch (error) {
    if (!(error instanceof RangeError)) throw error;
    for (let c = 1e3; c <= 1e30; c *= 1e3) {
      const k = couplingForEfficiency(eta, Q1 * c, Q2 * c) * c;
      if (Number.isFinite(k)) return k;
    }
    throw error;
  }
}
