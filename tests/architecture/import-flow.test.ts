// The core reads as one straight line: text -> load -> model -> graph -> traces -> findings ->
// assessment -> report. Each folder of packages/core/src may import only from folders below it in
// FLOW (or from itself); this test reads every import and fails on a back-edge or a cycle.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const SRC = fileURLToPath(new URL('../../packages/core/src/', import.meta.url));

/**
 * Bottom first. A folder may import from any folder before it. `reliability` (a SIF's PFDavg and PFH from its failure
 * data) reads only the model and the traces, and comes before `assess`, which credits a SIF at its computed figure;
 * `verify` judges that figure against the scenarios' requirements, so it stays after `analysis`.
 */
const FLOW = [
  'diagnostics',
  'util',
  'model',
  'catalogue',
  'vocabulary',
  'bulk',
  'json',
  'loader',
  'graph',
  'trace',
  'reliability',
  'rules',
  'assess',
  'justify',
  'analysis',
  'verify',
  'cutsets',
  'ranking',
  'report',
  'diff',
];

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? files(path) : path.endsWith('.ts') ? [path] : [];
  });
}

function folderOf(path: string): string {
  const rel = relative(SRC, path);
  return rel.includes('/') ? rel.split('/')[0]! : '(package index)';
}

/** Every relative import or re-export of a file, as [importing folder, imported folder]. */
function edges(): { from: string; to: string; file: string }[] {
  const out: { from: string; to: string; file: string }[] = [];
  for (const file of files(SRC)) {
    const text = readFileSync(file, 'utf8');
    for (const m of text.matchAll(/(?:import|export)[^'"]*?from\s+['"](\.{1,2}\/[^'"]+)['"]/g)) {
      out.push({ from: folderOf(file), to: folderOf(resolve(dirname(file), m[1]!)), file: relative(SRC, file) });
    }
  }
  return out;
}

describe('imports in packages/core follow the flow', () => {
  const all = edges();

  it('reads a real import graph', () => {
    expect(all.length).toBeGreaterThan(100);
    expect(new Set(all.map((e) => e.from)).size).toBeGreaterThan(8);
  });

  it('names every folder in FLOW', () => {
    const folders = new Set(all.map((e) => e.from).filter((f) => f !== '(package index)'));
    expect([...folders].filter((f) => !FLOW.includes(f))).toEqual([]);
  });

  it('has no import against the flow (so no cycle between folders either)', () => {
    const back = all
      .filter((e) => e.from !== '(package index)' && e.from !== e.to && FLOW.indexOf(e.to) > FLOW.indexOf(e.from))
      .map((e) => `${e.file} imports ${e.to}/ (above ${e.from}/)`);
    expect(back).toEqual([]);
  });
});
