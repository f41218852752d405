/**
 * Couplet physics benchmark: time and accuracy of the fast pair evaluator on four sweeps, and the
 * speed ratio against a naive Neumann baseline at equal accuracy. Run with
 * `npx tsx physics/bench/physics-bench.ts`. Prints figures; not a timed test. Coils are demo
 * geometry of our own, built with the coil models of physics/src/coils.
 *
 * Accuracy: sample poses are compared with brute-force references that share no kernel with the
 * fast path — Neumann's double integral by the product trapezoid rule (neumannRingPair) for ring
 * coils, and the polygons' closed-form segment potential integrated around the rings
 * (ringPathReference) for the rectangular Tx. Errors are relative to |M| at the pose and, where M
 * crosses zero, to the map's largest |M| (both printed).
 */
import { coilFilaments } from '../src/coils/coil-filaments';
import type { Coil } from '../src/coils/coil-schema';
import type { PathFilament, RingFilament } from '../src/filaments';
import { preparePair } from '../src/inductance/prepare-pair';
import { neumannRingPair } from '../src/kernels/neumann-ring-pair';
import { pathSegments } from '../src/kernels/path-segments';
import { ringStackFactor } from '../src/kernels/ring-stack-factor';
import { ringStackTable } from '../src/kernels/ring-stack-table';
import { poseRotation } from '../src/pose/pose-rotation';
import type { PoseInput } from '../src/pose/pose-schema';
import { transformFilaments } from '../src/pose/transform-filaments';
import { neumannMidpointSum } from './neumann-midpoint-sum';
import { ringPathReference } from './ring-path-reference';

const now = () => performance.now() / 1000;
const round = (x: number, digits = 3) => Number(x.toPrecision(digits));

const phoneTx = {
  kind: 'circular-spiral',
  turns: 20,
  innerDiameter: 0.02,
  outerDiameter: 0.05,
  conductor: { type: 'round', diameter: 6e-4 },
} as Coil;
const phoneRx = {
  kind: 'circular-spiral',
  turns: 20,
  innerDiameter: 0.016,
  outerDiameter: 0.04,
  conductor: { type: 'round', diameter: 5e-4 },
} as Coil;
const rectTx = {
  kind: 'rectangular-spiral',
  outerWidth: 0.07,
  outerHeight: 0.05,
  cornerRadius: 0.002,
  pitch: 0.0012,
  turns: 15,
  conductor: { type: 'round', diameter: 8e-4 },
} as Coil;
const padTx = {
  kind: 'circular-spiral',
  turns: 12,
  innerDiameter: 0.38,
  outerDiameter: 0.6,
  conductor: { type: 'round', diameter: 4e-3 },
} as Coil;
const padRx = {
  kind: 'circular-spiral',
  turns: 12,
  innerDiameter: 0.224,
  outerDiameter: 0.4,
  conductor: { type: 'round', diameter: 3e-3 },
} as Coil;

/** A square grid over ±half, exactly symmetric ((i - c) · step), at one gap. */
function grid(count: number, half: number, extra: PoseInput): PoseInput[] {
  const c = (count - 1) / 2;
  const step = half / c;
  const out: PoseInput[] = [];
  for (let i = 0; i < count; i++)
    for (let j = 0; j < count; j++) out.push({ ...extra, x: (i - c) * step, y: (j - c) * step });
  return out;
}

/** Neumann brute force over every ring pair (product trapezoid, n angles per ring). */
function neumannRings(tx: Coil, rx: Coil, pose: PoseInput, n: number): number {
  const a = coilFilaments(tx).rings;
  const b = transformFilaments(coilFilaments(rx), pose).rings;
  let sum = 0;
  for (const p of a) for (const q of b) sum += neumannRingPair(p, q, n);
  return sum;
}

interface Row {
  case: string;
  poses: number;
  prepare_s: number;
  sweep_s: number;
  target_s: string;
  maxErrPose: number;
  maxErrPeak: number;
  refCheck: string;
}
const rows: Row[] = [];
let tableCheck = { points: 0, maxErr: NaN };

function accuracy(
  values: Float64Array,
  poses: PoseInput[],
  picks: number[],
  ref: (p: PoseInput) => number,
): [number, number] {
  const peak = Math.max(...Array.from(values, Math.abs));
  let pose = 0;
  let peakErr = 0;
  for (const i of picks) {
    const r = ref(poses[i]);
    const e = Math.abs(values[i] - r);
    pose = Math.max(pose, e / Math.abs(r));
    peakErr = Math.max(peakErr, e / peak);
  }
  return [pose, peakErr];
}

/**
 * The Rx stack's tabulated potential (the table the fast path builds, same options) against
 * its direct ring sum at 200 points per Tx side, in the given poses: the table's error where the
 * Tx conductor actually is.
 */
