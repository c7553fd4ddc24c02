// File input and output for the CLI: reads a model with the size and existence checks done before
// any bytes are decoded, and prints diagnostics to stderr.
import { readFileSync, statSync } from 'node:fs';
import { error, loadModelText, MAX_FILE_BYTES, renderDiagnostics, type LoadResult } from '@bulkhead/core';

export class UsageError extends Error {}

export function readModel(file: string): LoadResult {
  let size: number;
  try {
    const stat = statSync(file);
    if (stat.isDirectory()) return failed(file, `\`${file}\` is a directory, not a model file`);
    size = stat.size;
  } catch {
    return failed(file, `cannot read \`${file}\`: no such file`);
  }
  if (size > MAX_FILE_BYTES) {
    return {
      format: 'bulk',
      diagnostics: [error('BH103', `the file is ${(size / 1048576).toFixed(1)} MB; the limit is 50 MB`, undefined, { help: 'split the site into units, one model file each' })],
      spans: new Map(),
      source: { file, lines: [] },
    };
  }
  let bytes: Uint8Array;
  try {
    bytes = readFileSync(file);
  } catch (e) {
    return failed(file, `cannot read \`${file}\`: ${(e as NodeJS.ErrnoException).code ?? 'read error'}`);
  }
  return loadModelText(file, bytes);
}

function failed(file: string, message: string): LoadResult {
  return { format: 'bulk', diagnostics: [error('BH104', message)], spans: new Map(), source: { file, lines: [] } };
}

export function printDiagnostics(result: LoadResult): void {
  if (result.diagnostics.length === 0) return;
  process.stderr.write(renderDiagnostics(result.diagnostics, result.source) + '\n');
  const errors = result.diagnostics.filter((d) => d.severity === 'error').length;
  process.stderr.write(`\n${result.source.file}: ${errors} error${errors === 1 ? '' : 's'}; nothing was analysed\n`);
}
