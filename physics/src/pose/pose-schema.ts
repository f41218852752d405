/**
 * The pose of the Rx relative to the Tx, as JSON: `{ x, y, z, tiltX, tiltY, yaw }`, metres and
 * degrees, every field optional with default 0. The Rx is rotated about its own local origin by
 * R = Rx(tiltX) · Ry(tiltY) · Rz(yaw) (right-hand rule: a positive tiltY leans its +z axis toward
 * +x), then its origin is placed at (x, y, z) in the Tx frame, whose axis is +z.
 */
import { z } from 'zod';
import { numberField } from '../coils/number-field';

/** Offsets beyond this are far outside any charger and only test decay; keeps numbers sane. */
const REACH = { min: -100, max: 100 };
/** One full turn either way covers every orientation and any sweep written across ±180°. */
const ANGLE = { min: -360, max: 360 };

const metres = numberField({ ...REACH, unit: 'm' }).default(0);
const degrees = numberField({ ...ANGLE, unit: 'deg' }).default(0);

export const poseSchema = z.strictObject(
  { x: metres, y: metres, z: metres, tiltX: degrees, tiltY: degrees, yaw: degrees },
  {
    error: (issue) =>
      issue.code === 'unrecognized_keys'
        ? 'unknown field; allowed fields: x, y, z, tiltX, tiltY, yaw'
        : undefined,
  },
);

/** A complete pose (every field present), metres and degrees. */
export type Pose = z.output<typeof poseSchema>;
/** A pose as written: missing fields mean 0. */
export type PoseInput = z.input<typeof poseSchema>;
