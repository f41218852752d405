import { parseCoil } from '../coils/parse-coil';
import { coilFigures } from '../link/coil-figures';
import { CliInputError } from './cli-input-error';
import {
  CURRENT_RANGE,
  FREQUENCY_RANGE,
  TEMPERATURE_RANGE,
  readOptionalNumber,
} from './read-optional-number';
import { requireFiniteOutput } from './require-finite-output';
import { withInputPath } from './with-input-path';

/** Keys beside a coil's own fields that set the operating point; stripped before parseCoil. */
const OPERATING_KEYS = ['frequency', 'current', 'temperature'] as const;

/**
 * The `couplet inductance` command on parsed JSON: figures for one coil or an array of coils.
 *
 * Method: for each coil, take `frequency` (Hz), `current` (A, default 1) and `temperature` (°C,
 * default 20) out of the object, validate the rest with parseCoil (path `coil` or `coils[i]`),
 * then coilFigures: L (low-frequency, backing included), Rdc, Rac, Q, stored energy ½LI², L/Rdc,
 * wire length, skin depth; without a frequency Rac, Q and skinDepth are null. Non-finite figures
 * are an error. The output has the input's shape: an object for an object, an array for an array.
 *
 * References: see coilFigures.
 *
 * @param json parsed input
 * @returns the output value, ready for JSON.stringify
 * @example runInductance({ kind: 'ring', radius: 0.02, wireRadius: 5e-4, frequency: 85e3 }).L
 *   // ≈ 1.01e-7
 */
export function runInductance(
  json: unknown,
): Record<string, number | null> | Array<Record<string, number | null>> {
  if (Array.isArray(json)) {
    if (json.length === 0) throw new CliInputError('coils: the array is empty');
    return json.map((item, i) => oneCoil(item, `coils[${i}]`));
  }
  return oneCoil(json, 'coil');
}

function oneCoil(item: unknown, path: string): Record<string, number | null> {
  if (typeof item !== 'object' || item === null || Array.isArray(item)) {
    throw new CliInputError(
      `${path}: expected a coil object (got ${item === null ? 'null' : typeof item})`,
    );
  }
  const record = item as Record<string, unknown>;
  const frequency = readOptionalNumber(record, 'frequency', path, FREQUENCY_RANGE);
  const current = readOptionalNumber(record, 'current', path, CURRENT_RANGE) ?? 1;
  const temperature = readOptionalNumber(record, 'temperature', path, TEMPERATURE_RANGE);
  const fields = Object.fromEntries(
    Object.entries(record).filter(([key]) => !(OPERATING_KEYS as readonly string[]).includes(key)),
  );
  const coil = parseCoil(fields, path);
  const f = withInputPath(path, () => coilFigures(coil, { frequency, current, temperature }));
  return requireFiniteOutput(
    {
      L: f.L,
      Rdc: f.Rdc,
      Rac: f.Rac,
      Q: f.Q,
      storedEnergy: f.storedEnergy,
      timeConstant: f.timeConstant,
      wireLength: f.wireLength,
      skinDepth: f.skinDepth,
      frequency: frequency ?? null,
      current,
    },
    path,
  );
}
