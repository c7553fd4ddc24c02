// Where `-o` may write: never over a file the command reads (the model would be replaced by its own
// report without a word), and over an existing file only when Bulkhead wrote it or `--force` says so.
import { closeSync, openSync, readSync, statSync } from 'node:fs';
import { UsageError } from './io.ts';

/** The first bytes of each report, as `renderReport` writes them: enough to know our own files. */
const REPORT_SIGNATURES: readonly RegExp[] = [
  /^# Independence evidence list: /, // md
  /^<!DOCTYPE html>[\s\S]{0,2000}<title>Independence evidence list/, // html
  /^row_kind,scenario,/, // csv
  /^# LOPA worksheet: /, // worksheet md
  /^<!DOCTYPE html>[\s\S]{0,2000}<title>LOPA worksheet/, // worksheet html
  /^scenario,scenario_title,study_reference,/, // worksheet csv
  /^action,severity,what_to_do,/, // actions csv
  /^\{\s*"formatVersion": \d+,\s*"tool": \{\s*"name": "bulkhead"/, // json
  /^\{\s*"\$schema": "[^"]*sarif[^"]*",[\s\S]{0,400}"driver": \{\s*"name": "bulkhead"/, // sarif
];

function head(file: string, bytes = 4096): string {
  const fd = openSync(file, 'r');
  try {
    const buffer = Buffer.alloc(bytes);
    return buffer.subarray(0, readSync(fd, buffer, 0, bytes, 0)).toString('utf8');
  } finally {
    closeSync(fd);
  }
}

export function isReportText(text: string): boolean {
  return REPORT_SIGNATURES.some((signature) => signature.test(text));
}

function sameFile(a: string, b: string): boolean {
  try {
    const x = statSync(a);
    const y = statSync(b);
    return x.dev === y.dev && x.ino === y.ino;
  } catch {
    return false;
  }
}

export interface OutputCheck {
  /** The files the command reads: never written over, `--force` or not. */
  inputs: readonly string[];
  force: boolean;
  /** Whether an existing file is one Bulkhead may replace without `--force` (given its first 4 KB). */
  replaceable(head: string): boolean;
  /** What the command writes, for the message: "report", "JSON model". */
  what: string;
  /** Why an existing file may not be replaced, for the message: "is not a Bulkhead report". */
  unlike: string;
}

/** Throws a usage error (exit 2) before anything is computed or written when `out` must not be written. */
export function checkOutput(out: string, check: OutputCheck): void {
  const input = check.inputs.find((file) => sameFile(file, out));
  if (input !== undefined) {
    throw new UsageError(
      `-o \`${out}\` is the model file \`${input}\` itself; writing the ${check.what} there would replace the model. Choose another output file`,
    );
  }
  let stat;
  try {
    stat = statSync(out);
  } catch {
    return; // nothing there yet (a missing directory is reported when writing)
  }
  if (stat.isDirectory()) throw new UsageError(`-o \`${out}\` is a directory; name a file`);
  if (check.force || stat.size === 0) return;
  if (!check.replaceable(head(out))) {
    throw new UsageError(
      `-o \`${out}\` already exists and ${check.unlike}; nothing was written. Add --force to replace it`,
    );
  }
}
