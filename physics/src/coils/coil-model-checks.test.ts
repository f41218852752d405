// Checks of the coil models against published inductance formulas, through the kernels helper's
// selfInductance (low-frequency, uniform-current self terms). Sources, one per check below:
// - H. Nagaoka, J. Coll. Sci. Tokyo 27 (1909): L = mu0 π R² N² K / l; table values
//   K(2R/l = 1) = 0.6884, K(2R/l = 2) = 0.5255 (from memory). K is evaluated in closed form with
//   the @stdlib complete elliptic integrals (parameter m = k²), k² = 4R²/(4R² + l²):
//   K = 4/(3π k') [ (k'²/k²) K(k) - ((1 - 2k²)/k²) E(k) - k ], k' = sqrt(1 - k²) (from memory;
//   the test first reproduces the two table values with it).
// - H. A. Wheeler, "Simple inductance formulas for radio coils", Proc. IRE 16(10), 1928:
//   L[µH] = r² n² / (9r + 10l), inches; within ~1 % for l > 0.8 r.
// - Long-solenoid limit mu0 N² A / l (textbook); it exceeds the current sheet by ~0.85 % at
//   l/R = 100 and ~18 % at l/R = 5 (textbook limit).
// - S. S. Mohan, M. del Mar Hershenson, S. P. Boyd, T. H. Lee, "Simple accurate expressions for
//   planar spiral inductances", IEEE J. Solid-State Circuits 34(10), 1999: current-sheet form
//   L = mu0 n² d_avg c1/2 (ln(c2/ρ) + c3 ρ + c4 ρ²), circle c = 1.00, 2.46, 0.00, 0.20
//   (coefficients from memory); typical error 2–3 %.
//
// Round wire versus current sheet. A winding of round wire is not a current sheet: each turn's
// own flux depends on the wire's geometric mean distance (GMD). A round wire of diameter d has
// the GMD of the strip of width p it replaces in the sheet (0.7788 d/2 = 0.2231 p) when
// d = 2 e^(-5/4) p = 0.573 p — the diameter at which Rosa's self correction G = 5/4 - ln(2p/d)
// vanishes (E. B. Rosa, Bull. Bureau of Standards 2, 1906; from memory). Such a "sheet-matched"
// wire isolates the model from the round-wire effect; what remains is Rosa's mutual correction
// H, which puts the ring model a little BELOW the sheet (about 0.34 · p / (π R K), ~1 % here).
// A realistic wire (d = 0.9 p) sits a further 1–3 % below — a ring model of round wire lies a
// few percent below a current sheet, as it should. Tolerances below are one-sided where the sign
// is known.
import ellipe from '@stdlib/math-base-special-ellipe';
import ellipk from '@stdlib/math-base-special-ellipk';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { selfInductance } from '../inductance/self-inductance';
import { expectNear } from '../testing/expect-near';
import type { Coil } from './coil-schema';

const MU0 = 4e-7 * Math.PI;
const SHEET_MATCHED = 2 * Math.exp(-1.25);

/** Nagaoka's coefficient in closed form (see header). */
function nagaoka(radius: number, length: number): number {
  const m = (4 * radius * radius) / (4 * radius * radius + length * length);
  const k = Math.sqrt(m);
  const kp = Math.sqrt(1 - m);
  return (4 / (3 * Math.PI * kp)) * (((1 - m) / m) * ellipk(m) - ((1 - 2 * m) / m) * ellipe(m) - k);
}
const sheet = (R: number, l: number, N: number) =>
  (MU0 * Math.PI * R * R * N * N * nagaoka(R, l)) / l;
/** Wheeler 1928, converted: inches in, µH out, H returned. */
function wheeler(R: number, l: number, N: number): number {
  const r = R / 0.0254;
  const len = l / 0.0254;
  return ((r * r * N * N) / (9 * r + 10 * len)) * 1e-6;
}
function solenoid(R: number, l: number, N: number, wireShare: number): Coil {
  return {
    kind: 'solenoid',
    radius: R,
    length: l,
    turns: N,
    conductor: { type: 'round', diameter: (wireShare * l) / N },
  };
}
/** Asserts low ≤ result/expected - 1 ≤ high with a message that prints everything. */
function expectRatio(
  result: number,
  expected: number,
  low: number,
  high: number,
  input: string,
): void {
  const excess = result / expected - 1;
  expect(
    excess >= low && excess <= high,
    `${input}: result ${result}, expected ${expected}, tolerance: excess in [${low}, ${high}], ` +
      `got ${excess}`,
  ).toBe(true);
}

