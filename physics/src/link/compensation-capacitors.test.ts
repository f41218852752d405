import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectNear } from '../testing/expect-near';
import { compensationCapacitors } from './compensation-capacitors';

const w = (f: number) => 2 * Math.PI * f;

describe('compensationCapacitors', () => {
  it('series-series: C = 1/(ω²L) per side, 100 µH at 85 kHz is 35.06 nF (textbook)', () => {
    const { C1, C2 } = compensationCapacitors('series-series', 100e-6, 24e-6, 20e-6, 85e3);
    // 1/(ω² L) by hand: ω² L = 2.852316e7 → 35.0592 nF; 1e-5 covers the hand rounding.
    expectNear(C1, 35.0592e-9, 1e-5, 'C1, 100 µH at 85 kHz');
    // Each side resonates at f on its own: f0 = 1/(2π sqrt(LC)); closed form, 1e-12 is rounding.
    expectNear(1 / (2 * Math.PI * Math.sqrt(100e-6 * C1)), 85e3, 1e-12, 'Tx f0');
    expectNear(1 / (2 * Math.PI * Math.sqrt(24e-6 * C2)), 85e3, 1e-12, 'Rx f0');
  });

  it('series-parallel: the Tx tank resonates with the leakage, ω²C1(L1 − M²/L2) = 1', () => {
    // C.-S. Wang, G. A. Covic, O. H. Stielau, IEEE Trans. Industrial Electronics 51(1), 2004:
    // C1 = 1/(ω²(L1 − M²/L2)) for a parallel-compensated secondary.
    fc.assert(
      fc.property(
        fc.double({ min: 1e-7, max: 1e-3, noNaN: true }),
        fc.double({ min: 1e-7, max: 1e-3, noNaN: true }),
        fc.double({ min: -0.95, max: 0.95, noNaN: true }),
        fc.double({ min: 1e3, max: 1e7, noNaN: true }),
        (L1, L2, k, f) => {
          const M = k * Math.sqrt(L1 * L2);
          const { C1, C2 } = compensationCapacitors('series-parallel', L1, L2, M, f);
          // Both are products of a few roundings; at |k| ≤ 0.95 the leakage keeps ≥ 10 % of L1,
          // so cancellation costs at most one digit: 1e-12.
          const tank = w(f) ** 2 * C1 * (L1 - (M * M) / L2);
          const rx = w(f) ** 2 * C2 * L2;
          return Math.abs(tank - 1) < 1e-12 && Math.abs(rx - 1) < 1e-12;
        },
      ),
      { seed: 2004, numRuns: 300 },
    );
  });

  it('series-parallel matches the table form C1 = C2 L2²/(L1 L2 − M²) (Wang et al. 2004)', () => {
    // Table I of Wang, Covic, Stielau (2004) writes the SP primary capacitor through the secondary
    // one (from memory); algebraically the same, evaluated another way: 1e-12 bounds rounding.
    const [L1, L2, M, f] = [100e-6, 100e-6, 20e-6, 85e3];
    const { C1, C2 } = compensationCapacitors('series-parallel', L1, L2, M, f);
    expectNear(C1, (C2 * L2 * L2) / (L1 * L2 - M * M), 1e-12, 'C1, k = 0.2');
    // The doc example: leakage 96 µH → 35.0592 nF / 0.96 = 36.52 nF (hand rounding, 1e-5).
    expectNear(C1, 35.0592e-9 / 0.96, 1e-5, 'C1 for 96 µH leakage');
    // SP needs a larger C1 than SS for the same coils: the leakage is below L1.
    expect(C1).toBeGreaterThan(compensationCapacitors('series-series', L1, L2, M, f).C1);
  });

  it('reduces to series-series when the coils are uncoupled, and ignores the sign of M', () => {
    const ss = compensationCapacitors('series-series', 50e-6, 30e-6, 0, 140e3);
    const sp = compensationCapacitors('series-parallel', 50e-6, 30e-6, 0, 140e3);
    expect(sp).toEqual(ss);
    const plus = compensationCapacitors('series-parallel', 50e-6, 30e-6, 9e-6, 140e3);
    const minus = compensationCapacitors('series-parallel', 50e-6, 30e-6, -9e-6, 140e3);
    expect(minus).toEqual(plus);
  });

  it('refuses bad input with a RangeError naming the parameter', () => {
    const sp = 'series-parallel' as const;
    expect(() => compensationCapacitors('parallel' as never, 1e-5, 1e-5, 0, 1e5)).toThrow(
      /^topology: must be 'series-series' or 'series-parallel'/,
    );
    expect(() => compensationCapacitors(sp, 0, 1e-5, 0, 1e5)).toThrow(/^L1: .*> 0/);
    expect(() => compensationCapacitors(sp, 1e-5, -1, 0, 1e5)).toThrow(/^L2: /);
    expect(() => compensationCapacitors(sp, 1e-5, 1e-5, NaN, 1e5)).toThrow(/^M: /);
    expect(() => compensationCapacitors(sp, 1e-5, 1e-5, 0, 0)).toThrow(/^frequency: /);
    // k = 1: no leakage left to tune; SS does not care.
    expect(() => compensationCapacitors(sp, 1e-5, 1e-5, 1e-5, 1e5)).toThrow(/^M: .*sqrt/);
    expect(() => compensationCapacitors(sp, 1e-5, 1e-5, 2e-5, 1e5)).toThrow(RangeError);
    expect(compensationCapacitors('series-series', 1e-5, 1e-5, 1e-5, 1e5).C1).toBeGreaterThan(0);
  });
});
