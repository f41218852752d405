/**
 * Bessel functions J0(z) and J1(z) of a complex argument by their power series.
 *
 * Method: J0(z) = Σ (−w)^k / (k!)², J1(z) = (z/2) Σ (−w)^k / (k! (k+1)!), w = (z/2)², summed
 * until the next term no longer changes the sum (relative 1e-17). The series converges for every
 * z, but on the diagonal arg z = −π/4 of the skin-effect problem the terms grow like I0(|z|)
 * while the sum grows like exp(|z|/√2), so about 0.13·|z| decimal digits are lost: callers keep
 * |z| ≤ 40 (≥ 11 good digits) and switch to the asymptotic form beyond.
 *
 * References: M. Abramowitz, I. A. Stegun, Handbook of Mathematical Functions (1964), 9.1.10;
 * NIST DLMF §10.8.
 *
 * @param re real part of z
 * @param im imaginary part of z
 * @returns [Re J0, Im J0, Re J1, Im J1]
 * @example besselJ01Complex(1, 0) // ≈ [0.7652, 0, 0.4401, 0]
 */
export function besselJ01Complex(re: number, im: number): [number, number, number, number] {
  // w = (z/2)^2 and the running term t_k = (-w)^k / (k!)^2.
  const hr = re / 2;
  const hi = im / 2;
  const wr = hr * hr - hi * hi;
  const wi = 2 * hr * hi;
  let tr = 1;
  let ti = 0;
  let s0r = 1;
  let s0i = 0;
  let s1r = 1;
  let s1i = 0;
  // 300 terms cover |z| ≤ 150; callers stay far below, so this only bounds a runaway loop.
  for (let k = 1; k < 300; k++) {
    // t_k = t_{k-1} · (−w) / k²
    const nr = -(tr * wr - ti * wi) / (k * k);
    const ni = -(tr * wi + ti * wr) / (k * k);
    tr = nr;
    ti = ni;
    s0r += tr;
    s0i += ti;
    // J1 term differs by the factor 1/(k+1).
    s1r += tr / (k + 1);
    s1i += ti / (k + 1);
    const size = Math.abs(tr) + Math.abs(ti);
    // Stop once the term is below the double-precision resolution of both sums.
    if (
      size < 1e-17 * (Math.abs(s0r) + Math.abs(s0i)) &&
      size < 1e-17 * (Math.abs(s1r) + Math.abs(s1i))
    )
      break;
  }
  // J1 = (z/2) · s1
  return [s0r, s0i, hr * s1r - hi * s1i, hr * s1i + hi * s1r];
}
