// `bulkhead convert FILE --to json|bulk [-o OUT]`: converts between the two model forms without loss.
import { writeFileSync } from 'node:fs';
import { printBulk, printJson } from '@bulkhead/core';
import { printDiagnostics, readModel, UsageError } from '../io.ts';

export function convertCommand(file: string, to: string | undefined, out: string | undefined): number {
  if (to !== 'json' && to !== 'bulk') throw new UsageError('convert needs --to json or --to bulk');
  const result = readModel(file);
  if (!result.model) {
    printDiagnostics(result);
    return 2;
  }
  const text = to === 'json' ? printJson(result.model) : printBulk(result.model);
  if (out) writeFileSync(out, text);
  else process.stdout.write(text);
  return 0;
}
