import { CliInputError } from './cli-input-error';

/**
 * Parse the text of an input file as JSON, with a one-line error naming the file.
 *
 * Method: JSON.parse; its SyntaxError message (which states the position) is kept on one line.
 *
 * References: RFC 8259 (JSON).
 *
 * @param text file contents
 * @param name the file name for messages (`stdin` for -)
 * @returns the parsed value
 * @example parseJsonText('{"z": 0.003}', 'a.json') // { z: 0.003 }
 */
export function parseJsonText(text: string, name: string): unknown {
  try {
    return JSON.parse(text);
  } catch (e) {
    const why = e instanceof Error ? e.message.split('\n')[0] : String(e);
    throw new CliInputError(`${name}: invalid JSON: ${why}`);
  }
}
