// `bulkhead check FILE [--fail-on LEVEL]`: loads and validates a model, analyses every scenario, and
// prints the findings, the LOPA lines and a verdict per scenario. Exit 1 only when --fail-on is given
// and an unaccepted finding reaches it, so the command can gate CI without failing a plain look.
import { analyze, renderDiagnostics } from '@bulkhead/core';
import { printDiagnostics, readModel } from '../io.ts';
import { renderCheck } from './check-render.ts';
import { failingFindings, parseFailOn } from './fail-on.ts';

export function checkCommand(file: string, failOn: string | undefined): number {
  const threshold = failOn === undefined ? undefined : parseFailOn(failOn);
  const result = readModel(file);
  if (!result.model) {
    printDiagnostics(result);
    return 2;
  }
  if (result.diagnostics.length) process.stderr.write(`${renderDiagnostics(result.diagnostics, result.source)}\n\n`);
  const analysis = analyze(result.model, { spans: result.spans });
  process.stdout.write(renderCheck({ ...result, model: result.model }, analysis));
  if (threshold === undefined) return 0;
  const failing = failingFindings(analysis.findings, threshold);
  if (failing.length) process.stderr.write(`${file}: ${failing.length} unaccepted finding${failing.length === 1 ? '' : 's'} at or above ${failOn}\n`);
  return failing.length ? 1 : 0;
}
