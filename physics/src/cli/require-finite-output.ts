import { CliInputError } from './cli-input-error';

/**
 * Refuse to print a result with a non-finite number: NaN never leaves the CLI.
 *
 * Method: every numeric field must be finite; `null` (a figure that does not apply) passes.
 *
 * References: none.
 *
 * @param result the figures of one item
 * @param path where the item came from, for the message (`pairs[2]`)
 * @returns the same object
 * @example requireFiniteOutput({ M: 1e-6 }, 'pair') // { M: 1e-6 }
 */
export function requireFiniteOutput<T extends Record<string, number | null>>(
  result: T,
  path: string,
): T {
  for (const [key, value] of Object.entries(result)) {
    if (value !== null && !Number.isFinite(value)) {
      throw new CliInputError(
        `${path}: the model gave a non-finite ${key} (${value}); check the input`,
      );
    }
  }
  return result;
}
