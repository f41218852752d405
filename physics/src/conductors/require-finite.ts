/**
 * Guards for engineering inputs: throw a `RangeError` that names the parameter and its allowed
 * range, so that no NaN or Infinity enters (or leaves) the library.
 */
export function requireFinite(name: string, value: number): void {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new RangeError(`${name}: must be a finite number (got ${String(value)})`);
  }
}

/** As {@link requireFinite}, and strictly positive. */
export function requirePositive(name: string, value: number): void {
  requireFinite(name, value);
  if (value <= 0) throw new RangeError(`${name}: must be > 0 (got ${value})`);
}

/** As {@link requireFinite}, and zero or positive. */
export function requireNonNegative(name: string, value: number): void {
  requireFinite(name, value);
  if (value < 0) throw new RangeError(`${name}: must be >= 0 (got ${value})`);
}
