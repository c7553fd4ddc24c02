// Runs once before the tests: rebuilds the `bulkhead` bin from the current sources (about a second),
// so CLI tests never run a stale packages/cli/dist. The library build is left to the test that uses it.
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

export default function setup(): void {
  const build = spawnSync(process.execPath, [fileURLToPath(new URL('../scripts/build.mjs', import.meta.url)), 'bin'], {
    encoding: 'utf8',
  });
  if (build.status !== 0) throw new Error(`building the bulkhead bin failed:\n${build.stderr}`);
}
