import ellipe from '@stdlib/math-base-special-ellipe';
import ellipk from '@stdlib/math-base-special-ellipk';
import { describe, expect, it } from 'vitest';
import type { Coil, SweepSpec } from '../../../physics/src/index';
import { expectNear } from '../../../physics/src/testing/expect-near';
import type { Threshold } from '../studies/studies-dto';
import { computeSweepResult } from './compute-sweep';
import type { FrozenSweepSpec, SweepKind } from './sweeps-dto';

// computeSweepResult against references outside the project. mu0 written out so no reference
// shares a constant with the code under test.
const MU0 = 4e-7 * Math.PI;

/**
 * Maxwell's closed form for coaxial circular filaments, M = mu0 sqrt(r1 r2) [(2/k − k) K − (2/k) E],
 * k² = 4 r1 r2 / ((r1 + r2)² + d²), with K and E from @stdlib (parameter m = k²). Source:
 * J. C. Maxwell, A Treatise on Electricity and Magnetism (1873), art. 701; DLMF §19.34.
 */
function maxwell(r1: number, r2: number, d: number): number {
  const m = (4 * r1 * r2) / ((r1 + r2) ** 2 + d * d);
  const k = Math.sqrt(m);
  return MU0 * Math.sqrt(r1 * r2) * ((2 / k - k) * ellipk(m) - (2 / k) * ellipe(m));
}

/**
 * Neumann's formula for two parallel rings, the second offset by rho and raised by d:
 * M = mu0/(4π) ∮∮ cos(φ1 − φ2) r1 r2 dφ1 dφ2 / |p1 − p2|, by the product trapezoid rule (the
 * integrand is smooth and periodic, so the rule converges geometrically). Source: F. E. Neumann
 * (1845), as in F. W. Grover, Inductance Calculations (1946), ch. 1.
 */
function neumannOffset(r1: number, r2: number, d: number, rho: number, n = 360): number {
  let sum = 0;
  for (let i = 0; i < n; i++) {
    const a = (2 * Math.PI * (i + 0.5)) / n;
    for (let j = 0; j < n; j++) {
      const b = (2 * Math.PI * (j + 0.5)) / n;
      const dx = rho + r2 * Math.cos(b) - r1 * Math.cos(a);
      const dy = r2 * Math.sin(b) - r1 * Math.sin(a);
      sum += Math.cos(a - b) / Math.sqrt(dx * dx + dy * dy + d * d);
    }
  }
  return ((MU0 / (4 * Math.PI)) * r1 * r2 * sum * (2 * Math.PI) ** 2) / (n * n);
}

/** Maximum link efficiency as PRODUCT.md writes it: k²Q1Q2 / (1 + sqrt(1 + k²Q1Q2))². */
const etaFormula = (k: number, Q1: number, Q2: number) =>
  (k * k * Q1 * Q2) / (1 + Math.sqrt(1 + k * k * Q1 * Q2)) ** 2;

const ring = (radius: number, wireRadius: number, extra: Partial<Coil> = {}) =>
  ({ kind: 'ring', radius, wireRadius, ...extra }) as Coil;

function frozen(
  kind: SweepKind,
  grid: SweepSpec,
  tx: Coil,
  rx: Coil,
  options: { threshold?: Threshold; frequencyHz?: number; nominal?: { x: number; y: number } } = {},
): FrozenSweepSpec {
  return {
    kind,
    grid,
    inputs: {
      frequencyHz: options.frequencyHz ?? 100e3,
      txCurrentA: 1,
      threshold: options.threshold ?? { kind: 'k', value: 0.05 },
      compensation: 'series-series',
      nominalPose: { ...(options.nominal ?? { x: 0, y: 0 }), z: 0.01, tiltX: 0, tiltY: 0 },
      tx,
      rx,
    },
    coilNames: { tx: 'Tx', rx: 'Rx' },
    engineVersion: 'test',
    inputsHash: 'test',
  };
}

