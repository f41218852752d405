import { CliInputError } from './cli-input-error';

/**
 * Read an optional numeric field of an input object, within an allowed range.
 *
 * Method: undefined stays undefined; anything else must be a finite number with
 * min < value (or ≤ when `minInclusive`) and value ≤ max, else a CliInputError naming the field.
 *
 * References: none.
 *
 * @param record the object
 * @param key the field
 * @param path the object's name in messages
 * @param range allowed range and unit for the message
 * @returns the number or undefined
 * @example readOptionalNumber({ frequency: 85e3 }, 'frequency', 'coil', FREQUENCY_RANGE) // 85000
 */
export function readOptionalNumber(
  record: Record<string, unknown>,
  key: string,
  path: string,
  range: { min: number; max: number; minInclusive?: boolean; unit: string },
): number | undefined {
  const value = record[key];
  if (value === undefined) return undefined;
  const low = range.minInclusive ? '≥' : '>';
  const allowed = `allowed: ${low} ${range.min} and ≤ ${range.max} ${range.unit}`;
  const ok =
    typeof value === 'number' &&
    Number.isFinite(value) &&
    (range.minInclusive ? value >= range.min : value > range.min) &&
    value <= range.max;
  if (!ok) {
    const got = typeof value === 'number' ? String(value) : `a ${typeof value}`;
    throw new CliInputError(`${path}.${key}: ${got} is out of range; ${allowed}`);
  }
  return value as number;
}

/**
 * Operating frequency: above 100 MHz a charger coil is no longer small against the wavelength
 * and the quasi-static filament models do not apply.
 */
export const FREQUENCY_RANGE = { min: 0, max: 1e8, unit: 'Hz' };

/** Coil current: 100 kA is beyond any charger and keeps the figures far from overflow. */
export const CURRENT_RANGE = { min: 0, max: 1e5, minInclusive: true, unit: 'A' };

/** Conductor temperature: the band of copperResistivity's linear model. */
export const TEMPERATURE_RANGE = { min: -100, max: 250, minInclusive: true, unit: '°C' };
