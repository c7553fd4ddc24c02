// Which column holds which field. Headers differ between companies, so a mapping file in our own
// simple form (`Header text = field`, one a line, `#` comments) names them; built-in words cover the
// common headers. A header neither knows is reported, never guessed.
import { ELEMENT_SPECS, FUNCTION_SPECS, fieldsOf, kebab, LIST_SPECS, SCENARIO_LINE_SPECS } from '@bulkhead/core';
import { issue, type ImportIssue } from './issues.ts';

/** Fields a row may carry besides a statement's attributes. */
export const ROW_FIELDS = ['tag', 'kind'] as const;
/** The scenario statement's own attributes a worksheet may carry, as `scenario-<key>` columns (title, hazard-study reference, outcome). */
export const SCENARIO_COLUMNS: readonly string[] = [...fieldsOf(LIST_SPECS.scenario.schema)]
  .filter(
    ([name, f]) =>
      !['id', 'category', 'comments', 'trailingComment'].includes(name) && f.type !== 'nested' && f.type !== 'literal',
  )
  .map(([name]) => `scenario-${kebab(name)}`);
/** A LOPA worksheet row: the scenario it belongs to, its own fields, and which line of it the row is. */
export const LOPA_FIELDS = ['scenario', ...SCENARIO_COLUMNS, 'category', 'line'] as const;
/** Read and kept as provenance, not model fields: the model has no place for them. */
export const NOTED_FIELDS = ['loop', 'channel', 'remarks'] as const;
export const IGNORE = 'ignore';

/** Header text in one form: lower case, runs of other characters as one space. */
export function headerWords(header: string): string {
  return header
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, ' ')
    .trim();
}

function attributeKeys(): Set<string> {
  const keys = new Set<string>();
  for (const spec of [...ELEMENT_SPECS.values(), ...FUNCTION_SPECS.values(), ...SCENARIO_LINE_SPECS.values()]) {
    for (const [name, f] of fieldsOf(spec.schema)) {
      if (
        name === 'comments' ||
        name === 'trailingComment' ||
        name === 'tag' ||
        f.type === 'nested' ||
        f.type === 'literal'
      )
        continue;
      keys.add(kebab(name));
    }
  }
  keys.add('function');
  keys.add('kind');
  return keys;
}

/** Every field a column may be mapped to. */
export const KNOWN_FIELDS: ReadonlySet<string> = new Set([
  ...ROW_FIELDS,
  ...LOPA_FIELDS,
  ...NOTED_FIELDS,
  ...attributeKeys(),
  IGNORE,
]);

/**
 * Common header words (from instrument indexes and I/O lists as the trade writes them; common practice,
 * no source). Each field's own name, with spaces for dashes, is known as well.
 */
const DEFAULT_WORDS: Record<string, string[]> = {
  tag: ['tag', 'tag no', 'tag number', 'instrument tag', 'tag name', 'item tag'],
  kind: ['kind', 'type', 'instrument type', 'element kind', 'device type'],
  title: ['title', 'service', 'description', 'service description'],
  variable: ['measured variable', 'process variable', 'variable', 'measurement'],
  make: ['make', 'manufacturer', 'vendor'],
  model: ['model', 'model no', 'model number'],
  technology: ['technology', 'principle', 'measuring principle'],
  'mounted-on': ['mounted on', 'process connection', 'connection', 'sensing location'],
  'fails-to': ['fails to', 'fail action', 'fail position', 'fail safe position'],
  'signal-via': ['signal via', 'card', 'io card', 'i o card', 'wired to', 'signal from'],
  'housed-in': ['housed in', 'cabinet', 'panel', 'junction box', 'enclosure'],
  'powered-by': ['powered by', 'power supply', 'fed from', 'power from', 'power source'],
  'air-from': ['air from', 'air supply', 'instrument air'],
  solver: ['solver', 'logic solver', 'controller'],
  loop: ['loop', 'loop no', 'loop number'],
  channel: ['channel', 'channel no', 'io channel'],
  remarks: ['remarks', 'notes', 'comment', 'comments'],
  scenario: ['scenario', 'scenario id', 'scenario no'],
  'scenario-title': ['scenario title', 'scenario description', 'hazard scenario'],
  line: ['line', 'row kind', 'lopa line', 'entry'],
  frequency: ['frequency', 'frequency per year', 'initiating frequency', 'if'],
  pfd: ['pfd', 'pfd avg', 'pfdavg'],
};

export type HeaderMap = Map<string, string>;

export function defaultHeaderMap(): HeaderMap {
  const map: HeaderMap = new Map();
  for (const field of KNOWN_FIELDS) if (field !== IGNORE) map.set(headerWords(field), field);
  for (const [field, words] of Object.entries(DEFAULT_WORDS)) for (const w of words) map.set(headerWords(w), field);
  return map;
}

/** Reads a mapping file over the defaults: `Header text = field` lines; `= ignore` drops a column knowingly. */
export function readMapping(file: string, text: string, issues: ImportIssue[]): HeaderMap {
  const map = defaultHeaderMap();
  text.split(/\r\n|\n|\r/).forEach((raw, i) => {
    const line = raw.replace(/^\uFEFF/, '');
    if (line.trim() === '' || line.trim().startsWith('#')) return;
    const equals = line.lastIndexOf('=');
    const header = equals === -1 ? '' : line.slice(0, equals).trim();
    const field = equals === -1 ? '' : line.slice(equals + 1).trim();
    if (header === '' || field === '') {
      issues.push(
        issue(
          'BH508',
          'a mapping line is `Header text = field`',
          { file, line: i + 1, lineColumn: 1 },
          {
            help: 'for example `Fail Pos. = fails-to`; a line starting with # is a comment',
          },
        ),
      );
      return;
    }
    if (!KNOWN_FIELDS.has(field)) {
      issues.push(
        issue(
          'BH508',
          `\`${field}\` is not a field a column can hold`,
          { file, line: i + 1, lineColumn: line.indexOf(field, equals) + 1 },
          {
            help: `fields: ${[...KNOWN_FIELDS].sort().join(', ')}`,
          },
        ),
      );
      return;
    }
    map.set(headerWords(header), field);
  });
  return map;
}

export { LIST_SPECS };
