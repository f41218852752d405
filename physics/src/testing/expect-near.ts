import { expect } from 'vitest';

/**
 * Test support: asserts |result − expected| ≤ tolerance (relative to |expected| unless
 * `absolute`), with a failure message that prints the input, result, expected and tolerance.
 */
export function expectNear(
  result: number,
  expected: number,
  tolerance: number,
  input: string,
  absolute = false,
): void {
  const error = Math.abs(result - expected);
  const bound = absolute ? tolerance : tolerance * Math.abs(expected);
  expect(
    Number.isFinite(result) && error <= bound,
    `${input}: result ${result}, expected ${expected}, tolerance ${tolerance} ` +
      `(${absolute ? 'absolute' : 'relative'}); error ${error}`,
  ).toBe(true);
}
