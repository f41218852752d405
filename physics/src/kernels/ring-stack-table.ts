import { chebyshevBasis, type ChebyshevBasis } from './chebyshev-basis';
import { chebyshevPatch } from './chebyshev-patch';
import { ringPotentialFactor } from './ring-potential-factor';
import { ringStackDistance } from './ring-stack-distance';
import type { RingStack } from './ring-stack-factor';

/** Options of the tabulated stack potential. */
export interface RingStackTableOptions {
  /**
   * Points nearer than this to a ring are summed directly (m): the pair's clearance (the two
   * conductors' reach), inside which no conductor of the other coil can be. Default 0.
   */
  clearance?: number;
  /** Chebyshev points per direction in a cell (default 12). */
  order?: number;
  /** Accepted interpolation error, relative to the cell's largest |G| (default 1e-12). */
  tolerance?: number;
}

/** The stack's potential factor G(rho, z), interpolated where that is verified to be exact. */
export interface RingStackTable {
  /** G at cylinder coordinates (rho >= 0, z) of the stack's frame, H/m^2. */
  factor(rho: number, z: number): number;
  /** Cells with an interpolant and cells summed directly, built so far. */
  readonly counts: { fitted: number; direct: number };
}

/** A cell is split while its side exceeds this fraction of its centre's distance to a ring. */
const GRADING = 0.5;
/** Below 2^-24 of the root side a cell is far below any conductor size: sum directly. */
const MAX_DEPTH = 24;
/** Root keys pack two integers into one exact double: |index| below 2^25 each. */
const KEY = 2 ** 25;
/** Node states. */
const OPEN = 0;
const SPLIT = 1;
const FITTED = 2;
const DIRECT = 3;

/**
 * The summed vector-potential factor G(rho, z) of a coaxial ring stack, tabulated once per coil
 * by piecewise Chebyshev interpolation and then evaluated for the cost of one polynomial — the
 * per-coil precomputation that makes maps of polygon Tx coils against ring Rx coils cheap.
 *
 * Method: the meridian half-plane (rho >= 0, z) is tiled by square root cells whose side is the
 * power of two at or above the stack's largest radius (so every cell bound is an exact double);
 * each is refined as a quadtree, lazily, only where points are asked for. A cell is split while
 * its side exceeds half the distance from its centre to the nearest ring (G is analytic away
 * from the rings, whose complex singularities then lie at least four half-sides from the centre:
 * a Bernstein polyellipse of parameter ≥ 4 + √15 ≈ 7.9). A cell that may reach within
 * `clearance` of a ring is summed directly (`ringPotentialFactor` per ring): the other coil's
 * conductor cannot be there in an accepted pose, and exactness costs nothing where nothing is
 * asked. Otherwise G is sampled on the cell's 12 x 12 Chebyshev grid (`chebyshevPatch`) and kept
 * to total degree 11 (terms a + b <= 11: half the work per evaluation, and coefficients fall
 * like ρ^-(a+b), so the terms dropped are of the size of the tail checked). The interpolant is
 * accepted only when (i) every coefficient with a + b >= 10 is below `tolerance` times the
 * cell's largest |G| and (ii) it matches the direct sum at the four quadrant centres to the same
 * bound; otherwise the cell is split. A cell's content depends only on its position and the
 * stack, so results are the same whatever poses were asked for first.
 *
 * Tolerance: 1e-12 of the cell's largest |G|. Where the Tx conductor can be (outside the
 * clearance) the tests find ≤ 1e-10 of G at random points, and the bench prints ~6e-13 at 99 200
 * points along the Tx paths of its case (c) — far inside the 1e-7 that a 1e-6 target on M
 * allows, even where M is small by cancellation (M's error is at most the field's relative
 * error times ∫ |A · dl|).
 *
 * References: L. N. Trefethen, Approximation Theory and Approximation Practice, SIAM, 2013,
 * ch. 8 (Bernstein ellipses) and ch. 4 (Chebyshev interpolation); H. Samet, The Design and
 * Analysis of Spatial Data Structures, 1990 (region quadtrees); J. D. Jackson, Classical
 * Electrodynamics, 3rd ed., 1999, eq. 5.37.
 *
 * @param stack - the rings in the stack's frame, m.
 * @param options - clearance (m), order, tolerance.
 * @returns the table; `factor` throws a RangeError on a ring, as the direct sum does.
 *
 * @example ringStackTable(rx20, { clearance: 6.5e-4 }).factor(0.03, -0.004); // ≈ ringStackFactor
 */
export function ringStackTable(
  stack: RingStack,
  options: RingStackTableOptions = {},
): RingStackTable {
  return new StackTable(stack, options);
}

/**
 * Σ_{a + b < n} c_ab T_a(x) T_b(y) for the patch at `at` (total degree n - 1: the terms dropped
 * are of the size of the tail that the fit checks), the T by their three-term recurrence.
 */