describe('Nagaoka coefficient (Nagaoka 1909, table values from memory)', () => {
  it('the closed form reproduces the table: K(2R/l = 1) = 0.6884, K(2R/l = 2) = 0.5255', () => {
    // Four decimals in the table: half a unit of the last place.
    expectNear(nagaoka(1, 2), 0.6884, 5e-5, 'K at 2R/l = 1', true);
    expectNear(nagaoka(1, 1), 0.5255, 5e-5, 'K at 2R/l = 2', true);
  });
  for (const [ratio, K] of [
    [1, 0.6884],
    [2, 0.5255],
  ]) {
    it(`ring-model solenoid at 2R/l = ${ratio}: K = ${K} less Rosa's H (0–1.5 % below)`, () => {
      const R = 0.01;
      const l = (2 * R) / ratio;
      const N = 40 / ratio;
      const L = selfInductance(solenoid(R, l, N, SHEET_MATCHED));
      const modelK = (L * l) / (MU0 * Math.PI * R * R * N * N);
      // Sheet-matched wire: only Rosa's mutual correction H (≈ 0.34 p/(πRK) ≈ 0.7–1 %) remains.
      expectRatio(modelK, K, -0.015, 0, `solenoid R ${R} m, l ${l} m, N ${N}`);
    });
  }
});

describe('Wheeler 1928 single-layer solenoid (~1 % for l > 0.8 r)', () => {
  const cases = [
    [0.01, 0.02, 40],
    [0.01, 0.05, 100],
    [0.01, 0.1, 200],
    [0.005, 0.5, 1000],
  ];
  for (const [R, l, N] of cases) {
    it(`R ${R} m, l ${l} m, N ${N}: sheet-matched ring model within 2 % of Wheeler`, () => {
      // Wheeler's ~1 % plus the ring model's ≤ 1.1 % (Rosa's H) below the sheet.
      expectRatio(
        selfInductance(solenoid(R, l, N, SHEET_MATCHED)),
        wheeler(R, l, N),
        -0.02,
        0.01,
        `R ${R} l ${l} N ${N}`,
      );
    });
    it(`R ${R} m, l ${l} m, N ${N}: realistic wire (d = 0.9 p) 0.5–3.5 % below Wheeler`, () => {
      // Round wire thinner than the sheet strip adds Rosa's G = 5/4 - ln(2/0.9) ≈ 0.45 to H.
      expectRatio(
        selfInductance(solenoid(R, l, N, 0.9)),
        wheeler(R, l, N),
        -0.035,
        0.005,
        `R ${R} l ${l} N ${N}`,
      );
    });
  }
  it('Wheeler itself agrees with Nagaoka to ~1 % for l > 0.8 r (the two references agree)', () => {
    for (const l of [0.008, 0.02, 0.1, 1])
      expectRatio(wheeler(0.01, l, 100), sheet(0.01, l, 100), -0.01, 0.01, `l ${l}`);
  });
});

describe('long-solenoid limit mu0 N² A / l (textbook)', () => {
  it('exceeds the ring model by ~0.85 % plus the ring deficit at l/R = 100', () => {
    const [R, l, N] = [0.005, 0.5, 1000];
    const long = (MU0 * N * N * Math.PI * R * R) / l;
    const L = selfInductance(solenoid(R, l, N, SHEET_MATCHED));
    // long/L = 1.0085 (sheet) × (1 + ring deficit ≤ 1.5 %); the 0.85 % is rounded, allow 0.1 %.
    expectRatio(long / L, 1.0085, -0.001, 0.016, `long solenoid R ${R} l ${l} N ${N}`);
  });
  it('exceeds the ring model by ~18 % at l/R = 5', () => {
    const [R, l, N] = [0.01, 0.05, 100];
    const long = (MU0 * N * N * Math.PI * R * R) / l;
    const L = selfInductance(solenoid(R, l, N, SHEET_MATCHED));
    // "~18 %" is rounded (the sheet gives 17.7 %); ring deficit adds up to 1.5 %.
    expectRatio(long / L, 1.18, -0.01, 0.02, `long solenoid R ${R} l ${l} N ${N}`);
  });
});

