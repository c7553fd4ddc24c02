// `bulkhead report --contents`: the worksheet and the actions list as a user asks for them, the
// document-control options, and usage errors (exit 2, nothing written) for what does not exist.
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { hasStackTrace, runCli } from '../helpers/cli.ts';

const DEMO = 'fixtures/demo/marrow-fen.bulk';
const dir = mkdtempSync(join(tmpdir(), 'bulkhead-contents-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('report --contents', () => {
  it.each([
    [['--format', 'json', '--contents', 'worksheet'], 'the worksheet report comes as md, html, csv, not `json`'],
    [['--format', 'md', '--contents', 'actions'], 'the actions report comes as csv, not `md`'],
    [['--format', 'csv', '--contents', 'todo'], '--contents takes evidence, worksheet, actions; found `todo`'],
    [['--format', 'md', '--revision', ' '], '--revision needs a value'],
  ])('%j is a usage error', async (args, message) => {
    const r = await runCli(['report', DEMO, ...args]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain(message);
    expect(r.stdout).toBe('');
    expect(hasStackTrace(r.stderr)).toBe(false);
  });

  it('writes the actions CSV and replaces its own earlier file without --force, but not another file', async () => {
    const out = join(dir, 'actions.csv');
    const first = await runCli([
      'report',
      DEMO,
      '--format',
      'csv',
      '--contents',
      'actions',
      '-o',
      out,
      '--fail-on',
      'none',
    ]);
    expect(first.code).toBe(0);
    expect(readFileSync(out, 'utf8')).toMatch(/^action,severity,what_to_do,/);
    expect(
      (await runCli(['report', DEMO, '--format', 'csv', '--contents', 'actions', '-o', out, '--fail-on', 'none'])).code,
    ).toBe(0);
    const mine = join(dir, 'tracker.csv');
    writeFileSync(mine, 'owner,due\nA. Person,2026-03-01\n');
    const refused = await runCli(['report', DEMO, '--format', 'csv', '--contents', 'actions', '-o', mine]);
    expect(refused.code).toBe(2);
    expect(readFileSync(mine, 'utf8')).toBe('owner,due\nA. Person,2026-03-01\n');
  });

  it('prints the document number, revision and status given on the command line', async () => {
    const r = await runCli([
      'report',
      DEMO,
      '--format',
      'md',
      '--contents',
      'worksheet',
      '--document',
      'X-9',
      '--revision',
      'C',
      '--status',
      'issued',
      '--fail-on',
      'none',
    ]);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('| Document number | X-9 |');
    expect(r.stdout).toContain('| Revision | C |');
    expect(r.stdout).toContain('| Status | issued |');
  });
});
