// The input guards. Reference: the rule of the library's style guide — bad input is a RangeError
// that names the parameter and its allowed range, and no NaN or Infinity passes.
import { describe, expect, it } from 'vitest';
import { requireFinite } from './require-finite';
import { requireNonNegative } from './require-non-negative';
import { requirePositive } from './require-positive';

const bad = [NaN, Infinity, -Infinity, '1' as unknown as number, undefined as unknown as number];

describe('requireFinite', () => {
  it('returns any finite number unchanged, zero and negatives included', () => {
    for (const v of [0, -0.003, 1e300, -5e-324]) expect(requireFinite('z', v, 'm')).toBe(v);
  });
  it('refuses NaN, infinities and non-numbers, naming the parameter and the unit', () => {
    expect(() => requireFinite('z', NaN, 'm')).toThrow(
      new RangeError('z: must be a finite number, in m (got NaN)'),
    );
    for (const v of bad) expect(() => requireFinite('point.x', v)).toThrow(/^point\.x: /);
  });
});

describe('requirePositive', () => {
  it('returns a positive number unchanged', () => {
    expect(requirePositive('radius', 0.02, 'm')).toBe(0.02);
    expect(requirePositive('Q1', 5e-324)).toBe(5e-324);
  });
  it('refuses zero, negatives and non-finite values with the allowed range', () => {
    expect(() => requirePositive('r1', -1, 'm')).toThrow(
      new RangeError('r1: must be a finite number > 0, in m (got -1)'),
    );
    expect(() => requirePositive('Q1', 0)).toThrow(
      new RangeError('Q1: must be a finite number > 0 (got 0)'),
    );
    for (const v of [...bad, -0]) expect(() => requirePositive('L', v, 'H')).toThrow(RangeError);
  });
});

describe('requireNonNegative', () => {
  it('returns zero and positive numbers unchanged', () => {
    for (const v of [0, 2.5]) expect(requireNonNegative('current', v, 'A')).toBe(v);
  });
  it('refuses negatives and non-finite values with the allowed range', () => {
    expect(() => requireNonNegative('current', -2, 'A')).toThrow(
      new RangeError('current: must be a finite number >= 0, in A (got -2)'),
    );
    for (const v of bad) expect(() => requireNonNegative('rho', v)).toThrow(/^rho: .* >= 0/);
  });
});
