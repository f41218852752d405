// Geometry of the filament models. References: plain geometry (arc length of the Archimedean
// spiral and the helix, chord lengths of inscribed polygons, the shoelace area formula) and the
// conventions of physics/README.md.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { PathFilament, Vec3 } from '../filaments';
import { expectNear } from '../testing/expect-near';
import { coilFilaments } from './coil-filaments';
import type { Coil } from './coil-schema';
import { ARC_SEGMENTS_PER_QUARTER, SEGMENTS_PER_TURN } from './filament-resolution';
import { parseCoil } from './parse-coil';
import { windingLength } from './winding-length';

const round = (diameter: number) => ({ type: 'round' as const, diameter });

function polylineLength(path: PathFilament): number {
  const p = path.points;
  let total = 0;
  const segments = path.closed ? p.length : p.length - 1;
  for (let i = 0; i < segments; i++) total += distance(p[i], p[(i + 1) % p.length]);
  return total;
}
const distance = (a: Vec3, b: Vec3) => Math.hypot(a.x - b.x, a.y - b.y, a.z - b.z);
/** Shoelace area of the projection on the xy plane: positive when counter-clockwise from +z. */
function signedArea(points: Vec3[]): number {
  let twice = 0;
  for (let i = 0; i < points.length; i++) {
    const a = points[i];
    const b = points[(i + 1) % points.length];
    twice += a.x * b.y - b.x * a.y;
  }
  return twice / 2;
}

describe('ring and rings', () => {
  it('one ring at the origin, normal +z, weight 1', () => {
    const set = coilFilaments(parseCoil({ kind: 'ring', radius: 0.02, wireRadius: 5e-4 }));
    expect(set).toEqual({
      rings: [
        {
          center: { x: 0, y: 0, z: 0 },
          normal: { x: 0, y: 0, z: 1 },
          radius: 0.02,
          wireRadius: 5e-4,
          weight: 1,
        },
      ],
      paths: [],
    });
  });
  it('explicit rings keep r and z in order', () => {
    const coil = parseCoil({
      kind: 'rings',
      wireRadius: 4e-4,
      rings: [
        { r: 0.01, z: 0 },
        { r: 0.02, z: 0.003 },
      ],
    });
    const set = coilFilaments(coil);
    expect(set.rings.map((r) => [r.radius, r.center.z, r.weight])).toEqual([
      [0.01, 0, 1],
      [0.02, 0.003, 1],
    ]);
  });
});

describe('circular spiral, ring model', () => {
  it('ring i at r_in + i·pitch, the fractional last turn weighted by its fraction', () => {
    const coil = parseCoil({
      kind: 'circular-spiral',
      turns: 10.25,
      innerRadius: 0.005,
      pitch: 0.001,
      conductor: round(8e-4),
    });
    const rings = coilFilaments(coil).rings;
    expect(rings).toHaveLength(11);
    rings.forEach((ring, i) =>
      expectNear(ring.radius, 0.005 + i * 0.001, 1e-14, `ring ${i} radius`),
    );
    expect(rings.map((r) => r.weight)).toEqual([1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 0.25]);
    expect(rings.every((r) => r.wireRadius === 4e-4 && r.center.z === 0 && r.normal.z === 1)).toBe(
      true,
    );
  });
  it('diameter form: innermost and outermost rings on the given centre-line diameters', () => {
    const coil = parseCoil({
      kind: 'circular-spiral',
      turns: 20,
      innerDiameter: 0.01,
      outerDiameter: 0.048,
      conductor: round(8e-4),
    });
    const rings = coilFilaments(coil).rings;
    expect(rings).toHaveLength(20);
    expectNear(rings[0].radius, 0.005, 1e-14, 'innermost radius');
    // Rounding of 19 additions of the pitch: a few ulps.
    expectNear(rings[19].radius, 0.024, 1e-14, 'outermost radius');
  });
  it('layers stack toward +z at layerSpacing', () => {
    const coil = parseCoil({
      kind: 'circular-spiral',
      turns: 3,
      innerRadius: 0.005,
      pitch: 0.001,
      layers: 3,
      layerSpacing: 0.0016,
      conductor: { type: 'trace', width: 5e-4, thickness: 3.5e-5 },
    });
    const zs = coilFilaments(coil).rings.map((r) => r.center.z);
    expect(zs.map((z) => Number(z.toFixed(10)))).toEqual([
      0, 0, 0, 0.0016, 0.0016, 0.0016, 0.0032, 0.0032, 0.0032,
    ]);
  });
});

