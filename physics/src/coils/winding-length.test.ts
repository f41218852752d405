// Conductor length. References: circumference 2πr; arc length of the Archimedean spiral
// r = a + bφ (integral of sqrt(r² + b²) dφ, any calculus text), checked here by direct
// numerical quadrature; rounded-rectangle perimeter 2(w + h) - (8 - 2π)c; helix length
// N·sqrt((2πr)² + p²).
import { describe, it } from 'vitest';
import { expectNear } from '../testing/expect-near';
import { parseCoil } from './parse-coil';
import { windingLength } from './winding-length';

const round = { type: 'round', diameter: 8e-4 };

/** Composite Simpson rule with n (even) intervals. */
function simpson(f: (x: number) => number, a: number, b: number, n: number): number {
  const h = (b - a) / n;
  let sum = f(a) + f(b);
  for (let i = 1; i < n; i++) sum += (i % 2 ? 4 : 2) * f(a + i * h);
  return (sum * h) / 3;
}

describe('windingLength', () => {
  it('ring and rings: circumferences', () => {
    expectNear(
      windingLength(parseCoil({ kind: 'ring', radius: 0.02, wireRadius: 5e-4 })),
      0.04 * Math.PI,
      1e-15,
      'ring',
    );
    const rings = parseCoil({
      kind: 'rings',
      wireRadius: 4e-4,
      rings: [
        { r: 0.01, z: 0 },
        { r: 0.02, z: 0.002 },
      ],
    });
    expectNear(windingLength(rings), 0.06 * Math.PI, 1e-15, 'rings');
  });
  it('circular spiral: closed-form arc length equals numerical quadrature of sqrt(r² + b²)', () => {
    const coil = parseCoil({
      kind: 'circular-spiral',
      turns: 12.3,
      innerRadius: 0.004,
      pitch: 9e-4,
      conductor: round,
    });
    const b = 9e-4 / (2 * Math.PI);
    const r0 = 0.004 - 9e-4 / 2;
    const numeric = simpson((phi) => Math.hypot(r0 + b * phi, b), 0, 2 * Math.PI * 12.3, 20000);
    // Simpson with 20000 intervals on a smooth integrand: error far below 1e-12 relative.
    expectNear(windingLength(coil), numeric, 1e-12, 'spiral arc length');
  });
  it('circular spiral: close to the sum of its ring circumferences (the other model)', () => {
    const coil = parseCoil({
      kind: 'circular-spiral',
      turns: 20,
      innerDiameter: 0.01,
      outerDiameter: 0.048,
      conductor: round,
    });
    let rings = 0;
    for (let i = 0; i < 20; i++) rings += 2 * Math.PI * (0.005 + i * 0.001);
    // The spiral's radial drift adds b²/(2r²) ≈ (p/2πr)²/2 < 1e-3 to each turn's length.
    expectNear(windingLength(coil), rings, 1e-3, 'spiral vs rings');
  });
  it('pitch above twice the inner radius: ring circumferences (no negative-radius spiral)', () => {
    const coil = parseCoil({
      kind: 'circular-spiral',
      turns: 3.5,
      innerRadius: 5e-4,
      pitch: 0.002,
      conductor: round,
    });
    const expected = 2 * Math.PI * (5e-4 + 2.5e-3 + 4.5e-3 + 0.5 * 6.5e-3);
    expectNear(windingLength(coil), expected, 1e-14, 'rings 0.5, 2.5, 4.5 mm and half of 6.5 mm');
  });
  it('two layers add one via of layerSpacing', () => {
    const one = parseCoil({
      kind: 'circular-spiral',
      turns: 5,
      innerRadius: 0.004,
      pitch: 6e-4,
      conductor: { type: 'trace', width: 4e-4, thickness: 3.5e-5 },
    });
    const two = parseCoil({ ...one, layers: 2, layerSpacing: 0.0016 });
    expectNear(windingLength(two), 2 * windingLength(one) + 0.0016, 1e-14, 'two layers');
  });
  it('rectangular spiral: sum of rounded-rectangle perimeters, the partial turn weighted', () => {
    const coil = parseCoil({
      kind: 'rectangular-spiral',
      outerWidth: 0.07,
      outerHeight: 0.05,
      cornerRadius: 0.002,
      pitch: 0.0015,
      turns: 2.5,
      conductor: round,
    });
    const perimeter = (w: number, h: number, c: number) => 2 * (w + h) - (8 - 2 * Math.PI) * c;
    const expected =
      perimeter(0.07, 0.05, 0.002) +
      perimeter(0.067, 0.047, 0.0005) +
      0.5 * perimeter(0.064, 0.044, 0);
    expectNear(windingLength(coil), expected, 1e-14, 'rectangular spiral');
  });
  it('solenoid of two layers: helices plus one radial step', () => {
    const coil = parseCoil({
      kind: 'solenoid',
      radius: 0.01,
      length: 0.02,
      turns: 20,
      layers: 2,
      layerSpacing: 6e-4,
      conductor: { type: 'round', diameter: 5e-4 },
    });
    const helix = (r: number) => 20 * Math.hypot(2 * Math.PI * r, 0.001);
    expectNear(
      windingLength(coil),
      helix(0.01) + helix(0.0106) + 6e-4,
      1e-14,
      'two-layer solenoid',
    );
  });
  it('path: polyline length, with the closing segment when closed', () => {
    const points = [
      { x: 0, y: 0, z: 0 },
      { x: 0.03, y: 0, z: 0 },
      { x: 0.03, y: 0.04, z: 0 },
    ];
    const conductor = { type: 'round', diameter: 1e-3 };
    expectNear(windingLength(parseCoil({ kind: 'path', points, conductor })), 0.07, 1e-15, 'open');
    expectNear(
      windingLength(parseCoil({ kind: 'path', points, conductor, closed: true })),
      0.12,
      1e-15,
      'closed',
    );
  });
});
