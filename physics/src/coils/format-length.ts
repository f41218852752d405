/**
 * Formats a length in metres for an error message or a label, in the unit a coil designer reads
 * at that size: metres from 1 m, millimetres from 1 mm, micrometres from 1 µm, nanometres below.
 *
 * Method: four significant digits, trailing zeros removed; non-finite values print as themselves
 * (`NaN`, `Infinity`) so that a message about a bad input shows what was received.
 *
 * @param metres a length in m
 * @returns text such as `0.4 mm`, `12.5 µm`, `2 m`
 * @example formatLength(0.0004) // '0.4 mm'
 */
export function formatLength(metres: number): string {
  if (!Number.isFinite(metres)) return String(metres);
  const size = Math.abs(metres);
  // Below a nanometre a length is rounding noise of a zero (two touching centre lines).
  if (size < 1e-9) return '0 m';
  if (size >= 1) return `${trim(metres)} m`;
  if (size >= 1e-3) return `${trim(metres * 1e3)} mm`;
  if (size >= 1e-6) return `${trim(metres * 1e6)} µm`;
  return `${trim(metres * 1e9)} nm`;
}

function trim(value: number): string {
  return String(Number(value.toPrecision(4)));
}
