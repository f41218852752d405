import { rangeMessage } from './range-message';

/**
 * Guard for engineering inputs that may be zero but not negative (currents, lengths of wire,
 * radial offsets): a finite number ≥ 0.
 *
 * Method: `typeof`, `Number.isFinite` and `>= 0`; the message comes from {@link rangeMessage}.
 *
 * References: none.
 *
 * @param name the parameter's name, quoted in the error
 * @param value the value to check
 * @param unit the parameter's SI unit, shown in the message (e.g. `A`); optional
 * @returns the value, unchanged
 * @throws RangeError `name: must be a finite number >= 0[, in unit] (got value)`
 * @example requireNonNegative('current', 0, 'A') // 0
 */
export function requireNonNegative(name: string, value: number, unit?: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value < 0) {
    throw new RangeError(rangeMessage(name, 'a finite number >= 0', value, unit));
  }
  return value;
}
