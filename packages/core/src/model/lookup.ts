// Lookups by tag, id or finding key over the model's lists, each built once per list and kept beside it,
// so work done per scenario or per finding never scans a whole list. The first entry with a key wins, as
// `Array.prototype.find` would give it. A list that has grown since its index was built is indexed again
// (models are read-only once loaded, but a caller may append to one it built in code).
import type { Element, Justification, Model, PlantFunction, Scenario } from './schema.ts';

const indexes = new WeakMap<readonly object[], { length: number; byKey: Map<string, object> }>();

function indexOf<T extends object>(list: readonly T[], key: (item: T) => string): ReadonlyMap<string, T> {
  const known = indexes.get(list);
  if (known && known.length === list.length) return known.byKey as Map<string, T>;
  const byKey = new Map<string, T>();
  for (const item of list) if (!byKey.has(key(item))) byKey.set(key(item), item);
  indexes.set(list, { length: list.length, byKey });
  return byKey;
}

export function elementByTag(model: Model, tag: string): Element | undefined {
  return indexOf(model.elements, (e) => e.tag).get(tag);
}

export function functionByTag(model: Model, tag: string): PlantFunction | undefined {
  return indexOf(model.functions, (f) => f.tag).get(tag);
}

export function scenarioById(model: Model, id: string): Scenario | undefined {
  return indexOf(model.scenarios, (s) => s.id).get(id);
}

/** The first justification naming a finding key, as listed in the model. */
export function justificationOf(model: Model, findingKey: string): Justification | undefined {
  return model.justifications ? indexOf(model.justifications, (j) => j.finding).get(findingKey) : undefined;
}
