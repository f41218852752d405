import besselj0 from '@stdlib/math-base-special-besselj0';
import besselj1 from '@stdlib/math-base-special-besselj1';
import { describe, expect, it } from 'vitest';
import { expectNear } from '../testing/expect-near';
import { besselJ01Complex } from './bessel-j01-complex';

describe('besselJ01Complex', () => {
  it('matches @stdlib besselj0 / besselj1 on the real axis', () => {
    // On the real axis the terms reach about I0(x) while J ≤ 1, so rounding costs ~1e-16·I0(x):
    // 3e-13 at x = 10 and 4e-9 at x = 20. The tolerance follows that bound with a 10x margin.
    for (const x of [0, 0.1, 0.5, 1, 2.404825557695773, 3.8317, 5, 10, 15, 20]) {
      const tol = x <= 10 ? 3e-12 : 5e-8;
      const [j0r, j0i, j1r, j1i] = besselJ01Complex(x, 0);
      expectNear(j0r, besselj0(x), tol, `J0(${x})`, true);
      expectNear(j1r, besselj1(x), tol, `J1(${x})`, true);
      expect(j0i).toBe(0);
      expect(j1i).toBe(0);
    }
  });

  it('gives ber + j bei = J0(x e^{3πj/4}) (A&S table 9.12, from memory)', () => {
    // Five-decimal table values, recalled: 1e-5 absolute.
    const c = Math.SQRT1_2;
    const table: [number, number, number][] = [
      [1, 0.98438, 0.24957],
      [2, 0.75173, 0.97229],
      [3, -0.2214, 1.93759],
    ];
    for (const [x, ber, bei] of table) {
      const [r, i] = besselJ01Complex(-x * c, x * c);
      expectNear(r, ber, 1e-4, `ber(${x})`, true);
      expectNear(i, bei, 1e-5, `bei(${x})`, true);
    }
  });

  it('is odd/even: J0(−z) = J0(z), J1(−z) = −J1(z)', () => {
    const [a0r, a0i, a1r, a1i] = besselJ01Complex(3.3, -2.1);
    const [b0r, b0i, b1r, b1i] = besselJ01Complex(-3.3, 2.1);
    // Same terms summed in the same order up to sign: 1e-14 absolute covers rounding.
    expectNear(b0r, a0r, 1e-14, 'Re J0', true);
    expectNear(b0i, a0i, 1e-14, 'Im J0', true);
    expectNear(b1r, -a1r, 1e-14, 'Re J1', true);
    expectNear(b1i, -a1i, 1e-14, 'Im J1', true);
  });
});
