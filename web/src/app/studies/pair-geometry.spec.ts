import { Vector3 } from 'three';
import { coilFilaments } from '../../../../physics/src/coils/coil-filaments';
import { transformFilaments } from '../../../../physics/src/pose/transform-filaments';
import { coilBounds } from './coil-bounds';
import { pairDrawing } from './pair-geometry';
import { polylineTube } from './polyline-tube';
import { poseRanges } from './pose-ranges';
import { rxMatrix } from './rx-matrix';

const ring = (radius: number, wireRadius = 5e-4) => ({
  rings: [
    { center: { x: 0, y: 0, z: 0 }, normal: { x: 0, y: 0, z: 1 }, radius, wireRadius, weight: 1 },
  ],
  paths: [],
});

describe('the pair drawing', () => {
  it('bounds a flat ring by its radius plus the wire, and a ring on edge by its projection', () => {
    const b = coilBounds(ring(0.02));
    expect(b.max.x).toBeCloseTo(0.0205, 12);
    expect(b.min.y).toBeCloseTo(-0.0205, 12);
    expect(b.max.z).toBeCloseTo(0.0005, 12);
    // Normal along x: the ring spans y and z, and only the wire along x.
    const edge = coilBounds({
      rings: [{ ...ring(0.02).rings[0], normal: { x: 1, y: 0, z: 0 } }],
      paths: [],
    });
    expect(edge.max.x).toBeCloseTo(0.0005, 12);
    expect(edge.max.z).toBeCloseTo(0.0205, 12);
  });

  it('gives thin conductors a visible tube and puts the ferrite under the Tx', () => {
    const d = pairDrawing(ring(0.025, 1e-6), ring(0.018), {
      tx: { mur: 2000, distance: 0.001 },
    });
    const tube = d.tx.tubes[0];
    expect(tube.kind).toBe('circle');
    // The span is the Tx width, 2 × (25 mm + 1 µm); the floor is 0.4 % of it.
    expect(tube.tubeRadius).toBeCloseTo(0.004 * 0.050002, 12);
    expect(d.rx.tubes[0].tubeRadius).toBe(5e-4);
    const slab = d.tx.slab!;
    // Top face on the plate surface at z = −1 mm; wider than the winding.
    expect(slab.center.z + slab.size.z / 2).toBeCloseTo(-0.001, 12);
    expect(slab.size.x).toBeGreaterThan(0.05);
    expect(d.rx.slab).toBeNull();
  });

  it('sizes the pose sliders to the pair: ±D offsets, a 1.5·D gap, ±90° tilts', () => {
    const r = poseRanges(coilBounds(ring(0.025)), coilBounds(ring(0.018)));
    // D = 51 mm; ends rounded up to whole 0.2 mm steps: 51 mm is one, 76.5 mm is not.
    expect(r.x.max).toBeCloseTo(0.051, 12);
    expect(r.x.min).toBeCloseTo(-0.051, 12);
    expect(r.z.min).toBe(0);
    expect(r.z.max).toBeCloseTo(0.0766, 12);
    expect(Math.abs(r.x.max / r.x.step - Math.round(r.x.max / r.x.step))).toBeLessThan(1e-9);
    expect(r.tiltY).toEqual({ min: -90, max: 90, step: 0.5 });
    // Steps are 1, 2 or 5 × 10^n: 0.2 mm over ±51 mm.
    expect(r.x.step).toBeCloseTo(2e-4, 15);
    // A vehicle pad stops at the contract's 1 m.
    const big = poseRanges(coilBounds(ring(0.4)), coilBounds(ring(0.3)));
    expect(big.z.max).toBe(1);
  });
});

describe('the drawn Rx placement', () => {
  it('puts every filament point where the engine’s transformFilaments does', () => {
    const spiral = coilFilaments({
      kind: 'rectangular-spiral',
      outerWidth: 0.04,
      outerHeight: 0.03,
      cornerRadius: 0.004,
      pitch: 0.002,
      turns: 3,
      conductor: { type: 'round', diameter: 8e-4 },
    });
    const pose = { x: 0.012, y: -0.007, z: 0.005, tiltX: 17, tiltY: -32 };
    const placed = transformFilaments(spiral, pose);
    const m = rxMatrix(pose, 1000);
    spiral.paths.forEach((path, i) =>
      path.points.forEach((p, j) => {
        const v = new Vector3(p.x, p.y, p.z).multiplyScalar(1000).applyMatrix4(m);
        const want = placed.paths[i].points[j];
        // Same rotation matrix, float32-free arithmetic: agreement to rounding (1e-9 mm).
        expect(v.x).toBeCloseTo(want.x * 1000, 9);
        expect(v.y).toBeCloseTo(want.y * 1000, 9);
        expect(v.z).toBeCloseTo(want.z * 1000, 9);
      }),
    );
  });

  it('draws a polyline tube through every vertex, at the given radius', () => {
    const square = [
      new Vector3(0, 0, 0),
      new Vector3(10, 0, 0),
      new Vector3(10, 10, 0),
      new Vector3(0, 10, 0),
    ];
    const g = polylineTube(square, true, 0.5, 8);
    const pos = g.getAttribute('position');
    // Closed: one section per vertex plus the seam, 8 vertices each.
    expect(pos.count).toBe(5 * 8);
    // Each section's vertices sit 0.5 from their vertex… (sections at corners are tilted).
    for (let j = 0; j < 8; j++) {
      const v = new Vector3().fromBufferAttribute(pos, 8 + j);
      expect(v.distanceTo(square[1])).toBeCloseTo(0.5, 6);
    }
    expect(g.getIndex()!.count).toBe(4 * 8 * 6);
  });
});
