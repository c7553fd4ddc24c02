// The `bulkhead` commands of the foundation (check, fmt, convert, schema) run as a user runs them:
// exit codes (0 clean, 1 fmt --check found changes, 2 bad input or usage), help, and clean pipes.
import { spawn } from 'node:child_process';
import {
  chmodSync,
  cpSync,
  lstatSync,
  mkdtempSync,
  readFileSync,
  rmSync,
  statSync,
  symlinkSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CLI_BIN, hasStackTrace, REPO_ROOT, runCli } from '../helpers/cli.ts';

const DEMO = 'fixtures/demo/marrow-fen.bulk';
const DEMO_JSON = 'fixtures/demo/marrow-fen.json';
let dir: string;

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'bulkhead-cli-'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function temp(name: string, text: string): string {
  const file = join(dir, name);
  writeFileSync(file, text);
  return file;
}

describe('help and usage', () => {
  it.each([
    ['--help'],
    ['-h'],
    ['help'],
    ['check', '--help'],
    ['fmt', '--help'],
    ['convert', '--help'],
    ['schema', '--help'],
  ])('`bulkhead %s` prints usage and exits 0', async (...args) => {
    const r = await runCli(args);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/usage: bulkhead/);
    expect(r.stderr).toBe('');
  });

  it('with no command prints usage and exits 2', async () => {
    const r = await runCli([]);
    expect(r.code).toBe(2);
    expect(r.stdout + r.stderr).toMatch(/usage: bulkhead/);
  });

  it.each([
    [['check', '--frobnicate', DEMO], /--frobnicate/],
    [['frobnicate'], /unknown command `frobnicate`/],
    [['check'], /needs a model file/],
    [['fmt'], /needs at least one model file/],
    [['convert', DEMO], /--to json or --to bulk/],
    [['convert', DEMO, '--to', 'xml'], /not `xml`/],
  ])('%j exits 2 with a clear message and no stack trace', async (args, message) => {
    const r = await runCli(args);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(message);
    expect(r.stderr).toContain('bulkhead --help');
    expect(hasStackTrace(r.stderr)).toBe(false);
  });
});

describe('check', () => {
  // What check prints after loading belongs to the analysis; here only that a valid model loads.
  it.each([DEMO, DEMO_JSON])('loads the valid model %s and exits 0 with --fail-on none', async (file) => {
    const r = await runCli(['check', file, '--fail-on', 'none']);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain(file);
    expect(r.stdout).toMatch(/4 scenarios|scenarios\s+4/);
    expect(r.stderr).toBe('');
  });
});

describe('schema', () => {
  it('prints the JSON Schema and exits 0', async () => {
    const r = await runCli(['schema']);
    expect(r.code).toBe(0);
    expect(JSON.parse(r.stdout).$schema).toBe('https://json-schema.org/draft/2020-12/schema');
  });
});

describe('fmt', () => {
  it('--check passes on canonical fixtures (both forms) and exits 0', async () => {
    const r = await runCli([
      'fmt',
      '--check',
      'fixtures/demo/marrow-fen.bulk',
      'fixtures/demo/marrow-fen-rev-b.bulk',
      DEMO_JSON,
    ]);
    expect(r.code).toBe(0);
    expect(r.stdout).toBe('');
  });

  it('--check exits 1 on an unformatted file and leaves it alone; fmt then rewrites it', async () => {
    const messy = 'site "Messy"   # note\n\n\ncategory c tolerable=0.0001 harm=people\nvessel V-1\n  title="Drum"\n';
    const file = temp('messy.bulk', messy);
    const check = await runCli(['fmt', '--check', file]);
    expect(check.code).toBe(1);
    expect(check.stdout).toContain('not in canonical form');
    expect(readFileSync(file, 'utf8')).toBe(messy);
    const fmt = await runCli(['fmt', file]);
    expect(fmt.code).toBe(0);
    expect(readFileSync(file, 'utf8')).toBe(
      'site "Messy" # note\ncategory c tolerable=1e-4 harm=people\n\nvessel V-1 title="Drum"\n',
    );
    expect((await runCli(['fmt', '--check', file])).code).toBe(0);
  });

  it('rewrites through a symbolic link and keeps the file mode', async () => {
    const target = temp('target.bulk', 'site "L"\n\ncategory c tolerable=0.0001 harm=people\n');
    chmodSync(target, 0o640);
    const link = join(dir, 'link.bulk');
    symlinkSync(target, link);
    expect((await runCli(['fmt', link])).code).toBe(0);
    expect(lstatSync(link).isSymbolicLink()).toBe(true);
    expect(readFileSync(target, 'utf8')).toBe('site "L"\ncategory c tolerable=1e-4 harm=people\n');
    expect(statSync(target).mode & 0o777).toBe(0o640);
  });

  it('treats CRLF line ends as not canonical', async () => {
    const file = temp('crlf.bulk', readFileSync(join(REPO_ROOT, DEMO), 'utf8').replace(/\n/g, '\r\n'));
    expect((await runCli(['fmt', '--check', file])).code).toBe(1);
  });

  it('exits 2 on a bad file, reports it, and still formats the others', async () => {
    const good = temp('good.bulk', 'site "G"\ncategory c tolerable=0.0001 harm=people\n');
    const bad = temp('bad.bulk', 'site "B\n');
    const r = await runCli(['fmt', bad, good]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/^ {2}code +BH110 /m);
    expect(r.stderr).toContain(`${bad}:1:6`);
    expect(readFileSync(bad, 'utf8')).toBe('site "B\n');
    expect(readFileSync(good, 'utf8')).toBe('site "G"\ncategory c tolerable=1e-4 harm=people\n');
    expect(hasStackTrace(r.stderr)).toBe(false);
  });
});

