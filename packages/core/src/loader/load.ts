// The loader: bytes in, a validated Model (or diagnostics) out. It detects .bulk or JSON, checks the
// bytes are sane text, parses with spans, validates against the schema and then beyond it.
import { capDiagnostics, error, hasErrors, sortDiagnostics, type Diagnostic } from '../diagnostics/diagnostic.ts';
import { splitLines, type SourceText } from '../diagnostics/render.ts';
import { parseBulk } from '../bulk/parser.ts';
import { RawModelBuilder, statementsToRaw, type RawModel, type SpanMap } from '../bulk/to-model.ts';
import { firstInvalidUtf8, positionOfByte } from '../util/utf8.ts';
import type { z } from 'zod';
import { readJson } from '../json/reader.ts';
import { kebab } from '../model/fields.ts';
import { Category, Element, Model, PlantFunction, Scenario } from '../model/schema.ts';
import { issueToDiagnostics, type FieldNamer } from './schema-issues.ts';
import { validateModel, type Origins } from './validate.ts';
import { PART_KEYWORD, readParts, type PartBytes, type PartReader } from './parts.ts';

/** A top-level `part` statement somewhere in the text (a cheap test; the parser decides). */
const NAMES_A_PART = new RegExp(`^${PART_KEYWORD}\\b`, 'm');

export const MAX_FILE_BYTES = 50 * 1024 * 1024;

export type ModelFormat = 'bulk' | 'json';

export interface LoadResult {
  /** Present only when there are no errors. */
  model?: Model;
  format: ModelFormat;
  diagnostics: Diagnostic[];
  spans: SpanMap;
  source: SourceText;
  /** The part files the model names, in the order first named (empty for a model in one file). */
  parts?: string[];
}

export interface LoadOptions {
  /** Reads the part files a .bulk model names; without it a `part` statement is an error. */
  readPart?: PartReader;
}

export function detectFormat(file: string, text: string): ModelFormat {
  if (/\.json$/i.test(file)) return 'json';
  if (/\.bulk$/i.test(file)) return 'bulk';
  return text.trimStart().startsWith('{') ? 'json' : 'bulk';
}

/** Decodes bytes as UTF-8, refusing what is not text. */
export function decode(bytes: Uint8Array, diagnostics: Diagnostic[]): string | undefined {
  if (bytes.length > MAX_FILE_BYTES) {
    diagnostics.push(
      error('BH103', `the file is ${(bytes.length / 1048576).toFixed(1)} MB; the limit is 50 MB`, undefined, {
        help: 'split the site into units, one model file each',
      }),
    );
    return undefined;
  }
  if (bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf) {
    diagnostics.push(
      error(
        'BH101',
        'the file starts with a UTF-8 byte-order mark',
        { line: 1, column: 1, length: 1 },
        { help: BOM_HELP },
      ),
    );
    return undefined;
  }
  // The first of a NUL byte or a broken UTF-8 sequence is reported, at its own line and column.
  const invalid = firstInvalidUtf8(bytes);
  const nul = bytes.indexOf(0);
  if (nul !== -1 && (invalid === -1 || nul < invalid)) {
    diagnostics.push(
      error(
        'BH102',
        'the file holds a NUL byte, so it is binary, not text',
        { ...positionOfByte(bytes, nul), length: 1 },
        { help: NOT_TEXT_HELP },
      ),
    );
    return undefined;
  }
  if (invalid !== -1) {
    const byte = bytes[invalid]!.toString(16).toUpperCase().padStart(2, '0');
    diagnostics.push(
      error(
        'BH102',
        `the file is not UTF-8 text (byte 0x${byte} at offset ${invalid})`,
        { ...positionOfByte(bytes, invalid), length: 1 },
        {
          help: `${NOT_TEXT_HELP}; a file saved in a legacy code page must be re-saved as UTF-8`,
        },
      ),
    );
    return undefined;
  }
  return new TextDecoder('utf-8').decode(bytes);
}

const BOM_HELP =
  'save the file as UTF-8 without BOM; Bulkhead does not strip it for you so that nothing changes unseen';
const NOT_TEXT_HELP = 'is this a model file? models are UTF-8 text (.bulk) or JSON';

const COLLECTIONS = [
  ['elements', Element],
  ['functions', PlantFunction],
  ['scenarios', Scenario],
  ['categories', Category],
] as const;

/** When the model as a whole fails the schema, keeps the items that pass so later checks still run. */
function salvage(
  raw: unknown,
  brokenTags: Set<string>,
): { model: Model; origins: Origins; brokenTags: Set<string>; brokenCategories: Set<string> } | undefined {
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) return undefined;
  const top = raw as Record<string, unknown>;
  const origins: Origins = { elements: [], functions: [], scenarios: [], categories: [] };
  const brokenCategories = new Set<string>();
  const out: Record<string, unknown> = {
    site: { name: '' },
    categories: [],
    elements: [],
    functions: [],
    scenarios: [],
  };
  for (const [collection, schema] of COLLECTIONS) {
    const items = Array.isArray(top[collection]) ? (top[collection] as unknown[]) : [];
    const kept: unknown[] = [];
    items.forEach((item, i) => {
      const parsed = schema.safeParse(item);
      if (parsed.success) {
        kept.push(parsed.data);
        origins[collection].push(i);
      } else if (item && typeof item === 'object') {
        const tag = (item as Record<string, unknown>).tag ?? (item as Record<string, unknown>).id;
        if (typeof tag === 'string') (collection === 'categories' ? brokenCategories : brokenTags).add(tag);
      }
    });
    out[collection] = kept;
  }
  const policy = Model.shape.policy.safeParse(top.policy);
  if (policy.success && policy.data) out.policy = policy.data;
  return { model: out as Model, origins, brokenTags, brokenCategories };
}

