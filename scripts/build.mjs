#!/usr/bin/env node
// Builds what runs outside the repository's dev tools (run by `npm ci` through the root `prepare`):
//   bin   the `bulkhead` command as one plain-JavaScript file, packages/cli/dist/bulkhead.js (esbuild),
//         so it starts on bare node: one file to read and compile instead of a few hundred modules;
//   lib   @bulkhead/core, @bulkhead/layout and @bulkhead/import as JavaScript with type declarations in their dist/ (tsc,
//         incremental: an unchanged package is not rebuilt), which their `exports` point at.
// `node scripts/build.mjs [bin] [lib]` builds the parts named, or both. Sources stay the truth: tests,
// the type check and the viewer read them through the `bulkhead-source` export condition.
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { build } from 'esbuild';

const root = fileURLToPath(new URL('..', import.meta.url));
const parts = process.argv.slice(2);
const wanted = (part) => parts.length === 0 || parts.includes(part);

export async function buildBin() {
  await build({
    absWorkingDir: root,
    entryPoints: ['packages/cli/src/main.ts'],
    outfile: 'packages/cli/dist/bulkhead.js',
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    // Our packages from source; jsonc-parser's `main` is a UMD file that cannot be bundled as ESM.
    conditions: ['bulkhead-source'],
    mainFields: ['module', 'main'],
    legalComments: 'linked',
    // The XLSX reader is large and only `import` of a workbook needs it: loaded from node_modules on
    // demand, so it costs the other commands nothing at start-up.
    external: ['exceljs'],
    logLevel: 'warning',
  });
}

export function buildLibraries() {
  const tsc = spawnSync(
    process.execPath,
    [
      fileURLToPath(new URL('../node_modules/typescript/bin/tsc', import.meta.url)),
      '-b',
      'packages/core/tsconfig.build.json',
      'packages/layout/tsconfig.build.json',
      'packages/import/tsconfig.build.json',
    ],
    { cwd: root, stdio: 'inherit' },
  );
  if (tsc.status !== 0) throw new Error(`tsc -b exited ${tsc.status}`);
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  try {
    if (wanted('bin')) await buildBin();
    if (wanted('lib')) buildLibraries();
  } catch (e) {
    process.stderr.write(`build failed: ${e instanceof Error ? e.message : String(e)}\n`);
    process.exit(1);
  }
}
