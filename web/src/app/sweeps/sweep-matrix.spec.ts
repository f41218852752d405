import { sweepAxes } from '../../../../physics/src/sweep/sweep-axes';
import { sweepPoseAt } from '../../../../physics/src/sweep/sweep-pose-at';
import type { SweepAxes } from '../api-types';
import { curveAxisOf, sweepCurve } from './sweep-curve';
import { sweepMatrix } from './sweep-matrix';

// The slices are checked against the engine's own indexing (physics' sweepPoseAt, the contract
// of the stored result order): each value encodes the pose it belongs to, so a value in the wrong
// cell names the pose it came from.
function encode(p: { x: number; y: number; z: number; tiltX: number; tiltY: number }): number {
  return p.x * 1e4 + p.y * 1e3 + p.z * 1e2 + p.tiltX * 10 + p.tiltY;
}

function valuesOf(axes: SweepAxes): number[] {
  const count = [axes.x, axes.y, axes.z, axes.tiltX, axes.tiltY].reduce((n, a) => n * a.length, 1);
  return Array.from({ length: count }, (_, i) => encode(sweepPoseAt(axes, i)));
}

describe('sweepMatrix', () => {
  const axes: SweepAxes = { x: [0, 1, 2], y: [3, 4], z: [5, 6, 7], tiltX: [0, 1], tiltY: [0, 2] };
  const values = valuesOf(axes);

  it('puts every pose of a slice at [iy][ix], for every gap and tilt', () => {
    for (let iz = 0; iz < 3; iz++) {
      for (let itx = 0; itx < 2; itx++) {
        for (let ity = 0; ity < 2; ity++) {
          const m = sweepMatrix(axes, values, { z: iz, tiltX: itx, tiltY: ity });
          expect(m.xs).toEqual(axes.x);
          expect(m.ys).toEqual(axes.y);
          expect(m.values).toHaveLength(2);
          m.values.forEach((row, iy) =>
            row.forEach((v, ix) =>
              expect(v).toBe(
                encode({
                  x: axes.x[ix],
                  y: axes.y[iy],
                  z: axes.z[iz],
                  tiltX: axes.tiltX[itx],
                  tiltY: axes.tiltY[ity],
                }),
              ),
            ),
          );
        }
      }
    }
  });

  it('slices a map spec as the engine grids it (x fastest)', () => {
    const map = sweepAxes({
      x: { from: -0.01, to: 0.01, steps: 3 },
      y: { from: 0, to: 0.01, steps: 2 },
      z: { from: 0.003, to: 0.005, steps: 2 },
    });
    const m = sweepMatrix(map, valuesOf(map), { z: 1 });
    expect(m.values[1][0]).toBe(encode({ x: -0.01, y: 0.01, z: 0.005, tiltX: 0, tiltY: 0 }));
    expect(m.values[0][2]).toBe(encode({ x: 0.01, y: 0, z: 0.005, tiltX: 0, tiltY: 0 }));
  });

  it('refuses values of the wrong length and indices outside the axes', () => {
    expect(() => sweepMatrix(axes, values.slice(1))).toThrow(
      /values: must have one entry per pose, 72/,
    );
    expect(() => sweepMatrix(axes, values, { z: 3 })).toThrow(
      /z: index must be .* 0 to 2 \(got 3\)/,
    );
    expect(() => sweepMatrix(axes, values, { tiltY: -1 })).toThrow(RangeError);
    expect(() => sweepMatrix(axes, values, { tiltX: 0.5 })).toThrow(RangeError);
  });
});

describe('sweepCurve', () => {
  it('follows the gap of a gap sweep and a tilt of a tilt sweep', () => {
    const gap: SweepAxes = { x: [0], y: [0], z: [1, 2, 3, 4], tiltX: [0], tiltY: [0] };
    expect(curveAxisOf(gap)).toBe('z');
    const curve = sweepCurve(gap, valuesOf(gap), 'z');
    expect(curve.at).toEqual([1, 2, 3, 4]);
    expect(curve.values).toEqual(
      [1, 2, 3, 4].map((z) => encode({ x: 0, y: 0, z, tiltX: 0, tiltY: 0 })),
    );

    const tilt: SweepAxes = { x: [0.5], y: [0], z: [2], tiltX: [0], tiltY: [-2, 0, 2] };
    expect(curveAxisOf(tilt)).toBe('tiltY');
    expect(sweepCurve(tilt, valuesOf(tilt), 'tiltY').values).toEqual(
      [-2, 0, 2].map((tiltY) => encode({ x: 0.5, y: 0, z: 2, tiltX: 0, tiltY })),
    );
  });

  it('uses the stride of the axis when other axes hold several values', () => {
    const axes: SweepAxes = { x: [0, 1], y: [0, 1, 2], z: [7], tiltX: [1, 2, 3], tiltY: [0] };
    expect(curveAxisOf(axes)).toBe('tiltX');
    expect(sweepCurve(axes, valuesOf(axes), 'tiltX').values).toEqual(
      [1, 2, 3].map((tiltX) => encode({ x: 0, y: 0, z: 7, tiltX, tiltY: 0 })),
    );
  });

  it('refuses values of the wrong length', () => {
    const axes: SweepAxes = { x: [0], y: [0], z: [1, 2], tiltX: [0], tiltY: [0] };
    expect(() => sweepCurve(axes, [1], 'z')).toThrow(/one entry per pose, 2 \(got 1\)/);
  });
});
