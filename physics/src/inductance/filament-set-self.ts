import type { FilamentSet } from '../filaments';
import { pathPathMutual } from '../kernels/path-path-mutual';
import { pathRingMutual } from '../kernels/path-ring-mutual';
import { polylineSelf } from '../kernels/polyline-self';
import { ringRingMutual } from '../kernels/ring-ring-mutual';
import { ringSelf } from '../kernels/ring-self';

/** Options of the filament-set self-inductance. */
export interface FilamentSetSelfOptions {
  /** Surface-current self terms (the "- 2" ring form; no internal inductance). */
  highFrequency?: boolean;
}

/**
 * Self-inductance of a set of filaments connected in series (H): L = Σ_i Σ_j w_i w_j M_ij.
 *
 * Method: the diagonal terms are the filaments' own inductances — `ringSelf`
 * (mu0 R (ln(8R/a) - 7/4), or - 2 at high frequency) and `polylineSelf` (Dengler's curve
 * integral) — times w_i^2; every other pair enters twice with its mutual inductance (Maxwell's
 * closed form for coaxial rings, the single integrals otherwise).
 *
 * References: E. B. Rosa, F. W. Grover, Bull. Bureau of Standards 8(1), 1912; F. W. Grover,
 * Inductance Calculations, 1946; R. Dengler, Advanced Electromagnetics 5(1), 2016.
 *
 * @param set - the filaments, m.
 * @param options - high-frequency variant of the self terms.
 * @returns L in henries.
 *
 * @example filamentSetSelf(coilFilaments(twentyTurnSpiral)); // ≈ 1e-5 H
 */
export function filamentSetSelf(set: FilamentSet, options: FilamentSetSelfOptions = {}): number {
  const hf = { highFrequency: options.highFrequency ?? false };
  const { rings, paths } = set;
  let sum = 0;
  for (let i = 0; i < rings.length; i++) {
    const ri = rings[i];
    sum += ri.weight * ri.weight * ringSelf(ri.radius, ri.wireRadius, hf);
    for (let j = i + 1; j < rings.length; j++) sum += 2 * ringRingMutual(ri, rings[j]);
    for (const p of paths) sum += 2 * pathRingMutual(p, ri);
  }
  for (let i = 0; i < paths.length; i++) {
    const pi = paths[i];
    sum += pi.weight * pi.weight * polylineSelf(pi, hf);
    for (let j = i + 1; j < paths.length; j++) sum += 2 * pathPathMutual(pi, paths[j]);
  }
  return sum;
}
