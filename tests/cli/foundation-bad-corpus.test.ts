// Runs the real `bulkhead check` on every file of the bad-input corpus: each must exit 2, name its
// pinned code at file:line:column on stderr, and never show a stack trace.
import { mkdtempSync, rmSync, truncateSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CORPUS } from '../core/loader/bad-corpus.table.ts';
import { hasStackTrace, mapLimit, runCli, type CliResult } from '../helpers/cli.ts';

describe('bulkhead check on the bad-input corpus', () => {
  const results = new Map<string, CliResult>();

  beforeAll(async () => {
    // Each spawn costs about half a second; four at a time keeps the suite short on two cores.
    const runs = await mapLimit(CORPUS, 4, (row) => runCli(['check', `fixtures/bad/${row.file}`]));
    CORPUS.forEach((row, i) => results.set(row.file, runs[i]!));
  }, 120_000);

  it.each(CORPUS)('$file exits 2 with $code at its position', ({ file, code, line, column }) => {
    const r = results.get(file)!;
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(new RegExp(`^ {2}code +${code} `, 'm'));
    expect(r.stderr).toContain(`fixtures/bad/${file}:${line}:${column}`);
    expect(r.stderr).toContain('nothing was analysed');
    expect(hasStackTrace(r.stderr)).toBe(false);
  });
});

describe('bulkhead check on input it cannot read', () => {
  let dir: string;
  beforeAll(() => {
    dir = mkdtempSync(join(tmpdir(), 'bulkhead-bad-'));
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('a missing path exits 2 with BH104', async () => {
    const r = await runCli(['check', join(dir, 'no-such-model.bulk')]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/^ {2}code +BH104 /m);
    expect(r.stderr).toContain('no such file');
    expect(hasStackTrace(r.stderr)).toBe(false);
  });

  it('a directory exits 2 with BH104', async () => {
    const r = await runCli(['check', dir]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/^ {2}code +BH104 /m);
    expect(r.stderr).toContain('is a directory');
  });

  it('a file over 50 MB exits 2 with BH103 without being read', async () => {
    // A sparse file: its size is over the limit but it takes no disk space or time to make.
    const file = join(dir, 'huge.bulk');
    writeFileSync(file, 'site "Huge"\n');
    truncateSync(file, 50 * 1024 * 1024 + 1);
    const r = await runCli(['check', file]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/^ {2}code +BH103 /m);
    expect(r.stderr).toContain('the limit is 50 MB');
    expect(hasStackTrace(r.stderr)).toBe(false);
  });
});
