import { describe, expect, it } from 'vitest';
import { expectNear } from '../testing/expect-near';
import type { CouplingField } from './coupling-field';
import { toleranceEnvelope } from './tolerance-envelope';

/** Samples f on the grid xs × ys, x fastest (the map convention). */
function sample(xs: number[], ys: number[], f: (x: number, y: number) => number): CouplingField {
  const values = new Float64Array(xs.length * ys.length);
  ys.forEach((y, j) => xs.forEach((x, i) => (values[j * xs.length + i] = f(x, y))));
  return { xs, ys, values };
}

const linspace = (a: number, b: number, n: number) =>
  Array.from({ length: n }, (_, i) => a + ((b - a) * i) / (n - 1));

describe('toleranceEnvelope', () => {
  it('finds the diamond of a peak on a 3 × 3 grid (exact: linear per cell)', () => {
    const e = toleranceEnvelope(
      { xs: [-1, 0, 1], ys: [-1, 0, 1], values: [0, 0, 0, 0, 1, 0, 0, 0, 0] },
      0.5,
    );
    // Vertices at (±0.5, 0), (0, ±0.5) by linear interpolation: area 2·0.5², exact to rounding.
    expectNear(e.area, 0.5, 1e-14, 'diamond area');
    expectNear(e.chargeRadius, 0.5 / Math.SQRT2, 1e-14, 'diamond inradius');
    expect(e.worst).toEqual({ x: 0, y: 0, value: 1 });
    expect(e.nominal).toEqual({ x: 0, y: 0, value: 1, meets: true });
    expect(e.chargeRadiusLimitedByMap).toBe(false);
  });

  it('maps d3-contour cell centres to metres: a circle about an off-grid centre', () => {
    // f = −|p − c|²/r², threshold −1: the exact boundary is the circle |p − c| = r.
    const r = 0.012;
    const [cx, cy] = [0.003, -0.002];
    const h = 0.0005;
    const grid = linspace(-0.025, 0.025, 101);
    const map = sample(grid, grid, (x, y) => -((x - cx) ** 2 + (y - cy) ** 2) / (r * r));
    const e = toleranceEnvelope(map, -1, { x: cx, y: cy });
    // Linear interpolation of a quadratic along an edge misplaces the crossing by at most
    // h²·|f″|/(8|f′|) = h²/(8r); a half-cell slip of the convention would be h/2 = 250 µm.
    const tol = (h * h) / (8 * r);
    expect(e.polygons.length).toBe(1);
    for (const [x, y] of e.polygons[0][0]) {
      expectNear(Math.hypot(x - cx, y - cy), r, tol, `vertex (${x}, ${y})`, true);
    }
    // The polygon is inscribed with chords of ≤ h√2: sagitta ≤ h²/(4r) inward, plus the above.
    expectNear(e.chargeRadius, r, (h * h) / (4 * r) + tol, 'charge radius', true);
    expectNear(e.area, Math.PI * r * r, 2 * Math.PI * r * ((h * h) / (4 * r) + tol), 'area', true);
    expect(e.nominal.meets).toBe(true);
  });

  it('honours uneven spacing (same circle on a stretched grid)', () => {
    const r = 0.01;
    const xs = linspace(-1, 1, 121).map((t) => 0.02 * Math.sign(t) * Math.abs(t) ** 1.3);
    const ys = linspace(-0.02, 0.02, 81);
    const map = sample(xs, ys, (x, y) => 1 - (x * x + y * y) / (r * r));
    const e = toleranceEnvelope(map, 0);
    // Crossing error h²/(8r) with the largest step of either axis; 10 % more because |f′| varies
    // along an edge that the circle crosses obliquely.
    const steps = [...xs.slice(1).map((x, i) => x - xs[i]), ys[1] - ys[0]];
    const tol = (1.1 * Math.max(...steps) ** 2) / (8 * r);
    for (const [x, y] of e.polygons[0][0])
      expectNear(Math.hypot(x, y), r, tol, `(${x}, ${y})`, true);
    expectNear(e.area, Math.PI * r * r, 5e-3, 'area');
  });

  it('gives the offset ellipse its area πab and the exact distance from the nominal point', () => {
    const [a, b, x0] = [0.03, 0.02, 0.004];
    const grid = linspace(-0.04, 0.04, 161);
    const map = sample(grid, grid, (x, y) => 2 - ((x - x0) / a) ** 2 - (y / b) ** 2);
    const e = toleranceEnvelope(map, 1);
    // Nearest boundary point from (−x0, 0) relative to the centre: for a·x0/(a² − b²) ≤ 1 the
    // distance is b·sqrt(1 − x0²/(a² − b²)) (normal from an axis point; analytic geometry).
    const d = b * Math.sqrt(1 - (x0 * x0) / (a * a - b * b));
    const h = 0.0005;
    // Crossing error h²/(8b) with the smaller semi-axis, and the chord sagitta h²/(4b).
    expectNear(e.chargeRadius, d, (3 * h * h) / (8 * b), 'ellipse distance', true);
    expectNear(e.area, Math.PI * a * b, 2e-3, 'ellipse area');
    expect(e.nominal.meets).toBe(true);
    // The worst sample inside is at most one cell step of |∇f| ≈ 2/b · h above the threshold.
    expect(e.worst!.value).toBeGreaterThanOrEqual(1);
    expect(e.worst!.value).toBeLessThan(1 + (2 * h) / b);
  });

  it('subtracts holes: an annulus, with the nominal point in the hole', () => {
    const [r0, w] = [0.015, 0.004];
    const grid = linspace(-0.03, 0.03, 241);
    const map = sample(grid, grid, (x, y) => -((Math.hypot(x, y) - r0) ** 2) / (w * w));
    const e = toleranceEnvelope(map, -1);
    expect(e.polygons.length).toBe(1);
    expect(e.polygons[0].length).toBe(2);
    // Annulus area π((r0 + w)² − (r0 − w)²) = 4π r0 w; 1 % covers the inner ring's coarser chords.
    expectNear(e.area, 4 * Math.PI * r0 * w, 0.01, 'annulus area');
    expect(e.chargeRadius).toBe(0);
    expect(e.nominal.meets).toBe(false);
  });

  it('reports no region when nothing meets the threshold', () => {
    const grid = linspace(-1, 1, 11);
    const e = toleranceEnvelope(
      sample(grid, grid, (x, y) => x + y),
      5,
    );
    expect(e).toMatchObject({ polygons: [], area: 0, chargeRadius: 0, worst: null });
    expect(e.nominal).toEqual({ x: 0, y: 0, value: 0, meets: false });
  });

  it('covers the whole map, and the charge zone is then limited by the map edge', () => {
    const xs = linspace(-0.02, 0.03, 11);
    const ys = linspace(-0.01, 0.01, 5);
    const e = toleranceEnvelope(
      sample(xs, ys, (x, y) => 1 + x - y),
      0,
    );
    // The region is exactly the sampled rectangle 0.05 × 0.02.
    expectNear(e.area, 0.05 * 0.02, 1e-12, 'whole-map area');
    expectNear(e.chargeRadius, 0.01, 1e-15, 'distance to the y edges', true);
    expect(e.chargeRadiusLimitedByMap).toBe(true);
    expect(e.worst).toEqual({ x: -0.02, y: 0.01, value: 1 - 0.02 - 0.01 });
  });

  it('rejects malformed maps naming the field', () => {
    const ok = { xs: [0, 1], ys: [0, 1], values: [1, 1, 1, 1] };
    expect(() => toleranceEnvelope({ ...ok, xs: [1, 0] }, 0)).toThrow(
      /xs\[1\]: must be strictly ascending/,
    );
    expect(() => toleranceEnvelope({ ...ok, values: [1, 1, 1] }, 0)).toThrow(/values: must have/);
    expect(() => toleranceEnvelope({ ...ok, values: [1, NaN, 1, 1] }, 0)).toThrow(/values\[1\]/);
    expect(() => toleranceEnvelope({ ...ok, ys: [0], values: [1, 1] }, 0)).toThrow(
      /ys: needs at least 2/,
    );
    expect(() => toleranceEnvelope(ok, NaN)).toThrow(/threshold/);
    expect(toleranceEnvelope(ok, 0, { x: 5, y: 5 }).nominal).toEqual({
      x: 5,
      y: 5,
      value: null,
      meets: false,
    });
  });
});
