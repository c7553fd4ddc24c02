// Smoke test for the shared CLI helper: the real `bulkhead` binary runs and answers --help.
import { describe, expect, it } from 'vitest';
import { hasStackTrace, runCli } from '../helpers/cli.ts';

describe('runCli helper', () => {
  it('runs the real binary and captures stdout and the exit code', async () => {
    const r = await runCli(['--help']);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('usage: bulkhead COMMAND');
    expect(hasStackTrace(r.stderr)).toBe(false);
  });
  it('recognises a stack trace', () => {
    expect(hasStackTrace('Error: boom\n    at foo (file.js:1:1)')).toBe(true);
    expect(hasStackTrace('Model error: unknown tag `LT-9`\n  code     BH300 (unknown reference)')).toBe(false);
  });
});
