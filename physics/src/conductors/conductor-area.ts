import { requirePositive } from '../guards/require-positive';
import type { Conductor } from './conductor';

/**
 * Metal cross-section of a conductor, the area that carries DC current.
 *
 * Method: round wire π d²/4; Litz wire strands · π d_s²/4 (the strands' copper only — the
 * bundle diameter includes insulation and voids and does not carry current); trace width ·
 * thickness (a rectangle; etched trapezoids are not modelled).
 *
 * References: elementary geometry; the Litz convention as in C. R. Sullivan, "Optimal choice for
 * number of strands in a litz-wire transformer winding", IEEE Trans. Power Electronics 14(2), 1999.
 *
 * @param conductor the conductor, dimensions in m
 * @returns cross-section, m²
 * @example conductorArea({ type: 'round', diameter: 1e-3 }) // ≈ 7.85e-7 m²
 */
export function conductorArea(conductor: Conductor): number {
  switch (conductor.type) {
    case 'round':
      requirePositive('conductor.diameter', conductor.diameter, 'm');
      return (Math.PI * conductor.diameter * conductor.diameter) / 4;
    case 'litz': {
      const { strands, strandDiameter } = conductor;
      if (!Number.isInteger(strands) || strands < 1) {
        throw new RangeError(`conductor.strands: must be an integer >= 1 (got ${strands})`);
      }
      requirePositive('conductor.strandDiameter', strandDiameter, 'm');
      return (strands * Math.PI * strandDiameter * strandDiameter) / 4;
    }
    case 'trace':
      requirePositive('conductor.width', conductor.width, 'm');
      requirePositive('conductor.thickness', conductor.thickness, 'm');
      return conductor.width * conductor.thickness;
    default:
      throw new RangeError(`conductor.type: must be 'round', 'litz' or 'trace'`);
  }
}
