// What-if: the model as it would be if the team accepted a finding, withdrew an acceptance, or gave
// one side its own copy (a twin) of an element it shares. The changed model is analysed like the real
// one but never written anywhere; the lines that differ from the file's, printed in the file's own
// language, are the statements a user pastes into the model to make the change for real.
import { printBulk, type Model } from '@bulkhead/core';

export interface Twin {
  /** The shared element to copy. */
  element: string;
  /** The element or function whose link to `element` moves to the copy (the next step up one side's path). */
  relier: string;
}

export interface WhatIf {
  /** Finding keys accepted for the sake of the question. */
  accept: string[];
  /** Finding keys whose acceptance in the model is withdrawn. */
  reject: string[];
  twins: Twin[];
}

export const NO_WHAT_IF: WhatIf = { accept: [], reject: [], twins: [] };

export function isWhatIf(w: WhatIf): boolean {
  return w.accept.length + w.reject.length + w.twins.length > 0;
}

/** Function fields that name the elements (or functions) a function relies on. */
const FUNCTION_LINKS = ['sensors', 'solver', 'finals', 'raisedIn', 'console', 'operator', 'device'] as const;
const ELEMENT_LINKS = [
  'mountedOn',
  'connectedThrough',
  'signalVia',
  'housedIn',
  'poweredBy',
  'airFrom',
  'hydraulicFrom',
] as const;

/** A tag for the copy that no element or function has: BR-101-TWIN, then BR-101-TWIN2, ... */
export function twinTag(model: Model, element: string): string {
  const taken = new Set([...model.elements.map((e) => e.tag), ...model.functions.map((f) => f.tag)]);
  let tag = `${element}-TWIN`;
  for (let n = 2; taken.has(tag); n++) tag = `${element}-TWIN${n}`;
  return tag;
}

function repoint(holder: Record<string, unknown>, fields: readonly string[], from: string, to: string): boolean {
  let moved = false;
  for (const field of fields) {
    const value = holder[field];
    if (value === from) {
      holder[field] = to;
      moved = true;
    } else if (Array.isArray(value) && value.includes(from)) {
      holder[field] = value.map((v) => (v === from ? to : v));
      moved = true;
    }
  }
  return moved;
}

/** The model with the what-if applied; the input is left as it is. A twin whose relier does not link to the element changes nothing. */
export function applyWhatIf(model: Model, whatIf: WhatIf, today: string): Model {
  const next = structuredClone(model);
  const rejected = new Set(whatIf.reject);
  const kept = (next.justifications ?? []).filter((j) => !rejected.has(j.finding));
  const added = whatIf.accept.map((key) => ({
    finding: key,
    by: 'WHAT-IF',
    date: today,
    reason: 'What-if in the viewer: the team has not decided this',
  }));
  const justifications = [...kept, ...added];
  if (justifications.length > 0) next.justifications = justifications as Model['justifications'];
  else delete next.justifications;
  for (const twin of whatIf.twins) {
    const original = next.elements.find((e) => e.tag === twin.element);
    if (!original) continue;
    const relier =
      next.elements.find((e) => e.tag === twin.relier) ?? next.functions.find((f) => f.tag === twin.relier);
    if (!relier) continue;
    const tag = twinTag(next, twin.element);
    const fields = next.elements.includes(relier as Model['elements'][number]) ? ELEMENT_LINKS : FUNCTION_LINKS;
    if (!repoint(relier as unknown as Record<string, unknown>, fields, twin.element, tag)) continue;
    const copy = { ...structuredClone(original), tag } as Record<string, unknown>;
    delete copy.comments;
    delete copy.trailingComment;
    next.elements.push(copy as Model['elements'][number]);
  }
  return next;
}

/** The lines of the what-if model that the file's model does not have (to paste), and the reverse (to delete). */
export function statementsToPaste(original: Model, changed: Model): { add: string[]; remove: string[] } {
  const before = printBulk(original).split('\n');
  const after = printBulk(changed).split('\n');
  const had = new Set(before);
  const has = new Set(after);
  const meaningful = (line: string) => line.trim() !== '' && !line.trimStart().startsWith('#');
  return {
    add: after.filter((l) => !had.has(l) && meaningful(l)),
    remove: before.filter((l) => !has.has(l) && meaningful(l)),
  };
}
