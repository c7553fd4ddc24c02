// A hash of analyze()'s whole output for the demo models and the generated sites, so a performance
// change can show it changed no trace, finding or assessment: run before and after, compare the lines.
import { createHash } from 'node:crypto';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { analyze, loadModelText } from '@bulkhead/core';
import { ensureGenerated } from './generate.ts';

const root = new URL('..', import.meta.url).pathname;
const demo = join(root, 'fixtures', 'demo');
const sizes = (process.argv[2] ?? '1000,10000').split(',').map(Number);
const files = [
  ...readdirSync(demo)
    .filter((f) => /\.(bulk|json)$/.test(f))
    .sort()
    .map((f) => join(demo, f)),
  ...sizes.flatMap((size) => Object.values(ensureGenerated(size))),
];
for (const file of files) {
  const loaded = loadModelText(file, readFileSync(file));
  if (!loaded.model) throw new Error(`${file} does not load`);
  const analysis = analyze(loaded.model, { spans: loaded.spans });
  const hash = createHash('sha256').update(JSON.stringify(analysis)).digest('hex').slice(0, 16);
  process.stdout.write(`${hash}  ${analysis.findings.length} findings  ${file.slice(root.length)}\n`);
}
