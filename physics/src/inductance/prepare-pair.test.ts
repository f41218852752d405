import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { coilFilaments } from '../coils/coil-filaments';
import type { Coil } from '../coils/coil-schema';
import { maxwellCoaxial } from '../kernels/maxwell-coaxial';
import { neumannRingPair } from '../kernels/neumann-ring-pair';
import { ringSelf } from '../kernels/ring-self';
import { transformFilaments } from '../pose/transform-filaments';
import { expectNear } from '../testing/expect-near';
import { filamentSetMutual } from './filament-set-mutual';
import { mutualInductance } from './mutual-inductance';
import { preparePair } from './prepare-pair';
import { selfInductance } from './self-inductance';

// Demo geometry of our own: phone-size spirals and a rectangular pad.
const tx = {
  kind: 'circular-spiral',
  turns: 10,
  innerDiameter: 0.02,
  outerDiameter: 0.05,
  conductor: { type: 'round', diameter: 6e-4 },
} as Coil;
const rx = {
  kind: 'circular-spiral',
  turns: 8,
  innerDiameter: 0.016,
  outerDiameter: 0.04,
  conductor: { type: 'round', diameter: 5e-4 },
} as Coil;
const rect = {
  kind: 'rectangular-spiral',
  outerWidth: 0.06,
  outerHeight: 0.04,
  cornerRadius: 0,
  pitch: 0.002,
  turns: 3,
  conductor: { type: 'round', diameter: 8e-4 },
} as Coil;
const ring = (r: number): Coil => ({ kind: 'ring', radius: r, wireRadius: 5e-4 }) as Coil;

describe('selfInductance', () => {
  it('one ring is the Rosa–Grover ring formula', () => {
    expectNear(selfInductance(ring(0.02)), ringSelf(0.02, 5e-4), 1e-15, 'ring');
  });
  it('a rings coil is its self terms plus Maxwell mutual terms', () => {
    const coil = {
      kind: 'rings',
      wireRadius: 3e-4,
      rings: [
        { r: 0.02, z: 0 },
        { r: 0.018, z: 0 },
        { r: 0.02, z: 0.002 },
      ],
    } as Coil;
    const rr = [
      [0.02, 0],
      [0.018, 0],
      [0.02, 0.002],
    ];
    let want = 0;
    for (const [r, z] of rr) {
      want += ringSelf(r, 3e-4);
      for (const [r2, z2] of rr) if (r2 !== r || z2 !== z) want += maxwellCoaxial(r, r2, z2 - z);
    }
    expectNear(selfInductance(coil), want, 1e-14, 'rings');
  });
  it('grows with turns and with ferrite permeability; the high-frequency form is lower', () => {
    const more = { ...tx, turns: 12 } as Coil;
    expect(selfInductance(more)).toBeGreaterThan(selfInductance(tx));
    const l1 = selfInductance({ ...tx, backing: { mur: 10, distance: 1e-3 } } as Coil);
    const l2 = selfInductance({ ...tx, backing: { mur: 1000, distance: 1e-3 } } as Coil);
    expect(l1).toBeGreaterThan(selfInductance(tx));
    expect(l2).toBeGreaterThan(l1);
    expect(selfInductance(tx, { highFrequency: true })).toBeLessThan(selfInductance(tx));
  });
  it('an infinitely permeable plate right under one ring adds its coaxial image: L + M(2d)', () => {
    // Jackson problem 5.17 with mur -> ∞ (weight (mur-1)/(mur+1) = 1 - 2e-5 at mur = 1e5).
    const w = (1e5 - 1) / (1e5 + 1);
    const want = ringSelf(0.02, 5e-4) + w * maxwellCoaxial(0.02, 0.02, 0.004);
    expectNear(
      selfInductance({ ...ring(0.02), backing: { mur: 1e5, distance: 0.002 } } as Coil),
      want,
      1e-14,
      'image',
    );
  });
  it('rejects bad coils with a RangeError naming the field', () => {
    expect(() => selfInductance({ kind: 'ring', radius: -1, wireRadius: 1e-4 } as Coil)).toThrow(
      /radius/,
    );
    expect(() => selfInductance({ kind: 'ring', radius: NaN, wireRadius: 1e-4 } as Coil)).toThrow(
      RangeError,
    );
  });
});

