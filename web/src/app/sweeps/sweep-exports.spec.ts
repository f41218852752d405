import { couplingMapCsv } from './coupling-map-csv';
import { envelopeCsv, envelopeJson } from './envelope-export';
import { formatDuration } from './format-duration';
import { fileSlug } from './save-text-file';
import { sweepMatrix } from './sweep-matrix';
import { testMapResult, testRun } from './sweep-test-data';

const result = testMapResult(testRun()).result!;
const envelope = result.envelopes[0];

describe('couplingMapCsv', () => {
  it('writes one row per sample, x fastest, in mm with the agreed header', () => {
    const csv = couplingMapCsv(
      sweepMatrix(result.axes, result.k),
      sweepMatrix(result.axes, result.etaMax),
    );
    const lines = csv.trimEnd().split('\n');
    expect(lines[0]).toBe('x_mm,y_mm,k,eta_max');
    expect(lines).toHaveLength(10);
    expect(lines[1]).toBe('-10,-10,0.1,0.05');
    expect(lines[2]).toBe('0,-10,0.2,0.1');
    expect(lines[9]).toBe('10,10,0.9,0.45');
    expect(csv.endsWith('\n')).toBe(true);
  });

  it('writes lengths without binary noise (0.0035 m is 3.5 mm)', () => {
    const axes = { x: [0.0035, 0.0041], y: [0.0007], z: [0.004], tiltX: [0], tiltY: [0] };
    const csv = couplingMapCsv(sweepMatrix(axes, [0.5, 0.25]), sweepMatrix(axes, [0.1, 0.2]));
    expect(csv.split('\n').slice(1, 3)).toEqual(['3.5,0.7,0.5,0.1', '4.1,0.7,0.25,0.2']);
  });
});

describe('envelope exports', () => {
  it('writes the outline as CSV rows of region, ring and mm, closed', () => {
    const lines = envelopeCsv(envelope).trimEnd().split('\n');
    expect(lines[0]).toBe('region,ring,x_mm,y_mm');
    expect(lines.slice(1)).toEqual(['1,0,-5,-5', '1,0,5,-5', '1,0,5,5', '1,0,-5,5', '1,0,-5,-5']);
  });

  it('closes an open ring and numbers holes after the outline', () => {
    const holed = {
      ...envelope,
      polygons: [
        [
          [
            { x: 0, y: 0 },
            { x: 0.01, y: 0 },
            { x: 0, y: 0.01 },
          ],
          [
            { x: 0.001, y: 0.001 },
            { x: 0.002, y: 0.001 },
            { x: 0.001, y: 0.002 },
          ],
        ],
      ],
    };
    const rows = envelopeCsv(holed).trimEnd().split('\n').slice(1);
    expect(rows).toHaveLength(8);
    expect(rows[3]).toBe('1,0,0,0');
    expect(rows[4]).toBe('1,1,1,1');
  });

  it('writes the figures and regions as JSON in mm, with where they came from', () => {
    const source = { study: 'FP-7', runId: 'r1', engineVersion: 'e1', computedAt: null };
    const body = JSON.parse(envelopeJson(envelope, source));
    expect(body).toMatchObject({
      format: 'couplet-envelope',
      source,
      gap_mm: 4,
      threshold_k: 0.2,
      area_mm2: 100,
      charge_radius_mm: 5,
      charge_radius_limited_by_map: true,
      worst: { x_mm: 0, y_mm: -10, k: 0.2 },
      nominal: { x_mm: 0, y_mm: 0, k: 0.5, meets_threshold: true },
    });
    expect(body.regions).toEqual([
      {
        outline: [
          [-5, -5],
          [5, -5],
          [5, 5],
          [-5, 5],
          [-5, -5],
        ],
        holes: [],
      },
    ]);
  });
});

describe('formatDuration and fileSlug', () => {
  it('reads durations as a person would', () => {
    expect(formatDuration(0.4)).toBe('under 1 s');
    expect(formatDuration(42.4)).toBe('42 s');
    expect(formatDuration(60)).toBe('1 min');
    expect(formatDuration(200)).toBe('3 min 20 s');
    expect(formatDuration(3900)).toBe('1 h 05 min');
    expect(formatDuration(-1)).toBe('—');
    expect(formatDuration(Number.NaN)).toBe('—');
  });

  it('makes file names from study names', () => {
    expect(fileSlug('FP-7 cradle, band pad (Rev. B)')).toBe('fp-7-cradle-band-pad-rev-b');
    expect(fileSlug('Bobina ø40 — ensaio')).toBe('bobina-40-ensaio');
    expect(fileSlug('***')).toBe('study');
  });
});
