import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectNear } from '../testing/expect-near';
import { acResistanceFactor } from './ac-resistance-factor';
import { roundWireAcFactor } from './round-wire-ac-factor';
import { skinDepth } from './skin-depth';
import { traceAcFactor } from './trace-ac-factor';
import { wireImpedanceRatioAsymptotic, wireImpedanceRatioSeries } from './wire-impedance-ratio';

/** R_ac/R_dc of round wire from x = √2·a/δ, the variable of the handbook tables. */
const ratioAtX = (x: number) => roundWireAcFactor(2, Math.SQRT2 / x);

describe('roundWireAcFactor', () => {
  it('reproduces the skin-effect table (Terman, Radio Engineers’ Handbook, from memory)', () => {
    // Four-digit table values recalled from memory: 5e-4 relative.
    const table: [number, number][] = [
      [1, 1.005],
      [2, 1.078],
      [3, 1.318],
      [4, 1.678],
      [5, 2.043],
      [10, 3.799],
      [20, 7.328],
    ];
    for (const [x, expected] of table) expectNear(ratioAtX(x), expected, 5e-4, `x = ${x}`);
  });

  it('follows the low-frequency expansion 1 + x⁴/192 (Ramo, Whinnery & Van Duzer §5.6)', () => {
    // The next term is O(x⁸) ≈ 1e-7 at x = 0.3; 1e-8 relative after removing x⁴/192 is ample.
    for (const x of [1e-3, 0.05, 0.1, 0.3]) {
      expectNear(ratioAtX(x), 1 + x ** 4 / 192, 1e-7, `x = ${x}`);
    }
  });

  it('approaches a/(2δ) + 1/4 at high frequency (Ramo, Whinnery & Van Duzer §5.6)', () => {
    // The remainder is 3δ/(32a) + O((δ/a)²): bound it by 0.1·δ/a.
    for (const u of [20, 50, 200, 1000]) {
      const r = roundWireAcFactor(2 * u, 1);
      expect(Math.abs(r - (u / 2 + 0.25))).toBeLessThan(0.1 / u);
    }
  });

  it('is continuous where the series hands over to the asymptotic form', () => {
    // Both branches claim ≥ 11 digits at x = 40; require 1e-10 relative agreement.
    const u = 40 / Math.SQRT2;
    for (const v of [u * 0.9, u, u * 1.1]) {
      const s = wireImpedanceRatioSeries(v);
      const a = wireImpedanceRatioAsymptotic(v);
      expectNear(a[0], s[0], 1e-10, `R/Rdc at u = ${v}`);
      expectNear(a[1], s[1], 1e-10, `X/Rdc at u = ${v}`);
    }
  });

  it('tends to 1 at low frequency and grows monotonically with frequency (seeded property)', () => {
    expect(roundWireAcFactor(1e-3, Infinity)).toBe(1);
    // 1 mm copper at 10 Hz: a/δ ≈ 0.024, so (a/δ)⁴/48 ≈ 7e-9 is all that separates it from 1.
    expectNear(roundWireAcFactor(1e-3, skinDepth(1.72e-8, 10)), 1, 1e-8, '10 Hz');
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 1e8, noNaN: true }),
        fc.double({ min: 1.0001, max: 10, noNaN: true }),
        fc.double({ min: 1e-5, max: 5e-3, noNaN: true }),
        (f, step, d) => {
          const lo = roundWireAcFactor(d, skinDepth(1.72e-8, f));
          const hi = roundWireAcFactor(d, skinDepth(1.72e-8, f * step));
          // Allow 1e-12 relative for rounding where both sit at 1.
          return lo >= 1 - 1e-12 && hi >= lo * (1 - 1e-12);
        },
      ),
      { seed: 20240617, numRuns: 300 },
    );
  });
});

describe('traceAcFactor', () => {
  it('follows 1 + (t/δ)⁴/180 at low and t/(2δ) at high frequency (Dowell 1966)', () => {
    // Low: next term O((t/δ)⁸); at t/δ = 0.2 that is < 1e-8.
    for (const a of [1e-3, 0.05, 0.2])
      expectNear(traceAcFactor(a, 1), 1 + a ** 4 / 180, 1e-8, `${a}`);
    // High: the remainder is exponentially small (e^{−t/δ}); 1e-6 at t/δ ≥ 20.
    for (const a of [20, 39, 41, 100]) expectNear(traceAcFactor(a, 1), a / 2, 1e-6, `${a}`);
    // Across the three branches the function stays continuous within 1e-9.
    expectNear(traceAcFactor(0.0099999, 1), traceAcFactor(0.0100001, 1), 1e-9, 'low switch');
  });

  it('grows with frequency and is 1 at DC', () => {
    expect(traceAcFactor(35e-6, Infinity)).toBe(1);
    let prev = 1;
    for (let f = 1e3; f < 1e9; f *= 1.5) {
      const r = traceAcFactor(35e-6, skinDepth(1.72e-8, f));
      expect(r, `f = ${f}`).toBeGreaterThanOrEqual(prev * (1 - 1e-12));
      prev = r;
    }
  });
});

describe('acResistanceFactor', () => {
  it('uses the strand diameter for Litz and the thickness for a trace', () => {
    const delta = skinDepth(1.72e-8, 200e3);
    const litz = { type: 'litz' as const, strands: 60, strandDiameter: 0.2e-3 };
    expect(acResistanceFactor(litz, delta)).toBe(roundWireAcFactor(0.2e-3, delta));
    const trace = { type: 'trace' as const, width: 2e-3, thickness: 70e-6 };
    expect(acResistanceFactor(trace, delta)).toBe(traceAcFactor(70e-6, delta));
    // Litz of fine strands stays far closer to DC than a solid wire of the same copper.
    const solid = acResistanceFactor({ type: 'round', diameter: 0.2e-3 * Math.sqrt(60) }, delta);
    expect(acResistanceFactor(litz, delta)).toBeLessThan(solid);
  });

  it('rejects bad dimensions and skin depths naming the field', () => {
    expect(() =>
      acResistanceFactor({ type: 'litz', strands: 0, strandDiameter: 1e-4 }, 1e-4),
    ).toThrow(/conductor.strands/);
    expect(() => acResistanceFactor({ type: 'round', diameter: 1e-3 }, -1)).toThrow(/skinDepth/);
    expect(() => acResistanceFactor({ type: 'round', diameter: 1e-3 }, NaN)).toThrow(/skinDepth/);
  });
});
