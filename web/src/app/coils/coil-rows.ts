import type { CoilKind, CoilResponse } from '../api-types';
import { coilKindLabels } from './coil-kind-labels';
import { coilSummary, type CoilSummary } from './coil-summary';

/** One row of the library table: the coil, its summary, and the values its columns sort by. */
export interface CoilRow extends CoilSummary {
  coil: CoilResponse;
  kindLabel: string;
}

export interface CoilFilter {
  /** Part of the name or description, any case. */
  text: string;
  kind: CoilKind | null;
}

export interface CoilSort {
  active: string;
  direction: 'asc' | 'desc' | '';
}

const sortValues: Record<string, (row: CoilRow) => number | string | null> = {
  name: (row) => row.coil.name.toLocaleLowerCase(),
  kind: (row) => row.kindLabel,
  size: (row) => row.sizeValue,
  turns: (row) => row.turnsValue,
  conductor: (row) => row.conductor,
  L: (row) => row.coil.figures.L,
  Rac: (row) => row.coil.figures.Rac,
  Q: (row) => row.coil.figures.Q,
  wireLength: (row) => row.coil.figures.wireLength,
  updated: (row) => row.coil.updatedAt,
  usedBy: (row) => row.coil.usedBy.length,
};

/**
 * The table's rows: coils matching the filter, in the chosen order (newest change first when no
 * column is chosen). Missing values (no frequency, so no Q) sort last either way.
 *
 * @param coils the workspace's coils
 * @param filter search text and kind
 * @param sort the sorted column and direction
 * @returns the rows to show
 */
export function coilRows(coils: CoilResponse[], filter: CoilFilter, sort: CoilSort): CoilRow[] {
  const text = filter.text.trim().toLocaleLowerCase();
  const rows = coils
    .filter((coil) => filter.kind === null || coil.kind === filter.kind)
    .filter(
      (coil) =>
        text === '' ||
        coil.name.toLocaleLowerCase().includes(text) ||
        coil.description.toLocaleLowerCase().includes(text),
    )
    .map((coil) => ({ coil, kindLabel: coilKindLabels[coil.kind], ...coilSummary(coil.spec) }));
  const value = sort.direction ? sortValues[sort.active] : undefined;
  if (!value) return rows.sort((a, b) => b.coil.updatedAt.localeCompare(a.coil.updatedAt));
  const sign = sort.direction === 'asc' ? 1 : -1;
  return rows.sort((a, b) => {
    const [x, y] = [value(a), value(b)];
    if (x === null || y === null) return x === y ? 0 : x === null ? 1 : -1;
    const order = typeof x === 'string' ? x.localeCompare(String(y)) : x - (y as number);
    return sign * order;
  });
}