describe('preparePair routes agree with the generic filament sum and with Neumann', () => {
  const pair = preparePair(tx, rx);
  const txF = coilFilaments(tx);
  const rxF = coilFilaments(rx);
  it('offsets at one gap (Bessel route) vs pairwise Babic integrals', () => {
    const poses = [
      { z: 0.003 },
      { x: 0.01, z: 0.003 },
      { x: -0.02, y: 0.015, z: 0.003 },
      { x: 0.04, z: 0.003 },
    ];
    const m = pair.mutualMany(poses);
    const peak = m[0];
    poses.forEach((p, i) => {
      // 1e-9 of the aligned M: Bessel truncation ~1e-10; zero crossings make per-pose ratios
      // unfair.
      expectNear(
        m[i],
        filamentSetMutual(txF, transformFilaments(rxF, p)),
        1e-9 * peak,
        `pose ${JSON.stringify(p)}`,
        true,
      );
    });
  });
  it('a tilted pose vs Neumann brute force summed over the ring pairs', () => {
    const p = { x: 0.004, y: -0.002, z: 0.006, tiltX: 5, tiltY: -3, yaw: 20 };
    const placed = transformFilaments(rxF, p);
    let brute = 0;
    for (const a of txF.rings) for (const b of placed.rings) brute += neumannRingPair(a, b, 256);
    // Trapezoid 256^2 on separations >= 2 mm of 10–25 mm rings: ~1e-10; tolerance 1e-8.
    expectNear(pair.mutual(p), brute, 1e-8, 'tilted');
  });
  it('M12 = M21: swapping coils with the opposite offset (untilted)', () => {
    const a = preparePair(tx, rx).mutual({ x: 0.007, y: 0.002, z: 0.004 });
    const b = preparePair(rx, tx).mutual({ x: -0.007, y: -0.002, z: -0.004 });
    expectNear(a, b, 1e-9, 'reciprocity');
  });
  it('a polygon Tx against a ring Rx in a tilted pose is finite and reciprocal', () => {
    const p = { x: 0.003, y: 0.001, z: 0.005, tiltX: 5 };
    const m = preparePair(rect, ring(0.015)).mutual(p);
    expect(Number.isFinite(m)).toBe(true);
    expect(m).toBeGreaterThan(0);
  });
});

describe('polygon against ring stack (stack route) vs the per-ring adaptive route', () => {
  const rectF = coilFilaments(rect);
  const rxF = coilFilaments(rx);
  // Rx of 20 mm radius tilted up to 4° dips 1.4 mm: a 3 mm gap keeps the wires apart.
  const tilted = fc.record({
    x: fc.double({ min: -0.03, max: 0.03, noNaN: true }),
    y: fc.double({ min: -0.03, max: 0.03, noNaN: true }),
    z: fc.double({ min: 0.003, max: 0.02, noNaN: true }),
    tiltX: fc.double({ min: -4, max: 4, noNaN: true }),
    tiltY: fc.double({ min: -4, max: 4, noNaN: true }),
    yaw: fc.double({ min: -180, max: 180, noNaN: true }),
  });
  it('rectangular Tx, spiral Rx: 1e-9 of the aligned M (fast-check, seeded)', () => {
    const pair = preparePair(rect, rx);
    const peak = Math.abs(pair.mutual({ z: 0.003 }));
    fc.assert(
      fc.property(tilted, (p) => {
        // Stated panel error of the route (ratio 2, 10 points) ~1e-9; the old route ~1e-12.
        expectNear(
          pair.mutual(p),
          filamentSetMutual(rectF, transformFilaments(rxF, p)),
          1e-9 * peak,
          `pose ${JSON.stringify(p)}`,
          true,
        );
      }),
      { seed: 42, numRuns: 12 },
    );
  });
  it('spiral Tx, rectangular Rx (the Tx as the stack): same agreement', () => {
    const pair = preparePair(tx, rect);
    const txF = coilFilaments(tx);
    const peak = Math.abs(pair.mutual({ z: 0.003 }));
    fc.assert(
      fc.property(tilted, (p) => {
        expectNear(
          pair.mutual(p),
          filamentSetMutual(txF, transformFilaments(rectF, p)),
          1e-9 * peak,
          `pose ${JSON.stringify(p)}`,
          true,
        );
      }),
      { seed: 43, numRuns: 8 },
    );
  });
  it('M12 = M21 across the two stack routes (untilted, opposite offsets)', () => {
    const a = preparePair(rect, rx).mutual({ x: 0.006, y: -0.003, z: 0.004 });
    const b = preparePair(rx, rect).mutual({ x: -0.006, y: 0.003, z: -0.004 });
    expectNear(a, b, 1e-9, 'reciprocity');
  });
  it('a map gives the same numbers in one call as pose by pose', () => {
    const poses = Array.from({ length: 9 }, (_, i) => ({ x: 0.005 * (i - 4), z: 0.004, tiltX: 5 }));
    const once = preparePair(rect, rx).mutualMany(poses);
    const single = preparePair(rect, rx);
    const oneByOne = [...poses]
      .reverse()
      .map((p) => single.mutual(p))
      .reverse();
    expect(Array.from(once)).toEqual(oneByOne);
  });
});

