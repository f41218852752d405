import { describe, expect, it } from 'vitest';
import { expectNear } from '../testing/expect-near';
import { COPPER_RESISTIVITY_20C, copperResistivity } from './copper-resistivity';
import { skinDepth } from './skin-depth';

describe('skinDepth', () => {
  // Textbook values: copper ~0.23 mm at 85 kHz, ~0.15 mm at 200 kHz, ~25 µm at 6.78 MHz.
  // The textbook figures carry two significant digits, hence a 3 % band.
  it.each([
    [85e3, 0.23e-3],
    [200e3, 0.15e-3],
    [6.78e6, 25e-6],
  ])('copper at %d Hz is about %d m', (f, expected) => {
    expectNear(skinDepth(COPPER_RESISTIVITY_20C, f), expected, 0.03, `delta(f = ${f})`);
  });

  it('equals sqrt(2 rho / (omega mu)) (the same textbook formula in its other form)', () => {
    const rho = copperResistivity(80);
    const f = 110e3;
    const expected = Math.sqrt((2 * rho) / (2 * Math.PI * f * 4e-7 * Math.PI));
    // 4π·1e-7 differs from the CODATA mu0 by 5.5e-10 relative; 1e-9 covers it.
    expectNear(skinDepth(rho, f), expected, 1e-9, 'delta vs 2rho/omega mu');
  });

  it('scales as 1/sqrt(f mur)', () => {
    const d = skinDepth(1.72e-8, 1e5);
    // Pure arithmetic identities: only rounding error, 1e-14.
    expectNear(skinDepth(1.72e-8, 4e5), d / 2, 1e-14, 'f x4');
    expectNear(skinDepth(1.72e-8, 1e5, 100), d / 10, 1e-14, 'mur 100');
  });

  it('rejects zero, negative and non-finite inputs naming the parameter', () => {
    expect(() => skinDepth(1.72e-8, 0)).toThrow(/frequency: must be a finite number > 0/);
    expect(() => skinDepth(-1, 1e5)).toThrow(/resistivity/);
    expect(() => skinDepth(1.72e-8, NaN)).toThrow(RangeError);
    expect(() => skinDepth(1.72e-8, 1e5, 0)).toThrow(/mur/);
  });
});

describe('copperResistivity', () => {
  it('is the IACS value at 20 °C (from memory: 1/58 Ω·mm²/m = 1.7241e-8)', () => {
    expect(copperResistivity()).toBe(1.72e-8);
    // The rounded constant sits 0.24 % below 1/58e6; 0.3 % states that rounding.
    expectNear(copperResistivity(20), 1 / 58e6, 0.003, 'rho(20 °C) vs IACS');
  });

  it('rises about 39 % from 20 °C to 120 °C (alpha 0.00393 /K, from memory)', () => {
    expectNear(copperResistivity(120) / copperResistivity(20), 1.393, 1e-12, 'rho ratio');
  });

  it('refuses temperatures outside the linear model', () => {
    expect(() => copperResistivity(400)).toThrow(/temperature: must be between/);
    expect(() => copperResistivity(NaN)).toThrow(/temperature/);
  });
});
