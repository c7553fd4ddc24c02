// A short account of what a model holds, for `bulkhead check` when there is nothing wrong with it.
import { groupOf, type ElementGroup } from './kinds.ts';
import type { Model } from './schema.ts';

export interface ModelSummary {
  site: string;
  elements: number;
  elementsByGroup: Partial<Record<ElementGroup, number>>;
  functionsByKind: Record<string, number>;
  scenarios: number;
  justifications: number;
}

export function summarize(model: Model): ModelSummary {
  const elementsByGroup: Partial<Record<ElementGroup, number>> = {};
  for (const e of model.elements) {
    const g = groupOf(e.kind);
    elementsByGroup[g] = (elementsByGroup[g] ?? 0) + 1;
  }
  const functionsByKind: Record<string, number> = {};
  for (const f of model.functions) functionsByKind[f.kind] = (functionsByKind[f.kind] ?? 0) + 1;
  return {
    site: model.site.name,
    elements: model.elements.length,
    elementsByGroup,
    functionsByKind,
    scenarios: model.scenarios.length,
    justifications: model.justifications?.length ?? 0,
  };
}
