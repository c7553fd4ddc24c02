// `bulkhead report` end to end through the real binary: output equals the golden files, --fail-on
// semantics (accepted findings ignored, stale justifications counted), and bad input exits 2 cleanly.
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Ajv2020 from 'ajv/dist/2020.js';
import { afterAll, describe, expect, it } from 'vitest';
import { hasStackTrace, runCli } from '../helpers/cli.ts';
import { DEMO, DEMO_REV_B, GOLDEN_DIR, readDemo } from './demo.ts';

const dir = mkdtempSync(join(tmpdir(), 'bulkhead-report-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function model(name: string, text: string): string {
  const file = join(dir, name);
  writeFileSync(file, text);
  return file;
}

const REV_B = readDemo(DEMO_REV_B);
const ACCEPT_LINE = /^accept same-make-model:.*$/m;

describe('bulkhead report', () => {
  it('writes the golden Markdown report to stdout and exits 1 on the demo (its voided credits)', async () => {
    const r = await runCli(['report', DEMO, '--format', 'md']);
    expect(r.stdout).toBe(readFileSync(`${GOLDEN_DIR}marrow-fen.md`, 'utf8'));
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/unaccepted findings? at or above voids-credit/);
  });

  it('writes the same bytes to -o as to stdout, for every format', async () => {
    await Promise.all(
      ['html', 'csv', 'json', 'sarif'].map(async (format) => {
        const out = join(dir, `demo.${format}`);
        const r = await runCli(['report', DEMO, '--format', format, '-o', out]);
        expect(r.stdout).toBe('');
        expect(readFileSync(out, 'utf8')).toBe(readFileSync(`${GOLDEN_DIR}marrow-fen.${format}`, 'utf8'));
      }),
    );
  });

  it('prints the date in the header only when --date is given', async () => {
    const dated = await runCli(['report', DEMO, '--format', 'md', '--date', '2026-12-01']);
    expect(dated.stdout).toContain('| Date | 2026-12-01 |');
    const plain = await runCli(['report', DEMO, '--format', 'md']);
    expect(plain.stdout).not.toContain('| Date |');
  });

  it('prints the JSON report schema, which the JSON report satisfies', async () => {
    const schema = await runCli(['report', '--json-schema']);
    expect(schema.code).toBe(0);
    const validate = new Ajv2020({ strict: false }).compile(JSON.parse(schema.stdout));
    const report = JSON.parse(readFileSync(`${GOLDEN_DIR}marrow-fen.json`, 'utf8'));
    expect(validate(report), JSON.stringify(validate.errors)).toBe(true);
  });
});

describe('--fail-on', () => {
  it('exits 0 on revision B at the default (no voided credit) and at needs-justification (its finding is accepted)', async () => {
    expect((await runCli(['report', DEMO_REV_B, '--format', 'json'])).code).toBe(0);
    expect((await runCli(['report', DEMO_REV_B, '--format', 'json', '--fail-on', 'voids-credit'])).code).toBe(0);
    expect((await runCli(['report', DEMO_REV_B, '--format', 'json', '--fail-on', 'needs-justification'])).code).toBe(0);
  });

  it('counts the same finding once its justification is removed', async () => {
    expect(REV_B).toMatch(ACCEPT_LINE);
    const file = model('rev-b-unaccepted.bulk', REV_B.replace(ACCEPT_LINE, ''));
    const r = await runCli(['report', file, '--format', 'json', '--fail-on', 'needs-justification']);
    expect(r.code).toBe(1);
    expect(
      JSON.parse(r.stdout).findings.some(
        (f: { rule: string; accepted?: unknown }) => f.rule === 'same-make-model' && !f.accepted,
      ),
    ).toBe(true);
  });

  it('counts notes only at --fail-on note', async () => {
    const r = await runCli(['report', DEMO_REV_B, '--format', 'json', '--fail-on', 'note']);
    const findings: { severity: string; accepted?: unknown }[] = JSON.parse(r.stdout).findings;
    // Revision B still has fails-safe supports, reported as notes, and nothing more severe left open.
    expect(findings.filter((f) => !f.accepted).map((f) => f.severity)).toContain('note');
    expect(findings.filter((f) => !f.accepted && f.severity !== 'note')).toEqual([]);
    expect(r.code).toBe(1);
  });

  it('counts a stale justification at needs-justification, not at voids-credit', async () => {
    const file = model(
      'rev-b-stale.bulk',
      `${REV_B}accept shared-bridle:S-101:LIC-101+SIF-101:BR-101 by="C. Reviewer (invented)" date=2026-01-05 reason="revision A"\n`,
    );
    const strict = await runCli(['report', file, '--format', 'sarif', '--fail-on', 'needs-justification']);
    expect(strict.code).toBe(1);
    expect(strict.stdout).toContain('stale-justification:shared-bridle:S-101:LIC-101+SIF-101:BR-101');
    expect((await runCli(['report', file, '--format', 'sarif', '--fail-on', 'voids-credit'])).code).toBe(0);
  });
});

describe.concurrent('bad input and usage exit 2 with a clear message and no stack trace', () => {
  const cases: [string, string[], RegExp][] = [
    ['a model with a syntax error', ['report', 'BROKEN', '--format', 'md'], /broken\.bulk:3:\d+/],
    ['a missing file', ['report', join(dir, 'nope.bulk'), '--format', 'md'], /cannot read/],
    ['no --format', ['report', DEMO], /needs --format/],
    ['an unknown format', ['report', DEMO, '--format', 'pdf'], /--format takes md, html, csv, json, sarif/],
    ['a date that does not exist', ['report', DEMO, '--format', 'md', '--date', '2026-02-30'], /not a date/],
    ['a date in another form', ['report', DEMO, '--format', 'md', '--date', '01/12/2026'], /not a date/],
    ['an unknown --fail-on level', ['report', DEMO, '--format', 'md', '--fail-on', 'error'], /--fail-on takes/],
    ['two model files', ['report', DEMO, DEMO_REV_B, '--format', 'md'], /takes one model file/],
    ['an unknown option', ['report', DEMO, '--format', 'md', '--colour'], /colour/],
  ];
  const broken = model('broken.bulk', 'site "x"\ncategory c tolerable=1e-4 harm=people\nvessel "unterminated\n');
  it.each(cases)('%s', async (_name, args, message) => {
    const r = await runCli(args.map((a) => (a === 'BROKEN' ? broken : a)));
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(message);
    expect(hasStackTrace(r.stderr)).toBe(false);
  });
});
