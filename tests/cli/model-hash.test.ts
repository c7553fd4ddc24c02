// The report names a split model by one hash over the model file and every part, the same hash the
// viewer's title block shows (modelContentHash in core; the browser side is checked in
// tests/e2e/view-compare.e2e.test.ts). Reference: GNU coreutils `sha256sum`, run where installed.
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { appendFileSync, cpSync, mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from '../helpers/cli.ts';

interface JsonReport {
  model: { file: string; sha256: string; parts?: { file: string; sha256: string }[] };
}

const hasSha256sum = spawnSync('sha256sum', ['--version']).status === 0;

function splitDemo(): string {
  const dir = mkdtempSync(join(tmpdir(), 'bh-model-hash-'));
  cpSync('fixtures/demo/tables', dir, { recursive: true });
  return dir;
}

async function jsonReport(file: string): Promise<JsonReport> {
  const r = await runCli(['report', file, '--format', 'json', '--fail-on', 'none']);
  expect(r.code, r.stderr).toBe(0);
  return JSON.parse(r.stdout) as JsonReport;
}

describe('the hash a report names a split model by', () => {
  it.runIf(hasSha256sum)('should be the SHA-256 of `sha256sum MAIN PART` run in the model folder', async () => {
    const dir = splitDemo();
    const report = await jsonReport(join(dir, 'marrow-fen-site.bulk'));
    const listing = spawnSync('sha256sum', ['marrow-fen-site.bulk', 'generated/plant.bulk'], {
      cwd: dir,
      encoding: 'utf8',
    });
    expect(report.model.sha256).toBe(createHash('sha256').update(listing.stdout).digest('hex'));
    // Each part keeps its own hash beside it.
    expect(report.model.parts).toEqual([
      {
        file: join(dir, 'generated/plant.bulk'),
        sha256: createHash('sha256')
          .update(readFileSync(join(dir, 'generated/plant.bulk')))
          .digest('hex'),
      },
    ]);
  });

  it('should change when only the part file changes, and the Markdown report should say it covers 2 files', async () => {
    const dir = splitDemo();
    const main = join(dir, 'marrow-fen-site.bulk');
    const before = await jsonReport(main);
    appendFileSync(join(dir, 'generated/plant.bulk'), '# a comment added to the part only\n');
    const after = await jsonReport(main);
    expect(after.model.sha256).not.toBe(before.model.sha256);
    const md = await runCli(['report', main, '--format', 'md', '--fail-on', 'none']);
    expect(md.stdout).toContain(
      `| SHA-256 of the model | \`${after.model.sha256}\` over 2 files: the model file and 1 part file |`,
    );
  });

  it("should stay the file's own SHA-256 for a model in one file", async () => {
    const report = await jsonReport('fixtures/demo/marrow-fen.bulk');
    expect(report.model.sha256).toBe(
      createHash('sha256').update(readFileSync('fixtures/demo/marrow-fen.bulk')).digest('hex'),
    );
    expect(report.model.parts).toBeUndefined();
  });
});