describe('convert', () => {
  it('--to json prints the JSON twin', async () => {
    const r = await runCli(['convert', DEMO, '--to', 'json']);
    expect(r.code).toBe(0);
    expect(r.stdout).toBe(readFileSync(join(REPO_ROOT, DEMO_JSON), 'utf8'));
  });

  it('--to bulk turns the twin back into the .bulk file, byte for byte', async () => {
    const r = await runCli(['convert', DEMO_JSON, '--to', 'bulk']);
    expect(r.code).toBe(0);
    expect(r.stdout).toBe(readFileSync(join(REPO_ROOT, DEMO), 'utf8'));
  });

  it('-o writes the output to a file', async () => {
    const out = join(dir, 'out.json');
    const r = await runCli(['convert', DEMO, '--to', 'json', '-o', out]);
    expect(r.code).toBe(0);
    expect(r.stdout).toBe('');
    expect(readFileSync(out, 'utf8')).toBe(readFileSync(join(REPO_ROOT, DEMO_JSON), 'utf8'));
  });

  it('round-trips every demo fixture through the command line (bulk -> json -> bulk)', async () => {
    for (const name of ['marrow-fen', 'marrow-fen-rev-b']) {
      const json = join(dir, `${name}.json`);
      cpSync(join(REPO_ROOT, `fixtures/demo/${name}.bulk`), join(dir, `${name}.bulk`));
      expect((await runCli(['convert', join(dir, `${name}.bulk`), '--to', 'json', '-o', json])).code).toBe(0);
      const back = await runCli(['convert', json, '--to', 'bulk']);
      expect(back.code).toBe(0);
      expect(back.stdout).toBe(readFileSync(join(REPO_ROOT, `fixtures/demo/${name}.bulk`), 'utf8'));
    }
  });

  it('says aloud that $schema has no place in .bulk', async () => {
    const model = JSON.parse(readFileSync(join(REPO_ROOT, DEMO_JSON), 'utf8')) as Record<string, unknown>;
    const file = temp('with-schema.json', JSON.stringify({ $schema: './model.schema.json', ...model }, null, 2));
    const r = await runCli(['convert', file, '--to', 'bulk']);
    expect(r.code).toBe(0);
    expect(r.stderr).toContain('`$schema`');
    expect(r.stdout).toBe(readFileSync(join(REPO_ROOT, DEMO), 'utf8'));
  });

  it('exits 2 on a bad model and writes nothing', async () => {
    const out = join(dir, 'never.json');
    const r = await runCli(['convert', 'fixtures/bad/unknown-reference.bulk', '--to', 'json', '-o', out]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('fixtures/bad/unknown-reference.bulk:16:19');
    expect(() => readFileSync(out)).toThrow();
  });
});

describe('pipes closed early (EPIPE)', () => {
  /** Runs `bulkhead ARGS | head -1` in a shell with pipefail, so the exit status is bulkhead's own. */
  function piped(args: string[]): Promise<{ code: number | null; stdout: string; stderr: string }> {
    return new Promise((resolve) => {
      const quoted = [process.execPath, CLI_BIN, ...args].map((a) => `'${a.replace(/'/g, `'\\''`)}'`).join(' ');
      const child = spawn('bash', ['-c', `set -o pipefail; ${quoted} | head -1`], {
        cwd: REPO_ROOT,
        env: { ...process.env, NO_COLOR: '1' },
      });
      let stdout = '';
      let stderr = '';
      child.stdout.on('data', (c: Buffer) => (stdout += c.toString()));
      child.stderr.on('data', (c: Buffer) => (stderr += c.toString()));
      child.on('close', (code) => resolve({ code, stdout, stderr }));
    });
  }

  it('`bulkhead schema | head -1` exits cleanly with no stack trace', async () => {
    const r = await piped(['schema']);
    expect(r.code).toBe(0);
    expect(r.stdout).toBe('{\n');
    expect(r.stderr).toBe('');
  });

  it('a large conversion into `head -1` (output far beyond the pipe buffer) exits cleanly', async () => {
    const lines = ['site "Big"'];
    for (let i = 0; i < 20000; i++)
      lines.push(`vessel V-${i} title="vessel number ${i}, with a title long enough to fill the pipe"`);
    const file = temp('big.bulk', lines.join('\n') + '\n');
    const r = await piped(['convert', file, '--to', 'json']);
    expect(r.code).toBe(0);
    expect(r.stdout).toBe('{\n');
    expect(hasStackTrace(r.stderr)).toBe(false);
    expect(r.stderr).toBe('');
  });
});
