import type { QuantityUnit } from './parse-quantity';
import { unitMath } from './unit-math';

/**
 * Writes an SI value in a field's display unit, for the text of a unit-aware input:
 * 0.045 m in `mm` → "45 mm". Twelve significant digits, so that 0.045 / 0.001 does not print as
 * 44.999999999999996 and a value typed in another unit survives the round trip.
 *
 * @param value the value in the stored unit
 * @param unit the stored unit
 * @param display the unit to write it in (the stored unit when missing)
 * @returns e.g. "45 mm"
 * @example toUnitText(0.045, 'm', 'mm') // '45 mm'
 */
export function toUnitText(value: number, unit: QuantityUnit, display?: string): string {
  if (unit === '1') return String(Number(value.toPrecision(12)));
  const target = display ?? unit;
  const converted = target === unit ? value : unitMath.unit(value, unit).toNumber(target);
  return `${Number(converted.toPrecision(12))} ${target}`;
}
