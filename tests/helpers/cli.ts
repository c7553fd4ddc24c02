// Runs the real, built `bulkhead` command (node packages/cli/bin/bulkhead.js, which loads the bundle that
// tests/global-setup.ts rebuilds before the tests) in a child process, for CLI tests.
// Shared by every CLI test so they all exercise the same entry point, environment and exit codes.
import { spawn } from 'node:child_process';
import { fileURLToPath } from 'node:url';

export const REPO_ROOT = fileURLToPath(new URL('../../', import.meta.url));
export const CLI_BIN = fileURLToPath(new URL('../../packages/cli/bin/bulkhead.js', import.meta.url));

export interface CliResult {
  /** Exit code; null only when the process was killed by a signal (see `signal`). */
  code: number | null;
  signal: NodeJS.Signals | null;
  stdout: string;
  stderr: string;
}

export interface RunCliOptions {
  /** Working directory; defaults to the repository root so fixture paths are relative to it. */
  cwd?: string;
  /** Extra environment variables; NO_COLOR=1 is always set so output is plain. */
  env?: Record<string, string>;
  /** Text written to the child's stdin (stdin is closed either way). */
  input?: string;
  /** Kill the child after this many milliseconds (default 30 s). */
  timeoutMs?: number;
}

export function runCli(args: string[], opts: RunCliOptions = {}): Promise<CliResult> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [CLI_BIN, ...args], {
      cwd: opts.cwd ?? REPO_ROOT,
      env: { ...process.env, NO_COLOR: '1', FORCE_COLOR: '0', ...opts.env },
      stdio: ['pipe', 'pipe', 'pipe'],
    });
    let stdout = '';
    let stderr = '';
    child.stdout.setEncoding('utf8').on('data', (chunk: string) => (stdout += chunk));
    child.stderr.setEncoding('utf8').on('data', (chunk: string) => (stderr += chunk));
    const timer = setTimeout(() => child.kill('SIGKILL'), opts.timeoutMs ?? 30_000);
    child.on('error', (e) => {
      clearTimeout(timer);
      reject(e);
    });
    child.on('close', (code, signal) => {
      clearTimeout(timer);
      resolve({ code, signal, stdout, stderr });
    });
    child.stdin.end(opts.input ?? '');
  });
}

/** Runs `tasks` with at most `limit` in flight at once, keeping results in input order. */
export async function mapLimit<T, R>(items: readonly T[], limit: number, task: (item: T) => Promise<R>): Promise<R[]> {
  const results = new Array<R>(items.length);
  let next = 0;
  const worker = async () => {
    while (next < items.length) {
      const i = next++;
      results[i] = await task(items[i]!);
    }
  };
  await Promise.all(Array.from({ length: Math.min(limit, items.length) }, worker));
  return results;
}

/** True when the text looks like a Node stack trace or an uncaught error report. */
export function hasStackTrace(text: string): boolean {
  return /^\s{4}at /m.test(text) || /^(\w*Error|Error):/m.test(text) || /node:internal/.test(text);
}
