// Where `-o` may write (issue 10): never over the model it reads, whatever the options (exit 2, the model
// unchanged), and over an existing file only when Bulkhead wrote it, unless --force says otherwise.
import { copyFileSync, linkSync, mkdtempSync, readFileSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { renderReport, REPORT_FORMATS } from '@bulkhead/core';
import { isReportText } from '../../packages/cli/src/output.ts';
import { hasStackTrace, runCli } from '../helpers/cli.ts';
import { DEMO, demoInput } from '../report/demo.ts';

let dir: string;
let model: string;
let original: string;

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'bulkhead-out-'));
  model = join(dir, 'm.bulk');
  copyFileSync(DEMO, model);
  original = readFileSync(model, 'utf8');
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function refused(r: { code: number | null; stderr: string; stdout: string }, says: string) {
  expect(r.code).toBe(2);
  expect(r.stdout).toBe('');
  expect(r.stderr).toContain(says);
  expect(hasStackTrace(r.stderr)).toBe(false);
}

describe('-o onto the model file itself', () => {
  it.each([
    ['report --format md', ['report', '--format', 'md']],
    ['report --format json --force', ['report', '--format', 'json', '--force']],
    ['convert --to json', ['convert', '--to', 'json']],
    ['convert --to bulk --force', ['convert', '--to', 'bulk', '--force']],
  ])('%s is refused with exit 2 and the model is unchanged', async (_, args) => {
    refused(await runCli([...args, model, '-o', model]), 'would replace the model');
    expect(readFileSync(model, 'utf8')).toBe(original);
  });

  it('is refused through a symbolic link and through a hard link to the model', async () => {
    const soft = join(dir, 'soft.md');
    const hard = join(dir, 'hard.md');
    symlinkSync(model, soft);
    linkSync(model, hard);
    refused(await runCli(['report', model, '--format', 'md', '-o', soft]), 'would replace the model');
    refused(await runCli(['convert', model, '--to', 'json', '-o', hard, '--force']), 'would replace the model');
    expect(readFileSync(model, 'utf8')).toBe(original);
  });
});

describe('-o onto an existing file', () => {
  it('a file the user wrote is kept; --force replaces it', async () => {
    const notes = join(dir, 'notes.md');
    writeFileSync(notes, '# My own notes\n');
    refused(await runCli(['report', model, '--format', 'md', '-o', notes]), 'is not a Bulkhead report');
    expect(readFileSync(notes, 'utf8')).toBe('# My own notes\n');
    const forced = await runCli(['report', model, '--format', 'md', '-o', notes, '--force']);
    expect(forced.code).toBe(1); // the demo has findings that void credit
    expect(readFileSync(notes, 'utf8')).toMatch(/^# Independence evidence list/);
  });

  it('an earlier Bulkhead report is replaced without --force, in any format', async () => {
    const out = join(dir, 'report.out');
    for (const format of ['html', 'sarif', 'csv', 'json', 'md']) {
      const r = await runCli(['report', model, '--format', format, '-o', out]);
      expect(r.code, `${format}: ${r.stderr}`).toBe(1);
    }
    expect(readFileSync(out, 'utf8')).toMatch(/^# Independence evidence list/);
  });

  it('convert replaces an existing model only when it holds the same text, or with --force', async () => {
    const twin = join(dir, 'twin.json');
    expect((await runCli(['convert', model, '--to', 'json', '-o', twin])).code).toBe(0);
    expect((await runCli(['convert', model, '--to', 'json', '-o', twin])).code).toBe(0); // the same text again
    writeFileSync(twin, '{ "hand": "edited" }\n');
    refused(await runCli(['convert', model, '--to', 'json', '-o', twin]), 'holds something else');
    expect(readFileSync(twin, 'utf8')).toBe('{ "hand": "edited" }\n');
    expect((await runCli(['convert', model, '--to', 'json', '-o', twin, '--force'])).code).toBe(0);
  });
});

describe('isReportText', () => {
  const input = demoInput(DEMO);
  it.each(REPORT_FORMATS)('knows a %s report by its first 4 KB', (format) => {
    expect(isReportText(renderReport(input, format).slice(0, 4096))).toBe(true);
  });

  it("does not take a model, a note or another tool's SARIF for one of ours", () => {
    expect(isReportText(original)).toBe(false);
    expect(isReportText('# Notes\n')).toBe(false);
    expect(
      isReportText(
        '{\n  "$schema": "https://json.schemastore.org/sarif-2.1.0.json",\n  "runs": [{ "tool": { "driver": { "name": "other" } } }]\n}',
      ),
    ).toBe(false);
  });
});
