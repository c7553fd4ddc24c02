// Writes merged records and LOPA scenarios as .bulk statements, remembering which cell each value
// came from, column by column on each generated line, so the loader's diagnostics on the generated
// text can be reported at the cells. Every statement ends with its provenance as a comment.
import { camel, ELEMENT_SPECS, fieldsOf, FUNCTION_SPECS, LIST_SPECS, type FieldType } from '@bulkhead/core';
import type { Place } from './issues.ts';
import { LINE_POSITIONAL, type LopaScenario } from './lopa.ts';
import type { CellValue, TagRecord } from './records.ts';

export interface Segment {
  from: number;
  to: number;
  place: Place;
}

export interface GeneratedLine {
  /** The record or scenario the line belongs to, by tag or id, to leave it out on a partial import. */
  owner: string;
  /** The place of the whole statement (its tag cell). */
  place: Place;
  segments: Segment[];
}

export interface Generated {
  text: string;
  lines: GeneratedLine[];
}

const BARE = /^[A-Za-z0-9][A-Za-z0-9_.\-/+:]*$/;

function quoted(text: string): string {
  // eslint-disable-next-line no-control-regex -- control characters are escaped so the line stays one line
  return `"${text.replace(/[\\"\u0000-\u001f]/g, (c) => (c === '\\' ? '\\\\' : c === '"' ? '\\"' : `\\u{${c.charCodeAt(0).toString(16)}}`))}"`;
}

const word = (text: string) => (BARE.test(text) ? text : quoted(text));

const SCENARIO_TYPES = fieldsOf(LIST_SPECS.scenario.schema);

/** Worked out once per kind, not once per row. */
const typesByKind = new Map<string, Map<string, FieldType> | undefined>();

function fieldTypes(keyword: string): Map<string, FieldType> | undefined {
  if (!typesByKind.has(keyword)) {
    const spec = ELEMENT_SPECS.get(keyword) ?? FUNCTION_SPECS.get(keyword);
    typesByKind.set(keyword, spec ? fieldsOf(spec.schema) : undefined);
  }
  return typesByKind.get(keyword);
}

class LineBuilder {
  text = '';
  readonly segments: Segment[] = [];
  add(part: string, place?: Place): void {
    if (this.text !== '' && !this.text.endsWith(' ')) this.text += ' ';
    if (place) this.segments.push({ from: this.text.length + 1, to: this.text.length + part.length, place });
    this.text += part;
  }
}

function attribute(line: LineBuilder, key: string, cell: CellValue, types: Map<string, FieldType> | undefined): void {
  const isList = types?.get(camel(key))?.type === 'list';
  // A list cell may separate its tags by commas, semicolons or line breaks.
  const value = isList
    ? cell.value
        .split(/[,;\n]/)
        .map((v) => v.trim())
        .filter(Boolean)
        .map(word)
        .join(',')
    : word(cell.value);
  line.add(`${key}=${value}`, cell.place);
}

function provenance(sources: string[], extra: string[]): string {
  return ` # from ${[...sources, ...extra].join('; ').replace(/[\r\n]+/g, ' ')}`;
}

/** The statements, under `preamble` (comment lines, which the first statement keeps above it). */
export function generate(
  records: Iterable<TagRecord>,
  scenarios: LopaScenario[],
  leaveOut: ReadonlySet<string> = new Set(),
  preamble: string[] = [],
): Generated {
  const out: string[] = [...preamble];
  const lines: GeneratedLine[] = preamble.map(() => ({ owner: '', place: { file: '(generated)' }, segments: [] }));
  const push = (builder: LineBuilder, owner: string, place: Place, comment: string) => {
    out.push(builder.text + comment);
    lines.push({ owner, place, segments: builder.segments });
  };
  const all = [...records].filter((r) => r.kind && !leaveOut.has(r.tag.value));
  // Elements before functions, as a reader expects: what a function names is defined above it.
  const ordered = [
    ...all.filter((r) => !FUNCTION_SPECS.has(r.kind!.value)),
    ...all.filter((r) => FUNCTION_SPECS.has(r.kind!.value)),
  ];
  for (const record of ordered) {
    const line = new LineBuilder();
    line.add(word(record.kind!.value), record.kind!.place);
    line.add(word(record.tag.value), record.tag.place);
    const types = fieldTypes(record.kind!.value);
    for (const [key, cell] of record.fields) attribute(line, key, cell, types);
    const extra = [
      ...record.noted,
      ...(record.suggested
        ? [`kind suggested from ISA-5.1 letters ${record.suggested}, not from a column: confirm it`]
        : []),
    ];
    push(line, record.tag.value, record.tag.place, provenance(record.sources, extra));
  }
  for (const scenario of scenarios) {
    if (leaveOut.has(scenario.id.value)) continue;
    const head = new LineBuilder();
    head.add('scenario');
    head.add(word(scenario.id.value), scenario.id.place);
    for (const [key, cell] of scenario.fields) attribute(head, key, cell, SCENARIO_TYPES);
    push(head, scenario.id.value, scenario.id.place, provenance(scenario.sources.slice(0, 1), []));
    for (const l of scenario.lines) {
      const line = new LineBuilder();
      line.text = '  ';
      line.add(l.keyword);
      const positional = LINE_POSITIONAL[l.keyword];
      const first = positional ? l.fields.get(positional) : undefined;
      if (first) line.add(positional === 'title' ? quoted(first.value) : word(first.value), first.place);
      for (const [key, cell] of l.fields) {
        if (key === positional) continue;
        line.add(`${key}=${TEXT_KEYS.has(key) ? quoted(cell.value) : word(cell.value)}`, cell.place);
      }
      push(line, scenario.id.value, scenario.id.place, provenance([l.source], []));
    }
  }
  return { text: out.join('\n') + '\n', lines };
}

const TEXT_KEYS = new Set(['basis', 'title', 'external']);
