/**
 * Guard for engineering inputs that may be zero or negative (offsets, heights, weights).
 *
 * @param name - the parameter's name, quoted in the error.
 * @param value - the value to check.
 * @param unit - unit shown in the message (e.g. 'm').
 * @returns the value, unchanged.
 * @throws RangeError naming the parameter and the allowed range.
 *
 * @example requireFinite('z', -0.003, 'm'); // -0.003
 */
export function requireFinite(name: string, value: number, unit: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new RangeError(
      `${name} must be a finite number${unit ? ' in ' + unit : ''} (got ${String(value)})`,
    );
  }
  return value;
}
