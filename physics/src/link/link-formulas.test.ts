import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectNear } from '../testing/expect-near';
import { couplingCoefficient } from './coupling-coefficient';
import { couplingForEfficiency } from './coupling-for-efficiency';
import { inducedVoltage } from './induced-voltage';
import { maxLinkEfficiency } from './max-link-efficiency';
import { optimalLoad } from './optimal-load';
import { qualityFactor } from './quality-factor';
import { resonantVoltage } from './resonant-voltage';
import { seriesCompensation } from './series-compensation';
import { storedEnergy } from './stored-energy';
import { timeConstant } from './time-constant';

/**
 * Efficiency of a series–series resonant link from Kirchhoff's laws, for any load: the Tx sees
 * R1 + (ωM)²/(R2 + RL); the fraction reflected reaches the Rx loop, of which RL/(R2 + RL) is load.
 */
function circuitEfficiency(wM: number, R1: number, R2: number, RL: number): number {
  const reflected = (wM * wM) / (R2 + RL);
  return (reflected / (R1 + reflected)) * (RL / (R2 + RL));
}

/** Golden-section maximisation of circuitEfficiency over log RL, independent of the formulas. */
function bestLoad(wM: number, R1: number, R2: number): { eta: number; RL: number } {
  let a = Math.log(R2 * 1e-3);
  let b = Math.log(R2 * 1e6);
  const g = (Math.sqrt(5) - 1) / 2;
  for (let i = 0; i < 200; i++) {
    const c = b - g * (b - a);
    const d = a + g * (b - a);
    if (circuitEfficiency(wM, R1, R2, Math.exp(c)) > circuitEfficiency(wM, R1, R2, Math.exp(d)))
      b = d;
    else a = c;
  }
  const RL = Math.exp((a + b) / 2);
  return { eta: circuitEfficiency(wM, R1, R2, RL), RL };
}

describe('maxLinkEfficiency', () => {
  // Published figures: kQ = 1 → 17.2 %, 3 → 52.0 %, 10 → 81.9 %, 25 → 92.3 %, 100 → 98.0 %
  // (inductive-link literature, e.g. Kiani & Ghovanloo, IEEE TIE 60(11), 2013). The table is
  // quoted to 0.1 % and rounds loosely (51.95 % is given as 52.0 %), hence 0.1 % absolute.
  it.each([
    [1, 0.172],
    [3, 0.52],
    [10, 0.819],
    [25, 0.923],
    [100, 0.98],
  ])('kQ = %d gives %d', (kQ, expected) => {
    // k = kQ/100 with Q1 = Q2 = 100 (kQ = k sqrt(Q1 Q2)).
    expectNear(maxLinkEfficiency(kQ / 100, 100, 100), expected, 1e-3, `kQ = ${kQ}`, true);
    // Unequal Q with the same product give the same figure.
    expectNear(maxLinkEfficiency(kQ / 100, 400, 25), expected, 1e-3, `kQ = ${kQ}`, true);
  });

  it('and optimalLoad match a direct circuit optimisation (Kirchhoff, seeded)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-3, max: 0.9, noNaN: true }),
        fc.double({ min: 5, max: 1000, noNaN: true }),
        fc.double({ min: 5, max: 1000, noNaN: true }),
        (k, Q1, Q2) => {
          // Any L, R, f with these Q: take ω = 1, R1 = R2 = 0.1 Ω, L = Q R.
          const R1 = 0.1;
          const R2 = 0.1;
          const wM = k * Math.sqrt(Q1 * R1 * Q2 * R2);
          const best = bestLoad(wM, R1, R2);
          const eta = maxLinkEfficiency(k, Q1, Q2);
          const RL = optimalLoad(R2, k, Q1, Q2);
          // Golden section converges to 1e-12 in eta; the argmax of a flat peak only to ~1e-5
          // relative, so the load is checked by the efficiency it gives.
          return (
            Math.abs(best.eta - eta) < 1e-10 &&
            Math.abs(circuitEfficiency(wM, R1, R2, RL) - eta) < 1e-12 &&
            Math.abs(Math.log(best.RL / RL)) < 1e-3
          );
        },
      ),
      { seed: 1013, numRuns: 100 },
    );
  });

  it('stays finite and within [0, 1) at the extremes', () => {
    expect(maxLinkEfficiency(0, 100, 100)).toBe(0);
    // x = 1e-20: eta = x/4 to 1e-20 relative, so 1e-12 bounds only rounding.
    expectNear(maxLinkEfficiency(1e-12, 100, 100), 0.25e-20, 1e-12, 'tiny x');
    const e = maxLinkEfficiency(1, 1e150, 1e150);
    expect(e).toBeLessThanOrEqual(1);
    expect(e).toBeGreaterThan(0.999);
    expect(() => maxLinkEfficiency(0.1, 0, 10)).toThrow(/Q1: must be a finite number > 0/);
    expect(() => maxLinkEfficiency(NaN, 10, 10)).toThrow(/k:/);
  });
});

