// Multi-file models: a .bulk file may name other .bulk files with `part "path"`, relative to itself.
// Each part's statements take the place of its `part` statement, so a model split over files reads as
// the same model written in one. Every token read from a part carries the part's path, so diagnostics,
// findings and SARIF point into the right file, and a tag defined in two files names both places.
import { error, type Diagnostic, type Related, type Span } from '../diagnostics/diagnostic.ts';
import { splitLines } from '../diagnostics/render.ts';
import type { Token } from '../bulk/lexer.ts';
import { parseBulk, PART_KEYWORD, tokenSpan, type ParsedFile, type Statement } from '../bulk/parser.ts';

export { PART_KEYWORD };

/** What reading a part file gave: its bytes, or why it could not be read (said in the user's words). */
export type PartBytes = Uint8Array | { problem: string };

/** Reads a part file by the path the model names (already joined to the naming file's folder). */
export type PartReader = (path: string) => PartBytes;

/** Turns a file's bytes into text, reporting (at the file's own positions) why it is not text. */
export type Decoder = (bytes: Uint8Array, diagnostics: Diagnostic[]) => string | undefined;

/** Joins a path written in a file to that file's folder, with `.` and `..` worked out, in `/` form. */
export function joinRelative(fromFile: string, written: string): string {
  const slash = Math.max(fromFile.lastIndexOf('/'), fromFile.lastIndexOf('\\'));
  const folder = slash === -1 ? '' : fromFile.slice(0, slash);
  const segments: string[] = [];
  const absolute = folder.startsWith('/');
  for (const segment of `${folder}/${written}`.split(/[\\/]/)) {
    if (segment === '' || segment === '.') continue;
    if (segment === '..' && segments.length > 0 && segments[segments.length - 1] !== '..') segments.pop();
    else segments.push(segment);
  }
  return (absolute ? '/' : '') + segments.join('/');
}

/** A path in the one form `joinRelative` gives, so the same file is known by one name. */
export function normalPath(file: string): string {
  return joinRelative(file, file.slice(Math.max(file.lastIndexOf('/'), file.lastIndexOf('\\')) + 1));
}

export interface PartedFile {
  parsed: ParsedFile;
  /** The lines of every part file read, by the path its spans carry. */
  parts: Map<string, string[]>;
  /** The part files in the order they were first named. */
  files: string[];
}

function stampStatement(statement: Statement, file: string): void {
  const stamp = (t: Token | undefined) => {
    if (t) t.file = file;
  };
  stamp(statement.keyword);
  stamp(statement.name);
  for (const a of statement.attributes) {
    stamp(a.key);
    a.values.forEach(stamp);
  }
  for (const child of statement.children) stampStatement(child, file);
}

function stampSpan(span: Span | undefined, file: string): Span | undefined {
  return span && span.file === undefined ? { ...span, file } : span;
}

/** Marks a diagnostic found while reading a part file as lying in that file. */
function stampDiagnostic(d: Diagnostic, file: string): Diagnostic {
  const span = stampSpan(d.span, file);
  const related: Related[] | undefined = d.related?.map((r) => ({ ...r, span: stampSpan(r.span, file)! }));
  return { ...d, ...(span ? { span } : {}), ...(related ? { related } : {}) };
}

const PART_HELP = 'write `part "units/area-100.bulk"`: one quoted path to a .bulk file, relative to this file';

/**
 * Replaces each `part` statement of `parsed` (read from `file`) with the statements of the file it
 * names, recursively. A part named twice is read once; a part that names a file on its own path back
 * to the loaded file is a cycle, reported with the chain of files.
 */
export function readParts(
  file: string,
  parsed: ParsedFile,
  read: PartReader | undefined,
  decode: Decoder,
  diagnostics: Diagnostic[],
): PartedFile {
  const parts = new Map<string, string[]>();
  const files: string[] = [];
  const expand = (from: string, statements: Statement[], chain: string[]): Statement[] => {
    const out: Statement[] = [];
    for (const statement of statements) {
      if (statement.keyword.value !== PART_KEYWORD) {
        out.push(statement);
        continue;
      }
      const target = statement.name;
      if (!target || statement.attributes.length > 0 || statement.children.length > 0) {
        diagnostics.push(
          error('BH124', 'a `part` statement names one file and nothing else', tokenSpan(statement.keyword), {
            help: PART_HELP,
          }),
        );
        continue;
      }
      if (!/\.bulk$/i.test(target.value) || /^([\\/]|[A-Za-z]:)/.test(target.value)) {
        diagnostics.push(
          error('BH124', `\`${target.value}\` is not a relative path to a .bulk file`, tokenSpan(target), {
            help: PART_HELP,
          }),
        );
        continue;
      }
      if (!read) {
        diagnostics.push(
          error('BH123', `the part file \`${target.value}\` cannot be read here`, tokenSpan(target), {
            help: 'a model split over files is read from disk: run `bulkhead view MAIN.bulk` (or check, report) on the main file',
          }),
        );
        continue;
      }
      const path = joinRelative(from, target.value);
      const loop = chain.indexOf(path);
      if (loop !== -1) {
        const cycle = [...chain.slice(loop), path];
        diagnostics.push(
          error('BH122', `part files name one another in a cycle: ${cycle.join(' -> ')}`, tokenSpan(target), {
            help: 'a part file may not name, directly or through other parts, a file that names it; remove one `part` statement',
          }),
        );
        continue;
      }
      if (parts.has(path)) continue;
      const got = read(path);
      if (!(got instanceof Uint8Array)) {
        diagnostics.push(
          error('BH123', `the part file \`${path}\` cannot be read: ${got.problem}`, tokenSpan(target), {
            help: 'check the path, which is relative to the file that names it',
          }),
        );
        continue;
      }
      const own: Diagnostic[] = [];
      const text = decode(got, own) ?? '';
      parts.set(path, splitLines(text));
      files.push(path);
      const partParsed = parseBulk(text, own);
      diagnostics.push(...own.map((d) => stampDiagnostic(d, path)));
      for (const s of partParsed.statements) stampStatement(s, path);
      for (const s of partParsed.statements) {
        if (s.keyword.value !== 'site') continue;
        diagnostics.push(
          error(
            'BH124',
            'a part file does not name the site; only the main file has a `site` statement',
            tokenSpan(s.keyword),
            {
              help: 'move the `site` statement to the main model file',
            },
          ),
        );
      }
      out.push(
        ...expand(
          path,
          partParsed.statements.filter((s) => s.keyword.value !== 'site'),
          [...chain, path],
        ),
      );
    }
    return out;
  };
  const statements = expand(file, parsed.statements, [normalPath(file)]);
  return { parsed: { statements, endComments: parsed.endComments }, parts, files };
}
