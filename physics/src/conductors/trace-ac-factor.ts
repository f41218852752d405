import { requirePositive } from '../guards/require-positive';

/**
 * Skin-effect resistance ratio R_ac/R_dc of a flat rectangular trace.
 *
 * Method: the exact one-dimensional solution for a conducting plate of thickness t carrying
 * current with equal fields on both faces (Dowell's skin-effect term for one layer):
 * R_ac/R_dc = Δ · (sinh 2Δ + sin 2Δ)/(cosh 2Δ − cos 2Δ), Δ = t/(2δ). Limits: 1 + (t/δ)⁴/180 at low
 * frequency, t/(2δ) (two skins of depth δ on the broad faces) at high frequency.
 * Accuracy: assumes width ≫ thickness; it ignores the current on the two narrow edges (which
 * lowers R by roughly t/w at high frequency) and the crowding of current towards the edges of a
 * thin strip and the proximity of neighbouring turns (which raise it). For PCB coils with w/t ≥ 5
 * read it as an estimate of skin loss only, a lower bound for the winding.
 *
 * References: P. L. Dowell, "Effects of eddy currents in transformer windings", Proc. IEE 113(8),
 * 1966, pp. 1387–1394; S. Ramo, J. R. Whinnery, T. Van Duzer, Fields and Waves in Communication
 * Electronics, 3rd ed. (1994), §5.5 (plane conductor).
 *
 * @param thickness trace thickness, m
 * @param delta skin depth, m (Infinity for DC)
 * @returns R_ac/R_dc (≥ 1)
 * @example traceAcFactor(35e-6, 25e-6) // ≈ 1.02 (1 oz copper at 6.78 MHz)
 */
export function traceAcFactor(thickness: number, delta: number): number {
  requirePositive('thickness', thickness, 'm');
  if (delta === Infinity) return 1;
  requirePositive('skinDepth', delta, 'm');
  const a = thickness / delta; // a = 2Δ
  // Below a = 1e-2 the closed form cancels catastrophically; the series is exact to 1e-16 there.
  if (a < 1e-2) return 1 + a ** 4 / 180;
  // Above a = 40, sinh and cosh dominate the sin/cos terms by e^40: the ratio is tanh-like ≈ 1.
  if (a > 40) return a / 2;
  return ((a / 2) * (Math.sinh(a) + Math.sin(a))) / (Math.cosh(a) - Math.cos(a));
}