function patchValue(
  c: Float64Array,
  at: number,
  n: number,
  ys: Float64Array,
  x: number,
  y: number,
): number {
  const y2 = 2 * y;
  ys[0] = 1;
  ys[1] = y;
  for (let b = 2; b < n; b++) ys[b] = y2 * ys[b - 1] - ys[b - 2];
  const x2 = 2 * x;
  let t0 = 1;
  let t1 = x;
  let sum = 0;
  for (let a = 0; a < n; a++) {
    const base = at + a * n;
    let row = 0;
    for (let b = 0; b < n - a; b++) row += c[base + b] * ys[b];
    sum += t0 * row;
    const t2 = x2 * t1 - t0;
    t0 = t1;
    t1 = t2;
  }
  return sum;
}

class StackTable implements RingStackTable {
  readonly counts = { fitted: 0, direct: 0 };
  private readonly r: Float64Array;
  private readonly z: Float64Array;
  private readonly w: Float64Array;
  private readonly n: number;
  private readonly nodes: Float64Array;
  private readonly basis: ChebyshevBasis;
  private readonly tol: number;
  private readonly clearance: number;
  /** With no stated clearance, cells near a ring still stop splitting at 1e-3 of the root side. */
  private readonly near: number;
  private readonly side: number;
  private readonly roots = new Map<number, number>();
  // Node arrays: state, first child (of four), coefficient offset, depth, geometry.
  private state = new Int32Array(1024);
  private child = new Int32Array(1024);
  private offset = new Int32Array(1024);
  private depth = new Int32Array(1024);
  private cellR0 = new Float64Array(1024);
  private cellZ0 = new Float64Array(1024);
  private cellSide = new Float64Array(1024);
  private size = 0;
  private coeffs: Float64Array;
  private used = 0;
  private readonly values: Float64Array;
  private readonly scratch: Float64Array;
  private readonly trial: Float64Array;
  private readonly ys: Float64Array;
  // The last leaf used: consecutive quadrature points nearly always fall in it.
  private lastR0 = Infinity;
  private lastR1 = -Infinity;
  private lastZ0 = Infinity;
  private lastZ1 = -Infinity;
  private lastOffset = -1;
  private lastKey = -1;
  private lastRoot = -1;

  constructor(
    private readonly stack: RingStack,
    options: RingStackTableOptions,
  ) {
    this.r = stack.r;
    this.z = stack.z;
    this.w = stack.w;
    if (this.r.length === 0) throw new RangeError('stack must hold at least one ring');
    this.clearance = options.clearance ?? 0;
    this.tol = options.tolerance ?? 1e-12;
    this.basis = chebyshevBasis(options.order ?? 12);
    this.n = this.basis.n;
    this.nodes = this.basis.nodes;
    let largest = 0;
    for (let i = 0; i < this.r.length; i++) largest = Math.max(largest, this.r[i]);
    // A power of two at or above the largest radius: every cell bound is then an exact double.
    const side = 2 ** Math.ceil(Math.log2(largest));
    this.side = side;
    this.near = Math.max(this.clearance, 1e-3 * side);
    const nn = this.n * this.n;
    this.coeffs = new Float64Array(256 * nn);
    this.values = new Float64Array(nn);
    this.scratch = new Float64Array(nn);
    this.trial = new Float64Array(nn);
    this.ys = new Float64Array(this.n);
  }

  factor(rho: number, z: number): number {
    // Membership by comparisons with exact dyadic bounds only, the same ones the descent uses,
    // so a point always lands in the same leaf whatever was asked before.
    if (!(rho >= this.lastR0 && rho < this.lastR1 && z >= this.lastZ0 && z < this.lastZ1)) {
      if (!this.find(rho, z)) return this.direct(rho, z);
    }
    if (this.lastOffset < 0) return this.direct(rho, z);
    const h = 0.5 * (this.lastR1 - this.lastR0);
    return patchValue(
      this.coeffs,
      this.lastOffset,
      this.n,
      this.ys,
      (rho - this.lastR0) / h - 1,
      (z - this.lastZ0) / h - 1,
    );
  }

