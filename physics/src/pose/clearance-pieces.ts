import { conductorSection } from '../coils/conductor-section';
import { formatLength } from '../coils/format-length';
import type { Coil } from '../coils/coil-schema';
import type { FilamentSet, Vec3 } from '../filaments';

/** How a conductor's section sits: round, or a rectangle whose width lies along `widthAlong`. */
export interface PieceSection {
  /** Half the width (radius for round conductors), m. */
  halfWidth: number;
  /** Half the thickness (radius for round conductors), m. */
  halfThickness: number;
  round: boolean;
  /** 'plane': width in the winding plane (spirals, paths); 'axis': width along the axis. */
  widthAlong: 'plane' | 'axis';
  /** The coil's axis in the frame of the pieces (unit vector). */
  axis: Vec3;
}

/** A ring or a straight segment of conductor centre line, with a label for messages. */
export type ClearancePiece =
  | {
      kind: 'ring';
      center: Vec3;
      normal: Vec3;
      radius: number;
      label: string;
      section: PieceSection;
    }
  | { kind: 'segment'; p: Vec3; q: Vec3; label: string; section: PieceSection };

/**
 * The conductor of a coil as pieces for clearance tests: every ring filament and every straight
 * segment of every path, with the conductor's true section (not the equivalent self-term radius).
 *
 * Method: round wire and Litz are round of radius d/2 (bundle radius); a trace is a w × t
 * rectangle with its width in the winding plane (across the turns), or along the axis for a
 * solenoid wound from strip. `axis` is the coil's +z axis carried into the filaments' frame.
 *
 * References: none needed.
 *
 * @param set the coil's filaments in some frame, m
 * @param coil the coil they came from (for its conductor)
 * @param axis the coil's +z axis in that frame
 * @param who 'Tx' or 'Rx', for messages
 * @returns the pieces, m
 * @example clearancePieces(coilFilaments(ring), ring, { x: 0, y: 0, z: 1 }, 'Tx')[0].kind // 'ring'
 */
export function clearancePieces(
  set: FilamentSet,
  coil: Coil,
  axis: Vec3,
  who: string,
): ClearancePiece[] {
  const section = pieceSection(coil, axis);
  const pieces: ClearancePiece[] = set.rings.map((ring, i) => ({
    kind: 'ring',
    center: ring.center,
    normal: ring.normal,
    radius: ring.radius,
    label: `${who} ring ${i} (radius ${formatLength(ring.radius)})`,
    section,
  }));
  set.paths.forEach((path, j) => {
    const n = path.points.length;
    const segments = path.closed ? n : n - 1;
    for (let i = 0; i < segments; i++) {
      pieces.push({
        kind: 'segment',
        p: path.points[i],
        q: path.points[(i + 1) % n],
        label: `${who} path ${j} segment ${i}`,
        section,
      });
    }
  });
  return pieces;
}

function pieceSection(coil: Coil, axis: Vec3): PieceSection {
  if (coil.kind === 'ring' || coil.kind === 'rings') {
    const a = coil.wireRadius;
    return { halfWidth: a, halfThickness: a, round: true, widthAlong: 'plane', axis };
  }
  const s = conductorSection(coil.conductor);
  return {
    halfWidth: s.width / 2,
    halfThickness: s.thickness / 2,
    round: s.type !== 'trace',
    widthAlong: coil.kind === 'solenoid' ? 'axis' : 'plane',
    axis,
  };
}
