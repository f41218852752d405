/**
 * Bad input to the `couplet` command — unreadable file, invalid JSON, invalid field, unknown
 * option. The CLI prints its one-line message and exits with code 2. Engineering functions throw
 * RangeError for invalid values; the CLI treats those the same way.
 */
export class CliInputError extends Error {
  override readonly name = 'CliInputError';
}
