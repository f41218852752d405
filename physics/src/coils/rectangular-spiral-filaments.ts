import type { FilamentSet, Vec3 } from '../filaments';
import type { RectangularSpiralCoil } from './coil-schema';
import { conductorSection } from './conductor-section';
import { ARC_SEGMENTS_PER_QUARTER } from './filament-resolution';

/**
 * Filaments of a rectangular planar spiral in its local frame: one closed polygon per turn.
 *
 * Method: turn i (i = 0 outermost … ceil(N) - 1 innermost) is the outer turn's centre line offset
 * inward by i · pitch: a rectangle of (W - 2i·p) × (H - 2i·p) centred on the origin, with corner
 * radius max(c - i·p, 0) (the exact inward offset of a rounded rectangle; a corner whose radius
 * reaches zero is sharp). Straight sides stay single segments; each quarter-circle corner becomes
 * 8 chords. Turns are closed and concentric, like the ring model of a circular spiral: the short
 * jog by which a real spiral steps inward once per turn is left out (an error of the order of
 * pitch / perimeter), and closed turns keep Neumann's formula exact for the model. The innermost
 * turn carries the weight of the fractional last turn. Layers repeat the turns at
 * z = layer · layerSpacing; current runs counter-clockwise seen from +z (right-handed about +z).
 *
 * References: none needed (plain geometry).
 *
 * @param coil a validated rectangular spiral (SI units)
 * @returns closed paths, one per turn and layer, with the equivalent wire radius (m)
 * @example rectangularSpiralFilaments({ kind: 'rectangular-spiral', outerWidth: 0.07,
 *   outerHeight: 0.05, cornerRadius: 0.005, pitch: 0.001, turns: 15,
 *   conductor: { type: 'round', diameter: 8e-4 } }).paths.length // 15
 */
export function rectangularSpiralFilaments(coil: RectangularSpiralCoil): FilamentSet {
  const { wireRadius } = conductorSection(coil.conductor);
  const turns = Math.max(1, Math.ceil(coil.turns - 1e-12));
  const lastWeight = coil.turns - (turns - 1);
  const layers = coil.layers ?? 1;
  const spacing = coil.layerSpacing ?? 0;
  const paths = [];
  for (let layer = 0; layer < layers; layer++) {
    for (let i = 0; i < turns; i++) {
      const inset = i * coil.pitch;
      const points = roundedRectangle(
        coil.outerWidth / 2 - inset,
        coil.outerHeight / 2 - inset,
        Math.max(coil.cornerRadius - inset, 0),
        layer * spacing,
      );
      paths.push({ points, closed: true, wireRadius, weight: i === turns - 1 ? lastWeight : 1 });
    }
  }
  return { rings: [], paths };
}

/** Counter-clockwise polygon of a rounded rectangle of half sides a, b and corner radius c. */
function roundedRectangle(a: number, b: number, c: number, z: number): Vec3[] {
  const centres = [
    { x: a - c, y: b - c },
    { x: -(a - c), y: b - c },
    { x: -(a - c), y: -(b - c) },
    { x: a - c, y: -(b - c) },
  ];
  const points: Vec3[] = [];
  centres.forEach((centre, quarter) => {
    if (c === 0) {
      push(points, { ...centre, z });
      return;
    }
    for (let k = 0; k <= ARC_SEGMENTS_PER_QUARTER; k++) {
      const angle = (Math.PI / 2) * (quarter + k / ARC_SEGMENTS_PER_QUARTER);
      push(points, { x: centre.x + c * Math.cos(angle), y: centre.y + c * Math.sin(angle), z });
    }
  });
  if (points.length > 1 && same(points[0], points[points.length - 1])) points.pop();
  return points;
}

/** Appends a point unless it repeats the last one (a side of zero length when c = a or b). */
function push(points: Vec3[], p: Vec3): void {
  const last = points[points.length - 1];
  if (!last || !same(last, p)) points.push(p);
}

function same(p: Vec3, q: Vec3): boolean {
  // Relative to the turn's size, closer than this is the same point (rounding of cos and sin).
  const tolerance = 1e-12 * (Math.abs(p.x) + Math.abs(p.y));
  return Math.abs(p.x - q.x) <= tolerance && Math.abs(p.y - q.y) <= tolerance;
}
