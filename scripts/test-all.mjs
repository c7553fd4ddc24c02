#!/usr/bin/env node
// The whole test suite, as the README's test command runs it: type check, lint, format, unit and standards tests,
// then the browser tests when a viewer exists. Prints one plain closing line "N passed, N failed"
// because CI reads that line, not vitest's own summary.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync } from 'node:fs';

const env = { ...process.env, NO_COLOR: '1', FORCE_COLOR: '0' };
mkdirSync('.reports', { recursive: true });

function step(name, command, args) {
  process.stdout.write(`\n== ${name}: ${command} ${args.join(' ')}\n`);
  const r = spawnSync(command, args, { stdio: 'inherit', env });
  return r.status === 0;
}

let ok = step('type check', 'npx', ['tsc', '--noEmit', '-p', '.']);
ok = step('lint', 'npx', ['eslint', '.']) && ok;
ok = step('format', 'npx', ['prettier', '--check', '.']) && ok;
const reports = [];
const hasViewer = existsSync('apps/viewer/vite.config.ts');
if (hasViewer) {
  ok = step('viewer check', 'npm', ['run', 'check', '-w', '@bulkhead/viewer']) && ok;
  ok = step('viewer build', 'npm', ['run', 'build', '-w', '@bulkhead/viewer']) && ok;
}
ok =
  step('unit tests', 'npx', [
    'vitest',
    'run',
    '--reporter=default',
    '--reporter=json',
    '--outputFile.json=.reports/unit.json',
  ]) && ok;
reports.push('.reports/unit.json');
if (hasViewer && existsSync('vitest.e2e.config.ts')) {
  ok =
    step('browser tests', 'npx', [
      'vitest',
      'run',
      '-c',
      'vitest.e2e.config.ts',
      '--reporter=default',
      '--reporter=json',
      '--outputFile.json=.reports/e2e.json',
    ]) && ok;
  reports.push('.reports/e2e.json');
}

let passed = 0;
let failed = 0;
let skipped = 0;
for (const file of reports) {
  if (!existsSync(file)) {
    process.stdout.write(`missing test report ${file}\n`);
    failed++;
    continue;
  }
  const r = JSON.parse(readFileSync(file, 'utf8'));
  passed += r.numPassedTests;
  failed += r.numFailedTests;
  skipped += r.numPendingTests + (r.numTodoTests ?? 0);
}
if (!ok && failed === 0) failed = 1; // a failed type check or build counts as a failure
process.stdout.write(`\n${passed} passed, ${failed} failed, ${skipped} skipped\n`);
process.exit(failed > 0 || passed === 0 ? 1 : 0);
