// The README's "Use it as a library" example, run as written against the built package (plain node, no
// export condition: what a user of @bulkhead/core gets), and type-checked against its declarations.
import { spawnSync } from 'node:child_process';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { analyze, loadModelText } from '@bulkhead/core';
import { beforeAll, describe, expect, it } from 'vitest';
import { REPO_ROOT } from '../helpers/cli.ts';

const WORK = join(REPO_ROOT, 'test-artifacts', 'library');
const EXAMPLE = join(WORK, 'readme-example.mjs');
const MISTYPED = join(WORK, 'mistyped.mjs');

function readmeExample(): string {
  const readme = readFileSync(join(REPO_ROOT, 'README.md'), 'utf8');
  const section = readme.split(/^## Use it as a library$/m)[1];
  const code = section?.match(/^```js\n([\s\S]*?)^```$/m)?.[1];
  if (!code) throw new Error('README.md has no js example under "## Use it as a library"');
  return code;
}

function node(args: string[]) {
  return spawnSync(process.execPath, args, {
    cwd: REPO_ROOT,
    encoding: 'utf8',
    env: { ...process.env, NO_COLOR: '1' },
  });
}

beforeAll(() => {
  // Incremental: rebuilds only a package whose sources changed since its last build.
  const build = node([join(REPO_ROOT, 'scripts', 'build.mjs'), 'lib']);
  if (build.status !== 0) throw new Error(`the library build failed:\n${build.stdout}${build.stderr}`);
  mkdirSync(WORK, { recursive: true });
  writeFileSync(EXAMPLE, readmeExample());
}, 180_000);

describe('the README library example', () => {
  it('should resolve @bulkhead/core to the built JavaScript, not the sources', () => {
    const r = node(['--input-type=module', '-e', "process.stdout.write(import.meta.resolve('@bulkhead/core'))"]);
    expect(r.stdout).toMatch(/\/packages\/core\/dist\/index\.js$/);
  });

  it('should run on plain node and print every finding and assessment the sources give', () => {
    const run = node([EXAMPLE]);
    expect(run.stderr).toBe('');
    expect(run.status).toBe(0);
    const lines = run.stdout.trimEnd().split('\n');

    const file = 'fixtures/demo/marrow-fen.bulk';
    const loaded = loadModelText(file, readFileSync(join(REPO_ROOT, file)));
    const analysis = analyze(loaded.model!, { spans: loaded.spans });
    expect(lines).toHaveLength(analysis.findings.length + analysis.assessments.length);
    expect(lines.slice(0, analysis.findings.length).map((l) => l.split('  ').slice(0, 3))).toEqual(
      analysis.findings.map((f) => [f.scenario ?? '-', f.severity, f.rule]),
    );
    // Common practice, no source: two level instruments on one bridle are not independent (a plugged
    // bridle defeats both), so the SIS transmitter on the BPCS loop's bridle voids the SIF's credit.
    expect(lines).toContain('S-101  voids-credit  shared-bridle  LIC-101 + SIF-101  BR-101');
    for (const a of analysis.assessments) {
      expect(lines.find((l) => l.startsWith(`${a.scenario}: `))).toContain(a.meetsAfter ? ', meets' : ', falls short');
    }
  });

  it('should type-check against the built declarations, which catch a misuse', () => {
    writeFileSync(
      MISTYPED,
      "// @ts-check\n/** @type {import('@bulkhead/core').Finding} */\nconst finding = JSON.parse('{}');\n/** @type {number} */\nexport const severity = finding.severity;\n",
    );
    const tsc = node([
      join(REPO_ROOT, 'node_modules', 'typescript', 'bin', 'tsc'),
      '--noEmit',
      '--allowJs',
      '--checkJs',
      '--strict',
      '--module',
      'esnext',
      '--moduleResolution',
      'bundler',
      '--target',
      'es2022',
      '--types',
      'node',
      '--skipLibCheck',
      EXAMPLE,
      MISTYPED,
    ]);
    const errors = tsc.stdout.split('\n').filter((l) => /error TS/.test(l));
    // The example is clean; the one misuse (a severity word into a number) is the only error.
    expect(errors).toHaveLength(1);
    expect(errors[0]).toMatch(/mistyped\.mjs\(5,\d+\): error TS2322/);
  }, 120_000);
});
