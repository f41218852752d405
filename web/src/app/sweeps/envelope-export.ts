import type { SweepEnvelope } from '../api-types';
import { lengthMm } from './coupling-map-csv';

/** Where an exported envelope came from, written into the JSON so a file says what it is. */
export interface EnvelopeSource {
  study: string;
  runId: string;
  engineVersion: string;
  computedAt: string | null;
}

/**
 * A tolerance envelope as CSV: one row per outline point, `region,ring,x_mm,y_mm`. `region`
 * counts the separate areas from 1; `ring` 0 is a region's outline and 1, 2 … its holes. Each
 * ring is written closed (last point = first).
 */
export function envelopeCsv(envelope: SweepEnvelope): string {
  const lines = ['region,ring,x_mm,y_mm'];
  envelope.polygons.forEach((polygon, region) =>
    polygon.forEach((ring, r) =>
      closed(ring).forEach((p) =>
        lines.push([region + 1, r, lengthMm(p.x), lengthMm(p.y)].join(',')),
      ),
    ),
  );
  return lines.join('\n') + '\n';
}

/**
 * A tolerance envelope as JSON, in millimetres: the threshold, area, charge-zone radius, worst and
 * nominal points and each region as an outline with its holes ([x_mm, y_mm] pairs, closed).
 */
export function envelopeJson(envelope: SweepEnvelope, source: EnvelopeSource): string {
  const point = (p: { x: number; y: number }) => [Number(lengthMm(p.x)), Number(lengthMm(p.y))];
  const body = {
    format: 'couplet-envelope',
    version: 1,
    source,
    gap_mm: Number(lengthMm(envelope.z)),
    threshold_k: envelope.thresholdK,
    area_mm2: Number((envelope.area * 1e6).toFixed(4)),
    charge_radius_mm: Number(lengthMm(envelope.chargeRadius)),
    charge_radius_limited_by_map: envelope.chargeRadiusLimitedByMap,
    worst: envelope.worst
      ? { x_mm: point(envelope.worst)[0], y_mm: point(envelope.worst)[1], k: envelope.worst.value }
      : null,
    nominal: {
      x_mm: point(envelope.nominal)[0],
      y_mm: point(envelope.nominal)[1],
      k: envelope.nominal.value,
      meets_threshold: envelope.nominal.meets,
    },
    regions: envelope.polygons.map(([outline, ...holes]) => ({
      outline: closed(outline ?? []).map(point),
      holes: holes.map((ring) => closed(ring).map(point)),
    })),
  };
  return JSON.stringify(body, null, 2) + '\n';
}

function closed<T extends { x: number; y: number }>(ring: T[]): T[] {
  if (ring.length === 0) return ring;
  const first = ring[0];
  const last = ring[ring.length - 1];
  return first.x === last.x && first.y === last.y ? ring : [...ring, first];
}