/** A field that is absent (as opposed to present with a wrong value). */
function isMissing(issue: z.core.$ZodIssue): boolean {
  if (issue.code === 'invalid_type') return (issue as { input?: unknown }).input === undefined;
  return issue.code === 'invalid_union' && !!(issue as { discriminator?: string }).discriminator;
}

/**
 * The part files a .bulk model names, directly or through other parts, each as `read` gave it, keyed by
 * the path a load of the same file passes to its `readPart`. It parses but builds nothing, so a server
 * can learn cheaply which files to watch and send with the model.
 */
export function partFilesOf(file: string, bytes: Uint8Array, read: PartReader): Map<string, PartBytes> {
  const got = new Map<string, PartBytes>();
  const ignored: Diagnostic[] = [];
  const text = decode(bytes, ignored);
  if (text === undefined || detectFormat(file, text) !== 'bulk' || !NAMES_A_PART.test(text)) return got;
  const record: PartReader = (path) => {
    const part = read(path);
    got.set(path, part);
    return part;
  };
  readParts(file, parseBulk(text, ignored), record, decode, ignored);
  return got;
}

export function loadModelText(file: string, bytes: Uint8Array | string, options: LoadOptions = {}): LoadResult {
  const diagnostics: Diagnostic[] = [];
  const text = typeof bytes === 'string' ? bytes : decode(bytes, diagnostics);
  let source: SourceText = { file, lines: text === undefined ? [] : splitLines(text) };
  const format = detectFormat(file, text ?? '');
  let spans: SpanMap = new Map();
  let parts: string[] = [];
  const done = (model?: Model): LoadResult => ({
    ...(model && !hasErrors(diagnostics) ? { model } : {}),
    format,
    diagnostics: capDiagnostics(sortDiagnostics(diagnostics)),
    spans,
    source,
    ...(parts.length ? { parts } : {}),
  });
  if (text === undefined) return done();
  if (typeof bytes === 'string' && text.charCodeAt(0) === 0xfeff) {
    diagnostics.push(
      error('BH101', 'the text starts with a byte-order mark', { line: 1, column: 1, length: 1 }, { help: BOM_HELP }),
    );
    return done();
  }
  if (text.trim() === '') {
    diagnostics.push(
      error(
        'BH100',
        'the file is empty',
        { line: 1, column: 1, length: 1 },
        { help: 'a model needs at least a `site` statement' },
      ),
    );
    return done();
  }
  let raw: unknown;
  // Values the reader already reported (a malformed number) and names of unknown statements, so
  // that one mistake gives one diagnostic, not a cascade of "missing" and "unknown tag" ones.
  let reportedPaths = new Set<string>();
  let incompletePaths = new Set<string>();
  const brokenTags = new Set<string>();
  if (format === 'json') {
    const read = readJson(text, diagnostics);
    if (!read) return done();
    raw = read.raw;
    spans = read.spans;
  } else {
    // A model in one file is read a statement at a time as the parser completes each, so its tokens can be
    // dropped as it goes; one that names part files is parsed whole first, to splice the parts in.
    let built: RawModel;
    if (NAMES_A_PART.test(text)) {
      let parsed = parseBulk(text, diagnostics);
      if (parsed.statements.some((s) => s.keyword.value === PART_KEYWORD)) {
        const parted = readParts(file, parsed, options.readPart, decode, diagnostics);
        parsed = parted.parsed;
        parts = parted.files;
        source = { ...source, parts: parted.parts };
      }
      built = statementsToRaw(parsed, diagnostics);
    } else {
      const builder = new RawModelBuilder(diagnostics);
      built = builder.finish(parseBulk(text, diagnostics, (statement) => builder.add(statement)).endComments);
    }
    raw = built.raw;
    reportedPaths = built.reportedPaths;
    incompletePaths = built.incompletePaths;
    for (const tag of built.unknownNames) brokenTags.add(tag);
    spans = built.spans;
  }
  const name: FieldNamer = format === 'bulk' ? kebab : (f) => f;
  const parsed = Model.safeParse(raw, { reportInput: true });
  if (parsed.success) {
    const identity = (list: unknown[]) => list.map((_, i) => i);
    const m = parsed.data;
    const origins: Origins = {
      elements: identity(m.elements),
      functions: identity(m.functions),
      scenarios: identity(m.scenarios),
      categories: identity(m.categories),
    };
    diagnostics.push(...validateModel({ model: m, spans, name, origins, brokenTags, brokenCategories: new Set() }));
    return done(m);
  }
  for (const issue of parsed.error.issues) {
    if (reportedPaths.has(issue.path.map(String).join('.'))) continue;
    if (
      isMissing(issue) &&
      issue.path.some((_, n) => incompletePaths.has(issue.path.slice(0, n).map(String).join('.')))
    )
      continue;
    diagnostics.push(...issueToDiagnostics(issue, spans, name, raw));
  }
  const salvaged = salvage(raw, brokenTags);
  if (salvaged) diagnostics.push(...validateModel({ ...salvaged, spans, name }));
  return done();
}
