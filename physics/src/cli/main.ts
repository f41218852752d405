/**
 * Entry point of the `couplet` command: wires runCli to the process (files, stdin, stdout,
 * stderr, Ctrl-C) and sets the exit code. All logic lives in runCli, which tests call directly.
 */
import { readFile, writeFile } from 'node:fs/promises';
import { runCli } from './run-cli';

const controller = new AbortController();
process.once('SIGINT', () => controller.abort());

async function readStdin(): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks).toString('utf8');
}

process.exitCode = await runCli(process.argv.slice(2), {
  readFile: (path) => readFile(path, 'utf8'),
  readStdin,
  writeFile: (path, text) => writeFile(path, text, 'utf8'),
  stdout: (text) => process.stdout.write(text),
  stderr: (text) => process.stderr.write(text),
  stderrIsTTY: Boolean(process.stderr.isTTY),
  signal: controller.signal,
});
