import type { CircularSpiralCoil } from './coil-schema';

/** The winding of a circular spiral reduced to the numbers every model uses, metres. */
export interface CircularSpiralGeometry {
  /** Centre-line radius of the innermost turn (ring 0 of the ring model). */
  innerRadius: number;
  /** Radial distance between neighbouring turns, centre to centre. */
  pitch: number;
  /** Rings per layer in the ring model: ceil(turns). */
  ringCount: number;
  /** Weight of the outermost ring: the fraction of the last turn (1 for whole turns). */
  lastWeight: number;
  /** Centre-line radius of the outermost turn: innerRadius + (ringCount - 1) · pitch. */
  outerRadius: number;
}

/**
 * Inner radius, pitch and ring count of a circular planar spiral from either of its two forms.
 *
 * Method: form A gives inner and outer winding diameter, read as the centre-line diameters of the
 * innermost and outermost turn, so pitch = (D_out - D_in) / (2 (ceil(N) - 1)); form B gives the
 * inner radius and the pitch directly. Turn i sits at r_in + i · pitch, the fractional last turn
 * is weighted by its fraction.
 *
 * References: none needed (plain geometry).
 *
 * @param coil a circular spiral (form A with turns > 1, or form B)
 * @returns inner radius, pitch and ring count (m, m, count)
 * @example circularSpiralGeometry({ kind: 'circular-spiral', turns: 11, innerDiameter: 0.02,
 *   outerDiameter: 0.04, conductor: { type: 'round', diameter: 5e-4 } }).pitch // 0.001 m
 */
export function circularSpiralGeometry(coil: CircularSpiralCoil): CircularSpiralGeometry {
  const ringCount = Math.max(1, Math.ceil(coil.turns - 1e-12));
  const lastWeight = coil.turns - (ringCount - 1);
  if (coil.innerRadius !== undefined && coil.pitch !== undefined) {
    const outerRadius = coil.innerRadius + (ringCount - 1) * coil.pitch;
    return { innerRadius: coil.innerRadius, pitch: coil.pitch, ringCount, lastWeight, outerRadius };
  }
  if (coil.innerDiameter !== undefined && coil.outerDiameter !== undefined) {
    const innerRadius = coil.innerDiameter / 2;
    const outerRadius = coil.outerDiameter / 2;
    const pitch = ringCount > 1 ? (outerRadius - innerRadius) / (ringCount - 1) : 0;
    return { innerRadius, pitch, ringCount, lastWeight, outerRadius };
  }
  throw new RangeError(
    'coil.innerDiameter: missing; allowed: either innerDiameter + outerDiameter or ' +
      'innerRadius + pitch',
  );
}
