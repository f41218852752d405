import type { FilamentSet } from '../filaments';

/** One ring of a coil whose rings all share the local z axis. */
export interface StackRing {
  r: number;
  z: number;
  weight: number;
}

/**
 * The coil as a stack of coaxial rings on its local +z axis — the case Maxwell's, Grover's and
 * Conway's forms serve — or null when any filament is a polyline, off the axis or tilted.
 *
 * @param set - filaments in the coil's local frame (images of a backing parallel to it included).
 * @returns radius, height and weight of every ring, or null.
 *
 * @example coaxialStack(coilFilaments(spiral20))?.length; // 20
 */
export function coaxialStack(set: FilamentSet): StackRing[] | null {
  if (set.paths.length > 0) return null;
  const out: StackRing[] = [];
  for (const ring of set.rings) {
    const { center: c, normal: n } = ring;
    // Exactly on the axis and exactly parallel: coil builders produce 0 and 1 exactly.
    if (c.x !== 0 || c.y !== 0 || n.x !== 0 || n.y !== 0 || n.z !== 1) return null;
    out.push({ r: ring.radius, z: c.z, weight: ring.weight });
  }
  return out;
}