describe('circular spiral, spiral model', () => {
  const base = {
    kind: 'circular-spiral' as const,
    turns: 5.5,
    innerRadius: 0.005,
    pitch: 0.001,
    model: 'spiral' as const,
    conductor: round(8e-4),
  };
  it('is one open path starting half a pitch inside ring 0, ending N pitches further out', () => {
    const set = coilFilaments(parseCoil(base));
    expect(set.rings).toHaveLength(0);
    expect(set.paths).toHaveLength(1);
    const path = set.paths[0];
    expect(path.closed).toBe(false);
    expect(path.points).toHaveLength(Math.ceil(SEGMENTS_PER_TURN * 5.5) + 1);
    expectNear(Math.hypot(path.points[0].x, path.points[0].y), 0.0045, 1e-12, 'start radius');
    const end = path.points[path.points.length - 1];
    expectNear(Math.hypot(end.x, end.y), 0.0045 + 5.5 * 0.001, 1e-12, 'end radius');
  });
  it('turn i has the mean radius r_in + i·pitch of ring i (models agree turn by turn)', () => {
    const points = coilFilaments(parseCoil(base)).paths[0].points;
    for (let turn = 0; turn < 5; turn++) {
      const slice = points.slice(turn * SEGMENTS_PER_TURN, (turn + 1) * SEGMENTS_PER_TURN);
      const mean = slice.reduce((sum, p) => sum + Math.hypot(p.x, p.y), 0) / slice.length;
      // Sampling the linear r(φ) at the left ends of 96 steps biases the mean by half a step.
      expectNear(
        mean,
        0.005 + turn * 0.001,
        0.001 / SEGMENTS_PER_TURN,
        `turn ${turn} mean radius`,
        true,
      );
    }
  });
  it('turns counter-clockwise seen from +z (right-handed about +z)', () => {
    const points = coilFilaments(parseCoil({ ...base, turns: 1 })).paths[0].points;
    expect(signedArea(points)).toBeGreaterThan(0);
  });
  it('polyline length matches windingLength within the chord deficit of 96 per turn', () => {
    const coil = parseCoil(base);
    const length = polylineLength(coilFilaments(coil).paths[0]);
    // A chord of angle θ is short of its arc by θ²/24; θ = 2π/96 gives 1.8e-4 of the length.
    expectNear(length, windingLength(coil), 2e-4, 'spiral polyline vs arc length');
    expect(length).toBeLessThan(windingLength(coil));
  });
  it('two layers: outward then inward through a via, the same sense throughout', () => {
    const coil = parseCoil({ ...base, turns: 3, layers: 2, layerSpacing: 0.0016 });
    const points = coilFilaments(coil).paths[0].points;
    const perLayer = SEGMENTS_PER_TURN * 3 + 1;
    expect(points).toHaveLength(2 * perLayer);
    const top = points[perLayer - 1];
    const next = points[perLayer];
    expectNear(distance(top, next), 0.0016, 1e-12, 'via length');
    expectNear(
      Math.hypot(points[2 * perLayer - 1].x, points[2 * perLayer - 1].y),
      0.0045,
      1e-12,
      'ends inside',
    );
    expect(signedArea(points.slice(perLayer))).toBeGreaterThan(0);
    expectNear(polylineLength(coilFilaments(coil).paths[0]), windingLength(coil), 2e-4, 'with via');
  });
});

describe('rectangular spiral', () => {
  const coil = parseCoil({
    kind: 'rectangular-spiral',
    outerWidth: 0.07,
    outerHeight: 0.05,
    cornerRadius: 0.005,
    pitch: 0.0015,
    turns: 14.5,
    conductor: round(8e-4),
  });
  const paths = coilFilaments(coil).paths;
  it('one closed counter-clockwise polygon per turn, stepping inward by the pitch', () => {
    expect(paths).toHaveLength(15);
    expect(paths.every((p) => p.closed)).toBe(true);
    expect(paths.map((p) => p.weight)).toEqual([...Array(14).fill(1), 0.5]);
    paths.forEach((path, i) => {
      const xs = path.points.map((p) => p.x);
      expectNear(Math.max(...xs), 0.035 - i * 0.0015, 1e-12, `turn ${i} half width`, true);
      expect(signedArea(path.points)).toBeGreaterThan(0);
    });
  });
  it('perimeter of each polygon equals sides plus 8 chords per corner (exact geometry)', () => {
    paths.forEach((path, i) => {
      const inset = i * 0.0015;
      const c = Math.max(0.005 - inset, 0);
      const sides = 2 * (0.07 - 2 * inset - 2 * c) + 2 * (0.05 - 2 * inset - 2 * c);
      const chords =
        4 * ARC_SEGMENTS_PER_QUARTER * 2 * c * Math.sin(Math.PI / 4 / ARC_SEGMENTS_PER_QUARTER);
      // Rounding only: sums of a few dozen terms of order 0.01 m.
      expectNear(polylineLength(path), sides + chords, 1e-12, `turn ${i} perimeter`);
    });
  });
  it('polygon perimeters agree with windingLength within the chord deficit of the corners', () => {
    const total = paths.reduce((sum, p) => sum + p.weight * polylineLength(p), 0);
    // A chord of π/16 is short of its arc by (π/16)²/24 ≈ 1.6e-3; the corner arcs are 3 % of
    // this winding's length, so the whole falls short by about 5e-5.
    expectNear(total, windingLength(coil), 1e-4, 'rectangular spiral length');
  });
  it('sharp corners once the corner radius is used up; area of the rounded rectangle', () => {
    const inner = paths[10].points;
    expect(inner).toHaveLength(4);
    const outer = paths[0].points;
    const exact = 0.07 * 0.05 - (4 - Math.PI) * 0.005 ** 2;
    // Chords cut each quarter disc by (θ - sin θ)/2 per sector: 8 sectors of θ = π/16.
    const cut = 4 * 8 * (0.005 ** 2 / 2) * (Math.PI / 16 - Math.sin(Math.PI / 16));
    expectNear(signedArea(outer), exact - cut, 1e-12, 'outer turn area');
  });
});

