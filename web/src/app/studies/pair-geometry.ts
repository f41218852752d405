import type { Backing, FilamentSet, Vec3 } from '../../../../physics/src/index';
import { coilBounds, type Bounds } from './coil-bounds';
import { niceStep } from './pose-ranges';

/** One turn drawn as a tube: a circle (ring filament) or a polyline (path filament), m. */
export type WindingTube =
  | { kind: 'circle'; center: Vec3; normal: Vec3; radius: number; tubeRadius: number }
  | { kind: 'polyline'; points: Vec3[]; closed: boolean; tubeRadius: number };

/** A ferrite plate drawn as a slab: centre and full sizes, m, in the backed coil's frame. */
export interface FerriteSlab {
  center: Vec3;
  size: Vec3;
}

export interface CoilDrawing {
  tubes: WindingTube[];
  slab: FerriteSlab | null;
  bounds: Bounds;
}

export interface PairDrawing {
  tx: CoilDrawing;
  rx: CoilDrawing;
  /** The larger coil's largest size, m: sets the camera distance and the axes. */
  span: number;
  /** Cell of the grid in the Tx plane, m: 1, 2 or 5 × 10^n, about a tenth of the span. */
  gridStep: number;
}

/** Thin conductors are drawn at least this fraction of the pair's span thick, to stay visible. */
const MIN_TUBE_FRACTION = 0.004;
/** The slab reaches this much beyond the winding on each side (the model's plate is infinite). */
const SLAB_MARGIN = 0.12;

/**
 * What the 3D view draws, to scale: each filament as a tube of the conductor's radius (at least
 * 0.4 % of the pair's span), and a coil's ferrite backing as a slab whose top face is the plate
 * surface at z = −distance, a little wider than the winding. The physics models the plate as
 * infinite; the slab only shows where it starts.
 *
 * @param tx Tx filaments in the Tx frame, m
 * @param rx Rx filaments in the Rx's own frame, m
 * @param backings the coils' ferrite backings, if any
 * @returns tubes, slabs and bounds per coil, m
 */
export function pairDrawing(
  tx: FilamentSet,
  rx: FilamentSet,
  backings: { tx?: Backing; rx?: Backing } = {},
): PairDrawing {
  const txBounds = coilBounds(tx);
  const rxBounds = coilBounds(rx);
  const size = (b: Bounds) => Math.max(b.max.x - b.min.x, b.max.y - b.min.y, b.max.z - b.min.z);
  const span = Math.max(size(txBounds), size(rxBounds), 1e-4);
  const least = span * MIN_TUBE_FRACTION;
  const coil = (set: FilamentSet, bounds: Bounds, backing?: Backing): CoilDrawing => ({
    tubes: [
      ...set.rings.map((r): WindingTube => ({
        kind: 'circle',
        center: r.center,
        normal: r.normal,
        radius: r.radius,
        tubeRadius: Math.max(r.wireRadius, least),
      })),
      ...set.paths.map((p): WindingTube => ({
        kind: 'polyline',
        points: p.points,
        closed: p.closed,
        tubeRadius: Math.max(p.wireRadius, least),
      })),
    ],
    slab: backing ? ferriteSlab(bounds, backing, span) : null,
    bounds,
  });
  return {
    tx: coil(tx, txBounds, backings.tx),
    rx: coil(rx, rxBounds, backings.rx),
    span,
    gridStep: niceStep(span, 10),
  };
}

function ferriteSlab(bounds: Bounds, backing: Backing, span: number): FerriteSlab {
  const wx = bounds.max.x - bounds.min.x;
  const wy = bounds.max.y - bounds.min.y;
  const margin = SLAB_MARGIN * Math.max(wx, wy);
  // Drawn thickness only: the image model has no thickness (common practice, no source: tiles of
  // a few per cent of the pad's width).
  const thickness = Math.min(Math.max(0.03 * span, 5e-4), 0.01);
  return {
    center: {
      x: (bounds.min.x + bounds.max.x) / 2,
      y: (bounds.min.y + bounds.max.y) / 2,
      z: -backing.distance - thickness / 2,
    },
    size: { x: wx + 2 * margin, y: wy + 2 * margin, z: thickness },
  };
}
