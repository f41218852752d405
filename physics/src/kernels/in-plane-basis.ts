import type { Vec3 } from '../filaments';

/**
 * Two unit vectors u, v such that (u, v, n) is a right-handed orthonormal frame, for parametrising
 * a ring of normal n as centre + r (cos t u + sin t v) with current along +t (right-handed about
 * n).
 *
 * Method: u = normalise(e x n) with e the coordinate axis least aligned with n; v = n x u.
 *
 * @param n - unit normal.
 * @returns [u, v].
 *
 * @example inPlaneBasis({ x: 0, y: 0, z: 1 }); // [{ x: 0, y: 1, z: 0 }, { x: -1, y: 0, z: 0 }]
 */
export function inPlaneBasis(n: Vec3): [Vec3, Vec3] {
  const ax = Math.abs(n.x);
  const ay = Math.abs(n.y);
  const az = Math.abs(n.z);
  // e is the axis least aligned with n, so e x n is far from zero.
  const e =
    ax <= ay && ax <= az
      ? { x: 1, y: 0, z: 0 }
      : ay <= az
        ? { x: 0, y: 1, z: 0 }
        : { x: 0, y: 0, z: 1 };
  let ux = e.y * n.z - e.z * n.y;
  let uy = e.z * n.x - e.x * n.z;
  let uz = e.x * n.y - e.y * n.x;
  const s = Math.hypot(ux, uy, uz);
  ux /= s;
  uy /= s;
  uz /= s;
  const v = { x: n.y * uz - n.z * uy, y: n.z * ux - n.x * uz, z: n.x * uy - n.y * ux };
  return [{ x: ux, y: uy, z: uz }, v];
}
