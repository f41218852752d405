import type { Unit } from 'mathjs';
import { unitMath as math } from './unit-math';

/** The SI unit a field stores: metres, hertz, amperes, degrees (angles), henries, or a number. */
export type QuantityUnit = 'm' | 'Hz' | 'A' | 'deg' | 'H' | '1';

export interface ParseQuantityOptions {
  /** What the field stores (SI, degrees for angles). */
  unit: QuantityUnit;
  /** The unit a bare number is read in, e.g. `mm` for a length field shown in millimetres. */
  bare?: string;
}

export type ParsedQuantity = { value: number } | { error: string };

/** Words for the error messages: what each unit measures and an example of what to type. */
const quantityNames: Record<QuantityUnit, { name: string; example: string }> = {
  m: { name: 'a length', example: '45 mm' },
  Hz: { name: 'a frequency', example: '120 kHz' },
  A: { name: 'a current', example: '1.5 A' },
  deg: { name: 'an angle', example: '3 deg' },
  H: { name: 'an inductance', example: '12 uH' },
  '1': { name: 'a plain number', example: '12' },
};

/** Units that name a kind of quantity, to tell the user what they typed instead. */
const otherQuantities: [string, string][] = [
  ['m', 'a length'],
  ['Hz', 'a frequency'],
  ['A', 'a current'],
  ['deg', 'an angle'],
  ['H', 'an inductance'],
  ['ohm', 'a resistance'],
  ['s', 'a time'],
  ['V', 'a voltage'],
  ['W', 'a power'],
  ['F', 'a capacitance'],
  ['kg', 'a mass'],
  ['T', 'a flux density'],
];

/**
 * Reads what a user typed into a unit-aware field: a number with a unit (`45 mm`, `0.2 in`,
 * `120 kHz`, `1.5 A`, `3 deg`, `12 µH`) or a bare number in the field's display unit.
 *
 * Method: mathjs's unit parser (units and SI prefixes only, no expression evaluation); the unit's
 * dimensions must match the field's; the value is converted to the field's stored unit. A
 * decimal comma (`0,2 in`) is read as a point when the text holds no other comma.
 *
 * @param text what the user typed
 * @param options the stored unit and the unit of a bare number
 * @returns `{ value }` in the stored unit, or `{ error }` saying what is allowed
 * @example parseQuantity('0.2 in', { unit: 'm', bare: 'mm' }) // { value: 0.00508 }
 */
export function parseQuantity(text: string, options: ParseQuantityOptions): ParsedQuantity {
  const { unit } = options;
  const expected = quantityNames[unit];
  const cleaned = normalise(text);
  if (cleaned === '') return { error: `Enter ${expected.name}, e.g. ${expected.example}` };

  const bareNumber = Number(cleaned);
  if (cleaned.match(/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i) && Number.isFinite(bareNumber)) {
    if (unit === '1' || !options.bare) return { value: bareNumber };
    return parseQuantity(`${cleaned} ${options.bare}`, { unit });
  }

  let parsed: Unit;
  try {
    parsed = math.unit(cleaned);
  } catch {
    return {
      error: `Cannot read “${text.trim()}”; type ${expected.name}, e.g. ${expected.example}`,
    };
  }
  if (parsed.value === null || parsed.value === undefined) {
    return { error: `Add a number before the unit, e.g. ${expected.example}` };
  }
  if (unit === '1') {
    return { error: `Expected a plain number without a unit, e.g. ${expected.example}` };
  }
  if (!parsed.equalBase(math.unit(unit))) {
    const other = otherQuantities.find(([u]) => parsed.equalBase(math.unit(u)));
    const what = other ? `${other[1]}` : 'not a quantity this field takes';
    return {
      error: `“${text.trim()}” is ${what}; expected ${expected.name}, e.g. ${expected.example}`,
    };
  }
  const value = parsed.toNumber(unit);
  if (!Number.isFinite(value)) return { error: `“${text.trim()}” is not a finite number` };
  return { value };
}

/** Micro signs to mathjs's `u`, spaces trimmed, a lone decimal comma to a point. */
function normalise(text: string): string {
  let out = text.trim().replace(/[µμ]/g, 'u').replace(/Ω/g, 'ohm');
  if ((out.match(/,/g) ?? []).length === 1 && !out.includes('.')) out = out.replace(',', '.');
  return out;
}
