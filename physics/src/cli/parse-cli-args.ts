import { CliInputError } from './cli-input-error';

export type CliCommand = 'mutual' | 'inductance' | 'sweep';

/** What the command line asks for. */
export type CliArgs =
  | { kind: 'help' }
  | { kind: 'run'; command: CliCommand; file: string; out?: string; format: 'csv' | 'json' };

const COMMANDS: readonly CliCommand[] = ['mutual', 'inductance', 'sweep'];

/**
 * Parse the arguments of `couplet` (without `node` and the script path).
 *
 * Method: the first word is the command, then exactly one FILE (`-` for stdin); options
 * `--out PATH` / `--out=PATH`, `--format csv|json` (sweep only) and `-h`/`--help` anywhere.
 * Anything else is a CliInputError naming the offending word.
 *
 * References: none (POSIX-style option syntax).
 *
 * @param argv the arguments
 * @returns the parsed request
 * @example parseCliArgs(['sweep', 'pair.json', '--out', 'map.csv'])
 *   // { kind: 'run', command: 'sweep', file: 'pair.json', out: 'map.csv', format: 'csv' }
 */
export function parseCliArgs(argv: readonly string[]): CliArgs {
  if (argv.length === 0 || argv.includes('-h') || argv.includes('--help')) return { kind: 'help' };
  const [command, ...rest] = argv;
  if (!COMMANDS.includes(command as CliCommand)) {
    throw new CliInputError(
      `unknown command '${command}'; allowed: ${COMMANDS.join(', ')} (see couplet --help)`,
    );
  }
  const files: string[] = [];
  let out: string | undefined;
  let format: string | undefined;
  for (let i = 0; i < rest.length; i++) {
    const word = rest[i];
    const [name, inline] = word.startsWith('--') ? splitOption(word) : [word, undefined];
    if (name === '--out' || name === '--format') {
      const value = inline ?? rest[++i];
      if (value === undefined || value === '') throw new CliInputError(`${name}: needs a value`);
      if (name === '--out') out = value;
      else format = value;
    } else if (word.startsWith('-') && word !== '-') {
      throw new CliInputError(`unknown option '${word}' (see couplet --help)`);
    } else {
      files.push(word);
    }
  }
  if (files.length !== 1) {
    throw new CliInputError(
      files.length === 0
        ? `${command}: needs a FILE (or - for standard input)`
        : `${command}: takes one FILE (got ${files.length}: ${files.join(' ')})`,
    );
  }
  if (format !== undefined && command !== 'sweep') {
    throw new CliInputError(`--format: only the sweep command has formats`);
  }
  if (format !== undefined && format !== 'csv' && format !== 'json') {
    throw new CliInputError(`--format: must be csv or json (got '${format}')`);
  }
  return {
    kind: 'run',
    command: command as CliCommand,
    file: files[0],
    out,
    format: format ?? 'csv',
  };
}

function splitOption(word: string): [string, string | undefined] {
  const eq = word.indexOf('=');
  return eq < 0 ? [word, undefined] : [word.slice(0, eq), word.slice(eq + 1)];
}