function tabulatedFieldError(
  paths: readonly PathFilament[],
  rings: readonly RingFilament[],
  poses: PoseInput[],
): { points: number; maxErr: number } {
  const stack = {
    r: Float64Array.from(rings, (r) => r.radius),
    z: Float64Array.from(rings, (r) => r.center.z),
    w: Float64Array.from(rings, (r) => r.weight),
  };
  const clearance = paths[0].wireRadius + rings[0].wireRadius;
  const table = ringStackTable(stack, { clearance });
  let points = 0;
  let maxErr = 0;
  for (const pose of poses) {
    const [r0, r1, r2] = poseRotation(pose);
    const t = { x: pose.x ?? 0, y: pose.y ?? 0, z: pose.z ?? 0 };
    for (const path of paths) {
      for (const [a, b] of pathSegments(path)) {
        for (let k = 0; k < 200; k++) {
          const f = (k + 0.5) / 200;
          const p = {
            x: a.x + f * (b.x - a.x) - t.x,
            y: a.y + f * (b.y - a.y) - t.y,
            z: a.z + f * (b.z - a.z) - t.z,
          };
          const qx = r0.x * p.x + r1.x * p.y + r2.x * p.z;
          const qy = r0.y * p.x + r1.y * p.y + r2.y * p.z;
          const qz = r0.z * p.x + r1.z * p.y + r2.z * p.z;
          const rho = Math.hypot(qx, qy);
          const want = ringStackFactor(stack, rho * rho, qz);
          maxErr = Math.max(maxErr, Math.abs(table.factor(rho, qz) - want) / Math.abs(want));
          points++;
        }
      }
    }
  }
  return { points, maxErr };
}

function timed<T>(f: () => T): [T, number] {
  const t0 = now();
  const out = f();
  return [out, now() - t0];
}

// JIT warm-up on a different gap, so nothing is cached for the timed runs.
preparePair(phoneTx, phoneRx).mutualMany(grid(5, 0.02, { z: 0.007 }));

// (a) 101 x 101 map at 3 mm.
{
  const poses = grid(101, 0.025, { z: 0.003 });
  const [pair, prep] = timed(() => preparePair(phoneTx, phoneRx));
  const [m, t] = timed(() => pair.mutualMany(poses));
  const picks = [5100, 5110, 3030, 0, 7777, 5150];
  const [ep, ek] = accuracy(m, poses, picks, (p) => neumannRings(phoneTx, phoneRx, p, 512));
  const check =
    Math.abs(
      neumannRings(phoneTx, phoneRx, poses[7777], 384) -
        neumannRings(phoneTx, phoneRx, poses[7777], 512),
    ) / Math.abs(m[7777]);
  rows.push({
    case: '(a) spirals 50/40 mm, 101x101, ±25 mm, 3 mm',
    poses: poses.length,
    prepare_s: round(prep),
    sweep_s: round(t),
    target_s: '<= 0.3',
    maxErrPose: round(ep, 2),
    maxErrPeak: round(ek, 2),
    refCheck: `Neumann 384 vs 512: ${round(check, 2)}`,
  });
}

// (b) 200-point gap sweep 0.5–30 mm, aligned. The gap is between conductor surfaces here: at a
// 0.5 mm centre-line distance the 0.6 mm and 0.5 mm wires would overlap (0.55 mm needed).
{
  const surfaces = 0.00055;
  const poses = Array.from({ length: 200 }, (_, i) => ({
    z: surfaces + 0.0005 + (i * (0.03 - 0.0005)) / 199,
  }));
  const [pair, prep] = timed(() => preparePair(phoneTx, phoneRx));
  const [m, t] = timed(() => pair.mutualMany(poses));
  // Trapezoid rate ~ e^(-n gap / r): 2048 angles at the 0.5 mm gap, 512 elsewhere.
  const [ep, ek] = accuracy(m, poses, [0, 34, 199], (p) =>
    neumannRings(phoneTx, phoneRx, p, (p.z ?? 0) < 0.002 ? 2048 : 512),
  );
  rows.push({
    case: '(b) same pair, aligned, gap 0.5–30 mm (surfaces), 200',
    poses: poses.length,
    prepare_s: round(prep),
    sweep_s: round(t),
    target_s: '-',
    maxErrPose: round(ep, 2),
    maxErrPeak: round(ek, 2),
    refCheck: 'Neumann 2048 / 512',
  });
}

