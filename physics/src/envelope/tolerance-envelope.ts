import { contours } from 'd3-contour';
import type { CouplingField } from './coupling-field';

type Point = [number, number];

/** The region of a map where the quantity meets a threshold, and what follows for mechanics. */
export interface ToleranceEnvelope {
  threshold: number;
  /** GeoJSON MultiPolygon coordinates, m: polygons → rings (outer first, then holes). */
  polygons: Point[][][];
  /** Area of the region, m² (holes subtracted). */
  area: number;
  /** Radius of the largest circle centred at the nominal point wholly inside the region, m. */
  chargeRadius: number;
  /** True when that circle is stopped by the edge of the map, not by the threshold: sweep wider. */
  chargeRadiusLimitedByMap: boolean;
  /** The lowest sample that still meets the threshold, or null if none does. */
  worst: { x: number; y: number; value: number } | null;
  /** The nominal point, its bilinear value (null outside the map) and whether it meets. */
  nominal: { x: number; y: number; value: number | null; meets: boolean };
}

/**
 * Misalignment tolerance envelope: where on an x–y map k (or efficiency) ≥ threshold.
 *
 * Method: marching squares with linear interpolation along cell edges (d3-contour), on the grid
 * of samples. d3-contour places sample (i, j) at the centre of cell i…i+1, i.e. at grid
 * coordinate (i + 0.5, j + 0.5), and closes regions that touch the border half a cell outside the
 * outer samples; its coordinates g are mapped to metres by g − 0.5 → fractional sample index,
 * clamped to the sampled range (the map says nothing beyond its outer samples), then linearly
 * between neighbouring xs (so uneven spacing is honoured). Area by the shoelace formula, holes
 * subtracted. Charge radius: if the nominal point lies inside the region (ray casting, even–odd),
 * the distance to the nearest edge of any ring, map edge included; otherwise 0. Worst point: the
 * lowest sample with value ≥ threshold.
 * Accuracy: the boundary is exact for fields linear within each cell; for smooth fields its
 * error is about h²·|f″|/(8|f′|) for grid step h.
 *
 * References: W. E. Lorensen, H. E. Cline, "Marching cubes", SIGGRAPH 1987 (the 2-D case);
 * d3-contour documentation (grid convention); shoelace formula (Gauss's area formula).
 *
 * @param map the sampled field (m; values in the quantity's unit)
 * @param threshold minimum acceptable value (same unit)
 * @param nominal the design position (default the origin), m
 * @returns polygons, area, charge-zone radius, worst point, nominal check
 * @example
 * toleranceEnvelope({ xs: [-1, 0, 1], ys: [-1, 0, 1], values: [0, 0, 0, 0, 1, 0, 0, 0, 0] }, 0.5)
 *   // area 0.5 (the diamond |x| + |y| ≤ 0.5), chargeRadius ≈ 0.354 (0.5/√2)
 */
export function toleranceEnvelope(
  map: CouplingField,
  threshold: number,
  nominal: { x: number; y: number } = { x: 0, y: 0 },
): ToleranceEnvelope {
  const { xs, ys, values } = map;
  checkAxis('xs', xs);
  checkAxis('ys', ys);
  const nx = xs.length;
  const ny = ys.length;
  if (values.length !== nx * ny) {
    throw new RangeError(
      `values: must have xs.length · ys.length = ${nx * ny} entries (got ${values.length})`,
    );
  }
  for (let i = 0; i < values.length; i++) {
    if (!Number.isFinite(values[i]))
      throw new RangeError(`values[${i}]: must be finite (got ${values[i]})`);
  }
  if (!Number.isFinite(threshold))
    throw new RangeError(`threshold: must be finite (got ${threshold})`);
  if (!Number.isFinite(nominal.x) || !Number.isFinite(nominal.y)) {
    throw new RangeError(`nominal: x and y must be finite (got ${nominal.x}, ${nominal.y})`);
  }

  const grid = contours().size([nx, ny]).contour(Array.from(values), threshold);
  const polygons = grid.coordinates.map((polygon) =>
    polygon.map((ring) => ring.map(([gx, gy]): Point => [toMetres(xs, gx), toMetres(ys, gy)])),
  );

  let area = 0;
  for (const polygon of polygons) {
    polygon.forEach((ring, r) => (area += (r === 0 ? 1 : -1) * Math.abs(ringArea(ring))));
  }

  const p: Point = [nominal.x, nominal.y];
  const inside = polygons.some(
    (polygon) => ringContains(polygon[0], p) && !polygon.slice(1).some((h) => ringContains(h, p)),
  );
  let chargeRadius = 0;
  let limitedByMap = false;
  if (inside) {
    chargeRadius = Infinity;
    const bounds = [xs[0], xs[nx - 1], ys[0], ys[ny - 1]];
    for (const ring of polygons.flat()) {
      for (let i = 0; i < ring.length; i++) {
        const a = ring[i];
        const b = ring[(i + 1) % ring.length];
        const d = segmentDistance(p, a, b);
        if (d < chargeRadius) {
          chargeRadius = d;
          limitedByMap = onMapEdge(a, b, bounds);
        }
      }
    }
  }

  let worst: ToleranceEnvelope['worst'] = null;
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      const v = values[j * nx + i];
      if (v >= threshold && (worst === null || v < worst.value))
        worst = { x: xs[i], y: ys[j], value: v };
    }
  }

  const value = bilinear(map, nominal.x, nominal.y);
  return {
    threshold,
    polygons,
    area,
    chargeRadius,
    chargeRadiusLimitedByMap: limitedByMap,
    worst,
    nominal: { x: nominal.x, y: nominal.y, value, meets: value !== null && value >= threshold },
  };
}

