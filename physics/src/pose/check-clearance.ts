import { coilFilaments } from '../coils/coil-filaments';
import type { Coil } from '../coils/coil-schema';
import { formatLength as f } from '../coils/format-length';
import type { FilamentSet, Vec3 } from '../filaments';
import { clearancePieces, type ClearancePiece, type PieceSection } from './clearance-pieces';
import { pieceDistance } from './piece-distance';
import { poseRotation } from './pose-rotation';
import type { PoseInput } from './pose-schema';
import { transformFilaments } from './transform-filaments';

/** Filaments per coil object, so a sweep that checks every pose builds them once. */
const filamentCache = new WeakMap<Coil, FilamentSet>();

/**
 * Rejects a pose in which the Tx and Rx conductors would touch, or the Rx reaches into the Tx's
 * ferrite half-space (or the Tx into the Rx's, if the Rx carries a backing).
 *
 * Method: both coils become pieces of conductor centre line (rings and straight segments, from
 * coilFilaments; the Rx placed by transformFilaments). Pairs whose bounding boxes, grown by the
 * conductor size, are apart are skipped; for the rest the centre-line distance and closest points
 * come from pieceDistance (exact for segments, sampled and refined to ~1e-10 of the piece for
 * rings). The conductors touch when that distance is below the sum of the two sections' extents
 * toward each other: the radius for round wire and Litz, the support (w/2)|u·e_w| + (t/2)|u·e_t|
 * of a trace's rectangle in the direction u between the closest points. A backing plate fills
 * z < -distance of its coil's frame; any conductor of the other coil below it is rejected.
 * Cost: one bounding-box test per pair of pieces, distances only for near pairs.
 *
 * References: C. Ericson, Real-Time Collision Detection (2005), §4.2 (bounding boxes) and §5.1.9
 * (closest points of segments).
 *
 * @param tx the transmitter (its frame is the world frame)
 * @param rx the receiver, placed by `pose`
 * @param pose the Rx pose (metres, degrees; missing = 0)
 * @throws RangeError `pose: the coils intersect (…)` or `pose: the Rx reaches into …`
 * @example checkClearance(ring, ring, { z: 0.003 }) // passes; { z: 0 } throws
 */
export function checkClearance(tx: Coil, rx: Coil, pose: PoseInput): void {
  const txSet = filaments(tx);
  const rxSet = transformFilaments(filaments(rx), pose);
  const [r0, r1, r2] = poseRotation(pose);
  const rxAxis = { x: r0.z, y: r1.z, z: r2.z };
  const txPieces = clearancePieces(txSet, tx, { x: 0, y: 0, z: 1 }, 'Tx');
  const rxPieces = clearancePieces(rxSet, rx, rxAxis, 'Rx');
  if (tx.backing) {
    const lowest = lowestPoint(rxPieces);
    if (lowest.z < -tx.backing.distance) {
      throw new RangeError(
        `pose: the Rx reaches into the Tx's ferrite backing (${lowest.label} reaches z = ` +
          `${f(lowest.z)}, the ferrite surface is at z = ${f(-tx.backing.distance)}); allowed: ` +
          'poses that keep the Rx above the ferrite surface',
      );
    }
  }
  if (rx.backing) {
    const inRx = clearancePieces(txSet, tx, { x: 0, y: 0, z: 1 }, 'Tx').map((piece) =>
      toRxFrame(piece, pose),
    );
    const lowest = lowestPoint(inRx);
    if (lowest.z < -rx.backing.distance) {
      throw new RangeError(
        `pose: the Tx reaches into the Rx's ferrite backing (${lowest.label} reaches ` +
          `${f(-lowest.z - rx.backing.distance)} past it); allowed: poses that keep each coil ` +
          "outside the other's ferrite half-space",
      );
    }
  }
  const rxBoxes = rxPieces.map(box);
  for (const a of txPieces) {
    const boxA = box(a);
    for (let j = 0; j < rxPieces.length; j++) {
      const boxB = rxBoxes[j];
      if (
        boxA.lo.x > boxB.hi.x ||
        boxB.lo.x > boxA.hi.x ||
        boxA.lo.y > boxB.hi.y ||
        boxB.lo.y > boxA.hi.y ||
        boxA.lo.z > boxB.hi.z ||
        boxB.lo.z > boxA.hi.z
      ) {
        continue;
      }
      const b = rxPieces[j];
      const near = pieceDistance(a, b);
      const u = direction(near.pointA, near.pointB);
      const need = extent(a.section, near.tangentA, u) + extent(b.section, near.tangentB, u);
      if (near.distance < need) {
        throw new RangeError(
          `pose: the coils intersect (${a.label} and ${b.label} come within ` +
            `${f(near.distance)} centre to centre, their conductors need ${f(need)}); ` +
            'allowed: poses in which the conductors stay apart',
        );
      }
    }
  }
}

