// Reads the zod schema's shapes so the .bulk reader, printer and loader share one list of fields
// per statement: the schema stays the only place where a field is declared.
import type { z } from 'zod';
import { Category, Cause, Element, Enabler, Function, Justification, LayerClaim, Modifier, Policy, RuleSetting, Scenario, Site } from './schema.ts';

export type FieldType =
  | { type: 'string' }
  | { type: 'number' }
  | { type: 'enum'; options: readonly string[] }
  | { type: 'list' }
  | { type: 'literal' }
  | { type: 'nested' };

// eslint-disable-next-line @typescript-eslint/no-explicit-any
type AnySchema = any;

function unwrap(schema: AnySchema): AnySchema {
  let s = schema;
  while (s?._zod?.def?.type === 'optional' || s?._zod?.def?.type === 'default') s = s._zod.def.innerType;
  return s;
}

function typeOf(schema: AnySchema): FieldType {
  const s = unwrap(schema);
  switch (s._zod.def.type) {
    case 'string':
      return { type: 'string' };
    case 'number':
      return { type: 'number' };
    case 'enum':
      return { type: 'enum', options: Object.values(s._zod.def.entries) as string[] };
    case 'literal':
      return { type: 'literal' };
    case 'array':
      return unwrap(s._zod.def.element)._zod.def.type === 'string' ? { type: 'list' } : { type: 'nested' };
    default:
      return { type: 'nested' };
  }
}

/** Fields of an object schema, in declaration order (which is also the canonical print order). */
export function fieldsOf(schema: z.ZodObject): Map<string, FieldType> {
  const out = new Map<string, FieldType>();
  for (const [key, value] of Object.entries(schema.shape)) out.set(key, typeOf(value));
  return out;
}

export const COMMENT_FIELDS = new Set(['comments', 'trailingComment']);

/** Fields whose values are free text: always quoted when printed. */
export const TEXT_FIELDS = new Set([
  'name', 'description', 'title', 'basis', 'pfdBasis', 'pfhBasis', 'hraBasis', 'creditBasis', 'reason', 'by', 'make', 'model', 'external',
]);

export function kebab(field: string): string {
  return field.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`);
}

export function camel(key: string): string {
  return key.replace(/-([a-z])/g, (_, c: string) => c.toUpperCase());
}

export interface StatementSpec {
  schema: z.ZodObject;
  /** The field filled by the word right after the keyword, if any. */
  positional?: string;
}

function optionsOf(union: AnySchema): z.ZodObject[] {
  return union._zod.def.options as z.ZodObject[];
}

const elementSpecs = new Map<string, StatementSpec>();
for (const option of optionsOf(Element)) {
  const kinds = (typeOf(option.shape.kind) as { options: readonly string[] }).options;
  for (const kind of kinds) elementSpecs.set(kind, { schema: option, positional: 'tag' });
}
const functionSpecs = new Map<string, StatementSpec>();
for (const option of optionsOf(Function)) {
  const kind = unwrap(option.shape.kind)._zod.def.values[0] as string;
  functionSpecs.set(kind, { schema: option, positional: 'tag' });
}

export const SINGLE_SPECS: Record<'site' | 'policy', StatementSpec> = {
  site: { schema: Site, positional: 'name' },
  policy: { schema: Policy },
};
export const LIST_SPECS: Record<'category' | 'rule' | 'scenario' | 'accept', StatementSpec & { collection: string }> = {
  category: { schema: Category, positional: 'id', collection: 'categories' },
  rule: { schema: RuleSetting, positional: 'id', collection: 'rules' },
  scenario: { schema: Scenario, positional: 'id', collection: 'scenarios' },
  accept: { schema: Justification, positional: 'finding', collection: 'justifications' },
};
export const SCENARIO_LINE_SPECS: Record<string, StatementSpec & { collection: string; single?: boolean }> = {
  cause: { schema: Cause, collection: 'cause', single: true },
  enabler: { schema: Enabler, positional: 'title', collection: 'enablers' },
  modifier: { schema: Modifier, positional: 'kind', collection: 'modifiers' },
  layer: { schema: LayerClaim, positional: 'function', collection: 'layers' },
};
export const ELEMENT_SPECS: ReadonlyMap<string, StatementSpec> = elementSpecs;
export const FUNCTION_SPECS: ReadonlyMap<string, StatementSpec> = functionSpecs;

export const TOP_KEYWORDS: readonly string[] = [
  ...Object.keys(SINGLE_SPECS),
  ...Object.keys(LIST_SPECS),
  ...elementSpecs.keys(),
  ...functionSpecs.keys(),
];
