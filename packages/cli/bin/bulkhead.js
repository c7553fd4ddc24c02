#!/usr/bin/env node
// The `bulkhead` command: one plain-JavaScript file built from src/ by `npm run build` (`npm ci` runs it).
import { existsSync } from 'node:fs';

const main = new URL('../dist/bulkhead.js', import.meta.url);
if (!existsSync(main)) {
  process.stderr.write(
    'bulkhead: the command is not built (no packages/cli/dist/bulkhead.js).\nBuild it once with:\n  npm run build\nthen run this command again.\n',
  );
  process.exit(2);
}
await import(main.href);
