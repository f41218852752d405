import {
  copperResistivity,
  skinDepth,
  storedEnergy,
  timeConstant,
  type CoilFigures,
} from '../../../physics/src/index';
import type { CoilRow } from '../../../schema/src/index';

/**
 * The figures of a stored coil, without running the models again: L, R_dc, R_ac, Q and the wire
 * length come from the columns written on save, and the rest is derived from them by the same
 * physics functions coilFigures uses, in the same order, so the result equals coilFigures(spec)
 * bit for bit (PostgreSQL's double precision keeps every IEEE 754 double exactly). A heavy coil
 * (thousands of path points) is then listed in microseconds instead of seconds.
 */
export function storedCoilFigures(row: CoilRow): CoilFigures {
  const L = required(row.selfInductanceH, 'self_inductance_h', row.id);
  const Rdc = required(row.dcResistanceOhm, 'dc_resistance_ohm', row.id);
  const frequency = row.operatingFrequencyHz;
  return {
    L,
    Rdc,
    Rac: frequency === null ? null : row.acResistanceOhm,
    Q: frequency === null ? null : row.qualityFactor,
    storedEnergy: storedEnergy(L, row.ratedCurrentA ?? 1),
    timeConstant: timeConstant(L, Rdc),
    wireLength: required(row.wireLengthM, 'wire_length_m', row.id),
    skinDepth: frequency === null ? null : skinDepth(copperResistivity(), frequency),
  };
}

function required(value: number | null, column: string, id: string): number {
  // Every save through the API writes the figures; a row without them was written by hand.
  if (value === null) throw new Error(`coil ${id} has no ${column}; save it again to compute it`);
  return value;
}