describe('invariants of a prepared pair (fast-check, seeded)', () => {
  const pair = preparePair(tx, rx);
  const pose = fc.record({
    x: fc.double({ min: -0.03, max: 0.03, noNaN: true }),
    y: fc.double({ min: -0.03, max: 0.03, noNaN: true }),
    // 4 mm and ±4°: a 25 mm ring tilted 4° dips 1.7 mm, so the coils never touch.
    z: fc.double({ min: 0.004, max: 0.05, noNaN: true }),
    tiltX: fc.double({ min: -4, max: 4, noNaN: true }),
    tiltY: fc.double({ min: -4, max: 4, noNaN: true }),
  });
  it('|k| <= 1', () => {
    fc.assert(
      fc.property(pose, (p) => Math.abs(pair.coupling(p)) <= 1),
      { seed: 42, numRuns: 25 },
    );
  });
  it('Rx yaw about its own axis and pose rotation about the Tx axis change nothing', () => {
    fc.assert(
      fc.property(pose, fc.double({ min: -180, max: 180, noNaN: true }), (p, yaw) => {
        const t = (yaw * Math.PI) / 180;
        const rotated = {
          z: p.z,
          x: Math.cos(t) * p.x - Math.sin(t) * p.y,
          y: Math.sin(t) * p.x + Math.cos(t) * p.y,
          yaw,
        };
        const base = pair.mutual({ x: p.x, y: p.y, z: p.z });
        expectNear(
          pair.mutual(rotated),
          base,
          1e-9 * Math.abs(pair.mutual({ z: p.z })),
          'rotated pose',
          true,
        );
      }),
      { seed: 42, numRuns: 15 },
    );
  });
  it('M -> 0 with distance', () => {
    const m = pair.mutualMany([{ z: 0.01 }, { z: 0.1 }, { z: 1 }, { z: 10 }]);
    for (let i = 1; i < m.length; i++) expect(Math.abs(m[i])).toBeLessThan(Math.abs(m[i - 1]));
    // Dipole decay: M(10 m) / M(1 cm) ~ (coil area)^2 / (2 d^3) / M(1 cm) ≈ 1e-8; bound 1e-7.
    expect(m[3] / m[0]).toBeLessThan(1e-7);
  });
});

describe('ferrite backing in a pair', () => {
  const backed = { ...tx, backing: { mur: 2000, distance: 1e-3 } } as Coil;
  it('M = M(Tx, Rx) + w M(image(Tx), Rx): one image term, raising M on the same side', () => {
    const p = { x: 0.005, z: 0.004 };
    const free = mutualInductance(tx, rx, p);
    const withPlate = mutualInductance(backed, rx, p);
    expect(withPlate).toBeGreaterThan(free);
    // mur = 1 gives weight 0: no change at all.
    expectNear(
      mutualInductance({ ...tx, backing: { mur: 1, distance: 1e-3 } } as Coil, rx, p),
      free,
      1e-15,
      'mur 1',
    );
  });
  it('the Rx inductance rises near the plate and k stays within 1', () => {
    const pair = preparePair(backed, rx);
    expect(pair.L2At({ z: 0.002 })).toBeGreaterThan(pair.L2At({ z: 0.02 }));
    expect(pair.L2At({ z: 0.02 })).toBeGreaterThan(pair.L2);
    expect(Math.abs(pair.coupling({ z: 0.002 }))).toBeLessThan(1);
  });
});

describe('bad poses and pairs', () => {
  it('rejects intersecting coils, NaN poses and an Rx backing', () => {
    expect(() => mutualInductance(tx, rx, { z: 0 })).toThrow(RangeError);
    expect(() => mutualInductance(tx, rx, { z: NaN })).toThrow(/z/);
    expect(() => preparePair(tx, { ...rx, backing: { mur: 100, distance: 1e-3 } } as Coil)).toThrow(
      /rx.backing/,
    );
  });
});
