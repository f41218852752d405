import type { FilamentSet, Vec3 } from '../filaments';
import { circularSpiralGeometry } from './circular-spiral-geometry';
import type { CircularSpiralCoil } from './coil-schema';
import { conductorSection } from './conductor-section';
import { SEGMENTS_PER_TURN } from './filament-resolution';

/**
 * Filaments of a circular planar spiral in its local frame.
 *
 * Method: ring model (default): in every layer, ring i (i = 0 … ceil(N) - 1) of radius
 * r_in + i · pitch in the plane z = layer · layerSpacing, current right-handed about +z; the
 * outermost ring carries the weight of the fractional last turn. Spiral model: one continuous
 * Archimedean polyline r(φ) = r_in - pitch/2 + pitch · φ/2π with 96 segments per turn, so turn i
 * has the mean radius r_in + i · pitch of ring i; even layers run outward, odd layers inward, and
 * a straight via joins the layers, all turning the same way about +z (as a multilayer board is
 * connected). The path is open: leads and their return are not modelled.
 *
 * References: Archimedean spiral r = a + bφ (any geometry text).
 *
 * @param coil a validated circular spiral (SI units)
 * @returns rings or one path, with the conductor's equivalent wire radius (m)
 * @example circularSpiralFilaments({ kind: 'circular-spiral', turns: 2.5, innerRadius: 0.01,
 *   pitch: 0.001, conductor: { type: 'round', diameter: 5e-4 } }).rings.map((r) => r.weight)
 *   // [1, 1, 0.5]
 */
export function circularSpiralFilaments(coil: CircularSpiralCoil): FilamentSet {
  const g = circularSpiralGeometry(coil);
  const { wireRadius } = conductorSection(coil.conductor);
  const layers = coil.layers ?? 1;
  const spacing = coil.layerSpacing ?? 0;
  if (coil.model !== 'spiral') {
    const rings = [];
    for (let layer = 0; layer < layers; layer++) {
      for (let i = 0; i < g.ringCount; i++) {
        rings.push({
          center: { x: 0, y: 0, z: layer * spacing },
          normal: { x: 0, y: 0, z: 1 },
          radius: g.innerRadius + i * g.pitch,
          wireRadius,
          weight: i === g.ringCount - 1 ? g.lastWeight : 1,
        });
      }
    }
    return { rings, paths: [] };
  }
  const sweep = 2 * Math.PI * coil.turns;
  const steps = Math.max(8, Math.ceil(SEGMENTS_PER_TURN * coil.turns));
  const start = g.innerRadius - g.pitch / 2;
  const growth = g.pitch / (2 * Math.PI);
  const points: Vec3[] = [];
  for (let layer = 0; layer < layers; layer++) {
    const outward = layer % 2 === 0;
    for (let k = 0; k <= steps; k++) {
      const local = (sweep * k) / steps;
      const phi = layer * sweep + local;
      const r = start + growth * (outward ? local : sweep - local);
      points.push({ x: r * Math.cos(phi), y: r * Math.sin(phi), z: layer * spacing });
    }
  }
  return { rings: [], paths: [{ points, closed: false, wireRadius, weight: 1 }] };
}
