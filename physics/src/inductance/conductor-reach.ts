import type { Coil } from '../coils/coil-schema';
import { conductorSection } from '../coils/conductor-section';

/**
 * How far a coil's conductor can reach from its centre line in any direction (m): the wire
 * radius for `ring` and `rings`, otherwise the larger of the equivalent radius and the half
 * diagonal of the conductor's section — a bound used to skip clearance checks safely.
 *
 * @param coil - a validated coil.
 * @returns the reach, m.
 *
 * @example conductorReach({ kind: 'ring', radius: 0.02, wireRadius: 5e-4 }); // 5e-4
 */
export function conductorReach(coil: Coil): number {
  if (coil.kind === 'ring' || coil.kind === 'rings') return coil.wireRadius;
  const s = conductorSection(coil.conductor);
  return Math.max(s.wireRadius, Math.hypot(s.width, s.thickness) / 2);
}
