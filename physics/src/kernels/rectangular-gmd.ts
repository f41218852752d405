import { requirePositive } from '../guards/require-positive';

/**
 * Geometric mean distance of a rectangular cross-section (PCB trace, strip) from itself (m).
 *
 * Method: g = 0.2235 (w + t), Rosa's approximation, within 0.5 % of the exact value for every
 * aspect ratio (exact: 0.22313 (w + t) for a thin strip, 0.44705 w for a square).
 *
 * References: E. B. Rosa, "The self and mutual inductances of linear conductors", Bull. Bureau of
 * Standards 4(2), 1908; F. W. Grover, Inductance Calculations, 1946, ch. 2, table 1.
 *
 * @param width - width w, m (> 0).
 * @param thickness - thickness t, m (> 0).
 * @returns the geometric mean distance, m.
 *
 * @example rectangularGmd(0.001, 35e-6); // ≈ 2.313e-4 m
 */
export function rectangularGmd(width: number, thickness: number): number {
  requirePositive('width', width, 'm');
  requirePositive('thickness', thickness, 'm');
  return 0.2235 * (width + thickness);
}
