import type { Coil } from '../coils/coil-schema';
import type { Conductor } from './conductor';

/**
 * The conductor that carries a coil's current, for resistance figures.
 *
 * Method: coils of kind `ring` and `rings` describe their wire only by `wireRadius` and are read
 * as round wire of diameter 2·wireRadius; every other kind carries its `conductor` field.
 *
 * References: none (bookkeeping).
 *
 * @param coil a validated coil
 * @returns its conductor (m)
 * @example coilConductor({ kind: 'ring', radius: 0.02, wireRadius: 5e-4 }) // round, d = 1 mm
 */
export function coilConductor(coil: Coil): Conductor {
  return coil.kind === 'ring' || coil.kind === 'rings'
    ? { type: 'round', diameter: 2 * coil.wireRadius }
    : coil.conductor;
}
