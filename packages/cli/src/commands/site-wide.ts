// `bulkhead cut-sets FILE [--order N] [--format text|json]` and `bulkhead common-causes FILE
// [--format text|json|csv]`: the site as a whole, for the auditor who cannot read scenarios one by one.
import {
  analyze,
  DEFAULT_CUT_SET_ORDER,
  modelCutSets,
  rankCommonCauses,
  RANKING_ORDER,
  renderCommonCausesCsv,
  renderCommonCausesText,
  renderCutSetsText,
  CUT_SET_METHOD,
  type Model,
} from '@bulkhead/core';
import { printDiagnostics, readModel, UsageError } from '../io.ts';

/** The highest order accepted: the number of sets grows as elements to the power of the order. */
export const MAX_CUT_SET_ORDER = 4;

function parseOrder(text: string | undefined): number {
  if (text === undefined) return DEFAULT_CUT_SET_ORDER;
  if (!/^[1-9]\d*$/.test(text) || Number(text) > MAX_CUT_SET_ORDER)
    throw new UsageError(`--order takes a whole number from 1 to ${MAX_CUT_SET_ORDER}; found \`${text}\``);
  return Number(text);
}

function parseFormat<T extends string>(text: string | undefined, formats: readonly T[]): T {
  if (text === undefined) return formats[0]!;
  if (!(formats as readonly string[]).includes(text))
    throw new UsageError(`--format takes ${formats.join(', ')}; found \`${text}\``);
  return text as T;
}

function loaded(file: string): Model | undefined {
  const result = readModel(file);
  if (!result.model) printDiagnostics(result);
  return result.model;
}

export function cutSetsCommand(file: string, order: string | undefined, format: string | undefined): number {
  const maxOrder = parseOrder(order);
  const as = parseFormat(format, ['text', 'json'] as const);
  const model = loaded(file);
  if (!model) return 2;
  const analysis = analyze(model);
  const cutSets = modelCutSets(model, { maxOrder, findings: analysis.findings });
  if (as === 'json')
    process.stdout.write(`${JSON.stringify({ method: CUT_SET_METHOD, maxOrder, scenarios: cutSets }, null, 2)}\n`);
  else process.stdout.write(renderCutSetsText(model, cutSets));
  return 0;
}

export function commonCausesCommand(file: string, format: string | undefined): number {
  const as = parseFormat(format, ['text', 'json', 'csv'] as const);
  const model = loaded(file);
  if (!model) return 2;
  const ranking = rankCommonCauses(model, analyze(model));
  if (as === 'json') process.stdout.write(`${JSON.stringify({ order: RANKING_ORDER, elements: ranking }, null, 2)}\n`);
  else if (as === 'csv') process.stdout.write(renderCommonCausesCsv(ranking));
  else process.stdout.write(renderCommonCausesText(ranking));
  return 0;
}
