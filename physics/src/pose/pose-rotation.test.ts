// Pose rotation R = Rx(tiltX)·Ry(tiltY)·Rz(yaw). References: the right-hand-rule elementary
// rotation matrices (e.g. H. Goldstein, Classical Mechanics, §4) and the pose convention of
// physics/README.md ("a positive tiltY leans its axis toward +x"); three.js (three@0.187, a
// general-purpose library from the registry) as an outside implementation of the same composition.
import fc from 'fast-check';
import { Euler, Matrix4, Vector3 } from 'three';
import { describe, expect, it } from 'vitest';
import type { Vec3 } from '../filaments';
import { expectNear } from '../testing/expect-near';
import { parsePose } from './parse-pose';
import { poseRotation, type Mat3 } from './pose-rotation';

const apply = (m: Mat3, v: Vec3): Vec3 => ({
  x: m[0].x * v.x + m[0].y * v.y + m[0].z * v.z,
  y: m[1].x * v.x + m[1].y * v.y + m[1].z * v.z,
  z: m[2].x * v.x + m[2].y * v.y + m[2].z * v.z,
});
const z = { x: 0, y: 0, z: 1 };
// Double-precision rounding of a handful of products of sines and cosines.
const EPS = 1e-15;

describe('poseRotation', () => {
  it('a positive tiltY leans +z toward +x; a positive tiltX toward -y', () => {
    const leaned = apply(poseRotation({ tiltY: 30 }), z);
    expectNear(leaned.x, 0.5, EPS, 'tiltY 30°: x', true);
    expectNear(leaned.z, Math.sqrt(3) / 2, EPS, 'tiltY 30°: z', true);
    const tilted = apply(poseRotation({ tiltX: 30 }), z);
    expectNear(tilted.y, -0.5, EPS, 'tiltX 30°: y', true);
  });
  it('yaw turns +x toward +y (right-handed about +z) and leaves +z alone', () => {
    const turned = apply(poseRotation({ yaw: 90 }), { x: 1, y: 0, z: 0 });
    expect(turned).toEqual({ x: 0, y: 1, z: 0 });
    expect(apply(poseRotation({ yaw: 37 }), z)).toEqual(z);
  });
  it('is exact at multiples of 90°', () => {
    expect(apply(poseRotation({ tiltY: 90 }), z)).toEqual({ x: 1, y: 0, z: 0 });
    expect(apply(poseRotation({ tiltX: 180 }), z)).toEqual({ x: 0, y: 0, z: -1 });
  });
  it('composes as Rx·Ry·Rz: yaw acts first, then tiltY, then tiltX', () => {
    const pose = { tiltX: 20, tiltY: -35, yaw: 70 };
    const v = { x: 0.3, y: -0.7, z: 0.2 };
    const stepwise = apply(
      poseRotation({ tiltX: 20 }),
      apply(poseRotation({ tiltY: -35 }), apply(poseRotation({ yaw: 70 }), v)),
    );
    const whole = apply(poseRotation(pose), v);
    for (const k of ['x', 'y', 'z'] as const)
      expectNear(whole[k], stepwise[k], 1e-15, `component ${k}`, true);
  });
  it("agrees with three.js Euler order 'XYZ' (which is Rx·Ry·Rz)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -180, max: 180, noNaN: true }),
        fc.double({ min: -180, max: 180, noNaN: true }),
        fc.double({ min: -180, max: 180, noNaN: true }),
        (tiltX, tiltY, yaw) => {
          const d = Math.PI / 180;
          const ref = new Matrix4().makeRotationFromEuler(
            new Euler(tiltX * d, tiltY * d, yaw * d, 'XYZ'),
          );
          const v = new Vector3(0.3, -0.7, 0.2).applyMatrix4(ref);
          const ours = apply(poseRotation({ tiltX, tiltY, yaw }), { x: 0.3, y: -0.7, z: 0.2 });
          // Both in double precision from the same sines and cosines; a few ulps apart.
          expectNear(ours.x, v.x, 1e-14, `tiltX ${tiltX} tiltY ${tiltY} yaw ${yaw}: x`, true);
          expectNear(ours.y, v.y, 1e-14, `tiltX ${tiltX} tiltY ${tiltY} yaw ${yaw}: y`, true);
          expectNear(ours.z, v.z, 1e-14, `tiltX ${tiltX} tiltY ${tiltY} yaw ${yaw}: z`, true);
        },
      ),
      { seed: 42, numRuns: 200 },
    );
  });
  it('is orthonormal with determinant +1 (fast-check, seed 42)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -360, max: 360, noNaN: true }),
        fc.double({ min: -360, max: 360, noNaN: true }),
        fc.double({ min: -360, max: 360, noNaN: true }),
        (tiltX, tiltY, yaw) => {
          const m = poseRotation({ tiltX, tiltY, yaw });
          const dot = (a: Vec3, b: Vec3) => a.x * b.x + a.y * b.y + a.z * b.z;
          for (let i = 0; i < 3; i++) {
            for (let j = 0; j < 3; j++) {
              expectNear(dot(m[i], m[j]), i === j ? 1 : 0, 1e-14, `rows ${i}·${j}`, true);
            }
          }
          const [a, b, c] = m;
          const det =
            a.x * (b.y * c.z - b.z * c.y) -
            a.y * (b.x * c.z - b.z * c.x) +
            a.z * (b.x * c.y - b.y * c.x);
          expectNear(det, 1, 1e-14, 'determinant', true);
        },
      ),
      { seed: 42, numRuns: 200 },
    );
  });
});

describe('parsePose', () => {
  it('fills missing fields with 0', () => {
    expect(parsePose({ z: 0.003 })).toEqual({ x: 0, y: 0, z: 0.003, tiltX: 0, tiltY: 0, yaw: 0 });
    expect(parsePose(undefined)).toEqual({ x: 0, y: 0, z: 0, tiltX: 0, tiltY: 0, yaw: 0 });
  });
  it('rejects non-finite, absurd and unknown fields by name', () => {
    expect(() => parsePose({ z: Number.NaN })).toThrow(
      /^pose\.z: expected a finite number.*allowed/,
    );
    expect(() => parsePose({ tiltY: 400 })).toThrow(
      /^pose\.tiltY: 400° is out of range; allowed: ≥ -360° and ≤ 360°/,
    );
    expect(() => parsePose({ x: 1e3 })).toThrow(/^pose\.x: .*allowed/);
    expect(() => parsePose({ gap: 0.003 })).toThrow(
      /^pose\.gap: unknown field; allowed fields: x, y, z/,
    );
    expect(() => parsePose({ z: 1e3 }, 'pairs[1].pose')).toThrow(RangeError);
  });
});