describe('solenoid', () => {
  const base = {
    kind: 'solenoid' as const,
    radius: 0.01,
    length: 0.02,
    turns: 20,
    conductor: round(5e-4),
  };
  it('ring model: rings at (i + 1/2)·pitch along +z', () => {
    const rings = coilFilaments(parseCoil(base)).rings;
    expect(rings).toHaveLength(20);
    rings.forEach((ring, i) =>
      expectNear(ring.center.z, (i + 0.5) * 0.001, 1e-12, `ring ${i} z`, true),
    );
  });
  it('helix: from z = 0 to z = length, length N·sqrt((2πr)² + p²) within the chord deficit', () => {
    const coil = parseCoil({ ...base, model: 'helix' });
    const path = coilFilaments(coil).paths[0];
    expect(path.points[0].z).toBe(0);
    expectNear(path.points[path.points.length - 1].z, 0.02, 1e-15, 'top end', true);
    const exact = 20 * Math.hypot(2 * Math.PI * 0.01, 0.001);
    expectNear(windingLength(coil), exact, 1e-14, 'windingLength of a helix');
    // Chords of 2π/96 of a turn: (2π/96)²/24 of the circumferential part, 1.8e-4.
    expectNear(polylineLength(path), exact, 2e-4, 'helix polyline length');
    expect(signedArea(path.points.slice(0, SEGMENTS_PER_TURN))).toBeGreaterThan(0);
  });
  it('two layers grow outward by layerSpacing', () => {
    const coil = parseCoil({ ...base, layers: 2, layerSpacing: 6e-4 });
    const radii = new Set(coilFilaments(coil).rings.map((r) => r.radius));
    expect([...radii]).toEqual([0.01, 0.0106]);
  });
});

describe('path', () => {
  it('keeps the points and is open unless closed is set', () => {
    const json = {
      kind: 'path',
      conductor: round(1e-3),
      points: [
        { x: 0, y: 0, z: 0 },
        { x: 0.03, y: 0, z: 0 },
        { x: 0.03, y: 0.02, z: 0.001 },
      ],
    };
    const open = coilFilaments(parseCoil(json)).paths[0];
    expect(open.points).toEqual(json.points);
    expect(open.closed).toBe(false);
    expect(coilFilaments(parseCoil({ ...json, closed: true })).paths[0].closed).toBe(true);
  });
});

describe('properties (fast-check, seed 42)', () => {
  it('ring model: ceil(N)·layers rings, total weight N·layers, all radii ≥ r_in', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.05, max: 60, noNaN: true }),
        fc.integer({ min: 1, max: 4 }),
        (turns, layers) => {
          const coil: Coil = parseCoil({
            kind: 'circular-spiral',
            turns,
            innerRadius: 0.004,
            pitch: 0.001,
            layers,
            layerSpacing: 0.001,
            conductor: round(8e-4),
          });
          const rings = coilFilaments(coil).rings;
          expect(rings).toHaveLength(Math.ceil(turns) * layers);
          const weight = rings.reduce((sum, r) => sum + r.weight, 0);
          // Summing up to 240 weights: rounding of order 1e-13.
          expectNear(weight, turns * layers, 1e-12, `turns ${turns} layers ${layers}`);
          expect(
            rings.every((r) => r.radius >= 0.004 && r.weight > 0 && r.weight <= 1 + 1e-12),
          ).toBe(true);
        },
      ),
      { seed: 42, numRuns: 100 },
    );
  });
});
