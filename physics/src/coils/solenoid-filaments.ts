import type { FilamentSet, RingFilament, Vec3 } from '../filaments';
import type { SolenoidCoil } from './coil-schema';
import { conductorSection } from './conductor-section';
import { SEGMENTS_PER_TURN } from './filament-resolution';

/**
 * Filaments of a helical solenoid in its local frame: the winding runs along +z from z = 0 to
 * z = length, the current sheet of Wheeler and Nagaoka; layers grow outward.
 *
 * Method: pitch p = length / N. Ring model (default): in layer k (radius R + k · layerSpacing),
 * ring i (i = 0 … ceil(N) - 1) at z = (i + 1/2) p, the mean height of helix turn i; the last ring
 * carries the weight of the fractional last turn. Helix model: one continuous polyline with 96
 * segments per turn, z = p · φ/2π; even layers climb, odd layers descend, joined by a radial step,
 * all turning right-handed about +z. The path is open: leads are not modelled.
 *
 * References: H. A. Wheeler, "Simple inductance formulas for radio coils", Proc. IRE 16(10), 1928
 * (the winding length l of a single-layer coil is the length of its current sheet, N · p).
 *
 * @param coil a validated solenoid (SI units)
 * @returns rings or one path, with the conductor's equivalent wire radius (m)
 * @example solenoidFilaments({ kind: 'solenoid', radius: 0.01, length: 0.02, turns: 20,
 *   conductor: { type: 'round', diameter: 5e-4 } }).rings[0].center.z // 5e-4 m
 */
export function solenoidFilaments(coil: SolenoidCoil): FilamentSet {
  const { wireRadius } = conductorSection(coil.conductor);
  const pitch = coil.length / coil.turns;
  const layers = coil.layers ?? 1;
  const spacing = coil.layerSpacing ?? 0;
  if (coil.model !== 'helix') {
    const count = Math.max(1, Math.ceil(coil.turns - 1e-12));
    const lastWeight = coil.turns - (count - 1);
    const rings: RingFilament[] = [];
    for (let layer = 0; layer < layers; layer++) {
      for (let i = 0; i < count; i++) {
        rings.push({
          center: { x: 0, y: 0, z: (i + 0.5) * pitch },
          normal: { x: 0, y: 0, z: 1 },
          radius: coil.radius + layer * spacing,
          wireRadius,
          weight: i === count - 1 ? lastWeight : 1,
        });
      }
    }
    return { rings, paths: [] };
  }
  const sweep = 2 * Math.PI * coil.turns;
  const steps = Math.max(8, Math.ceil(SEGMENTS_PER_TURN * coil.turns));
  const points: Vec3[] = [];
  for (let layer = 0; layer < layers; layer++) {
    const radius = coil.radius + layer * spacing;
    const climbing = layer % 2 === 0;
    for (let k = 0; k <= steps; k++) {
      const local = (sweep * k) / steps;
      const phi = layer * sweep + local;
      const height = (coil.length * (climbing ? k : steps - k)) / steps;
      points.push({ x: radius * Math.cos(phi), y: radius * Math.sin(phi), z: height });
    }
  }
  return { rings: [], paths: [{ points, closed: false, wireRadius, weight: 1 }] };
}
