import { CliInputError } from './cli-input-error';

/**
 * Check that an input value is a JSON object with only the allowed keys and all required ones.
 *
 * Method: plain-object test, then unknown keys, then missing keys, each a CliInputError naming
 * the field, e.g. `pairs[1].pose: required`.
 *
 * References: none.
 *
 * @param json the value
 * @param path its name in messages
 * @param allowed every allowed key
 * @param required the keys that must be present
 * @returns the value as a record
 * @example readObjectFields({ tx: {}, rx: {} }, 'pair', ['tx', 'rx'], ['tx']) // the same object
 */
export function readObjectFields(
  json: unknown,
  path: string,
  allowed: readonly string[],
  required: readonly string[],
): Record<string, unknown> {
  if (typeof json !== 'object' || json === null || Array.isArray(json)) {
    const got = json === null ? 'null' : Array.isArray(json) ? 'an array' : typeof json;
    throw new CliInputError(`${path}: expected an object with ${required.join(', ')} (got ${got})`);
  }
  const record = json as Record<string, unknown>;
  for (const key of Object.keys(record)) {
    if (!allowed.includes(key)) {
      throw new CliInputError(
        `${path}.${key}: unknown field; allowed fields: ${allowed.join(', ')}`,
      );
    }
  }
  for (const key of required) {
    if (record[key] === undefined) throw new CliInputError(`${path}.${key}: required`);
  }
  return record;
}
