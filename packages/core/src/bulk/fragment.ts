// Canonical form of one file of a multi-file model. Such a file is not a model on its own (a part has
// no `site`, and names tags defined in other files), so it is formatted statement by statement, and the
// result is checked to read back as the same statements before anyone writes it.
import type { Diagnostic } from '../diagnostics/diagnostic.ts';
import type { Model } from '../model/schema.ts';
import { parseBulk, PART_KEYWORD } from './parser.ts';
import { printBulk, type PartLine } from './printer.ts';
import { statementsToRaw } from './to-model.ts';

interface FileContent {
  raw: unknown;
  parts: PartLine[];
  diagnostics: Diagnostic[];
}

function read(text: string): FileContent {
  const diagnostics: Diagnostic[] = [];
  const parsed = parseBulk(text, diagnostics);
  const parts: PartLine[] = [];
  const statements = parsed.statements.filter((s) => {
    if (s.keyword.value !== PART_KEYWORD || !s.name) return true;
    parts.push({
      path: s.name.value,
      ...(s.comments.length ? { comments: s.comments } : {}),
      ...(s.trailingComment !== undefined ? { trailingComment: s.trailingComment } : {}),
    });
    return false;
  });
  const { raw } = statementsToRaw({ statements, endComments: parsed.endComments }, diagnostics);
  return { raw, parts, diagnostics };
}

function sortedJson(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) =>
    v && typeof v === 'object' && !Array.isArray(v)
      ? Object.fromEntries(Object.entries(v).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)))
      : v,
  );
}

/** The canonical text of one model file, or undefined when it has syntax errors or would not read back the same. */
export function formatModelFile(text: string): string | undefined {
  const content = read(text);
  if (content.diagnostics.some((d) => d.severity === 'error')) return undefined;
  const printed = printBulk(content.raw as Model, content.parts);
  const back = read(printed);
  // Attributes print in schema order, so the comparison does not depend on the order they were written in.
  const same = sortedJson([back.raw, back.parts]) === sortedJson([content.raw, content.parts]);
  return same && back.diagnostics.length === 0 ? printed : undefined;
}
