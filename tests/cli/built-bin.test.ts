// The `bulkhead` bin runs plain JavaScript that `npm ci` built (scripts/build.mjs): one bundled file that
// needs neither a TypeScript loader nor node_modules at run time, and says how to build it when missing.
import { spawnSync } from 'node:child_process';
import { copyFileSync, mkdirSync, mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { CLI_BIN, hasStackTrace, REPO_ROOT } from '../helpers/cli.ts';

const BUNDLE = join(REPO_ROOT, 'packages/cli/dist/bulkhead.js');
const DEMO = join(REPO_ROOT, 'fixtures/demo/marrow-fen.bulk');

describe('the built bin', () => {
  it('should analyse the demo from a copy of the bundle far from the repository and its node_modules', () => {
    const lonely = mkdtempSync(join(tmpdir(), 'bulkhead-bundle-'));
    copyFileSync(BUNDLE, join(lonely, 'bulkhead.js'));
    const r = spawnSync(process.execPath, [join(lonely, 'bulkhead.js'), 'check', DEMO, '--fail-on', 'voids-credit'], {
      cwd: lonely,
      encoding: 'utf8',
      env: { ...process.env, NO_COLOR: '1' },
    });
    expect(hasStackTrace(r.stderr)).toBe(false);
    // Exit 1: the demo's revision A has findings that void credit (an SIS transmitter on the loop's bridle).
    expect(r.status).toBe(1);
    expect(r.stdout).toContain('shared-bridle');
    expect(r.stdout).toMatch(/4 scenarios, 1 meeting its criterion after independence[\s\S]*findings: \d+ void credit/);
  });

  it("should name no TypeScript loader, in the bin or among the command's dependencies", () => {
    expect(readFileSync(CLI_BIN, 'utf8')).not.toMatch(/tsx|\.ts['"]/);
    const pkg = JSON.parse(readFileSync(join(REPO_ROOT, 'packages/cli/package.json'), 'utf8')) as {
      dependencies?: Record<string, string>;
    };
    expect(Object.keys(pkg.dependencies ?? {})).not.toContain('tsx');
  });

  it('should exit 2 and say how to build it when the bundle is missing, without a stack trace', () => {
    const unbuilt = mkdtempSync(join(tmpdir(), 'bulkhead-unbuilt-'));
    mkdirSync(join(unbuilt, 'bin'));
    copyFileSync(CLI_BIN, join(unbuilt, 'bin', 'bulkhead.js'));
    const r = spawnSync(process.execPath, [join(unbuilt, 'bin', 'bulkhead.js'), 'check', DEMO], { encoding: 'utf8' });
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('not built');
    expect(r.stderr).toContain('npm run build');
    expect(hasStackTrace(r.stderr)).toBe(false);
  });
});