// (c) 41 x 41 map, rectangular Tx, circular Rx tilted 5° about x, 3 mm gap at its centre.
{
  const poses = grid(41, 0.025, { z: 0.003, tiltX: 5 });
  const [pair, prep] = timed(() => preparePair(rectTx, phoneRx));
  const [m, t] = timed(() => pair.mutualMany(poses));
  const txPaths = coilFilaments(rectTx).paths;
  const ref = (p: PoseInput) =>
    ringPathReference(
      txPaths,
      transformFilaments(coilFilaments(phoneRx), p).rings as RingFilament[],
    ).M;
  // Centre, both far corners, an edge and two off-centre poses (the map is not symmetric in y).
  const [ep, ek] = accuracy(m, poses, [840, 0, 1680, 1300, 420, 41], ref);
  tableCheck = tabulatedFieldError(
    txPaths,
    coilFilaments(phoneRx).rings,
    [0, 840, 1300, 1680].map((i) => poses[i]),
  );
  rows.push({
    case: '(c) rect 70x50 15 t vs spiral 40 mm, 5° tilt, 41x41',
    poses: poses.length,
    prepare_s: round(prep),
    sweep_s: round(t),
    target_s: '<= 3',
    maxErrPose: round(ep, 2),
    maxErrPeak: round(ek, 2),
    refCheck: 'segment potential around rings',
  });
}

// (d) vehicle pads 600 / 400 mm, 12 turns, 150 mm gap, 61 x 61 over ±200 mm.
{
  const poses = grid(61, 0.2, { z: 0.15 });
  const [pair, prep] = timed(() => preparePair(padTx, padRx));
  const [m, t] = timed(() => pair.mutualMany(poses));
  const [ep, ek] = accuracy(m, poses, [1860, 0, 1000, 2500], (p) =>
    neumannRings(padTx, padRx, p, 256),
  );
  rows.push({
    case: '(d) pads 600/400 mm, 61x61, ±200 mm, 150 mm',
    poses: poses.length,
    prepare_s: round(prep),
    sweep_s: round(t),
    target_s: '<= 1',
    maxErrPose: round(ep, 2),
    maxErrPeak: round(ek, 2),
    refCheck: 'Neumann 256',
  });
}

console.log('\nCouplet physics benchmark (filament model; times in seconds on this machine)\n');
console.table(rows);
console.log(
  `(c) tabulated Rx potential vs its direct ring sum at ${tableCheck.points} points along the ` +
    `Tx paths (4 poses): max rel. error ${round(tableCheck.maxErr, 2)}`,
);

// Naive baseline on case (a): n-gon turns, midpoint Neumann sum, n doubled until it matches the
// fast evaluator's accuracy (1e-6 relative to the converged reference) or one pose takes > 8 s.
{
  const pose = { x: 0.005, y: 0, z: 0.003 };
  const ref = neumannRings(phoneTx, phoneRx, pose, 512);
  const a = coilFilaments(phoneTx).rings;
  const b = transformFilaments(coilFilaments(phoneRx), pose).rings;
  const pair = preparePair(phoneTx, phoneRx);
  const poses = grid(101, 0.025, { z: 0.0031 });
  const [, fastMap] = timed(() => pair.mutualMany(poses));
  const fastPerPose = fastMap / poses.length;
  const fastErr = Math.abs(pair.mutual(pose) - ref) / Math.abs(ref);
  const steps: Array<{ n: number; time_s: number; relErr: number }> = [];
  for (let n = 64; ; n *= 2) {
    const [val, t] = timed(() => neumannMidpointSum(a, b, n));
    steps.push({ n, time_s: round(t), relErr: round(Math.abs(val - ref) / Math.abs(ref), 3) });
    if (Math.abs(val - ref) / Math.abs(ref) <= 1e-6 || t > 8) break;
  }
  console.log(
    '\nNaive baseline (case (a) pair at x = 5 mm, 3 mm gap): ' +
      'n segments per turn, midpoint Neumann sum',
  );
  console.table(steps);
  const last = steps[steps.length - 1];
  let naivePerPose = last.time_s;
  let note = `matched at n = ${last.n}`;
  if (last.relErr > 1e-6) {
    const prev = steps[steps.length - 2];
    const order = Math.log(prev.relErr / last.relErr) / Math.log(last.n / prev.n);
    const nNeeded = last.n * (last.relErr / 1e-6) ** (1 / order);
    naivePerPose = last.time_s * (nNeeded / last.n) ** 2;
    note =
      `extrapolated: observed order ${round(order, 2)}, ` +
      `n ≈ ${Math.round(nNeeded)} needed, time ∝ n^2`;
  }
  console.log(
    `fast evaluator: ${round(fastPerPose * 1e6)} µs per pose in a 101x101 map ` +
      `(error ${round(fastErr, 2)})`,
  );
  console.log(`naive baseline at 1e-6: ${round(naivePerPose)} s per pose (${note})`);
  console.log(
    `speed ratio at equal accuracy: ${round(naivePerPose / fastPerPose, 2)} x (target >= 100 x)\n`,
  );
}
process.exit(0);
