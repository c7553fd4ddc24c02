// Shared by the import tests: load a main model whose part files live in memory, and compare what two
// models give (findings and LOPA figures) without the source positions, which differ by design.
import { analyze, loadModelText, type Model, type PartReader } from '@bulkhead/core';

export function memoryReader(files: Record<string, string>, fallback?: PartReader): PartReader {
  return (path) =>
    path in files ? new TextEncoder().encode(files[path]) : (fallback?.(path) ?? { problem: 'no such file' });
}

export function loadWithParts(file: string, text: string, parts: Record<string, string>): Model {
  const result = loadModelText(file, text, { readPart: memoryReader(parts) });
  if (!result.model)
    throw new Error(result.diagnostics.map((d) => `${d.code} ${d.message} ${JSON.stringify(d.span)}`).join('\n'));
  return result.model;
}

const withoutPlaces = (_key: string, value: unknown) =>
  _key === 'span' || _key === 'spans' || _key === 'comments' || _key === 'trailingComment' ? undefined : value;

/** Findings and assessments as JSON, positions and comments left out. */
export function outcome(model: Model): string {
  const a = analyze(model);
  return JSON.stringify({ findings: a.findings, assessments: a.assessments }, withoutPlaces);
}

/** A model's content with comments left out and every list of tagged items in tag order. */
export function content(model: Model): string {
  const byTag = <T extends { tag?: string; id?: string }>(list: T[]) =>
    [...list].sort((x, y) => ((x.tag ?? x.id ?? '') < (y.tag ?? y.id ?? '') ? -1 : 1));
  return JSON.stringify(
    { ...model, elements: byTag(model.elements), functions: byTag(model.functions), scenarios: byTag(model.scenarios) },
    withoutPlaces,
  );
}
