// `bulkhead diff`, `cut-sets` and `common-causes` through the real binary: answer first, every format,
// the CI exit code, a git revision as OLD, and bad input or usage refused with exit 2 and no stack trace.
import { execFileSync } from 'node:child_process';
import { copyFileSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { hasStackTrace, REPO_ROOT, runCli } from '../helpers/cli.ts';

const A = 'fixtures/demo/marrow-fen.bulk';
const B = 'fixtures/demo/marrow-fen-rev-b.bulk';
const dir = mkdtempSync(join(tmpdir(), 'bulkhead-diff-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('bulkhead diff', () => {
  it('answers first, exits 0 when nothing got worse, 1 with --fail-on worse when something did', async () => {
    const better = await runCli(['diff', A, B, '--fail-on', 'worse']);
    expect(better.code).toBe(0);
    expect(better.stdout.split('\n')[0]).toBe(
      '0 scenarios got worse, 3 better; 0 findings appeared, 10 disappeared, 0 changed severity; 1 finding changed acceptance.',
    );
    const worse = await runCli(['diff', B, A, '--fail-on', 'worse']);
    expect(worse.code).toBe(1);
    expect(worse.stdout.split('\n')[0]).toMatch(/^3 scenarios got worse, 0 better; 10 findings appeared/);
    expect(worse.stderr).toMatch(/made independence worse/);
  });

  it('writes JSON, Markdown and SARIF with only the new findings', async () => {
    const json = JSON.parse((await runCli(['diff', B, A, '--format', 'json'])).stdout);
    expect(json.summary).toMatchObject({ worse: 3, better: 0, findingsAppeared: 10 });
    const md = (await runCli(['diff', A, B, '--format', 'md'])).stdout;
    expect(md).toMatch(/^# Revision diff\n\n\*\*0 scenarios got worse, 3 better/);
    const sarif = JSON.parse((await runCli(['diff', B, A, '--format', 'sarif'])).stdout);
    expect(sarif.version).toBe('2.1.0');
    expect(sarif.runs[0].results.map((r: { ruleId: string }) => r.ruleId).sort()).toEqual(
      json.appeared.map((f: { rule: string }) => f.rule).sort(),
    );
    const none = JSON.parse((await runCli(['diff', A, B, '--format', 'sarif'])).stdout);
    expect(none.runs[0].results).toEqual([]);
  });

  it('reads OLD from a git revision of the same file', async () => {
    const git = (...args: string[]) =>
      execFileSync('git', ['-c', 'user.name=Test', '-c', 'user.email=test@example.invalid', ...args], {
        cwd: dir,
        stdio: 'ignore',
      });
    git('init', '-q');
    copyFileSync(join(REPO_ROOT, A), join(dir, 'unit.bulk'));
    git('add', 'unit.bulk');
    git('commit', '-q', '-m', 'rev A');
    copyFileSync(join(REPO_ROOT, B), join(dir, 'unit.bulk'));
    const r = await runCli(['diff', join(dir, 'unit.bulk'), '--git', 'HEAD']);
    expect(r.code).toBe(0);
    expect(r.stdout.split('\n')[0]).toMatch(/^0 scenarios got worse, 3 better/);
    expect(r.stdout.split('\n')[1]).toBe(`from ${join(dir, 'unit.bulk')}@HEAD to ${join(dir, 'unit.bulk')}`);
    const missing = await runCli(['diff', join(dir, 'unit.bulk'), '--git', 'no-such-rev']);
    expect(missing.code).toBe(2);
    expect(missing.stderr).toMatch(/cannot read .* at git revision `no-such-rev`/);
    expect(hasStackTrace(missing.stderr)).toBe(false);
  });

  it('refuses bad usage and bad models with exit 2', async () => {
    expect((await runCli(['diff', A])).code).toBe(2);
    expect((await runCli(['diff', A, B, '--fail-on', 'note'])).stderr).toMatch(/--fail-on takes `worse` for diff/);
    const broken = join(dir, 'broken.bulk');
    writeFileSync(broken, 'site "x"\nvessel\n');
    const r = await runCli(['diff', A, broken]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/broken\.bulk:2:/);
    expect(hasStackTrace(r.stderr)).toBe(false);
  });
});

describe('bulkhead cut-sets and common-causes', () => {
  it('lists cut sets answer first, and refuses an order out of range', async () => {
    const r = await runCli(['cut-sets', A]);
    expect(r.code).toBe(0);
    expect(r.stdout.split('\n')[0]).toBe('No scenario of 4 can be started and left unprotected by one element.');
    expect(r.stdout).toMatch(/ {2}0 single points, 83 pairs/);
    const json = JSON.parse((await runCli(['cut-sets', A, '--order', '1', '--format', 'json'])).stdout);
    expect(json.maxOrder).toBe(1);
    expect((await runCli(['cut-sets', A, '--order', '9'])).code).toBe(2);
  });

  it('ranks common causes with the order stated, as text, JSON and CSV', async () => {
    const text = (await runCli(['common-causes', A])).stdout.split('\n');
    expect(text[0]).toMatch(/^7 elements take part in open findings; first: LT-102: 2 layers in 1 scenario/);
    expect(text[1]).toMatch(/^Ranked by/);
    const json = JSON.parse((await runCli(['common-causes', A, '--format', 'json'])).stdout);
    expect(json.elements[0].element).toBe('LT-102');
    const csv = (await runCli(['common-causes', A, '--format', 'csv'])).stdout;
    expect(csv.split('\r\n')[0]).toBe(
      'rank,element,kind,title,layers,scenarios,scenario_ids,findings,open_findings,frequency_cost_per_year,frequency_at_stake_per_year,gap_reduction_per_year,would_meet',
    );
  });
});