describe('computeSweepResult: coaxial rings against Maxwell (1873)', () => {
  const tx = ring(0.02, 5e-4);
  const rx = ring(0.015, 4e-4);

  it('gives M at every gap of a gap sweep as Maxwell’s closed form (stdlib K, E)', async () => {
    const result = await computeSweepResult(
      frozen('gap', { z: { from: 0.002, to: 0.05, steps: 25 } }, tx, rx),
    );
    expect(result.count).toBe(25);
    result.axes.z.forEach((z, i) => {
      // Tolerance 1e-9: both sides are closed forms; the textbook form with stdlib's K and E
      // loses at most ~2 of 16 digits at these moduli (m ≥ 0.3 down to m ≈ 0.1 at 50 mm).
      expectNear(result.M[i], maxwell(0.02, 0.015, z), 1e-9, `M at z = ${z} m`);
    });
  });

  it('forms k from the ring self-inductance of Rosa & Grover, L = mu0 R (ln(8R/a) − 7/4)', async () => {
    const result = await computeSweepResult(frozen('gap', { z: 0.01 }, tx, rx));
    // Rosa & Grover, Bull. Bureau of Standards 8 (1912): uniform current in a thin round ring.
    const L1 = MU0 * 0.02 * (Math.log((8 * 0.02) / 5e-4) - 1.75);
    const L2 = MU0 * 0.015 * (Math.log((8 * 0.015) / 4e-4) - 1.75);
    // Tolerance 1e-9: the engine uses the same thin-ring limit for a single ring.
    expectNear(result.L1, L1, 1e-9, 'L1 of a 40 mm ring of 1 mm wire');
    expectNear(result.L2[0], L2, 1e-9, 'L2 of a 30 mm ring of 0.8 mm wire');
    expectNear(result.k[0], maxwell(0.02, 0.015, 0.01) / Math.sqrt(L1 * L2), 1e-9, 'k at 10 mm');
  });

  it('gives R at 1 kHz as rho·l/A of annealed copper, and Q = ωL/R', async () => {
    const result = await computeSweepResult(
      frozen('gap', { z: 0.01 }, tx, rx, { frequencyHz: 1e3 }),
    );
    // rho = 1.7241e-8 Ω·m (IACS 1913, from memory). At 1 kHz the skin depth (~2 mm) is four
    // times the wire radius, so R_ac exceeds R_dc by ~(a/δ)⁴/48 < 0.1 %; tolerance 1 % covers it
    // and the resistivity's rounding.
    const rdc = (r: number, a: number) => (1.7241e-8 * 2 * Math.PI * r) / (Math.PI * a * a);
    expectNear(result.R1, rdc(0.02, 5e-4), 0.01, 'R1 of the 40 mm ring at 1 kHz');
    expectNear(result.R2, rdc(0.015, 4e-4), 0.01, 'R2 of the 30 mm ring at 1 kHz');
    expectNear(result.Q1, (2 * Math.PI * 1e3 * result.L1) / result.R1, 1e-12, 'Q1 = ωL1/R1');
    expectNear(result.Q2, (2 * Math.PI * 1e3 * result.L2[0]) / result.R2, 1e-12, 'Q2 = ωL2/R2');
  });

  it('gives η_max at every pose by the formula of PRODUCT.md (Kiani & Ghovanloo, 2013)', async () => {
    const result = await computeSweepResult(
      frozen('gap', { z: { from: 0.002, to: 0.04, steps: 9 } }, tx, rx),
    );
    result.k.forEach((k, i) => {
      // Tolerance 1e-12: the same closed formula, evaluated in another order.
      expectNear(result.etaMax[i], etaFormula(k, result.Q1, result.Q2), 1e-12, `η at pose ${i}`);
    });
    // The literature's table (kQ = 1 → 17.2 %, 3 → 52.0 %, 10 → 81.9 %; Kiani & Ghovanloo,
    // IEEE TIE 60(11), 2013, as quoted in CHECK-VALUES) checks the formula itself; tolerance
    // 1e-3 absolute, one unit of the table's last digit.
    for (const [kQ, eta] of [
      [1, 0.172],
      [3, 0.52],
      [10, 0.819],
      [25, 0.923],
      [100, 0.98],
    ] as const) {
      expectNear(etaFormula(kQ, 1, 1), eta, 1e-3, `η at kQ = ${kQ}`, true);
    }
    expect(result.kMin).toBe(Math.min(...result.k));
    expect(result.kMax).toBe(Math.max(...result.k));
    expect(result.envelopes).toEqual([]);
  });

  it('sums Maxwell over every ring pair of two multi-turn ring coils', async () => {
    const rings = (radii: number[]) => radii.map((r) => ({ r, z: 0 }));
    const txRings = [0.01, 0.012, 0.014, 0.016, 0.018];
    const rxRings = [0.008, 0.0095, 0.011, 0.0125];
    const multiTx = { kind: 'rings', wireRadius: 3e-4, rings: rings(txRings) } as Coil;
    const multiRx = { kind: 'rings', wireRadius: 2.5e-4, rings: rings(rxRings) } as Coil;
    const result = await computeSweepResult(
      frozen('gap', { z: { from: 0.003, to: 0.012, steps: 4 } }, multiTx, multiRx),
    );
    result.axes.z.forEach((z, i) => {
      const expected = txRings.reduce(
        (sum, a) => sum + rxRings.reduce((s, b) => s + maxwell(a, b, z), 0),
        0,
      );
      // Tolerance 1e-9, as for one pair: a sum of positive terms adds no cancellation.
      expectNear(result.M[i], expected, 1e-9, `M of 5 × 4 rings at z = ${z} m`);
    });
  });
});

