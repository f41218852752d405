import { rangeMessage } from './range-message';

/**
 * Guard for engineering inputs that must be strictly positive (radii, lengths, frequencies,
 * inductances, Q): a finite number above zero.
 *
 * Method: `typeof`, `Number.isFinite` and `> 0`; the message comes from {@link rangeMessage}.
 *
 * References: none.
 *
 * @param name the parameter's name, quoted in the error
 * @param value the value to check
 * @param unit the parameter's SI unit, shown in the message (e.g. `m`); optional
 * @returns the value, unchanged
 * @throws RangeError `name: must be a finite number > 0[, in unit] (got value)`
 * @example requirePositive('radius', 0.02, 'm') // 0.02
 */
export function requirePositive(name: string, value: number, unit?: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value <= 0) {
    throw new RangeError(rangeMessage(name, 'a finite number > 0', value, unit));
  }
  return value;
}
