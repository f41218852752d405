import type { FilamentSet, Vec3 } from '../filaments';
import { poseRotation } from './pose-rotation';
import type { PoseInput } from './pose-schema';

/**
 * Places a coil's filaments in the Tx frame: rotates them about the coil's local origin by the
 * pose's rotation, then translates the origin to (x, y, z).
 *
 * Method: p' = R p + t for points and ring centres, n' = R n for ring normals, with
 * R = Rx(tiltX) · Ry(tiltY) · Rz(yaw) (poseRotation). Rotations keep each ring's sense of
 * circulation about its (rotated) normal and each path's order of points, so the current keeps
 * its direction; weights and wire radii are unchanged. The input is not modified.
 *
 * References: rigid-body transformation, e.g. H. Goldstein, Classical Mechanics, §4.
 *
 * @param set filaments in the coil's local frame, m
 * @param pose the pose (metres, degrees; missing = 0)
 * @returns a new filament set in the Tx frame, m
 * @example transformFilaments(coilFilaments(ring), { z: 0.003, tiltY: 90 }).rings[0].normal
 *   // { x: 1, y: 0, z: 0 }
 */
export function transformFilaments(set: FilamentSet, pose: PoseInput): FilamentSet {
  const [r0, r1, r2] = poseRotation(pose);
  const t = { x: pose.x ?? 0, y: pose.y ?? 0, z: pose.z ?? 0 };
  const turn = (v: Vec3): Vec3 => ({
    x: r0.x * v.x + r0.y * v.y + r0.z * v.z,
    y: r1.x * v.x + r1.y * v.y + r1.z * v.z,
    z: r2.x * v.x + r2.y * v.y + r2.z * v.z,
  });
  const place = (v: Vec3): Vec3 => {
    const w = turn(v);
    return { x: w.x + t.x, y: w.y + t.y, z: w.z + t.z };
  };
  return {
    rings: set.rings.map((ring) => ({
      center: place(ring.center),
      normal: turn(ring.normal),
      radius: ring.radius,
      wireRadius: ring.wireRadius,
      weight: ring.weight,
    })),
    paths: set.paths.map((path) => ({
      points: path.points.map(place),
      closed: path.closed,
      wireRadius: path.wireRadius,
      weight: path.weight,
    })),
  };
}
