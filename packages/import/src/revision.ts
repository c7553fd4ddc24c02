// Re-import is a revision: the new generated file is compared with the one it replaces, statement by
// statement (by keyword and tag, comments aside), and `accept` statements whose finding names a tag
// that changed or went are listed, as their judgement may no longer hold.
import { parseBulk, type Justification, type Statement } from '@bulkhead/core';

export interface RevisionChanges {
  added: string[];
  removed: string[];
  changed: string[];
}

function statementText(s: Statement): string {
  const attributes = s.attributes.map(
    (a) => `${a.key.value}=${a.values.map((v) => JSON.stringify(v.value)).join(',')}`,
  );
  return [s.keyword.value, JSON.stringify(s.name?.value ?? ''), ...attributes, ...s.children.map(statementText)].join(
    ' ',
  );
}

function statements(text: string): Map<string, string> {
  const out = new Map<string, string>();
  for (const s of parseBulk(text, []).statements) out.set(s.name?.value ?? s.keyword.value, statementText(s));
  return out;
}

export function revisionChanges(before: string, after: string): RevisionChanges {
  const old = statements(before);
  const now = statements(after);
  return {
    added: [...now.keys()].filter((k) => !old.has(k)),
    removed: [...old.keys()].filter((k) => !now.has(k)),
    changed: [...now.keys()].filter((k) => old.has(k) && old.get(k) !== now.get(k)),
  };
}

/** Justifications whose finding key names a tag among the changed or removed ones. */
export function staleJustifications(
  justifications: readonly Justification[],
  changes: RevisionChanges,
): Justification[] {
  const touched = new Set([...changes.changed, ...changes.removed]);
  return justifications.filter((j) => j.finding.split(/[:+]/).some((part) => touched.has(part)));
}
