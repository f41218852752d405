import type { QuantityUnit } from './parse-quantity';

export interface FormatQuantityOptions {
  /** Significant digits (3 by default: "45.0 mm", "142 kHz"). */
  digits?: number;
  /** Drops trailing zeros ("100 µm" rather than "100.0 µm"), for messages. */
  trim?: boolean;
}

/** Engineering prefixes, powers of 1000, from atto to giga. */
const prefixes: [number, string][] = [
  [1e9, 'G'],
  [1e6, 'M'],
  [1e3, 'k'],
  [1, ''],
  [1e-3, 'm'],
  [1e-6, 'µ'],
  [1e-9, 'n'],
  [1e-12, 'p'],
  [1e-15, 'f'],
];

/** Units a designer reads without prefixes above 1 (a 2.5 m cable, not 2.5 m with k). */
const symbols: Record<Exclude<QuantityUnit, '1'>, string> = {
  m: 'm',
  Hz: 'Hz',
  A: 'A',
  deg: '°',
  H: 'H',
};

/**
 * Formats an SI value for a label with an engineering prefix (powers of 1000) and a fixed count
 * of significant digits: 0.045 m → "45.0 mm", 1.23e-5 H → "12.3 µH", 142e3 Hz → "142 kHz".
 *
 * Method: the prefix is the largest power of 1000 not above |value| (so the mantissa lies in
 * [1, 1000)), after rounding to the digits asked for, so 999.96 mm reads "1.00 m". Lengths never
 * take a prefix above the metre; angles and plain numbers take none. Zero prints without a prefix;
 * non-finite values print as "—".
 *
 * @param value the value in SI units (degrees for angles)
 * @param unit the SI unit, or any other symbol (Ω, J, s, W) taking the same prefixes
 * @param options significant digits
 * @returns e.g. "45.0 mm"
 * @example formatQuantity(1.23e-5, 'H') // '12.3 µH'
 */
export function formatQuantity(
  value: number,
  unit: QuantityUnit | string,
  options: FormatQuantityOptions = {},
): string {
  const digits = options.digits ?? 3;
  const toDigits = (v: number) =>
    options.trim ? String(Number(v.toPrecision(digits))) : fixed(v, digits);
  if (!Number.isFinite(value)) return '—';
  const symbol = unit in symbols ? symbols[unit as keyof typeof symbols] : unit;
  const suffix = (prefix: string) =>
    symbol === '1' ? '' : symbol === '°' ? '°' : ` ${prefix}${symbol}`;
  if (value === 0 || symbol === '1' || symbol === '°') {
    return `${toDigits(value)}${suffix('')}`;
  }
  const size = Math.abs(Number(value.toPrecision(digits)));
  const allowed = unit === 'm' ? prefixes.filter(([f]) => f <= 1) : prefixes;
  const [factor, prefix] =
    allowed.find(([f]) => size >= f * (1 - 1e-12)) ?? allowed[allowed.length - 1];
  return `${toDigits(value / factor)}${suffix(prefix)}`;
}

/** `digits` significant digits, without exponent notation for mantissas up to 1e6. */
function fixed(value: number, digits: number): string {
  const text = value.toPrecision(digits);
  if (!text.includes('e')) return text;
  // toPrecision writes 1234 at 3 digits as "1.23e+3": spell it out instead.
  return String(Number(text));
}
