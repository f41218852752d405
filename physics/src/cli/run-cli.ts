import { ZodError } from 'zod';
import { CliInputError } from './cli-input-error';
import { CLI_USAGE } from './cli-usage';
import { parseCliArgs } from './parse-cli-args';
import { parseJsonText } from './parse-json-text';
import { runInductance } from './run-inductance';
import { runMutual } from './run-mutual';
import { runSweepCommand } from './run-sweep-command';

/** Everything the CLI touches outside itself, so tests can run it in-process. */
export interface CliIo {
  readFile(path: string): Promise<string>;
  readStdin(): Promise<string>;
  writeFile(path: string, text: string): Promise<void>;
  stdout(text: string): void;
  stderr(text: string): void;
  /** Whether stderr is a terminal: progress is shown only then. */
  stderrIsTTY: boolean;
  /** Fires on Ctrl-C; a running sweep stops at its next chunk. */
  signal?: AbortSignal;
}

/**
 * Run `couplet` with its arguments and return the exit code.
 *
 * Method: parse the arguments; read FILE (or stdin for `-`) and parse it as JSON; run the command;
 * print the result (or write it to `--out`). Exit codes: 0 success; 2 bad input — CliInputError,
 * RangeError (invalid field, intersecting coils, grid too large, non-finite result), unreadable
 * file, invalid JSON — with one line `couplet: <field>: <what>` on stderr, never a stack trace;
 * 130 when cancelled; 1 for anything unexpected (still one line).
 *
 * References: none (process conventions: 2 for usage errors, 128 + SIGINT for interruption).
 *
 * @param argv arguments after the script name
 * @param io the outside world
 * @returns the exit code
 * @example await runCli(['--help'], io) // 0, usage on stdout
 */
export async function runCli(argv: readonly string[], io: CliIo): Promise<number> {
  try {
    const args = parseCliArgs(argv);
    if (args.kind === 'help') {
      io.stdout(CLI_USAGE);
      return 0;
    }
    const name = args.file === '-' ? 'stdin' : args.file;
    let text: string;
    try {
      text = args.file === '-' ? await io.readStdin() : await io.readFile(args.file);
    } catch (e) {
      throw new CliInputError(`${name}: cannot read (${describeIoError(e)})`);
    }
    const json = parseJsonText(text, name);
    let output: string;
    if (args.command === 'sweep') {
      const progress = io.stderrIsTTY ? progressLine(io) : undefined;
      output = await runSweepCommand(json, {
        format: args.format,
        signal: io.signal,
        onProgress: progress,
      });
      if (progress) io.stderr('\n');
    } else {
      const value = args.command === 'mutual' ? runMutual(json) : runInductance(json);
      output = `${JSON.stringify(value, null, 2)}\n`;
    }
    if (args.out !== undefined) {
      try {
        await io.writeFile(args.out, output);
      } catch (e) {
        throw new CliInputError(`--out ${args.out}: cannot write (${describeIoError(e)})`);
      }
    } else {
      io.stdout(output);
    }
    return 0;
  } catch (e) {
    return report(e, io);
  }
}

function report(e: unknown, io: CliIo): number {
  const oneLine = (s: string) => s.replace(/\s*\n\s*/g, ' ').trim();
  if (e instanceof Error && e.name === 'AbortError') {
    io.stderr(`couplet: ${oneLine(e.message)}\n`);
    return 130;
  }
  if (e instanceof CliInputError || e instanceof RangeError || e instanceof ZodError) {
    io.stderr(`couplet: ${oneLine(e.message)}\n`);
    return 2;
  }
  const message = e instanceof Error ? e.message : String(e);
  io.stderr(`couplet: internal error: ${oneLine(message)}\n`);
  return 1;
}

function describeIoError(e: unknown): string {
  const code = (e as { code?: string }).code;
  if (code === 'ENOENT') return 'no such file';
  if (code === 'EACCES') return 'permission denied';
  if (code === 'EISDIR') return 'is a directory';
  return code ?? (e instanceof Error ? e.message.split('\n')[0] : String(e));
}

function progressLine(io: CliIo) {
  return ({ done, total }: { done: number; total: number }) => {
    const pct = Math.floor((100 * done) / total);
    io.stderr(`\rcouplet: sweep ${pct}% (${done}/${total} poses)`);
  };
}