function checkAxis(name: string, axis: ArrayLike<number>): void {
  if (axis.length < 2)
    throw new RangeError(`${name}: needs at least 2 values (got ${axis.length})`);
  for (let i = 0; i < axis.length; i++) {
    if (!Number.isFinite(axis[i]))
      throw new RangeError(`${name}[${i}]: must be finite (got ${axis[i]})`);
    if (i > 0 && !(axis[i] > axis[i - 1])) {
      throw new RangeError(
        `${name}[${i}]: must be strictly ascending (got ${axis[i]} after ${axis[i - 1]})`,
      );
    }
  }
}

/** d3-contour grid coordinate → metres: sample i sits at g = i + 0.5. */
function toMetres(axis: ArrayLike<number>, g: number): number {
  const n = axis.length;
  const s = Math.min(n - 1, Math.max(0, g - 0.5));
  const i = Math.min(n - 2, Math.floor(s));
  const f = s - i;
  return f === 0 ? axis[i] : axis[i] + f * (axis[i + 1] - axis[i]);
}

function ringArea(ring: Point[]): number {
  let a = 0;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    a += (ring[j][0] - ring[i][0]) * (ring[j][1] + ring[i][1]);
  }
  return a / 2;
}

function ringContains(ring: Point[], [x, y]: Point): boolean {
  let inside = false;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const [xi, yi] = ring[i];
    const [xj, yj] = ring[j];
    if (yi > y !== yj > y && x < ((xj - xi) * (y - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

function segmentDistance([px, py]: Point, [ax, ay]: Point, [bx, by]: Point): number {
  const dx = bx - ax;
  const dy = by - ay;
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((px - ax) * dx + (py - ay) * dy) / len2));
  return Math.hypot(px - ax - t * dx, py - ay - t * dy);
}

function onMapEdge(a: Point, b: Point, [x0, x1, y0, y1]: number[]): boolean {
  return (
    (a[0] === x0 && b[0] === x0) ||
    (a[0] === x1 && b[0] === x1) ||
    (a[1] === y0 && b[1] === y0) ||
    (a[1] === y1 && b[1] === y1)
  );
}

/** Bilinear interpolation of the map at (x, y); null outside the sampled rectangle. */
function bilinear({ xs, ys, values }: CouplingField, x: number, y: number): number | null {
  const nx = xs.length;
  const ny = ys.length;
  if (x < xs[0] || x > xs[nx - 1] || y < ys[0] || y > ys[ny - 1]) return null;
  let i = 0;
  while (i < nx - 2 && x > xs[i + 1]) i++;
  let j = 0;
  while (j < ny - 2 && y > ys[j + 1]) j++;
  const u = (x - xs[i]) / (xs[i + 1] - xs[i]);
  const v = (y - ys[j]) / (ys[j + 1] - ys[j]);
  const f = (a: number, b: number) => values[b * nx + a];
  return (
    (1 - u) * (1 - v) * f(i, j) +
    u * (1 - v) * f(i + 1, j) +
    (1 - u) * v * f(i, j + 1) +
    u * v * f(i + 1, j + 1)
  );
}
