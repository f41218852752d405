import type { SweepMatrix } from './sweep-matrix';

/** Enough digits for k and η to survive a round trip through a spreadsheet; lengths to 1 nm. */
const valueDigits = 8;

/**
 * One gap of a coupling map as CSV for the mechanical team: a header row
 * `x_mm,y_mm,k,eta_max`, then one row per sample, x fastest (the map's grid order); η_max as a
 * fraction (0 … 1). Plain RFC 4180 text with LF line ends, no quoting needed.
 *
 * @param k k over x–y (m)
 * @param eta η_max over the same grid
 * @returns the CSV text
 */
export function couplingMapCsv(k: SweepMatrix, eta: SweepMatrix): string {
  const lines = ['x_mm,y_mm,k,eta_max'];
  k.ys.forEach((y, iy) =>
    k.xs.forEach((x, ix) =>
      lines.push(
        [lengthMm(x), lengthMm(y), num(k.values[iy][ix]), num(eta.values[iy]?.[ix])].join(','),
      ),
    ),
  );
  return lines.join('\n') + '\n';
}

/** Metres → mm, rounded to 1 nm so 0.0035 m is written 3.5 and not 3.5000000000000004. */
export function lengthMm(m: number): string {
  return String(Number((m * 1000).toFixed(6)));
}

function num(v: number | undefined): string {
  return v === undefined || !Number.isFinite(v) ? '' : String(Number(v.toPrecision(valueDigits)));
}
