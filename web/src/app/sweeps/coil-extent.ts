import type { StudyCoil } from '../api-types';

type Coil = StudyCoil['spec'];

/** Half the size of a coil's winding seen from above, about its own axis, m. */
export interface CoilExtent {
  halfX: number;
  halfY: number;
}

/**
 * How far a coil's winding reaches from its axis in x and y (conductor centre lines), for the
 * default ranges of a sweep. Only a guide: the sweep set-up lets the user type any range.
 *
 * Method: ring and solenoid radius; the largest ring of a rings coil; a circular spiral's outer
 * diameter / 2, or inner radius + (⌈turns⌉ − 1) · pitch (the outermost turn, as the coil
 * model places it); a rectangular spiral's outer width / 2 and height / 2; the largest |x| and
 * |y| of a path's points.
 *
 * @param coil the coil spec (SI)
 * @returns half extents in x and y, m
 * @example coilExtent({ kind: 'ring', radius: 0.02, wireRadius: 5e-4 })
 *   // { halfX: 0.02, halfY: 0.02 }
 */
export function coilExtent(coil: Coil): CoilExtent {
  const round = (r: number): CoilExtent => ({ halfX: r, halfY: r });
  switch (coil.kind) {
    case 'ring':
    case 'solenoid':
      return round(coil.radius);
    case 'rings':
      return round(Math.max(...coil.rings.map((r) => r.r)));
    case 'circular-spiral': {
      if (coil.outerDiameter !== undefined) return round(coil.outerDiameter / 2);
      const inner = coil.innerRadius ?? (coil.innerDiameter ?? 0) / 2;
      return round(inner + Math.max(0, Math.ceil(coil.turns) - 1) * (coil.pitch ?? 0));
    }
    case 'rectangular-spiral':
      return { halfX: coil.outerWidth / 2, halfY: coil.outerHeight / 2 };
    case 'path':
      return {
        halfX: Math.max(...coil.points.map((p) => Math.abs(p.x))),
        halfY: Math.max(...coil.points.map((p) => Math.abs(p.y))),
      };
  }
}
