import type { Vec3 } from '../filaments';
import type { PoseInput } from './pose-schema';

/** A 3 × 3 rotation matrix as its three rows; v' = (row0 · v, row1 · v, row2 · v). */
export type Mat3 = readonly [Vec3, Vec3, Vec3];

/**
 * The rotation of a pose: R = Rx(tiltX) · Ry(tiltY) · Rz(yaw), acting on column vectors.
 *
 * Method: right-handed elementary rotations, angles in degrees:
 * Rx(a) = [1 0 0; 0 c -s; 0 s c], Ry(b) = [c 0 s; 0 1 0; -s 0 c], Rz(g) = [c -s 0; s c 0; 0 0 1].
 * Applied to a vector, yaw acts first (about the coil's own axis), then tiltY, then tiltX, all
 * about the fixed axes of the Tx frame. Ry(b) takes +z to (sin b, 0, cos b): a positive tiltY
 * leans the axis toward +x; a positive tiltX leans it toward -y.
 *
 * References: right-hand rule rotation matrices, e.g. H. Goldstein, Classical Mechanics, §4.
 *
 * @param pose tiltX, tiltY and yaw in degrees (missing = 0)
 * @returns the rotation matrix (orthonormal, determinant +1)
 * @example poseRotation({ tiltY: 90 })[0].z // 1 (the local +z axis goes to +x)
 */
export function poseRotation(pose: PoseInput): Mat3 {
  const rad = Math.PI / 180;
  const [ca, sa] = cosSin((pose.tiltX ?? 0) * rad);
  const [cb, sb] = cosSin((pose.tiltY ?? 0) * rad);
  const [cg, sg] = cosSin((pose.yaw ?? 0) * rad);
  // Rx · Ry first, then times Rz.
  const m = [
    [cb, 0, sb],
    [sa * sb, ca, -sa * cb],
    [-ca * sb, sa, ca * cb],
  ];
  const row = (r: number[]): Vec3 => ({
    x: r[0] * cg + r[1] * sg,
    y: -r[0] * sg + r[1] * cg,
    z: r[2],
  });
  return [row(m[0]), row(m[1]), row(m[2])];
}

/** cos and sin with exact zeros at multiples of 90° (so aligned poses stay exactly aligned). */
function cosSin(angle: number): [number, number] {
  const quarter = angle / (Math.PI / 2);
  if (Math.abs(quarter - Math.round(quarter)) < 1e-15) {
    const q = ((Math.round(quarter) % 4) + 4) % 4;
    return [[1, 0, -1, 0][q], [0, 1, 0, -1][q]];
  }
  return [Math.cos(angle), Math.sin(angle)];
}
