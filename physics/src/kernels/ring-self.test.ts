import ellipe from '@stdlib/math-base-special-ellipe';
import ellipk from '@stdlib/math-base-special-ellipk';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MU0 } from './mu0';
import { rectangularGmd } from './rectangular-gmd';
import { ringPotentialShape } from './ring-potential-shape';
import { ringSelf } from './ring-self';
import { ringSelfGmd } from './ring-self-gmd';
import { roundWireGmd } from './round-wire-gmd';

describe('ringPotentialShape (own AGM) against @stdlib ellipk / ellipe', () => {
  // @stdlib/math-base-special-ellipk and -ellipe (parameter m = k^2). For m >= 0.3 the textbook
  // combination loses <= 2 digits, so 1e-13; below, the positive-term limit h(0) = π/32 (DLMF
  // 19.5).
  it.each([0.3, 0.5, 0.7, 0.9, 0.99, 0.999999])('m = %s', (m) => {
    const want = ((1 - m / 2) * ellipk(m) - ellipe(m)) / (m * m);
    const got = ringPotentialShape(m);
    expect(
      Math.abs(got - want) / want,
      `m ${m}: got ${got}, expected ${want}, tol 1e-13`,
    ).toBeLessThan(1e-13);
  });
  it('h(0) = π/32 and the series slope 3π/128 (DLMF 19.5.1, 19.5.2)', () => {
    expect(Math.abs(ringPotentialShape(0) - Math.PI / 32)).toBeLessThan(1e-17);
    const slope = (ringPotentialShape(1e-6) - ringPotentialShape(0)) / 1e-6;
    // h = (π/2)(1/16 + 3m/64 + ...): slope 3π/128; finite difference error ~1e-6 relative.
    expect(Math.abs(slope - (3 * Math.PI) / 128) / ((3 * Math.PI) / 128)).toBeLessThan(1e-5);
  });
  it('rejects m outside [0, 1)', () => {
    for (const m of [-0.1, 1.5, NaN]) expect(() => ringPotentialShape(m)).toThrow(RangeError);
  });
});

describe('ring self-inductance (Rosa & Grover 1912; Grover 1946)', () => {
  it('low and high frequency forms', () => {
    const [R, a] = [0.02, 5e-4];
    expect(ringSelf(R, a)).toBeCloseTo(MU0 * R * (Math.log((8 * R) / a) - 1.75), 20);
    expect(ringSelf(R, a, { highFrequency: true })).toBeCloseTo(
      MU0 * R * (Math.log((8 * R) / a) - 2),
      20,
    );
    // The GMD form with g = a e^(-1/4) is the same formula (Rosa 1908): 1e-14 relative.
    const viaGmd = ringSelfGmd(R, roundWireGmd(a));
    expect(Math.abs(viaGmd - ringSelf(R, a)) / ringSelf(R, a)).toBeLessThan(1e-14);
    expect(rectangularGmd(1e-3, 35e-6)).toBeCloseTo(0.2235 * 1.035e-3, 15);
  });
  it('grows with radius and falls with wire radius (fast-check, seeded)', () => {
    const r = fc.double({ min: 0.005, max: 1, noNaN: true });
    const f = fc.double({ min: 1e-3, max: 0.05, noNaN: true });
    fc.assert(
      fc.property(r, f, fc.double({ min: 1.01, max: 3, noNaN: true }), (R, frac, s) => {
        const a = frac * R;
        expect(ringSelf(R * s, a)).toBeGreaterThan(ringSelf(R, a));
        expect(ringSelf(R, a * s)).toBeLessThan(ringSelf(R, a));
      }),
      { seed: 42, numRuns: 100 },
    );
  });
  it.each([
    [0, 1e-4, 'radius'],
    [-0.02, 1e-4, 'radius'],
    [NaN, 1e-4, 'radius'],
    [Infinity, 1e-4, 'radius'],
    [0.02, 0, 'wireRadius'],
    [0.02, 0.03, 'wireRadius'],
  ])('rejects radius %s, wireRadius %s naming %s', (R, a, name) => {
    expect(() => ringSelf(R, a)).toThrow(RangeError);
    expect(() => ringSelf(R, a)).toThrow(name);
  });
});
