import { describe, expect, it } from 'vitest';
import { expectNear } from '../testing/expect-near';
import { conductorArea } from './conductor-area';
import { dcResistance } from './dc-resistance';

describe('dcResistance', () => {
  it('gives the handbook ohms per km of AWG 18 copper (1.024 mm: 20.95 Ω/km, from memory)', () => {
    // The wire table rounds and uses 1.7241e-8; 1 % covers both.
    expectNear(dcResistance(1000, { type: 'round', diameter: 1.024e-3 }), 20.95, 0.01, 'AWG 18');
  });

  it('is rho l / A for a known length of round wire', () => {
    const r = dcResistance(10, { type: 'round', diameter: 1e-3 }, 1.72e-8);
    // rho l / A = 1.72e-8 · 10 / (π · 0.25e-6) = 0.21899 Ω; rounding only.
    expectNear(r, (1.72e-8 * 10) / (Math.PI * 0.25e-6), 1e-14, 'R of 10 m, 1 mm');
    expectNear(r, 0.219, 0.001, 'R of 10 m, 1 mm, rounded');
  });

  it('counts only the strands of a Litz bundle and w·t of a trace', () => {
    const litz = {
      type: 'litz' as const,
      strands: 100,
      strandDiameter: 0.1e-3,
      bundleDiameter: 1.4e-3,
    };
    // 100 · π(0.1 mm)²/4 = π(1 mm)²/4: the strands hold the copper of one 1 mm wire.
    expectNear(conductorArea(litz), conductorArea({ type: 'round', diameter: 1e-3 }), 1e-14, 'A');
    expectNear(conductorArea({ type: 'trace', width: 2e-3, thickness: 35e-6 }), 7e-8, 1e-14, 'A');
    expectNear(
      dcResistance(2, { type: 'trace', width: 1e-3, thickness: 35e-6 }),
      (1.72e-8 * 2) / 35e-9,
      1e-14,
      'trace R',
    );
  });

  it('is zero for zero length and rejects bad conductors naming the field', () => {
    expect(dcResistance(0, { type: 'round', diameter: 1e-3 })).toBe(0);
    expect(() => dcResistance(1, { type: 'round', diameter: -1e-3 })).toThrow(
      /conductor.diameter: must be a finite number > 0/,
    );
    expect(() => dcResistance(1, { type: 'litz', strands: 2.5, strandDiameter: 1e-4 })).toThrow(
      /conductor.strands/,
    );
    expect(() => dcResistance(-1, { type: 'round', diameter: 1e-3 })).toThrow(/length/);
    expect(() => dcResistance(1, { type: 'trace', width: 1e-3, thickness: NaN })).toThrow(
      /conductor.thickness/,
    );
  });
});
