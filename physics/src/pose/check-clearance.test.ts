// Clearance between posed coils. References: plain geometry — distance from a point to a circle,
// sqrt(h² + (ρ - R)²); two round conductors touch when their centre lines come closer than the
// sum of their radii; closest points of segments after C. Ericson, Real-Time Collision Detection
// (2005), §5.1.9, checked here against brute-force sampling.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { coilFilaments } from '../coils/coil-filaments';
import { parseCoil } from '../coils/parse-coil';
import type { Vec3 } from '../filaments';
import { checkClearance } from './check-clearance';
import { segmentDistance } from './segment-distance';
import { transformFilaments } from './transform-filaments';

const R = 0.02;
const a = 5e-4;
const ring = parseCoil({ kind: 'ring', radius: R, wireRadius: a });
const small = parseCoil({ kind: 'ring', radius: 0.012, wireRadius: a });
const spiral = parseCoil({
  kind: 'circular-spiral',
  turns: 20,
  innerDiameter: 0.01,
  outerDiameter: 0.05,
  conductor: { type: 'round', diameter: 8e-4 },
});
const rect = parseCoil({
  kind: 'rectangular-spiral',
  outerWidth: 0.07,
  outerHeight: 0.05,
  cornerRadius: 0.005,
  pitch: 0.0015,
  turns: 15,
  conductor: { type: 'round', diameter: 8e-4 },
});

const intersects = /^pose: the coils intersect \(.+\); allowed: /;

describe('checkClearance: rings in simple poses', () => {
  it('coaxial equal rings touch below one wire diameter apart', () => {
    // Relative margin 1e-9 either side of contact: far above rounding, far below any real gap.
    expect(() => checkClearance(ring, ring, { z: 2 * a * (1 + 1e-9) })).not.toThrow();
    expect(() => checkClearance(ring, ring, { z: 2 * a * (1 - 1e-9) })).toThrow(intersects);
    expect(() => checkClearance(ring, ring, { z: -0.003 })).not.toThrow();
  });
  it('coplanar rings side by side touch at a centre distance of 2R + 2a', () => {
    expect(() => checkClearance(ring, ring, { x: 2 * R + 2 * a * 1.001 })).not.toThrow();
    expect(() => checkClearance(ring, ring, { x: 2 * R + 2 * a * 0.999 })).toThrow(intersects);
  });
  it('a smaller ring inside the larger one in the same plane is clear', () => {
    expect(() => checkClearance(ring, small, {})).not.toThrow();
    expect(() => checkClearance(ring, small, { x: R - 0.012 - 2 * a * 0.99 })).toThrow(intersects);
  });
  it('a ring stood on edge through the other ring’s conductor intersects', () => {
    // In the plane x = 16 mm a 12 mm ring passes through (20 mm, 0, 0), on the Tx conductor.
    expect(() => checkClearance(ring, small, { x: 0.016, tiltY: 90 })).toThrow(intersects);
    expect(() => checkClearance(ring, small, { x: R + 0.012 + 0.002, tiltY: 90 })).not.toThrow();
  });
  it('names both conductors in the message', () => {
    expect(() => checkClearance(ring, ring, { z: 0 })).toThrow(/Tx ring 0 .* and Rx ring 0 /);
  });
});

describe('checkClearance: multi-turn coils', () => {
  it('spiral pair: a 3 mm gap is clear, a 0.5 mm gap with 0.8 mm wire is not', () => {
    expect(() => checkClearance(spiral, spiral, { z: 0.003, x: 0.01, tiltY: 5 })).not.toThrow();
    expect(() => checkClearance(spiral, spiral, { z: 0.0005 })).toThrow(intersects);
  });
  it('rectangular Tx, spiral Rx: clear at 3 mm with 5° tilt, not with 30° at 3 mm', () => {
    expect(() => checkClearance(rect, spiral, { z: 0.003, tiltX: 5 })).not.toThrow();
    // A 25 mm radius tilted 30° dips 12.5 mm: far through the Tx plane.
    expect(() => checkClearance(rect, spiral, { z: 0.003, tiltX: 30 })).toThrow(
      /Tx path .* Rx ring/,
    );
  });
  it('PCB traces stack closer than their width: the thin dimension counts across layers', () => {
    const trace = parseCoil({
      kind: 'circular-spiral',
      turns: 1,
      innerRadius: 0.01,
      pitch: 0.002,
      conductor: { type: 'trace', width: 0.001, thickness: 3.5e-5 },
    });
    // 0.2 mm apart vertically: far more than the 35 µm copper, far less than the 1 mm width.
    expect(() => checkClearance(trace, trace, { z: 2e-4 })).not.toThrow();
    expect(() => checkClearance(trace, trace, { z: 3e-5 })).toThrow(intersects);
    // Side by side in one plane the 1 mm width counts.
    expect(() => checkClearance(trace, trace, { x: 0.02 + 0.0009 })).toThrow(intersects);
    expect(() => checkClearance(trace, trace, { x: 0.02 + 0.0011 })).not.toThrow();
  });
});

