// `bulkhead fmt FILE... [--check]`: rewrites model files in canonical form, keeping every comment.
// A file is rewritten only when its canonical text differs byte for byte and reads back as the same model.
import { readFileSync } from 'node:fs';
import { formatModelFile } from '@bulkhead/core';
import { printDiagnostics, printVerified, readModel, writeFileAtomic, type ReadResult } from '../io.ts';

/**
 * The files to rewrite and their canonical text. A model split over part files is formatted file by
 * file, each keeping its own statements; the model as a whole has already loaded clean.
 */
function canonicalTexts(
  file: string,
  result: ReadResult & { bytes: Uint8Array },
): { file: string; bytes: Uint8Array; text: string }[] {
  if (!result.parts?.length || !result.model)
    return [{ file, bytes: result.bytes, text: printVerified(result.model!, result.format, file) }];
  return [file, ...result.parts].map((path) => {
    const bytes = path === file ? result.bytes : readFileSync(path);
    const text = formatModelFile(Buffer.from(bytes).toString('utf8'));
    if (text === undefined)
      throw new Error(
        `the canonical form of \`${path}\` does not read back as the same statements, so nothing was written`,
      );
    return { file: path, bytes, text };
  });
}

export function fmtCommand(files: string[], check: boolean): number {
  let unformatted = 0;
  let bad = 0;
  for (const file of files) {
    const result = readModel(file);
    if (!result.model || !result.bytes) {
      // Report every bad file, and go on with the others, so one run shows all that is wrong.
      printDiagnostics(result);
      bad++;
      continue;
    }
    for (const { file: path, bytes, text: canonical } of canonicalTexts(file, { ...result, bytes: result.bytes })) {
      // Compare the bytes, not the lines: CRLF line ends or a missing final newline are not canonical.
      if (Buffer.from(bytes).equals(Buffer.from(canonical, 'utf8'))) continue;
      if (check) {
        unformatted++;
        process.stdout.write(`${path}: not in canonical form (run \`bulkhead fmt ${file}\`)\n`);
      } else {
        writeFileAtomic(path, canonical);
        process.stdout.write(`${path}: formatted\n`);
      }
    }
  }
  if (bad > 0) return 2;
  return unformatted > 0 ? 1 : 0;
}
