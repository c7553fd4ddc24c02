// What changed between two revisions of a model: elements, functions and scenarios added, removed,
// renamed or changed (which attributes), and the site's settings. Comments are not engineering content
// and are left out. A tag renamed everywhere is matched as a rename, not a removal and an addition: an
// item that left is the same as one that arrived when they read the same once the renames already found
// are applied, repeated until nothing more matches (a transmitter matches once its renamed nozzle has).
import { kebab } from '../model/fields.ts';
import type { Model } from '../model/schema.ts';

export type ItemKind = 'element' | 'function' | 'scenario';

export interface AttributeChange {
  /** The attribute as written in .bulk (`fails-to`, `cause frequency`, `layer SIF-101 pfd`). */
  attribute: string;
  old?: string | undefined;
  new?: string | undefined;
}

export interface ItemChanges {
  added: { id: string; kind: string }[];
  removed: { id: string; kind: string }[];
  changed: { id: string; kind: string; changes: AttributeChange[] }[];
}

export interface Rename {
  kind: ItemKind;
  old: string;
  new: string;
}

export interface ModelChanges {
  renames: Rename[];
  elements: ItemChanges;
  functions: ItemChanges;
  scenarios: ItemChanges;
  /** Site, policy, categories and rule settings. */
  settings: AttributeChange[];
  /** Justifications by the finding key they accept: added, removed, or with changed who, when or why. */
  justifications: { added: string[]; removed: string[]; changed: { finding: string; changes: AttributeChange[] }[] };
}

type Plain = Record<string, unknown>;
const COMMENT_KEYS = new Set(['comments', 'trailingComment', 'endComments', '$schema']);

/** A copy without comments, with every string that names a renamed tag replaced by its new name. */
function normalised(value: unknown, renames: ReadonlyMap<string, string>): unknown {
  if (typeof value === 'string') return renames.get(value) ?? value;
  if (Array.isArray(value)) return value.map((v) => normalised(v, renames));
  if (value !== null && typeof value === 'object') {
    const out: Plain = {};
    for (const key of Object.keys(value).sort())
      if (!COMMENT_KEYS.has(key)) out[key] = normalised((value as Plain)[key], renames);
    return out;
  }
  return value;
}

const text = (value: unknown): string | undefined =>
  value === undefined
    ? undefined
    : typeof value === 'string'
      ? value
      : Array.isArray(value) && value.every((v) => typeof v !== 'object')
        ? value.join(',')
        : JSON.stringify(value);

const compareText = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

/** The attributes that differ between two normalised objects; nested objects are named `outer inner`. */
function attributeChanges(before: Plain, after: Plain, prefix = ''): AttributeChange[] {
  const out: AttributeChange[] = [];
  for (const key of [...new Set([...Object.keys(before), ...Object.keys(after)])].sort()) {
    const a = before[key];
    const b = after[key];
    if (JSON.stringify(a) === JSON.stringify(b)) continue;
    const name = `${prefix}${kebab(key)}`;
    if (key === 'layers' && (Array.isArray(a) || Array.isArray(b))) {
      out.push(...claimChanges((a ?? []) as Plain[], (b ?? []) as Plain[]));
    } else if (isPlain(a) && isPlain(b)) {
      out.push(...attributeChanges(a, b, `${name} `));
    } else {
      out.push({
        attribute: name,
        ...(a !== undefined ? { old: text(a) } : {}),
        ...(b !== undefined ? { new: text(b) } : {}),
      });
    }
  }
  return out;
}

const isPlain = (v: unknown): v is Plain => v !== null && typeof v === 'object' && !Array.isArray(v);

/** A scenario's layer claims compared by the function claimed, so a reordered list is no change. */
function claimChanges(before: Plain[], after: Plain[]): AttributeChange[] {
  const out: AttributeChange[] = [];
  const byFunction = (claims: Plain[]) => new Map(claims.map((c) => [String(c.function), c]));
  const a = byFunction(before);
  const b = byFunction(after);
  for (const fn of [...new Set([...a.keys(), ...b.keys()])].sort(compareText)) {
    const x = a.get(fn);
    const y = b.get(fn);
    if (!x) out.push({ attribute: `layer ${fn}`, new: 'claimed' });
    else if (!y) out.push({ attribute: `layer ${fn}`, old: 'claimed' });
    else out.push(...attributeChanges(x, y, `layer ${fn} `).filter((c) => c.attribute !== `layer ${fn} function`));
  }
  return out;
}

interface Item {
  id: string;
  kind: string;
  body: Plain;
}

function itemsOf(model: Model, kind: ItemKind): Item[] {
  const list: Plain[] = kind === 'element' ? model.elements : kind === 'function' ? model.functions : model.scenarios;
  return list.map((item) => ({
    id: String(kind === 'scenario' ? item.id : item.tag),
    kind: kind === 'scenario' ? 'scenario' : String(item.kind),
    body: item,
  }));
}

