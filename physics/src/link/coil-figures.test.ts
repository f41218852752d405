import { describe, expect, it } from 'vitest';
import { parseCoil } from '../coils/parse-coil';
import { roundWireAcFactor } from '../conductors/round-wire-ac-factor';
import { expectNear } from '../testing/expect-near';
import { coilFigures } from './coil-figures';

const MU0 = 4e-7 * Math.PI;

describe('coilFigures', () => {
  const ring = parseCoil({ kind: 'ring', radius: 0.02, wireRadius: 5e-4 });

  it('gives a ring the Rosa & Grover inductance, ρl/A and the Bessel skin factor', () => {
    const f = coilFigures(ring, { frequency: 85e3, current: 2 });
    // Ring of round wire, uniform current: L = mu0 R (ln(8R/a) − 7/4) (Rosa & Grover,
    // Bull. Bureau of Standards 8, 1912; from memory). 4π·1e-7 vs CODATA mu0: 1e-9 relative.
    const L = MU0 * 0.02 * (Math.log((8 * 0.02) / 5e-4) - 1.75);
    expectNear(f.L, L, 1e-8, 'L of the ring');
    // R = rho 2πR / (π a²) with rho = 1.72e-8 Ω·m: arithmetic, 1e-12.
    const Rdc = (1.72e-8 * 2 * Math.PI * 0.02) / (Math.PI * 5e-4 * 5e-4);
    expectNear(f.Rdc, Rdc, 1e-12, 'Rdc');
    expectNear(f.Rac!, Rdc * roundWireAcFactor(1e-3, f.skinDepth!), 1e-12, 'Rac');
    expectNear(f.Q!, (2 * Math.PI * 85e3 * f.L) / f.Rac!, 1e-12, 'Q');
    expectNear(f.storedEnergy, 0.5 * f.L * 4, 1e-12, 'W at 2 A');
    expectNear(f.timeConstant, f.L / Rdc, 1e-12, 'tau');
    expectNear(f.wireLength, 2 * Math.PI * 0.02, 1e-12, 'wire length');
    // Skin depth of copper at 85 kHz ≈ 0.23 mm (textbook, two digits): 3 %.
    expectNear(f.skinDepth!, 0.23e-3, 0.03, 'delta');
  });

  it('leaves the frequency figures null without a frequency, and warms the copper', () => {
    const dc = coilFigures(ring);
    expect(dc).toMatchObject({ Rac: null, Q: null, skinDepth: null });
    // Stored energy defaults to 1 A: ½ L.
    expectNear(dc.storedEnergy, dc.L / 2, 1e-15, 'W at 1 A');
    // 80 K above 20 °C at 0.00393 /K: R × 1.3144 (from memory).
    expectNear(coilFigures(ring, { temperature: 100 }).Rdc, dc.Rdc * 1.3144, 1e-12, 'R(100 °C)');
  });

  it('keeps Litz close to its DC resistance where solid wire of the same copper is not', () => {
    const conductor = { type: 'litz', strands: 100, strandDiameter: 0.1e-3 };
    const litz = parseCoil({ kind: 'solenoid', radius: 0.02, length: 0.03, turns: 10, conductor });
    const solid = parseCoil({
      kind: 'solenoid',
      radius: 0.02,
      length: 0.03,
      turns: 10,
      conductor: { type: 'round', diameter: 1e-3 },
    });
    const a = coilFigures(litz, { frequency: 200e3 });
    const b = coilFigures(solid, { frequency: 200e3 });
    // Same copper area, same length: the same Rdc to rounding.
    expectNear(a.Rdc, b.Rdc, 1e-12, 'Rdc');
    expect(a.Rac! / a.Rdc).toBeLessThan(1.001);
    expect(b.Rac! / b.Rdc).toBeGreaterThan(1.5);
  });

  it('rejects bad options naming them', () => {
    expect(() => coilFigures(ring, { frequency: -1 })).toThrow(
      /frequency: must be a finite number > 0/,
    );
    expect(() => coilFigures(ring, { current: -1 })).toThrow(
      /current: must be a finite number >= 0/,
    );
    expect(() => coilFigures(ring, { temperature: 1000 })).toThrow(/temperature/);
  });
});
