import { rangeMessage } from './range-message';

/**
 * Guard for engineering inputs that may be zero or negative (offsets, heights, coupling):
 * a finite number, so that no NaN or Infinity enters (or leaves) the library.
 *
 * Method: `typeof` and `Number.isFinite`; the message comes from {@link rangeMessage}.
 *
 * References: none.
 *
 * @param name the parameter's name, quoted in the error
 * @param value the value to check
 * @param unit the parameter's SI unit, shown in the message (e.g. `m`); optional
 * @returns the value, unchanged
 * @throws RangeError `name: must be a finite number[, in unit] (got value)`
 * @example requireFinite('z', -0.003, 'm') // -0.003
 */
export function requireFinite(name: string, value: number, unit?: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new RangeError(rangeMessage(name, 'a finite number', value, unit));
  }
  return value;
}
