// `bulkhead fmt FILE [--check]`: rewrites a .bulk file in canonical form, keeping every comment.
import { writeFileSync } from 'node:fs';
import { printBulk, printJson } from '@bulkhead/core';
import { printDiagnostics, readModel } from '../io.ts';

export function fmtCommand(files: string[], check: boolean): number {
  let unformatted = 0;
  for (const file of files) {
    const result = readModel(file);
    if (!result.model) {
      printDiagnostics(result);
      return 2;
    }
    const canonical = result.format === 'json' ? printJson(result.model) : printBulk(result.model);
    const current = result.source.lines.join('\n');
    if (current === canonical || current + '\n' === canonical) continue;
    if (check) {
      unformatted++;
      process.stdout.write(`${file}: not in canonical form (run \`bulkhead fmt ${file}\`)\n`);
    } else {
      writeFileSync(file, canonical);
      process.stdout.write(`${file}: formatted\n`);
    }
  }
  return unformatted > 0 ? 1 : 0;
}
