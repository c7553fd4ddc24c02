// `bulkhead view` as a command: exit 2 with a way forward when the viewer is not built, the file is
// missing or the port is bad; the help names the command.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const BIN = new URL('../../packages/cli/bin/bulkhead.js', import.meta.url).pathname;
const run = (...args: string[]) =>
  spawnSync(process.execPath, [BIN, ...args], {
    encoding: 'utf8',
    env: { ...process.env, NO_COLOR: '1' },
    timeout: 30_000,
  });

describe('bulkhead view', () => {
  it('should exit 2 and say so when the model file is missing', () => {
    const r = run('view', join(tmpdir(), 'no-such-model.bulk'));
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/cannot read .*no such file/);
  });

  it('should exit 2 with a usage error for a bad port', () => {
    const dir = mkdtempSync(join(tmpdir(), 'bulkhead-view-cmd-'));
    writeFileSync(join(dir, 'm.bulk'), 'site "x"\n');
    for (const port of ['http', '70000', '-1']) {
      const r = run('view', join(dir, 'm.bulk'), '--port', port);
      expect(r.status, port).toBe(2);
      expect(r.stderr).toMatch(/--port|port/);
    }
  });

  it('should exit 2 with a coded notice, before serving anything, when the --compare file is missing or does not load', () => {
    const dir = mkdtempSync(join(tmpdir(), 'bulkhead-view-compare-cmd-'));
    const model = join(dir, 'm.bulk');
    writeFileSync(model, 'site "x"\n');
    const missing = run('view', model, '--compare', join(dir, 'no-such-old.bulk'), '--port', '0');
    expect(missing.status).toBe(2);
    expect(missing.stderr).toContain('no-such-old.bulk');
    expect(missing.stderr).toMatch(/BH104/);
    expect(missing.stdout).not.toMatch(/open http/);
    // The attribute with no value sits on line 2, column 17 (where the value should start).
    const broken = join(dir, 'old.bulk');
    writeFileSync(broken, 'site "x"\nvessel V-1 bogus=\n');
    const bad = run('view', model, '--compare', broken, '--port', '0');
    expect(bad.status).toBe(2);
    expect(bad.stderr).toContain(`${broken}:2:17`);
    expect(bad.stderr).toMatch(/BH116/);
    expect(bad.stderr).not.toMatch(/\n\s+at /);
    const empty = run('view', model, '--compare=', '--port', '0');
    expect(empty.status).toBe(2);
    expect(empty.stderr).toMatch(/--compare needs an earlier model file/);
  });

  it('should be listed in the help, with its own page', () => {
    expect(run('--help').stdout).toMatch(/view FILE \[--port N\]/);
    const page = run('view', '--help');
    expect(page.status).toBe(0);
    expect(page.stdout).toMatch(/127\.0\.0\.1/);
    expect(page.stdout).toMatch(/npm run build -w @bulkhead\/viewer/);
    expect(page.stdout).toMatch(/--compare OLD/);
  });
});

describe('viewCommand without a built viewer', () => {
  it('should exit 2 and tell how to build it', async () => {
    const { viewCommand } = await import('../../packages/cli/src/commands/view.ts');
    const dir = mkdtempSync(join(tmpdir(), 'bulkhead-view-nodist-'));
    writeFileSync(join(dir, 'm.bulk'), 'site "x"\n');
    const written: string[] = [];
    const write = process.stderr.write.bind(process.stderr);
    process.stderr.write = ((chunk: string) => (written.push(String(chunk)), true)) as typeof process.stderr.write;
    try {
      expect(viewCommand(join(dir, 'm.bulk'), undefined, join(dir, 'dist') + '/')).toBe(2);
    } finally {
      process.stderr.write = write;
    }
    expect(written.join('')).toMatch(/not built[\s\S]*npm run build -w @bulkhead\/viewer/);
  });
});
