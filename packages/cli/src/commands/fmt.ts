// `bulkhead fmt FILE... [--check]`: rewrites model files in canonical form, keeping every comment.
// A file is rewritten only when its canonical text differs byte for byte and reads back as the same model.
import { printDiagnostics, printVerified, readModel, writeFileAtomic } from '../io.ts';

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
    const canonical = printVerified(result.model, result.format, file);
    // Compare the bytes, not the lines: CRLF line ends or a missing final newline are not canonical.
    if (Buffer.from(result.bytes).equals(Buffer.from(canonical, 'utf8'))) continue;
    if (check) {
      unformatted++;
      process.stdout.write(`${file}: not in canonical form (run \`bulkhead fmt ${file}\`)\n`);
    } else {
      writeFileAtomic(file, canonical);
      process.stdout.write(`${file}: formatted\n`);
    }
  }
  if (bad > 0) return 2;
  return unformatted > 0 ? 1 : 0;
}
