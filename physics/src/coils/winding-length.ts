import { circularSpiralGeometry } from './circular-spiral-geometry';
import type { Coil } from './coil-schema';

/**
 * Total length of conductor in a coil, metres (for DC resistance, mass and cost).
 *
 * Method, per kind (exact for the geometry the coil describes, independent of the filament
 * model chosen):
 * - ring: 2πR; rings: Σ 2π r_i;
 * - circular spiral: per layer the Archimedean arc length of r = r0 + bφ, b = pitch/2π, over
 *   N turns from r0 = r_in - pitch/2: s = [F(r1) - F(r0)] / b with
 *   F(r) = (r·sqrt(r² + b²) + b² asinh(r/b)) / 2; plus one via of layerSpacing between layers;
 * - rectangular spiral: Σ over turns of the rounded-rectangle perimeter 2(w + h) - (8 - 2π) c,
 *   the innermost turn weighted by its fraction, times layers (jogs between turns left out,
 *   as in the filament model);
 * - solenoid: per layer N · sqrt((2π R_k)² + p²), p = length/N, plus a radial step of
 *   layerSpacing between layers;
 * - path: the polyline's length, with the closing segment when closed.
 * Leads to the terminals are not included.
 *
 * References: arc length of the Archimedean spiral and of the helix (any calculus text).
 *
 * @param coil a validated coil (SI units)
 * @returns conductor length, m
 * @example windingLength({ kind: 'solenoid', radius: 0.01, length: 0.02, turns: 20,
 *   conductor: { type: 'round', diameter: 5e-4 } }) // ≈ 1.2568 m
 */
export function windingLength(coil: Coil): number {
  switch (coil.kind) {
    case 'ring':
      return 2 * Math.PI * coil.radius;
    case 'rings':
      return coil.rings.reduce((sum, ring) => sum + 2 * Math.PI * ring.r, 0);
    case 'circular-spiral': {
      const g = circularSpiralGeometry(coil);
      const b = g.pitch / (2 * Math.PI);
      const r0 = g.innerRadius - g.pitch / 2;
      const r1 = r0 + g.pitch * coil.turns;
      // A spiral would start at a negative radius when pitch > 2 r_in: count the rings instead.
      const layer =
        r0 > 0
          ? (arc(r1, b) - arc(r0, b)) / b
          : 2 *
            Math.PI *
            (g.innerRadius * coil.turns + g.pitch * ringOffsets(g.ringCount, g.lastWeight));
      return stack(layer, coil.layers, coil.layerSpacing);
    }
    case 'rectangular-spiral': {
      const rings = Math.max(1, Math.ceil(coil.turns - 1e-12));
      let layer = 0;
      for (let i = 0; i < rings; i++) {
        const inset = i * coil.pitch;
        const c = Math.max(coil.cornerRadius - inset, 0);
        const perimeter =
          2 * (coil.outerWidth + coil.outerHeight - 4 * inset) - (8 - 2 * Math.PI) * c;
        layer += (i === rings - 1 ? coil.turns - (rings - 1) : 1) * perimeter;
      }
      return layer * (coil.layers ?? 1);
    }
    case 'solenoid': {
      const pitch = coil.length / coil.turns;
      let total = 0;
      const layers = coil.layers ?? 1;
      for (let k = 0; k < layers; k++) {
        const radius = coil.radius + k * (coil.layerSpacing ?? 0);
        total += coil.turns * Math.hypot(2 * Math.PI * radius, pitch);
      }
      return total + (layers - 1) * (coil.layerSpacing ?? 0);
    }
    case 'path': {
      const p = coil.points;
      let total = 0;
      const segments = coil.closed ? p.length : p.length - 1;
      for (let i = 0; i < segments; i++) {
        const a = p[i];
        const b = p[(i + 1) % p.length];
        total += Math.hypot(b.x - a.x, b.y - a.y, b.z - a.z);
      }
      return total;
    }
  }
}

/** Σ i · weight_i over the rings of one layer (ring i at r_in + i · pitch). */
function ringOffsets(count: number, lastWeight: number): number {
  return ((count - 1) * (count - 2)) / 2 + (count - 1) * lastWeight;
}

/** Antiderivative of sqrt(r² + b²) dr. */
function arc(r: number, b: number): number {
  return (r * Math.sqrt(r * r + b * b) + b * b * Math.asinh(r / b)) / 2;
}

function stack(layer: number, layers = 1, spacing = 0): number {
  return layer * layers + (layers - 1) * spacing;
}
