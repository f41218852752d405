import {
  coilFilaments,
  conductorSection,
  type Coil,
  type Vec3,
} from '../../../../physics/src/index';
import { formatQuantity } from '../units/format-quantity';

/** A circle of a drawing, mm (y already flipped to point up the page). */
export interface DrawnCircle {
  cx: number;
  cy: number;
  r: number;
}

/** One view of the winding to scale: SVG coordinates in mm. */
export interface DrawingView {
  /** `minX minY width height` in mm, margin included. */
  viewBox: string;
  circles: DrawnCircle[];
  /** Polylines as SVG path data. */
  paths: string[];
  /** Filled cross-sections (side view): circles of the conductor's size. */
  sections: DrawnCircle[];
  /** The drawn stroke: the conductor's width, mm (never thinner than a hairline). */
  stroke: number;
  /** The scale bar: from (x, y), `length` mm long, with its label. */
  bar: { x: number; y: number; length: number; label: string; fontSize: number };
  /** The ferrite surface as a band (side view) or a disc (top view), mm; null without one. */
  ferrite: { x: number; y: number; width: number; height: number } | null;
}

export interface CoilDrawing {
  top: DrawingView;
  /** The winding seen from the side (x–z), for solenoids and stacked windings. */
  side: DrawingView | null;
  /** Counts of what was drawn, and whether long paths were thinned for drawing. */
  thinned: boolean;
}

/** Points drawn per path at most: enough for a smooth spiral on screen, cheap to render. */
const MAX_POINTS_PER_PATH = 4000;
const mm = 1e3;

/**
 * The winding of a coil to scale, from its filaments (coilFilaments): the top view (x–y) as
 * circles and polylines stroked at the conductor's width, and a side view (x–z) of the conductor
 * cross-sections for solenoids and multi-layer windings. Rings that coincide in a view (layers
 * seen from above) are drawn once.
 *
 * @param coil a validated coil, m
 * @returns the views in mm
 */
export function coilDrawing(coil: Coil): CoilDrawing {
  const filaments = coilFilaments(coil);
  const width = 'conductor' in coil ? conductorSection(coil.conductor).width : 2 * coil.wireRadius;
  const stroke = Math.max(width * mm, 0);
  let thinned = false;
  const thin = (points: Vec3[]) => {
    if (points.length <= MAX_POINTS_PER_PATH) return points;
    thinned = true;
    const step = Math.ceil(points.length / MAX_POINTS_PER_PATH);
    return points.filter((_, i) => i % step === 0 || i === points.length - 1);
  };

  const topCircles = unique(
    filaments.rings.map((ring) => ({
      cx: ring.center.x * mm,
      cy: flip(ring.center.y * mm),
      r: ring.radius * mm,
    })),
  );
  const paths = filaments.paths.map((path) => ({ points: thin(path.points), closed: path.closed }));
  const topPaths = paths.map(({ points, closed }) =>
    pathData(
      points.map((p) => [p.x * mm, flip(p.y * mm)]),
      closed,
    ),
  );
  const topPoints = [
    ...topCircles.flatMap((c) => [
      [c.cx - c.r, c.cy - c.r],
      [c.cx + c.r, c.cy + c.r],
    ]),
    ...paths.flatMap(({ points }) => points.map((p) => [p.x * mm, flip(p.y * mm)])),
  ];
  const backing = coil.backing;
  const top = view(topPoints, stroke, [], topCircles, topPaths, (box) =>
    backing ? { x: box.minX, y: box.minY, width: box.width, height: box.height } : null,
  );

  const zs = [
    ...filaments.rings.map((ring) => ring.center.z),
    ...filaments.paths.flatMap((path) => path.points.map((p) => p.z)),
  ];
  const layered = Math.max(...zs) - Math.min(...zs) > 0;
  let side: DrawingView | null = null;
  if (coil.kind === 'solenoid' || layered) {
    const sections = unique(
      filaments.rings.flatMap((ring) => [
        { cx: (ring.center.x - ring.radius) * mm, cy: flip(ring.center.z * mm), r: stroke / 2 },
        { cx: (ring.center.x + ring.radius) * mm, cy: flip(ring.center.z * mm), r: stroke / 2 },
      ]),
    );
    const sidePaths = paths.map(({ points, closed }) =>
      pathData(
        points.map((p) => [p.x * mm, flip(p.z * mm)]),
        closed,
      ),
    );
    const sidePoints = [
      ...sections.flatMap((c) => [
        [c.cx - c.r, c.cy - c.r],
        [c.cx + c.r, c.cy + c.r],
      ]),
      ...paths.flatMap(({ points }) => points.map((p) => [p.x * mm, flip(p.z * mm)])),
      ...(backing ? [[0, backing.distance * mm]] : []),
    ];
    side = view(sidePoints, stroke, sections, [], sidePaths, (box) =>
      backing
        ? {
            x: box.minX,
            y: backing.distance * mm,
            width: box.width,
            height: Math.max(box.height * 0.08, stroke),
          }
        : null,
    );
  }
  return { top, side, thinned };
}

interface Box {
  minX: number;
  minY: number;
  width: number;
  height: number;
}

function view(
  points: number[][],
  stroke: number,
  sections: DrawnCircle[],
  circles: DrawnCircle[],
  paths: string[],
  ferrite: (box: Box) => DrawingView['ferrite'],
): DrawingView {
  const xs = points.map((p) => p[0]);
  const ys = points.map((p) => p[1]);
  const [x0, x1, y0, y1] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  const size = Math.max(x1 - x0, y1 - y0, stroke, 1e-3);
  const margin = size * 0.08 + stroke;
  const barRoom = size * 0.18;
  const box: Box = {
    minX: x0 - margin,
    minY: y0 - margin,
    width: x1 - x0 + 2 * margin,
    height: y1 - y0 + 2 * margin + barRoom,
  };
  const length = niceLength((x1 - x0 || size) / 4);
  const fontSize = size * 0.06;
  return {
    viewBox: [box.minX, box.minY, box.width, box.height].map((v) => round(v)).join(' '),
    circles,
    paths,
    sections,
    stroke: Math.max(stroke, size * 1e-3),
    bar: {
      x: x0,
      y: y1 + margin + barRoom * 0.35,
      length,
      label: formatQuantity(length / mm, 'm', { trim: true }),
      fontSize,
    },
    ferrite: ferrite({ ...box, height: y1 - y0 + 2 * margin }),
  };
}

/** A scale-bar length of 1, 2 or 5 × 10ⁿ mm, not above `target`. */
export function niceLength(target: number): number {
  const power = 10 ** Math.floor(Math.log10(target));
  const steps = [5, 2, 1].map((s) => s * power);
  return steps.find((s) => s <= target) ?? power;
}

function unique(circles: DrawnCircle[]): DrawnCircle[] {
  const seen = new Map<string, DrawnCircle>();
  for (const c of circles) {
    // Rounded to a nanometre-scale step: layers seen from above coincide exactly up to float noise.
    const key = `${round(c.cx)}|${round(c.cy)}|${round(c.r)}`;
    if (!seen.has(key)) seen.set(key, c);
  }
  return [...seen.values()];
}

function pathData(points: number[][], closed: boolean): string {
  const d = points.map((p, i) => `${i === 0 ? 'M' : 'L'}${round(p[0])} ${round(p[1])}`).join('');
  return closed ? `${d}Z` : d;
}

function round(value: number): number {
  return Number(value.toPrecision(7));
}

/** SVG's y grows down the page; 0 - v rather than -v so that a zero stays +0. */
function flip(value: number): number {
  return 0 - value;
}
