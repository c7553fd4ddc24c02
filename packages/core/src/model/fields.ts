// Reads the zod schema's shapes so the .bulk reader, printer and loader share one list of fields
// per statement: the schema stays the only place where a field is declared.
import { z } from 'zod';
import {
  Category,
  Cause,
  CommonCause,
  FailureData,
  Element,
  Enabler,
  Justification,
  LayerClaim,
  Modifier,
  PlantFunction,
  Policy,
  RuleSetting,
  Scenario,
  Site,
} from './schema.ts';

export type FieldType =
  | { type: 'string' }
  | { type: 'number' }
  | { type: 'enum'; options: readonly string[] }
  | { type: 'list' }
  | { type: 'literal' }
  | { type: 'nested' };

/** The schema under `.optional()` and `.default()`, through zod's public classes only. */
function unwrap(schema: z.core.$ZodType): z.core.$ZodType {
  let s = schema;
  while (s instanceof z.ZodOptional || s instanceof z.ZodDefault) s = s.unwrap();
  return s;
}

function typeOf(schema: z.core.$ZodType): FieldType {
  const s = unwrap(schema);
  if (s instanceof z.ZodString) return { type: 'string' };
  if (s instanceof z.ZodNumber) return { type: 'number' };
  if (s instanceof z.ZodEnum) return { type: 'enum', options: s.options as string[] };
  if (s instanceof z.ZodLiteral) return { type: 'literal' };
  if (s instanceof z.ZodArray) return unwrap(s.element) instanceof z.ZodString ? { type: 'list' } : { type: 'nested' };
  return { type: 'nested' };
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
  'name',
  'description',
  'title',
  'basis',
  'pfdBasis',
  'pfhBasis',
  'testBasis',
  'hraBasis',
  'creditBasis',
  'reason',
  'by',
  'make',
  'model',
  'external',
  'document',
  'revision',
  'status',
  'basedOn',
  'preparedBy',
  'checkedBy',
  'approvedBy',
  'study',
  'studyNode',
  'studyDeviation',
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

function optionsOf(union: z.ZodDiscriminatedUnion): z.ZodObject[] {
  return union.options as unknown as z.ZodObject[];
}

const elementSpecs = new Map<string, StatementSpec>();
for (const option of optionsOf(Element)) {
  const kinds = (typeOf(option.shape.kind) as { options: readonly string[] }).options;
  for (const kind of kinds) elementSpecs.set(kind, { schema: option, positional: 'tag' });
}
const functionSpecs = new Map<string, StatementSpec>();
for (const option of optionsOf(PlantFunction)) {
  const kind = (unwrap(option.shape.kind) as z.ZodLiteral<string>).value;
  functionSpecs.set(kind, { schema: option, positional: 'tag' });
}

export const SINGLE_SPECS: Record<'site' | 'policy', StatementSpec> = {
  site: { schema: Site, positional: 'name' },
  policy: { schema: Policy },
};
export const LIST_SPECS: Record<
  'category' | 'rule' | 'scenario' | 'failure-data' | 'common-cause' | 'accept',
  StatementSpec & { collection: string }
> = {
  category: { schema: Category, positional: 'id', collection: 'categories' },
  rule: { schema: RuleSetting, positional: 'id', collection: 'rules' },
  scenario: { schema: Scenario, positional: 'id', collection: 'scenarios' },
  'failure-data': { schema: FailureData, positional: 'id', collection: 'failureData' },
  'common-cause': { schema: CommonCause, positional: 'function', collection: 'commonCauses' },
  accept: { schema: Justification, positional: 'finding', collection: 'justifications' },
};
export type ScenarioLineSpec = StatementSpec & { collection: string; single?: boolean };
/** A scenario's indented lines, by keyword. A Map, as the keyword is the user's word (`constructor` is not a line). */
export const SCENARIO_LINE_SPECS: ReadonlyMap<string, ScenarioLineSpec> = new Map<string, ScenarioLineSpec>([
  ['cause', { schema: Cause, collection: 'cause', single: true }],
  ['enabler', { schema: Enabler, positional: 'title', collection: 'enablers' }],
  ['modifier', { schema: Modifier, positional: 'kind', collection: 'modifiers' }],
  ['layer', { schema: LayerClaim, positional: 'function', collection: 'layers' }],
]);
/** The single and list statements by keyword, for lookups by the user's word (never `keyword in SPECS`). */
export const SINGLE_SPEC_BY_KEYWORD: ReadonlyMap<string, StatementSpec> = new Map(Object.entries(SINGLE_SPECS));
export const LIST_SPEC_BY_KEYWORD: ReadonlyMap<string, StatementSpec & { collection: string }> = new Map(
  Object.entries(LIST_SPECS),
);
export const ELEMENT_SPECS: ReadonlyMap<string, StatementSpec> = elementSpecs;
export const FUNCTION_SPECS: ReadonlyMap<string, StatementSpec> = functionSpecs;

export const TOP_KEYWORDS: readonly string[] = [
  ...Object.keys(SINGLE_SPECS),
  ...Object.keys(LIST_SPECS),
  ...elementSpecs.keys(),
  ...functionSpecs.keys(),
];
