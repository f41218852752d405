/**
 * Guard for engineering inputs: a finite number strictly above zero.
 *
 * @param name - the parameter's name, quoted in the error.
 * @param value - the value to check.
 * @param unit - unit shown in the message (e.g. 'm').
 * @returns the value, unchanged.
 * @throws RangeError naming the parameter and the allowed range.
 *
 * @example requirePositive('radius', 0.02, 'm'); // 0.02
 */
export function requirePositive(name: string, value: number, unit: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value <= 0) {
    throw new RangeError(
      `${name} must be a finite number > 0${unit ? ' ' + unit : ''} (got ${String(value)})`,
    );
  }
  return value;
}