describe('computeSweepResult: envelopes of an x–y map', () => {
  const tx = ring(0.02, 5e-4);
  const rx = ring(0.02, 5e-4);
  const z = 0.01;
  const grid: SweepSpec = {
    x: { from: -0.04, to: 0.04, steps: 41 },
    y: { from: -0.04, to: 0.04, steps: 41 },
    z,
  };

  it('draws the envelope where Neumann’s k falls to the threshold (charge radius)', async () => {
    const threshold = 0.08;
    const result = await computeSweepResult(
      frozen('xy-map', grid, tx, rx, { threshold: { kind: 'k', value: threshold } }),
    );
    expect(result.envelopes).toHaveLength(1);
    const envelope = result.envelopes[0]!;
    expect(envelope.z).toBe(z);
    expect(envelope.thresholdK).toBe(threshold);
    const L = result.L1;
    // Bisection on Neumann's k(rho) for the offset where it crosses the threshold.
    let lo = 0;
    let hi = 0.04;
    expect(neumannOffset(0.02, 0.02, z, hi) / L).toBeLessThan(threshold);
    for (let i = 0; i < 30; i++) {
      const mid = (lo + hi) / 2;
      if (neumannOffset(0.02, 0.02, z, mid, 120) / L >= threshold) lo = mid;
      else hi = mid;
    }
    const edge = (lo + hi) / 2;
    // Tolerance 0.4 mm (a fifth of the 2 mm grid step): marching squares interpolates linearly
    // between samples and the circle becomes a polygon of chords; both errors are well below it.
    expectNear(envelope.chargeRadius, edge, 4e-4, 'charge radius, m', true);
    expect(envelope.chargeRadiusLimitedByMap).toBe(false);
    // The region is a disc about the common axis: area π r² within 3 % (the polygon's chords).
    expectNear(envelope.area, Math.PI * edge * edge, 0.03, 'envelope area, m²');
    expect(envelope.nominal.meets).toBe(true);
    expect(envelope.worst!.value).toBeGreaterThanOrEqual(threshold);
    const ring0 = envelope.polygons[0]![0]!;
    for (const p of ring0) expectNear(Math.hypot(p.x, p.y), edge, 0.08, 'boundary radius');
  });

  it('turns an η threshold into k with the coils’ Q, and reports an unreachable one', async () => {
    const eta = 0.5;
    const result = await computeSweepResult(
      frozen('xy-map', grid, tx, rx, { threshold: { kind: 'eta', value: eta } }),
    );
    const { thresholdK } = result.envelopes[0]!;
    // The k_min returned must give back η through PRODUCT.md's formula (its inverse).
    expectNear(etaFormula(thresholdK, result.Q1, result.Q2), eta, 1e-9, 'η at k_min');

    const lowQ = await computeSweepResult(
      frozen('xy-map', grid, tx, rx, {
        threshold: { kind: 'eta', value: 0.99 },
        frequencyHz: 1e3,
      }),
    );
    const unreachable = lowQ.envelopes[0]!;
    expect(unreachable.thresholdK).toBeGreaterThan(1);
    expectNear(etaFormula(unreachable.thresholdK, lowQ.Q1, lowQ.Q2), 0.99, 1e-9, 'η at k > 1');
    expect(unreachable.polygons).toEqual([]);
    expect(unreachable.nominal.meets).toBe(false);
  });

  it('gives one envelope per gap of an xy-stack, with the nominal point of the study', async () => {
    const result = await computeSweepResult(
      frozen(
        'xy-stack',
        {
          x: { from: -0.03, to: 0.03, steps: 13 },
          y: { from: -0.03, to: 0.03, steps: 13 },
          z: { from: 0.005, to: 0.02, steps: 3 },
        },
        tx,
        rx,
        { nominal: { x: 0.005, y: -0.005 } },
      ),
    );
    expect(result.envelopes.map((e) => e.z)).toEqual([0.005, 0.0125, 0.02]);
    expect(result.envelopes.every((e) => e.nominal.x === 0.005 && e.nominal.y === -0.005)).toBe(
      true,
    );
    // Coupling falls with the gap (decay with distance, an invariant of any correct model).
    const areas = result.envelopes.map((e) => e.area);
    expect(areas[0]).toBeGreaterThan(areas[1]!);
    expect(areas[1]).toBeGreaterThan(areas[2]!);
  });
});

