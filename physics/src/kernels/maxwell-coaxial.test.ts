import { all, create, type BigNumber } from 'mathjs';
import { describe, expect, it } from 'vitest';
import type { RingFilament } from '../filaments';
import { expectNear } from '../testing/expect-near';
import { maxwellStdlib } from '../testing/maxwell-stdlib';
import { maxwellCoaxial } from './maxwell-coaxial';
import { MU0 } from './mu0';
import { neumannRingPair } from './neumann-ring-pair';

// Independent reference: the textbook form of Maxwell's formula (Treatise art. 701, DLMF 19.34)
// in 40-digit arithmetic (mathjs BigNumber), K and E by the AGM of DLMF 19.8.1 and 19.8.6, so the
// cancellation at small k costs nothing.
const big = create(all, { number: 'BigNumber', precision: 40 });
function maxwellBig(r1: number, r2: number, d: number): number {
  const b = (x: number | string) => big.bignumber(x) as BigNumber;
  const R1 = b(r1);
  const R2 = b(r2);
  const D = b(d);
  const m = R1.mul(R2)
    .mul(4)
    .div(R1.add(R2).pow(2).add(D.pow(2)));
  let a = b(1);
  let g = b(1).sub(m).sqrt();
  let c2 = m;
  let sum = c2.div(2);
  let pow = b(0.5);
  for (let n = 0; n < 40; n++) {
    const an = a.add(g).div(2);
    const gn = a.mul(g).sqrt();
    const cn = a.sub(g).div(2);
    a = an;
    g = gn;
    pow = pow.mul(2);
    c2 = cn.pow(2);
    sum = sum.add(pow.mul(c2));
  }
  const K = b(Math.PI).div(a.mul(2));
  const E = K.mul(b(1).sub(sum));
  const k = m.sqrt();
  const val = b(2).div(k).sub(k).mul(K).sub(b(2).div(k).mul(E)).mul(R1.mul(R2).sqrt()).mul(b(MU0));
  return val.toNumber();
}

describe('maxwellCoaxial against outside references', () => {
  it('matches Maxwell in 40-digit arithmetic from contact to d = 1000 r', () => {
    // 1e-13: a few ulps of the AGM and of D^(3/2); the closed form has no cancellation left.
    for (const [r1, r2, d] of [
      [0.02, 0.02, 1e-5],
      [0.02, 0.015, 0.003],
      [0.3, 0.2, 0.15],
      [0.01, 0.01, 0.01],
      [0.02, 0.02, 1],
      [0.02, 0.02, 20],
      [1e-3, 5e-4, 2],
    ]) {
      expectNear(maxwellCoaxial(r1, r2, d), maxwellBig(r1, r2, d), 1e-13, `M(${r1}, ${r2}, ${d})`);
    }
  });

  it('matches the textbook form with @stdlib ellipk/ellipe where it is well conditioned', () => {
    // @stdlib/math-base-special-ellipk and -ellipe take m = k^2. For m >= 0.3 the textbook form
    // loses at most ~2 digits to cancellation, so 1e-13 holds.
    for (const [r1, r2, d] of [
      [0.02, 0.02, 0.003],
      [0.025, 0.02, 0.001],
      [0.3, 0.2, 0.15],
      [0.02, 0.018, 0.0005],
    ]) {
      const m = (4 * r1 * r2) / ((r1 + r2) ** 2 + d * d);
      expect(m).toBeGreaterThan(0.3);
      const want = maxwellStdlib(r1, r2, d);
      expectNear(maxwellCoaxial(r1, r2, d), want, 1e-13, `stdlib M(${r1}, ${r2}, ${d})`);
    }
  });

  it('is reached by the Neumann double integral as the quadrature is refined', () => {
    const ring = (r: number, z: number): RingFilament => ({
      center: { x: 0, y: 0, z },
      normal: { x: 0, y: 0, z: 1 },
      radius: r,
      wireRadius: 1e-4,
      weight: 1,
    });
    const want = maxwellCoaxial(0.02, 0.015, 0.003);
    const errors = [16, 32, 64].map(
      (n) => Math.abs(neumannRingPair(ring(0.02, 0), ring(0.015, 0.003), n) - want) / want,
    );
    // The periodic trapezoid rule converges geometrically: each doubling gains digits.
    expect(errors[1]).toBeLessThan(errors[0] / 10);
    expect(errors[2]).toBeLessThan(errors[1] / 10);
    // 1e-9 at 64 angles: separation/radius = 0.2 gives a rate of about e^(-0.2 n).
    expect(errors[2], `Neumann 64x64 error ${errors[2]}`).toBeLessThan(1e-9);
  });
});

describe('maxwellCoaxial limits', () => {
  it('tends to Maxwell 1865 near field mu0 a (ln(8a/r) - 2) for equal rings at r << a', () => {
    // Maxwell, Phil. Trans. R. Soc. 155 (1865). The next term is of order (r/a)^2 ln(a/r) relative,
    // so r/a = 1e-3 leaves ~1e-6 · 7 / 8: tolerance 1e-5.
    const a = 0.02;
    for (const r of [2e-5, 2e-6]) {
      const want = MU0 * a * (Math.log((8 * a) / r) - 2);
      expectNear(
        maxwellCoaxial(a, a, r),
        want,
        1e-5 * (r / 2e-5) ** 2 + 1e-12,
        `near field r = ${r}`,
      );
    }
  });

  it('tends to the dipole limit mu0 pi r1^2 r2^2 / (2 d^3) far away', () => {
    // The next term is relative -(3/2)(r1^2 + r2^2)/d^2... of order (r/d)^2: at d = 1000 r, 1e-5.
    const [r1, r2] = [0.02, 0.015];
    for (const d of [20, 200]) {
      const want = (MU0 * Math.PI * r1 * r1 * r2 * r2) / (2 * d ** 3);
      expectNear(
        maxwellCoaxial(r1, r2, d),
        want,
        10 * ((r1 * r1 + r2 * r2) / (d * d)),
        `dipole d = ${d}`,
      );
    }
  });
});

describe('maxwellCoaxial bad input', () => {
  it.each([
    ['r1', 0, 0.02, 0.003],
    ['r1', -0.01, 0.02, 0.003],
    ['r2', 0.02, NaN, 0.003],
    ['r2', 0.02, Infinity, 0.003],
    ['d', 0.02, 0.02, NaN],
  ])('rejects %s = bad value with a RangeError naming it', (name, r1, r2, d) => {
    expect(() => maxwellCoaxial(r1 as number, r2 as number, d as number)).toThrow(RangeError);
    expect(() => maxwellCoaxial(r1 as number, r2 as number, d as number)).toThrow(String(name));
  });
  it('rejects coincident rings', () => {
    expect(() => maxwellCoaxial(0.02, 0.02, 0)).toThrow(/coincide/);
  });
});
