import { coilFigures, type Coil, type CoilFigures } from '../../../physics/src/index';
import { ValidationError } from '../errors/app-errors';

/**
 * The library's figures of a coil: physics' coilFigures at the coil's operating frequency (none
 * for DC-only figures) and rated current (1 A when unset, so the stored energy is per A²).
 * A geometry the schema accepts but a model refuses becomes a 400 on `spec` with the engine's
 * own message.
 */
export function computeCoilFigures(
  spec: Coil,
  operatingFrequencyHz: number | null,
  ratedCurrentA: number | null,
): CoilFigures {
  try {
    return coilFigures(spec, {
      frequency: operatingFrequencyHz ?? undefined,
      current: ratedCurrentA ?? 1,
    });
  } catch (error) {
    if (error instanceof RangeError) throw new ValidationError(`spec: ${error.message}`, 'spec');
    throw error;
  }
}