describe('couplingForEfficiency', () => {
  it('inverts maxLinkEfficiency (round trip, seeded property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-4, max: 0.999, noNaN: true }),
        fc.double({ min: 1, max: 2000, noNaN: true }),
        fc.double({ min: 1, max: 2000, noNaN: true }),
        (eta, Q1, Q2) => {
          let k: number;
          try {
            k = couplingForEfficiency(eta, Q1, Q2);
          } catch (e) {
            // Only the k > 1 case may refuse, and then the check must agree it is unreachable.
            return e instanceof RangeError && maxLinkEfficiency(1, Q1, Q2) < eta;
          }
          // Closed forms both ways: agreement to 1e-12 relative (a few roundings).
          return Math.abs(maxLinkEfficiency(k, Q1, Q2) - eta) <= 1e-12 * eta;
        },
      ),
      { seed: 77, numRuns: 500 },
    );
  });

  it('gives k = 0.1 for 81.9 % with Q = 100 (kQ = 10, published figure)', () => {
    // 81.9 % is the rounded figure for kQ = 10: 0.3 % on k.
    expectNear(couplingForEfficiency(0.819, 100, 100), 0.1, 3e-3, 'k for 81.9 %');
  });

  it('refuses unreachable targets and out-of-range efficiencies', () => {
    expect(() => couplingForEfficiency(0.99, 10, 10)).toThrow(/no pose can reach it/);
    expect(() => couplingForEfficiency(1, 100, 100)).toThrow(/etaMin: must be between 0 and 1/);
    expect(() => couplingForEfficiency(0, 100, 100)).toThrow(/etaMin/);
  });
});

describe('coil and link formulas', () => {
  it('resonant voltage: 100 µH at 30 A, 85 kHz → 1.6 kV (textbook, ω L I)', () => {
    // The figure has two digits: 1 %.
    expectNear(resonantVoltage(100e-6, 85e3, 30), 1600, 0.01, 'V_L');
    expectNear(resonantVoltage(100e-6, 85e3, 30), 1602.2122533307945, 1e-12, 'V_L exact');
  });

  it('series compensation: 100 µH at 85 kHz is 35.06 nF, and resonates back (textbook)', () => {
    const C = seriesCompensation(100e-6, 85e3);
    // 1/(ω² L) by hand: ω = 534070.75 rad/s, ω² L = 2.852316e7 → 35.0592 nF; 1e-5 covers the
    // hand rounding.
    expectNear(C, 35.0592e-9, 1e-5, 'C');
    const f0 = 1 / (2 * Math.PI * Math.sqrt(100e-6 * C));
    expectNear(f0, 85e3, 1e-12, 'f0 = 1/(2π sqrt(LC))');
  });

  it('Q, induced voltage, stored energy and time constant', () => {
    expectNear(qualityFactor(24e-6, 0.1, 85e3), (2 * Math.PI * 85e3 * 24e-6) / 0.1, 1e-15, 'Q');
    expectNear(inducedVoltage(-5e-6, 85e3, 20), 2 * Math.PI * 85e3 * 5e-6 * 20, 1e-15, 'V2');
    expect(storedEnergy(100e-6, 30)).toBeCloseTo(0.045, 15);
    expect(timeConstant(24e-6, 0.05)).toBeCloseTo(4.8e-4, 15);
    expect(() => qualityFactor(24e-6, 0, 85e3)).toThrow(/R: must be a finite number > 0/);
    expect(() => storedEnergy(-1, 1)).toThrow(/L: must be a finite number > 0/);
    expect(() => inducedVoltage(1e-6, 85e3, -1)).toThrow(/current: must be a finite number >= 0/);
  });
});

describe('couplingCoefficient', () => {
  it('is M/sqrt(L1 L2) with its sign', () => {
    expectNear(couplingCoefficient(2e-6, 10e-6, 6.4e-6), 0.25, 1e-15, 'k');
    expectNear(couplingCoefficient(-2e-6, 10e-6, 6.4e-6), -0.25, 1e-15, 'k < 0');
  });

  it('clamps rounding just above 1 and refuses inconsistent inputs', () => {
    expect(couplingCoefficient(1e-5 * (1 + 1e-9), 1e-5, 1e-5)).toBe(1);
    expect(() => couplingCoefficient(1.2e-5, 1e-5, 1e-5)).toThrow(/exceeds 1/);
    expect(() => couplingCoefficient(1e-6, 0, 1e-5)).toThrow(/L1: must be a finite number > 0/);
    expect(() => couplingCoefficient(1e-6, 1e-5, -1)).toThrow(/L2/);
    expect(() => couplingCoefficient(NaN, 1e-5, 1e-5)).toThrow(/M:/);
  });
});
