// Placing filaments by a pose. References: rigid-body motion (distances, radii and weights are
// invariant; p' = R p + t) and the pose convention of physics/README.md.
import { describe, expect, it } from 'vitest';
import { coilFilaments } from '../coils/coil-filaments';
import { parseCoil } from '../coils/parse-coil';
import { expectNear } from '../testing/expect-near';
import { transformFilaments } from './transform-filaments';

const spiral = parseCoil({
  kind: 'circular-spiral',
  turns: 3,
  innerRadius: 0.005,
  pitch: 0.001,
  model: 'spiral',
  conductor: { type: 'round', diameter: 8e-4 },
});

describe('transformFilaments', () => {
  it('rotates about the local origin, then translates', () => {
    const ring = coilFilaments(
      parseCoil({ kind: 'rings', wireRadius: 4e-4, rings: [{ r: 0.01, z: 0.002 }] }),
    );
    const placed = transformFilaments(ring, { x: 0.001, y: -0.002, z: 0.003, tiltY: 90 });
    // The ring centre (0, 0, 2 mm) turns to (2 mm, 0, 0), then moves by the offset.
    expect(placed.rings[0].center).toEqual({ x: 0.003, y: -0.002, z: 0.003 });
    expect(placed.rings[0].normal).toEqual({ x: 1, y: 0, z: 0 });
    expect(placed.rings[0].radius).toBe(0.01);
  });
  it('keeps distances between path points (a rigid motion) and does not modify its input', () => {
    const set = coilFilaments(spiral);
    const before = JSON.stringify(set);
    const placed = transformFilaments(set, {
      x: 0.01,
      y: 0.02,
      z: 0.005,
      tiltX: 17,
      tiltY: -41,
      yaw: 123,
    });
    expect(JSON.stringify(set)).toBe(before);
    const a = set.paths[0].points;
    const b = placed.paths[0].points;
    for (let i = 0; i + 37 < a.length; i += 37) {
      const d0 = Math.hypot(a[i].x - a[i + 37].x, a[i].y - a[i + 37].y, a[i].z - a[i + 37].z);
      const d1 = Math.hypot(b[i].x - b[i + 37].x, b[i].y - b[i + 37].y, b[i].z - b[i + 37].z);
      // Rounding of a rotation and a translation of centimetre coordinates.
      expectNear(d1, d0, 1e-12, `distance points ${i}–${i + 37}`);
    }
    expect(placed.paths[0].weight).toBe(1);
    expect(placed.paths[0].closed).toBe(false);
  });
  it('an empty pose changes nothing', () => {
    const set = coilFilaments(spiral);
    expect(transformFilaments(set, {})).toEqual(set);
  });
});