describe('Mohan et al. 1999 current-sheet formula, circular planar spiral', () => {
  /** Mohan's current sheet over the winding's strips: d_out = 2 r_out + p, d_in = 2 r_in - p. */
  function mohan(n: number, rIn: number, pitch: number): number {
    const dOut = 2 * (rIn + (n - 1) * pitch) + pitch;
    const dIn = 2 * rIn - pitch;
    const dAvg = (dOut + dIn) / 2;
    const rho = (dOut - dIn) / (dOut + dIn);
    return ((MU0 * n * n * dAvg * 1.0) / 2) * (Math.log(2.46 / rho) + 0.0 * rho + 0.2 * rho * rho);
  }
  const spiral = (n: number, rIn: number, pitch: number, share: number): Coil => ({
    kind: 'circular-spiral',
    turns: n,
    innerRadius: rIn,
    pitch,
    conductor: { type: 'round', diameter: share * pitch },
  });
  const cases = [
    [20, 0.005, 0.001],
    [10, 0.01, 0.001],
    [15, 0.003, 0.0015],
    [5, 0.02, 0.002],
    [30, 0.002, 0.0008],
  ];
  for (const [n, rIn, pitch] of cases) {
    it(`${n} turns from r_in ${rIn} m at ${pitch} m: sheet-matched wire within Mohan's 3 %`, () => {
      // Mohan's published typical error is 2–3 %; sheet-matched wire removes the round-wire effect.
      expectRatio(
        selfInductance(spiral(n, rIn, pitch, SHEET_MATCHED)),
        mohan(n, rIn, pitch),
        -0.03,
        0.03,
        `spiral ${n}/${rIn}/${pitch}`,
      );
    });
    it(`${n} turns from r_in ${rIn} m at ${pitch} m: d = 0.9 p a few % below the sheet`, () => {
      // Below the sheet by the round-wire effect (1–3 %), with Mohan's 3 % either way: -7 … +1 %.
      expectRatio(
        selfInductance(spiral(n, rIn, pitch, 0.9)),
        mohan(n, rIn, pitch),
        -0.07,
        0.01,
        `spiral ${n}/${rIn}/${pitch}`,
      );
    });
  }
});

describe('monotonic facts (common practice, no source; fast-check, seed 42)', () => {
  const wire = { type: 'round' as const, diameter: 5e-4 };
  it('L grows with turns (solenoid of fixed pitch, spiral of fixed pitch)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 60 }), fc.integer({ min: 1, max: 60 }), (n1, n2) => {
        fc.pre(n1 < n2);
        const sol = (n: number): Coil => ({
          kind: 'solenoid',
          radius: 0.01,
          length: n * 0.001,
          turns: n,
          conductor: wire,
        });
        const spi = (n: number): Coil => ({
          kind: 'circular-spiral',
          turns: n,
          innerRadius: 0.003,
          pitch: 0.001,
          conductor: wire,
        });
        expect(selfInductance(sol(n2)), `solenoid ${n1} vs ${n2} turns`).toBeGreaterThan(
          selfInductance(sol(n1)),
        );
        expect(selfInductance(spi(n2)), `spiral ${n1} vs ${n2} turns`).toBeGreaterThan(
          selfInductance(spi(n1)),
        );
      }),
      { seed: 42, numRuns: 30 },
    );
  });
  it('L grows with loop area (ring radius; spiral inner radius)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.002, max: 0.5, noNaN: true }),
        fc.double({ min: 1.001, max: 4, noNaN: true }),
        (r, grow) => {
          const ring = (radius: number): Coil => ({ kind: 'ring', radius, wireRadius: 5e-4 });
          expect(selfInductance(ring(r * grow)), `ring ${r} vs ${r * grow}`).toBeGreaterThan(
            selfInductance(ring(r)),
          );
          const spi = (rIn: number): Coil => ({
            kind: 'circular-spiral',
            turns: 8,
            innerRadius: rIn,
            pitch: 0.001,
            conductor: wire,
          });
          expect(selfInductance(spi(r * grow))).toBeGreaterThan(selfInductance(spi(r)));
        },
      ),
      { seed: 42, numRuns: 30 },
    );
  });
  it('L grows with the backing permeability', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 1e4, noNaN: true }),
        fc.double({ min: 1.01, max: 10, noNaN: true }),
        (mur, grow) => {
          const backed = (m: number): Coil => ({
            kind: 'circular-spiral',
            turns: 10,
            innerRadius: 0.005,
            pitch: 0.001,
            conductor: wire,
            backing: { mur: m, distance: 0.001 },
          });
          expect(
            selfInductance(backed(Math.min(1e5, mur * grow))),
            `mur ${mur} vs ${mur * grow}`,
          ).toBeGreaterThan(selfInductance(backed(mur)));
        },
      ),
      { seed: 42, numRuns: 30 },
    );
  });
  it('L falls as a winding of fixed turns is stretched longer', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.011, max: 0.2, noNaN: true }),
        fc.double({ min: 1.01, max: 5, noNaN: true }),
        (l, stretch) => {
          const sol = (length: number): Coil => ({
            kind: 'solenoid',
            radius: 0.01,
            length,
            turns: 20,
            conductor: wire,
          });
          expect(selfInductance(sol(l * stretch)), `length ${l} vs ${l * stretch}`).toBeLessThan(
            selfInductance(sol(l)),
          );
        },
      ),
      { seed: 42, numRuns: 30 },
    );
  });
});
