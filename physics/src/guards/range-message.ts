/**
 * The one wording of a guard's `RangeError`: the parameter, what is allowed (with its unit when
 * there is one) and what was given, e.g. `r1: must be a finite number > 0, in m (got -1)`.
 *
 * Method: `name: must be <allowed>[, in <unit>] (got <value>)`. The message starts with
 * `name: `, so callers that add a path in front (`pairs[2].`) see a named field.
 *
 * References: none.
 *
 * @param name the parameter's name, e.g. `r1` or `conductor.diameter`
 * @param allowed what is allowed, e.g. `a finite number > 0`
 * @param value the value given (any type: guards also see non-numbers from untyped callers)
 * @param unit the SI unit of the parameter, e.g. `m`; empty or omitted for none
 * @returns the message
 * @example rangeMessage('r1', 'a finite number > 0', -1, 'm')
 *   // 'r1: must be a finite number > 0, in m (got -1)'
 */
export function rangeMessage(name: string, allowed: string, value: unknown, unit = ''): string {
  return `${name}: must be ${allowed}${unit ? `, in ${unit}` : ''} (got ${String(value)})`;
}
