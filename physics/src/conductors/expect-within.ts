import { expect } from 'vitest';

/**
 * Test support: assert |actual − expected| ≤ tol (absolute, or relative to |expected| when
 * `relative`), with a failure message that prints input, result, expected and tolerance.
 */
export function expectWithin(
  actual: number,
  expected: number,
  tol: number,
  what: string,
  relative = true,
): void {
  const err = Math.abs(actual - expected);
  const bound = relative ? tol * Math.abs(expected) : tol;
  const kind = relative ? 'relative' : 'absolute';
  expect(
    Number.isFinite(actual) && err <= bound,
    `${what}: got ${actual}, expected ${expected} ± ${tol} (${kind}); error ${err}`,
  ).toBe(true);
}
