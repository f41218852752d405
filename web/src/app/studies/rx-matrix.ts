import { Matrix4 } from 'three';
// Imported from its file, not the physics index: the index would pull the coil schemas (zod) into
// the view's chunk. The rotation is the engine's own, so the drawn Rx sits where the engine puts it.
import { poseRotation } from '../../../../physics/src/pose/pose-rotation';
import type { StudyPose } from '../api-types';

/**
 * The Rx's placement in the Tx frame as a three.js matrix: p' = R p + t with the engine's
 * R = Rx(tiltX)·Ry(tiltY) (poseRotation) and t = (x, y, z), scaled to scene units.
 *
 * @param pose the pose, m and degrees
 * @param scale scene units per metre
 * @returns the matrix
 */
export function rxMatrix(pose: StudyPose, scale: number): Matrix4 {
  const [r0, r1, r2] = poseRotation(pose);
  // Matrix4.set takes rows: the rotation rows with the translation in the last column.
  // prettier-ignore
  return new Matrix4().set(
    r0.x, r0.y, r0.z, pose.x * scale,
    r1.x, r1.y, r1.z, pose.y * scale,
    r2.x, r2.y, r2.z, pose.z * scale,
    0, 0, 0, 1,
  );
}
