// `bulkhead check FILE [--fail-on LEVEL|none] [--verbose]`: loads and validates a model, analyses every
// scenario, and prints the answer first (a verdict per scenario), then the LOPA and the findings. Exit codes
// follow the one rule `check` and `report` share (see fail-on.ts): 1 when an unaccepted finding reaches
// --fail-on, by default a voided credit.
import { analyze, renderDiagnostics } from '@bulkhead/core';
import { printDiagnostics, readModel } from '../io.ts';
import { COLOUR, PLAIN, wantsColour } from '../colour.ts';
import { writeCheck } from './check-render.ts';
import { gateFindings } from './fail-on.ts';

export function checkCommand(file: string, options: { failOn?: string | undefined; verbose?: boolean } = {}): number {
  const gate = gateFindings(options.failOn);
  const result = readModel(file);
  if (!result.model) {
    printDiagnostics(result);
    return 2;
  }
  if (result.diagnostics.length) process.stderr.write(`${renderDiagnostics(result.diagnostics, result.source)}\n\n`);
  const analysis = analyze(result.model, { spans: result.spans });
  const paint = wantsColour(process.stdout, process.env) ? COLOUR : PLAIN;
  writeCheck({ ...result, model: result.model }, analysis, { verbose: options.verbose ?? false, paint }, (text) =>
    process.stdout.write(text),
  );
  return gate(file, analysis.findings);
}
