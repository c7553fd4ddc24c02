// File input and output for the CLI: reads a model with the size and existence checks done before
// any bytes are decoded, prints diagnostics to stderr, and writes files so a crash never leaves half of one.
import {
  chmodSync,
  existsSync,
  readFileSync,
  realpathSync,
  renameSync,
  statSync,
  unlinkSync,
  writeFileSync,
} from 'node:fs';
import { basename, dirname, join } from 'node:path';
import {
  error,
  loadModelText,
  MAX_FILE_BYTES,
  printBulk,
  printJson,
  renderDiagnostics,
  type LoadResult,
  type Model,
  type ModelFormat,
  type PartBytes,
} from '@bulkhead/core';

export class UsageError extends Error {}

export interface ReadResult extends LoadResult {
  /** The bytes as read, when the file could be read. */
  bytes?: Uint8Array;
  /** The bytes of each part file read, by the path the load names it (so a report hashes what it read). */
  partBytes?: Map<string, Uint8Array>;
}

const REASONS: Record<string, string> = {
  ENOENT: 'no such file',
  EACCES: 'permission denied',
  EPERM: 'permission denied',
  EISDIR: 'it is a directory',
  ENOTDIR: 'a part of the path is not a directory',
  ELOOP: 'too many symbolic links',
  ENAMETOOLONG: 'the path is too long',
};

function reason(e: unknown): string {
  const code = (e as NodeJS.ErrnoException).code;
  return (code && REASONS[code]) ?? code ?? 'read error';
}

export function readModel(file: string): ReadResult {
  let size: number;
  try {
    const stat = statSync(file);
    if (stat.isDirectory()) return failed(file, `\`${file}\` is a directory, not a model file`);
    size = stat.size;
  } catch (e) {
    return failed(file, `cannot read \`${file}\`: ${reason(e)}`);
  }
  if (size > MAX_FILE_BYTES) {
    return {
      format: 'bulk',
      diagnostics: [
        error('BH103', `the file is ${(size / 1048576).toFixed(1)} MB; the limit is 50 MB`, undefined, {
          help: 'split the site into units, one model file each',
        }),
      ],
      spans: new Map(),
      source: { file, lines: [] },
    };
  }
  let bytes: Uint8Array;
  try {
    bytes = readFileSync(file);
  } catch (e) {
    return failed(file, `cannot read \`${file}\`: ${reason(e)}`);
  }
  const partBytes = new Map<string, Uint8Array>();
  const readPart = (path: string): PartBytes => {
    const part = readPartFile(path);
    if (part instanceof Uint8Array) partBytes.set(path, part);
    return part;
  };
  return { ...loadModelText(file, bytes, { readPart }), bytes, ...(partBytes.size ? { partBytes } : {}) };
}

/** Reads a part file a model names, with the same existence and size checks as the model file itself. */
export function readPartFile(path: string): PartBytes {
  try {
    const stat = statSync(path);
    if (stat.isDirectory()) return { problem: 'it is a directory' };
    if (stat.size > MAX_FILE_BYTES)
      return { problem: `it is ${(stat.size / 1048576).toFixed(1)} MB; the limit is 50 MB` };
    return readFileSync(path);
  } catch (e) {
    return { problem: reason(e) };
  }
}

function failed(file: string, message: string): LoadResult {
  return {
    format: 'bulk',
    diagnostics: [error('BH104', message, undefined, { help: 'check the path and that you may read the file' })],
    spans: new Map(),
    source: { file, lines: [] },
  };
}

export function printDiagnostics(result: LoadResult): void {
  if (result.diagnostics.length === 0) return;
  process.stderr.write(renderDiagnostics(result.diagnostics, result.source) + '\n');
  const errors = result.diagnostics.reduce((n, d) => n + (d.severity === 'error' ? 1 + (d.more ?? 0) : 0), 0);
  process.stderr.write(`\n${result.source.file}: ${errors} error${errors === 1 ? '' : 's'}; nothing was analysed\n`);
}

/** Writes through a temporary file in the same directory and renames it, so the target is never half-written. */
export function writeFileAtomic(file: string, text: string): void {
  // Write where a symbolic link points, and keep the file's permissions, as an in-place edit would.
  const target = existsSync(file) ? realpathSync(file) : file;
  const mode = existsSync(target) ? statSync(target).mode & 0o777 : undefined;
  const temporary = join(dirname(target), `.${basename(target)}.${process.pid}.tmp`);
  try {
    writeFileSync(temporary, text);
    if (mode !== undefined) chmodSync(temporary, mode);
    renameSync(temporary, target);
  } catch (e) {
    try {
      unlinkSync(temporary);
    } catch {
      // nothing to clean up
    }
    throw new UsageError(`cannot write \`${file}\`: ${reason(e)}`);
  }
}

/**
 * Prints a model in the given form and reads the text back before anyone writes it: if the printed
 * text would not load as the same model, nothing is written (that would be a bug in the printer).
 * The one field .bulk has no place for is JSON's `$schema` (an editor hint); its loss is said aloud.
 */
export function printVerified(model: Model, to: ModelFormat, file: string): string {
  const text = to === 'json' ? printJson(model) : printBulk(model);
  const expected = to === 'bulk' && model.$schema !== undefined ? { ...model, $schema: undefined } : model;
  const back = loadModelText(to === 'json' ? 'check.json' : 'check.bulk', text);
  if (!back.model || printJson(back.model) !== printJson(expected)) {
    throw new Error(`the ${to} form of \`${file}\` does not read back as the same model, so nothing was written`);
  }
  if (expected !== model)
    process.stderr.write(`${file}: note: \`$schema\` is a JSON editor hint with no place in .bulk; it was left out\n`);
  return text;
}