describe('computeSweepResult: ferrite backing, progress and cancellation', () => {
  it('raises L2 near a Tx backing by the image ring (Jackson, problem 5.17)', async () => {
    const mur = 1000;
    const distance = 0.002;
    const tx = ring(0.02, 5e-4, { backing: { mur, distance } });
    const rx = ring(0.015, 4e-4);
    const result = await computeSweepResult(
      frozen('gap', { z: { from: 0.004, to: 0.02, steps: 5 } }, tx, rx),
    );
    const w = (mur - 1) / (mur + 1);
    const L2alone = MU0 * 0.015 * (Math.log((8 * 0.015) / 4e-4) - 1.75);
    result.axes.z.forEach((z, i) => {
      // The Rx ring sits z + distance above the plate; its image lies as far below: 2(z + d).
      const expected = L2alone + w * maxwell(0.015, 0.015, 2 * (z + distance));
      expectNear(result.L2[i], expected, 1e-9, `L2 at z = ${z} m above a plate at −${distance}`);
    });
  });

  it('reports progress per chunk and stops when aborted', async () => {
    const tx = ring(0.02, 5e-4);
    const spec = frozen(
      'xy-map',
      { x: { from: -0.02, to: 0.02, steps: 10 }, y: { from: -0.02, to: 0.02, steps: 10 }, z: 0.01 },
      tx,
      tx,
    );
    const seen: number[] = [];
    await computeSweepResult(spec, { chunkSize: 30, onProgress: (p) => seen.push(p.done) });
    expect(seen).toEqual([30, 60, 90, 100]);

    const controller = new AbortController();
    const run = computeSweepResult(spec, {
      chunkSize: 30,
      signal: controller.signal,
      onProgress: (p) => p.done >= 30 && controller.abort(),
    });
    await expect(run).rejects.toMatchObject({ name: 'AbortError' });
  });

  it('fails with a message naming the pose when the coils intersect', async () => {
    const tx = ring(0.02, 5e-4);
    await expect(computeSweepResult(frozen('gap', { z: 0 }, tx, tx))).rejects.toThrow(/pose/);
  });
});