/** The item's content without its own name, as text, so two items compare by one string. */
function signature(item: Item, renames: ReadonlyMap<string, string>): string {
  const { tag: _tag, id: _id, ...rest } = normalised(item.body, renames) as Plain;
  return JSON.stringify(rest);
}

/** Pairs each item that left with an identical one that arrived, repeating as renames unlock others. */
function findRenames(before: Model, after: Model): Rename[] {
  const renames = new Map<string, string>();
  const found: Rename[] = [];
  const kinds: ItemKind[] = ['element', 'function', 'scenario'];
  for (let progress = true; progress;) {
    progress = false;
    for (const kind of kinds) {
      const oldItems = itemsOf(before, kind);
      const newItems = itemsOf(after, kind);
      const oldIds = new Set(oldItems.map((i) => i.id));
      const newIds = new Set(newItems.map((i) => i.id));
      const left = oldItems.filter((item) => !newIds.has(item.id) && !renames.has(item.id));
      if (left.length === 0) continue;
      const taken = new Set(renames.values());
      const arrived = new Map<string, string[]>();
      for (const item of newItems) {
        if (oldIds.has(item.id) || taken.has(item.id)) continue;
        const sig = signature(item, new Map());
        (arrived.get(sig) ?? arrived.set(sig, []).get(sig)!).push(item.id);
      }
      for (const item of left.sort((x, y) => compareText(x.id, y.id))) {
        const candidates = (arrived.get(signature(item, renames)) ?? [])
          .filter((id) => !taken.has(id))
          .sort(compareText);
        if (candidates.length === 0) continue;
        renames.set(item.id, candidates[0]!);
        taken.add(candidates[0]!);
        found.push({ kind, old: item.id, new: candidates[0]! });
        progress = true;
      }
    }
  }
  return found.sort((x, y) => compareText(x.kind, y.kind) || compareText(x.old, y.old));
}

function compareItems(before: Model, after: Model, kind: ItemKind, renames: ReadonlyMap<string, string>): ItemChanges {
  const oldItems = itemsOf(before, kind);
  const newItems = new Map(itemsOf(after, kind).map((i) => [i.id, i]));
  const matched = new Set<string>();
  const changes: ItemChanges = { added: [], removed: [], changed: [] };
  for (const item of oldItems) {
    const twin = newItems.get(renames.get(item.id) ?? item.id);
    if (!twin) {
      changes.removed.push({ id: item.id, kind: item.kind });
      continue;
    }
    matched.add(twin.id);
    // Most items of a revision are untouched: the same text is no change, without the attribute walk.
    if (JSON.stringify(item.body) === JSON.stringify(twin.body)) continue;
    const { tag: _a, id: _b, ...a } = normalised(item.body, renames) as Plain;
    const { tag: _c, id: _d, ...b } = normalised(twin.body, new Map()) as Plain;
    const diff = attributeChanges(a, b);
    if (diff.length) changes.changed.push({ id: twin.id, kind: twin.kind, changes: diff });
  }
  for (const item of newItems.values()) if (!matched.has(item.id)) changes.added.push({ id: item.id, kind: item.kind });
  const byId = (x: { id: string }, y: { id: string }) => compareText(x.id, y.id);
  return { added: changes.added.sort(byId), removed: changes.removed.sort(byId), changed: changes.changed.sort(byId) };
}

/** Site, policy, categories (by id) and rule settings (by id), as attribute changes. */
function settingsOf(model: Model, renames: ReadonlyMap<string, string>): Plain {
  const byId = (list: { id: string }[] | undefined) => Object.fromEntries((list ?? []).map((x) => [x.id, x]));
  return normalised(
    { site: model.site, policy: model.policy ?? {}, category: byId(model.categories), rule: byId(model.rules) },
    renames,
  ) as Plain;
}

function compareJustifications(before: Model, after: Model): ModelChanges['justifications'] {
  const byKey = (m: Model) =>
    new Map((m.justifications ?? []).map((j) => [j.finding, normalised(j, new Map()) as Plain]));
  const a = byKey(before);
  const b = byKey(after);
  const changed = [...a]
    .filter(([key]) => b.has(key))
    .map(([finding, j]) => ({ finding, changes: attributeChanges(j, b.get(finding)!) }))
    .filter((c) => c.changes.length > 0);
  return {
    added: [...b.keys()].filter((k) => !a.has(k)).sort(compareText),
    removed: [...a.keys()].filter((k) => !b.has(k)).sort(compareText),
    changed: changed.sort((x, y) => compareText(x.finding, y.finding)),
  };
}

export function compareModels(before: Model, after: Model): ModelChanges {
  const renames = findRenames(before, after);
  const map = new Map(renames.map((r) => [r.old, r.new]));
  return {
    renames,
    elements: compareItems(before, after, 'element', map),
    functions: compareItems(before, after, 'function', map),
    scenarios: compareItems(before, after, 'scenario', map),
    settings: attributeChanges(settingsOf(before, map), settingsOf(after, new Map())),
    justifications: compareJustifications(before, after),
  };
}
