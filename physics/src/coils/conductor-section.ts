import { LITZ_PACKING_FACTOR, RECTANGLE_GMD_FACTOR } from './coil-limits';
import type { Conductor } from './coil-schema';

/** The cross-section of a conductor as the filament models see it, metres. */
export interface ConductorSection {
  type: Conductor['type'];
  /**
   * Extent along the direction in which turns advance: in the winding plane for planar spirals,
   * along the axis for solenoids. Pitch must not be below it.
   */
  width: number;
  /** Extent across the layers (normal to the winding plane; radial for solenoids). */
  thickness: number;
  /**
   * Radius of the round wire with the same self-inductance (same geometric mean distance), used
   * as `wireRadius` of every filament: d/2 for round wire, the bundle radius for Litz,
   * e^(1/4) · 0.2235 (w + t) for a trace.
   */
  wireRadius: number;
}

/**
 * Cross-section of a conductor: its width, thickness and equivalent round-wire radius.
 *
 * Method: round wire of diameter d: width = thickness = d, radius d/2. Litz: the bundle is
 * treated as one round conductor of the bundle diameter (at low frequency the current fills the
 * bundle); a missing `bundleDiameter` is d_s · sqrt(strands / 0.6), the copper area divided by a
 * packing factor of 0.6 (common practice, no source). PCB trace w × t: a round wire has the same
 * self-inductance as a rectangle when the geometric mean distances agree; the GMD of a round
 * section is a·e^(-1/4) and that of a rectangle ≈ 0.2235 (w + t), so a = e^(1/4) · 0.2235 (w + t).
 *
 * References: E. B. Rosa, F. W. Grover, "Formulas and tables for the calculation of mutual and
 * self-inductance", Bull. Bureau of Standards 8 (1912); F. W. Grover, Inductance Calculations
 * (1946) — GMD of a rectangle (from memory).
 *
 * @param conductor a validated conductor
 * @returns width, thickness and equivalent radius, m
 * @example conductorSection({ type: 'trace', width: 1e-3, thickness: 35e-6 }).wireRadius
 *   // ≈ 2.97e-4 m
 */
export function conductorSection(conductor: Conductor): ConductorSection {
  switch (conductor.type) {
    case 'round':
      return section('round', conductor.diameter, conductor.diameter, conductor.diameter / 2);
    case 'litz': {
      const bundle =
        conductor.bundleDiameter ??
        conductor.strandDiameter * Math.sqrt(conductor.strands / LITZ_PACKING_FACTOR);
      return section('litz', bundle, bundle, bundle / 2);
    }
    case 'trace': {
      const gmd = RECTANGLE_GMD_FACTOR * (conductor.width + conductor.thickness);
      return section('trace', conductor.width, conductor.thickness, Math.exp(0.25) * gmd);
    }
  }
}

function section(
  type: Conductor['type'],
  width: number,
  thickness: number,
  wireRadius: number,
): ConductorSection {
  return { type, width, thickness, wireRadius };
}
