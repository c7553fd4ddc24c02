// `bulkhead check FILE [--fail-on LEVEL]`: loads and validates a model, analyses every scenario, and
// prints the findings, the LOPA lines and a verdict per scenario. Exit 1 only when --fail-on is given
// and an unaccepted finding reaches it, so the command can gate CI without failing a plain look.
import { analyze, SEVERITIES, type SeverityLevel } from '@bulkhead/core';
import { printDiagnostics, readModel, UsageError } from '../io.ts';
import { renderCheck } from './check-render.ts';
import { failingFindings } from './report.ts';

export function checkCommand(file: string, failOn: string | undefined): number {
  if (failOn !== undefined && !(SEVERITIES as readonly string[]).includes(failOn)) {
    throw new UsageError(`--fail-on takes ${SEVERITIES.join(', ')}; found \`${failOn}\``);
  }
  const result = readModel(file);
  if (!result.model) {
    printDiagnostics(result);
    return 2;
  }
  for (const d of result.diagnostics) process.stderr.write(`${d.severity}[${d.code}]: ${d.message}\n`);
  const analysis = analyze(result.model, { spans: result.spans });
  process.stdout.write(renderCheck({ ...result, model: result.model }, analysis));
  if (failOn === undefined) return 0;
  const failing = failingFindings(analysis.findings, failOn as SeverityLevel);
  if (failing.length) process.stderr.write(`${file}: ${failing.length} unaccepted finding${failing.length === 1 ? '' : 's'} at or above ${failOn}\n`);
  return failing.length ? 1 : 0;
}
