/** Run the CLI in-process (main() with stdout and stderr captured) or as a real child process. */
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { main } from '../../src/cli/main.js';

export interface CliResult {
  code: number;
  stdout: string;
  stderr: string;
  /** Wall time, ms (reported by the fuzz run; never asserted as a speed). */
  ms: number;
}

export const BIN = fileURLToPath(new URL('../../bin/quakesweep.js', import.meta.url));

/** main(argv) with process.stdout and process.stderr captured. */
export async function runMain(argv: string[]): Promise<CliResult> {
  const out: string[] = [];
  const err: string[] = [];
  const stdoutWrite = process.stdout.write;
  const stderrWrite = process.stderr.write;
  const capture = (into: string[]) =>
    ((chunk: string | Uint8Array) => {
      into.push(typeof chunk === 'string' ? chunk : Buffer.from(chunk).toString('utf8'));
      return true;
    }) as typeof process.stdout.write;
  process.stdout.write = capture(out);
  process.stderr.write = capture(err);
  const start = performance.now();
  let code: number;
  try {
    code = await main(argv);
  } finally {
    process.stdout.write = stdoutWrite;
    process.stderr.write = stderrWrite;
  }
  return { code, stdout: out.join(''), stderr: err.join(''), ms: performance.now() - start };
}

/** node bin/quakesweep.js argv, killed after `timeoutMs` (a hang shows as code -1). */
export function runChild(
  argv: string[],
  options: { cwd?: string; timeoutMs?: number; input?: string } = {},
): CliResult {
  const start = performance.now();
  const result = spawnSync(process.execPath, [BIN, ...argv], {
    cwd: options.cwd,
    encoding: 'utf8',
    timeout: options.timeoutMs ?? 20_000,
    input: options.input,
  });
  return {
    code: result.status ?? -1,
    stdout: result.stdout ?? '',
    stderr: result.stderr ?? '',
    ms: performance.now() - start,
  };
}

/** The lines of stderr that are neither warnings nor the two lines of a success. */
export function errorLines(stderr: string): string[] {
  return besidesSuccess(stderr)
    .split('\n')
    .filter((line) => line !== '' && !line.startsWith('quakesweep: warning: '));
}

/** What a stack trace or a raw exception looks like on stderr. */
export const STACK_TRACE = /^\s+at |\n\s+at |Error: |node:internal|\.ts:\d+|\.js:\d+:\d+/;

/** Check a failure the way a person meets it: exit 2, one line, no stack trace. */
export function expectOneLineFailure(result: CliResult): string {
  const lines = result.stderr.split('\n').filter((line) => line !== '');
  if (
    result.code !== 2 ||
    lines.length !== 1 ||
    STACK_TRACE.test(result.stderr) ||
    !lines[0].startsWith('quakesweep: ')
  ) {
    throw new Error(`expected exit 2 and one line on stderr, got exit ${result.code} and:\n${result.stderr}`);
  }
  return lines[0];
}

/** runMain(argv) with `cwd` as the working folder, so relative file names read as a person types them. */
export async function runMainIn(cwd: string, argv: string[]): Promise<CliResult> {
  const before = process.cwd();
  process.chdir(cwd);
  try {
    return await runMain(argv);
  } finally {
    process.chdir(before);
  }
}

/** Standard error without the two lines every success ends with (what was written, the caution). */
export function besidesSuccess(stderr: string): string {
  return stderr.replace(/^quakesweep: (done|caution): .*\n/gm, '');
}
