// Each command parses only its own options: one that belongs to another command is a usage error
// (exit 2) that names where it belongs, never silently ignored. --version comes from the package.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { hasStackTrace, runCli } from '../helpers/cli.ts';

const DEMO = 'fixtures/demo/marrow-fen.bulk';

describe('options are per command', () => {
  it.each([
    [['check', DEMO, '--to', 'json'], '`bulkhead check` has no option `--to` (it belongs to `bulkhead convert`)'],
    [['check', DEMO, '--port', '9'], '`bulkhead check` has no option `--port` (it belongs to `bulkhead view`)'],
    [
      ['check', DEMO, '--date', '2020-01-01'],
      '`bulkhead check` has no option `--date` (it belongs to `bulkhead report`)',
    ],
    [
      ['fmt', DEMO, '--format', 'md'],
      '`bulkhead fmt` has no option `--format` (it belongs to `bulkhead report`, `bulkhead cut-sets`, `bulkhead diff`, `bulkhead common-causes`, `bulkhead verify`)',
    ],
    [['view', DEMO, '--check'], '`bulkhead view` has no option `--check` (it belongs to `bulkhead fmt`)'],
    [
      ['trace', DEMO, 'LIC-101', '--fail-on', 'note'],
      '`bulkhead trace` has no option `--fail-on` (it belongs to `bulkhead check`, `bulkhead report`, `bulkhead diff`)',
    ],
    [
      ['report', DEMO, '--format', 'md', '--frobnicate'],
      '`bulkhead report` has no option `--frobnicate`; its options are',
    ],
    [['schema', 'extra.bulk'], '`bulkhead schema` takes no file; found `extra.bulk`'],
    [['check', DEMO, 'second.bulk'], '`bulkhead check` takes a model file; found'],
  ])('`bulkhead %j` is refused with exit 2', async (args, message) => {
    const r = await runCli(args);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain(message);
    expect(r.stdout).toBe('');
    expect(hasStackTrace(r.stderr)).toBe(false);
  });

  it('an option of the command itself still works', async () => {
    const r = await runCli(['check', DEMO, '--fail-on', 'note']);
    expect(r.code).toBe(1);
  });

  it('--version prints the version of the installed CLI package', async () => {
    const pkg = JSON.parse(readFileSync('packages/cli/package.json', 'utf8')) as { version: string };
    const r = await runCli(['--version']);
    expect(r.code).toBe(0);
    expect(r.stdout).toBe(`bulkhead ${pkg.version}\n`);
  });
});