  /** Makes the leaf holding (rho, z) the last leaf; false when no root cell can hold it. */
  private find(rho: number, z: number): boolean {
    const side = this.side;
    // side is a power of two: the quotients and the root bounds i · side are exact.
    const i = Math.floor(rho / side);
    const j = Math.floor(z / side);
    if (!(i >= 0 && i < KEY && Math.abs(j) < KEY)) return false;
    const key = i * 2 * KEY + (j + KEY);
    let node = key === this.lastKey ? this.lastRoot : (this.roots.get(key) ?? -1);
    if (node < 0) {
      node = this.newNode(i * side, j * side, side, 0);
      this.roots.set(key, node);
    }
    this.lastKey = key;
    this.lastRoot = node;
    for (;;) {
      if (this.state[node] === OPEN) this.resolve(node);
      if (this.state[node] !== SPLIT) break;
      const half = 0.5 * this.cellSide[node];
      const right = rho >= this.cellR0[node] + half ? 1 : 0;
      const up = z >= this.cellZ0[node] + half ? 1 : 0;
      node = this.child[node] + right + 2 * up;
    }
    this.lastR0 = this.cellR0[node];
    this.lastZ0 = this.cellZ0[node];
    this.lastR1 = this.lastR0 + this.cellSide[node];
    this.lastZ1 = this.lastZ0 + this.cellSide[node];
    this.lastOffset = this.state[node] === FITTED ? this.offset[node] : -1;
    return true;
  }

  private direct(rho: number, z: number): number {
    const { r, z: zi, w } = this;
    const rho2 = rho * rho;
    let sum = 0;
    for (let i = 0; i < r.length; i++) sum += w[i] * ringPotentialFactor(r[i], rho2, z - zi[i]);
    return sum;
  }

  private newNode(r0: number, z0: number, side: number, depth: number): number {
    if (this.size === this.state.length) {
      const grow = <T extends Int32Array | Float64Array>(a: T): T => {
        const b = new (a.constructor as new (n: number) => T)(2 * a.length);
        b.set(a);
        return b;
      };
      this.state = grow(this.state);
      this.child = grow(this.child);
      this.offset = grow(this.offset);
      this.depth = grow(this.depth);
      this.cellR0 = grow(this.cellR0);
      this.cellZ0 = grow(this.cellZ0);
      this.cellSide = grow(this.cellSide);
    }
    const k = this.size++;
    this.state[k] = OPEN;
    this.child[k] = -1;
    this.offset[k] = -1;
    this.depth[k] = depth;
    this.cellR0[k] = r0;
    this.cellZ0[k] = z0;
    this.cellSide[k] = side;
    return k;
  }

  /** Decides an open cell: split, direct, or fitted and verified. */
  private resolve(node: number): void {
    const { n, nodes, tol, values, trial } = this;
    const size = this.cellSide[node];
    const depth = this.depth[node];
    const r0 = this.cellR0[node];
    const z0 = this.cellZ0[node];
    const h = 0.5 * size;
    const rc = r0 + h;
    const zc = z0 + h;
    const d = ringStackDistance(this.stack, rc, zc);
    if (d - h * Math.SQRT2 <= this.clearance || depth >= MAX_DEPTH) {
      // Near a ring: direct once the cell is small against the clearance (or at the depth limit).
      if (size <= 0.25 * this.near || depth >= MAX_DEPTH) {
        this.state[node] = DIRECT;
        this.counts.direct++;
      } else this.split(node);
      return;
    }
    if (size > GRADING * d) {
      this.split(node);
      return;
    }
    let scale = 0;
    for (let j = 0; j < n; j++) {
      for (let k = 0; k < n; k++) {
        const v = this.direct(rc + h * nodes[j], zc + h * nodes[k]);
        values[j * n + k] = v;
        scale = Math.max(scale, Math.abs(v));
      }
    }
    chebyshevPatch(this.basis, values, trial, this.scratch);
    let tail = 0;
    for (let a = 0; a < n; a++) {
      for (let b = 0; b < n; b++)
        if (a + b >= n - 2) tail = Math.max(tail, Math.abs(trial[a * n + b]));
    }
    let ok = tail <= tol * scale;
    for (let q = 0; ok && q < 4; q++) {
      const x = q & 1 ? 0.5 : -0.5;
      const y = q & 2 ? 0.5 : -0.5;
      const want = this.direct(rc + h * x, zc + h * y);
      ok = Math.abs(patchValue(trial, 0, n, this.ys, x, y) - want) <= tol * scale;
    }
    if (!ok) {
      this.split(node);
      return;
    }
    if (this.used + n * n > this.coeffs.length) {
      const grown = new Float64Array(2 * this.coeffs.length);
      grown.set(this.coeffs);
      this.coeffs = grown;
    }
    this.coeffs.set(trial, this.used);
    this.offset[node] = this.used;
    this.used += n * n;
    this.state[node] = FITTED;
    this.counts.fitted++;
  }

  private split(node: number): void {
    const h = 0.5 * this.cellSide[node];
    const r0 = this.cellR0[node];
    const z0 = this.cellZ0[node];
    const depth = this.depth[node] + 1;
    // Children in the order (left, bottom), (right, bottom), (left, top), (right, top).
    const first = this.newNode(r0, z0, h, depth);
    this.newNode(r0 + h, z0, h, depth);
    this.newNode(r0, z0 + h, h, depth);
    this.newNode(r0 + h, z0 + h, h, depth);
    this.child[node] = first;
    this.state[node] = SPLIT;
  }
}
