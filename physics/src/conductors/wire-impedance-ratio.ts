import { besselJ01Complex } from './bessel-j01-complex';

/** Below this x = √2·a/δ the power series is used (≥ 11 good digits, see besselJ01Complex). */
const SERIES_LIMIT_X = 40;

/**
 * Internal impedance of a straight solid round wire relative to its DC resistance, Z/R_dc.
 *
 * Method: the exact solution of the diffusion equation in a cylinder (uniform return path far
 * away, no neighbours): Z/R_dc = (z/2) · J0(z)/J1(z) with z = (1 − j)·a/δ for the e^{jωt}
 * convention, equivalently the Kelvin-function form
 * R/R_dc = (x/2)(ber x · bei′x − bei x · ber′x)/(ber′²x + bei′²x), x = √2·a/δ.
 * For x ≤ 40 the Bessel power series is summed; beyond, Hankel's asymptotic expansion of
 * H0⁽¹⁾/H1⁽¹⁾ (J ≈ H⁽¹⁾/2 there, the H⁽²⁾ part is below e^{−56}) to eight terms, whose truncation
 * error at |z| ≥ 40 is below 1e-12. Real part: AC resistance ratio; imaginary part: internal
 * reactance ω·L_int over R_dc (u²/4 at low frequency, the μ0/8π internal inductance).
 *
 * References: S. Ramo, J. R. Whinnery, T. Van Duzer, Fields and Waves in Communication
 * Electronics, 3rd ed. (1994), §5.6; F. E. Terman, Radio Engineers' Handbook (1943), §2 (skin
 * effect in round wires); NIST DLMF §10.17 (Hankel expansions).
 *
 * @param u wire radius over skin depth, a/δ (dimensionless, ≥ 0)
 * @returns [R/R_dc, X_int/R_dc]
 * @example wireImpedanceRatio(10)[0] // ≈ 5.26 (high-frequency limit a/(2δ) + 1/4 ≈ 5.25)
 */
export function wireImpedanceRatio(u: number): [number, number] {
  if (!(u >= 0) || !Number.isFinite(u)) {
    throw new RangeError(`a/delta: must be a finite number >= 0 (got ${u})`);
  }
  if (u === 0) return [1, 0];
  return Math.SQRT2 * u <= SERIES_LIMIT_X
    ? wireImpedanceRatioSeries(u)
    : wireImpedanceRatioAsymptotic(u);
}

/** Series branch of {@link wireImpedanceRatio}; exported for the branch-continuity test. */
export function wireImpedanceRatioSeries(u: number): [number, number] {
  const [j0r, j0i, j1r, j1i] = besselJ01Complex(u, -u);
  // (z/2) · J0 / J1 with z = u (1 − j)
  const den = j1r * j1r + j1i * j1i;
  const qr = (j0r * j1r + j0i * j1i) / den;
  const qi = (j0i * j1r - j0r * j1i) / den;
  const hr = u / 2;
  const hi = -u / 2;
  return [hr * qr - hi * qi, hr * qi + hi * qr];
}

/** Asymptotic branch of {@link wireImpedanceRatio}; exported for the branch-continuity test. */
export function wireImpedanceRatioAsymptotic(u: number): [number, number] {
  // 1/z for z = u (1 − j) is (1 + j)/(2u).
  const izr = 1 / (2 * u);
  const izi = 1 / (2 * u);
  const [s0r, s0i] = hankelSeries(0, izr, izi);
  const [s1r, s1i] = hankelSeries(1, izr, izi);
  // J0/J1 ≈ H0/H1 = j · S0/S1
  const den = s1r * s1r + s1i * s1i;
  const rr = (s0r * s1r + s0i * s1i) / den;
  const ri = (s0i * s1r - s0r * s1i) / den;
  const qr = -ri;
  const qi = rr;
  const hr = u / 2;
  const hi = -u / 2;
  return [hr * qr - hi * qi, hr * qi + hi * qr];
}

/** Σ_k j^k a_k(ν) / z^k (DLMF 10.17.1/10.17.5), eight terms, given 1/z. */
function hankelSeries(nu: number, izr: number, izi: number): [number, number] {
  const mu = 4 * nu * nu;
  let sr = 1;
  let si = 0;
  // Running term c_k = j^k a_k(ν) z^{-k}, built from c_{k-1} by j (μ − (2k−1)²) / (8k) / z.
  let cr = 1;
  let ci = 0;
  for (let k = 1; k <= 8; k++) {
    const f = (mu - (2 * k - 1) * (2 * k - 1)) / (8 * k);
    // multiply by j·f/z: (cr + j ci)(izr + j izi) then by j f
    const pr = cr * izr - ci * izi;
    const pi = cr * izi + ci * izr;
    cr = -pi * f;
    ci = pr * f;
    sr += cr;
    si += ci;
  }
  return [sr, si];
}
