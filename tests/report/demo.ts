// The demo models run through the real pipeline (load, analyze) into report inputs, the way
// `bulkhead report` builds them; shared by the golden, determinism and CLI tests.
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { analyze, loadModelText, type ReportInput } from '@bulkhead/core';

export const DEMO = 'fixtures/demo/marrow-fen.bulk';
export const DEMO_REV_B = 'fixtures/demo/marrow-fen-rev-b.bulk';
export const GOLDEN_DIR = fileURLToPath(new URL('./golden/', import.meta.url));
const ROOT = fileURLToPath(new URL('../../', import.meta.url));

export function readDemo(file: string): string {
  return readFileSync(`${ROOT}${file}`, 'utf8');
}

export function cliVersion(): string {
  return (JSON.parse(readFileSync(`${ROOT}packages/cli/package.json`, 'utf8')) as { version: string }).version;
}

export function sha256(text: string): string {
  return createHash('sha256').update(text, 'utf8').digest('hex');
}

/** The input the CLI builds for `file`, from `text` (the file's own text unless a test changes it). */
export function demoInput(
  file: string,
  text = readDemo(file),
  options: { sha?: string; date?: string } = {},
): ReportInput {
  const loaded = loadModelText(file, text);
  if (!loaded.model) throw new Error(`${file} does not load: ${JSON.stringify(loaded.diagnostics)}`);
  return {
    model: loaded.model,
    analysis: analyze(loaded.model, { spans: loaded.spans }),
    file,
    sha256: options.sha ?? sha256(text),
    toolVersion: cliVersion(),
    ...(options.date ? { date: options.date } : {}),
    spans: loaded.spans,
  };
}

/**
 * The same model with its top-level statements in reverse order and its comments and blank lines left
 * out: a scenario keeps its indented lines (cause, layers), which belong to it.
 */
export function reorderStatements(text: string): string {
  const statements: string[][] = [];
  for (const line of text.split('\n')) {
    if (line.trim() === '' || line.trimStart().startsWith('#')) continue;
    if (/^\s/.test(line)) statements[statements.length - 1]!.push(line);
    else statements.push([line]);
  }
  return `${statements
    .reverse()
    .map((s) => s.join('\n'))
    .join('\n')}\n`;
}
