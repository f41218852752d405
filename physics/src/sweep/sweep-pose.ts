/**
 * A pose as the sweep produces it: the coil models' `Pose` — the Rx origin at (x, y, z) in the
 * Tx frame (m) and its rotation Rx(tiltX)·Ry(tiltY)·Rz(yaw) (degrees), every field present.
 */
export type { Pose as SweepPose } from '../pose/pose-schema';
