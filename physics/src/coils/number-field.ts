import { z } from 'zod';
import { formatLength } from './format-length';

/** What a number field allows; `unit: 'm'` formats values as lengths. */
export interface NumberFieldSpec {
  min: number;
  max: number;
  unit: 'm' | 'deg' | '';
  /** The minimum itself is not allowed (turns > 0). */
  minExclusive?: boolean;
  integer?: boolean;
}

/**
 * A zod number schema that accepts only finite numbers within `spec`, with error messages that
 * state the received value and the allowed range (the caller adds the field path).
 *
 * Method: `z.number` rejects NaN and ±Infinity; a refinement checks the range and integrality.
 *
 * @param spec allowed range and unit
 * @returns a zod schema for a number
 * @example numberField({ min: 1e-4, max: 10, unit: 'm' }).parse(0.02) // 0.02
 */
export function numberField(spec: NumberFieldSpec) {
  const allowed = `allowed: ${describeRange(spec)}`;
  return z
    .number({
      error: (issue) => `expected a finite number, received ${show(issue.input)}; ${allowed}`,
    })
    .superRefine((value, ctx) => {
      const low = spec.minExclusive ? value <= spec.min : value < spec.min;
      if (low || value > spec.max || (spec.integer && !Number.isInteger(value))) {
        ctx.addIssue({
          code: 'custom',
          message: `${format(value, spec)} is out of range; ${allowed}`,
        });
      }
    });
}

function describeRange(spec: NumberFieldSpec): string {
  const kind = spec.integer ? 'an integer ' : '';
  const low = spec.minExclusive ? '>' : '≥';
  return `${kind}${low} ${format(spec.min, spec)} and ≤ ${format(spec.max, spec)}`;
}

function format(value: number, spec: NumberFieldSpec): string {
  if (spec.unit === 'm') return formatLength(value);
  return spec.unit === 'deg' ? `${value}°` : String(value);
}

function show(input: unknown): string {
  if (typeof input === 'number') return String(input);
  if (input === undefined) return 'nothing';
  return typeof input === 'string' ? `the text "${input.slice(0, 40)}"` : typeof input;
}