describe('checkClearance: ferrite half-spaces', () => {
  const backed = parseCoil({
    kind: 'ring',
    radius: R,
    wireRadius: a,
    backing: { mur: 2000, distance: 0.001 },
  });
  it('rejects an Rx reaching into the Tx ferrite, accepts one above it', () => {
    expect(() => checkClearance(backed, small, { x: 0.2, z: -0.0008 })).toThrow(
      /^pose: the Rx reaches into the Tx's ferrite backing/,
    );
    expect(() => checkClearance(backed, small, { z: 0.003 })).not.toThrow();
    // Stood on edge 10 mm above, a 12 mm ring dips 2 mm below z = 0 and 1 mm into the plate.
    expect(() => checkClearance(backed, small, { x: 0.2, z: 0.01, tiltY: 90 })).toThrow(/ferrite/);
  });
  it('an Rx backing behind a flipped Rx is fine; one facing the Tx is not', () => {
    const rxBacked = parseCoil({
      kind: 'ring',
      radius: 0.012,
      wireRadius: a,
      backing: { mur: 2000, distance: 0.001 },
    });
    expect(() => checkClearance(ring, rxBacked, { z: 0.005, tiltX: 180 })).not.toThrow();
    expect(() => checkClearance(ring, rxBacked, { z: 0.005 })).toThrow(
      /^pose: the Tx reaches into the Rx's ferrite backing/,
    );
  });
});

/** Brute force: sample ring A densely, exact point-to-circle distance to ring B. */
function bruteRingDistance(pose: {
  x: number;
  y: number;
  z: number;
  tiltX: number;
  tiltY: number;
}): number {
  const rx = transformFilaments(coilFilaments(small), pose).rings[0];
  let best = Infinity;
  const n = 20000;
  for (let i = 0; i < n; i++) {
    const t = (2 * Math.PI * i) / n;
    const p = { x: R * Math.cos(t), y: R * Math.sin(t), z: 0 };
    const v = { x: p.x - rx.center.x, y: p.y - rx.center.y, z: p.z - rx.center.z };
    const h = v.x * rx.normal.x + v.y * rx.normal.y + v.z * rx.normal.z;
    const rho = Math.sqrt(Math.max(0, v.x * v.x + v.y * v.y + v.z * v.z - h * h));
    best = Math.min(best, Math.hypot(h, rho - rx.radius));
  }
  return best;
}

describe('checkClearance: agrees with brute force (fast-check, seed 42)', () => {
  it('rejects exactly the poses where the sampled centre-line distance is below 2a', () => {
    let decided = 0;
    fc.assert(
      fc.property(
        fc.double({ min: -0.04, max: 0.04, noNaN: true }),
        fc.double({ min: -0.01, max: 0.01, noNaN: true }),
        fc.double({ min: -0.012, max: 0.012, noNaN: true }),
        fc.double({ min: -90, max: 90, noNaN: true }),
        fc.double({ min: -90, max: 90, noNaN: true }),
        (x, y, z, tiltX, tiltY) => {
          const pose = { x, y, z, tiltX, tiltY };
          const brute = bruteRingDistance(pose);
          // Sampling 20000 points leaves an error ≪ 1e-6 m; skip poses closer than that to contact.
          if (Math.abs(brute - 2 * a) < 1e-6) return;
          decided++;
          let threw = false;
          try {
            checkClearance(ring, small, pose);
          } catch {
            threw = true;
          }
          expect(
            threw,
            `pose ${JSON.stringify(pose)}: brute-force distance ${brute}, need ${2 * a}`,
          ).toBe(brute < 2 * a);
        },
      ),
      { seed: 42, numRuns: 300 },
    );
    expect(decided).toBeGreaterThan(250);
  });
});

describe('segmentDistance (Ericson 2005, §5.1.9)', () => {
  it('matches brute-force sampling on random segments (fast-check, seed 42)', () => {
    const point = fc.record({
      x: fc.double({ min: -1, max: 1, noNaN: true }),
      y: fc.double({ min: -1, max: 1, noNaN: true }),
      z: fc.double({ min: -1, max: 1, noNaN: true }),
    });
    fc.assert(
      fc.property(point, point, point, point, (p0: Vec3, p1: Vec3, q0: Vec3, q1: Vec3) => {
        const exact = segmentDistance(p0, p1, q0, q1).distance;
        let brute = Infinity;
        const n = 100;
        for (let i = 0; i <= n; i++) {
          for (let j = 0; j <= n; j++) {
            const s = i / n;
            const t = j / n;
            brute = Math.min(
              brute,
              Math.hypot(
                p0.x + (p1.x - p0.x) * s - q0.x - (q1.x - q0.x) * t,
                p0.y + (p1.y - p0.y) * s - q0.y - (q1.y - q0.y) * t,
                p0.z + (p1.z - p0.z) * s - q0.z - (q1.z - q0.z) * t,
              ),
            );
          }
        }
        // The exact minimum is never above the sampled one; the grid point nearest the optimum
        // is within (|p1 - p0| + |q1 - q0|)/200 ≤ 0.035 of it (segments up to 2√3 long).
        expect(exact, `segments ${JSON.stringify([p0, p1, q0, q1])}`).toBeLessThanOrEqual(
          brute + 1e-12,
        );
        expect(
          brute - exact,
          `segments ${JSON.stringify([p0, p1, q0, q1])}: brute ${brute} exact ${exact}`,
        ).toBeLessThan(0.035);
      }),
      { seed: 42, numRuns: 100 },
    );
  });
});