function filaments(coil: Coil): FilamentSet {
  let set = filamentCache.get(coil);
  if (!set) {
    set = coilFilaments(coil);
    filamentCache.set(coil, set);
  }
  return set;
}

/** Half-extent of a conductor section toward unit direction u (u ⟂ tangent at closest points). */
function extent(section: PieceSection, tangent: Vec3, u: Vec3 | null): number {
  if (section.round) return section.halfWidth;
  const largest = Math.max(section.halfWidth, section.halfThickness);
  if (!u) return largest;
  const t = cross(tangent, section.axis);
  const size = Math.hypot(t.x, t.y, t.z);
  // A tangent along the coil's axis leaves the section's orientation open: take its largest extent.
  if (size < 1e-9) return largest;
  const across = { x: t.x / size, y: t.y / size, z: t.z / size };
  const [wide, thin] =
    section.widthAlong === 'plane' ? [across, section.axis] : [section.axis, across];
  return (
    section.halfWidth * Math.abs(dot(u, wide)) + section.halfThickness * Math.abs(dot(u, thin))
  );
}

/** Lowest conductor point of a set of pieces and its label. */
function lowestPoint(pieces: ClearancePiece[]): { z: number; label: string } {
  let lowest = { z: Infinity, label: '' };
  for (const piece of pieces) {
    const z = box(piece).lo.z;
    if (z < lowest.z) lowest = { z, label: piece.label };
  }
  return lowest;
}

/** Axis-aligned bounding box of a piece, grown by its section's largest half-extent. */
function box(piece: ClearancePiece): { lo: Vec3; hi: Vec3 } {
  const grow = Math.max(piece.section.halfWidth, piece.section.halfThickness);
  if (piece.kind === 'segment') {
    const { p, q } = piece;
    return {
      lo: {
        x: Math.min(p.x, q.x) - grow,
        y: Math.min(p.y, q.y) - grow,
        z: Math.min(p.z, q.z) - grow,
      },
      hi: {
        x: Math.max(p.x, q.x) + grow,
        y: Math.max(p.y, q.y) + grow,
        z: Math.max(p.z, q.z) + grow,
      },
    };
  }
  const { center: c, normal: n, radius: r } = piece;
  // A circle's extent along axis e is r · sqrt(1 - (n · e)²).
  const ex = r * Math.sqrt(Math.max(0, 1 - n.x * n.x)) + grow;
  const ey = r * Math.sqrt(Math.max(0, 1 - n.y * n.y)) + grow;
  const ez = r * Math.sqrt(Math.max(0, 1 - n.z * n.z)) + grow;
  return {
    lo: { x: c.x - ex, y: c.y - ey, z: c.z - ez },
    hi: { x: c.x + ex, y: c.y + ey, z: c.z + ez },
  };
}

/** A Tx piece expressed in the Rx frame: p_rx = Rᵀ (p - t). */
function toRxFrame(piece: ClearancePiece, pose: PoseInput): ClearancePiece {
  const [r0, r1, r2] = poseRotation(pose);
  const t = { x: pose.x ?? 0, y: pose.y ?? 0, z: pose.z ?? 0 };
  const back = (v: Vec3): Vec3 => ({
    x: r0.x * v.x + r1.x * v.y + r2.x * v.z,
    y: r0.y * v.x + r1.y * v.y + r2.y * v.z,
    z: r0.z * v.x + r1.z * v.y + r2.z * v.z,
  });
  const place = (p: Vec3) => back({ x: p.x - t.x, y: p.y - t.y, z: p.z - t.z });
  const section = { ...piece.section, axis: back(piece.section.axis) };
  return piece.kind === 'ring'
    ? { ...piece, center: place(piece.center), normal: back(piece.normal), section }
    : { ...piece, p: place(piece.p), q: place(piece.q), section };
}

function direction(a: Vec3, b: Vec3): Vec3 | null {
  const d = { x: b.x - a.x, y: b.y - a.y, z: b.z - a.z };
  const size = Math.hypot(d.x, d.y, d.z);
  return size > 0 ? { x: d.x / size, y: d.y / size, z: d.z / size } : null;
}

const dot = (a: Vec3, b: Vec3): number => a.x * b.x + a.y * b.y + a.z * b.z;
const cross = (a: Vec3, b: Vec3): Vec3 => ({
  x: a.y * b.z - a.z * b.y,
  y: a.z * b.x - a.x * b.z,
  z: a.x * b.y - a.y * b.x,
});
