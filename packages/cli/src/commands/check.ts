// `bulkhead check FILE`: loads and validates a model and prints what it holds, or what is wrong.
import { summarize } from '@bulkhead/core';
import { printDiagnostics, readModel } from '../io.ts';

export function checkCommand(file: string): number {
  const result = readModel(file);
  if (!result.model) {
    printDiagnostics(result);
    return 2;
  }
  const s = summarize(result.model);
  const groups = Object.entries(s.elementsByGroup).map(([g, n]) => `${n} ${g}`).join(', ');
  const functions = Object.entries(s.functionsByKind).map(([k, n]) => `${n} ${k}`).join(', ');
  process.stdout.write(
    [
      `${file}: ${s.site}`,
      `  elements   ${s.elements} (${groups})`,
      `  functions  ${Object.values(s.functionsByKind).reduce((a, b) => a + b, 0)} (${functions})`,
      `  scenarios  ${s.scenarios}`,
      '',
    ].join('\n'),
  );
  return 0;
}
