// Where each value of a .bulk model stands in its file. The reader keeps each statement's token positions
// in one flat array of integers; the span of a field path ("elements.12.mounted-on" as the schema names it:
// `elements.12.mountedOn`) is worked out only when a diagnostic, a finding or a report asks for it. A map
// from every field path to its span would cost a string and an object per value: on a 100k-element site,
// well over a million of each, for the few dozen that a run ever shows.
import type { Span } from '../diagnostics/diagnostic.ts';

/** The spans of a loaded model by dotted path (`scenarios.3.layers.1.function`); JSON keys as `path#key`. */
export interface SpanMap {
  get(path: string): Span | undefined;
}

/** The fields a kind of statement takes, numbered once per kind so a statement stores numbers, not names. */
export interface FieldTable {
  /** A field's number by its schema name. */
  readonly number: ReadonlyMap<string, number>;
  /** By number: whether the field is a list, whose values have spans of their own (`path.0`, `path.1`). */
  readonly isList: readonly boolean[];
  /** The field the word after the keyword fills (`tag`, `id`), if any. */
  readonly positional?: string;
}

interface TokenPosition {
  line: number;
  column: number;
  length: number;
  /** The part file the token lies in, when it is not the file that was loaded. */
  file?: string | undefined;
}

/** A statement's own collections of indented lines: one line (a scenario's `cause`) or a list (its `layer`s). */
type Children = Map<string, number | number[]>;

// The layout of one statement in `data`, from its start:
//   item span (3), positional value span (3; line 0 when the statement has no positional value),
//   count of attributes, then per attribute: field number, count of values, each value's span (3).
const ITEM = 0;
const POSITIONAL = 3;
const ATTRIBUTE_COUNT = 6;
const FIRST_ATTRIBUTE = 7;

export class StatementSpans implements SpanMap {
  private data = new Int32Array(1 << 12);
  private size = 0;
  /** Per statement (by the number `open` gave it): where it starts in `data`, and its kind's fields. */
  private readonly starts: number[] = [];
  private readonly tables: FieldTable[] = [];
  private readonly singles = new Map<string, number>();
  private readonly lists = new Map<string, number[]>();
  private readonly children = new Map<number, Children>();
  /** The part file of each statement read from one (most models are one file: this stays empty). */
  private readonly partFiles = new Map<number, string>();
  /** The statement open for attributes, and where its attribute count stands. */
  private openCount = -1;

  /** Where a problem with the model as a whole points: its first statement (set by pointRootAt). */
  private root: Span = { line: 1, column: 1, length: 1 };

  pointRootAt(span: Span): void {
    this.root = span;
  }

  private push(value: number): void {
    if (this.size === this.data.length) {
      const grown = new Int32Array(this.data.length * 2);
      grown.set(this.data);
      this.data = grown;
    }
    this.data[this.size++] = value;
  }

  private pushSpan(token: TokenPosition | undefined): void {
    this.push(token ? token.line : 0);
    this.push(token ? token.column : 0);
    this.push(token ? token.length : 0);
  }

  /**
   * Starts a statement: the item's own span (`item`), and the positional value's when it has one. It is
   * filed under `place`: a single statement's keyword (`site`), a collection and its index, or a scenario's
   * line under its parent statement. Attributes added next belong to it. Returns its number.
   */
  open(table: FieldTable, item: TokenPosition, positional: TokenPosition | undefined, place: StatementPlace): number {
    const id = this.starts.length;
    this.starts.push(this.size);
    this.tables.push(table);
    if (item.file !== undefined) this.partFiles.set(id, item.file);
    this.pushSpan(item);
    this.pushSpan(table.positional === undefined ? undefined : positional);
    this.openCount = this.size;
    this.push(0);
    if (place.parent === undefined) {
      if (place.index === undefined) this.singles.set(place.collection, id);
      else
        (this.lists.get(place.collection) ?? this.lists.set(place.collection, []).get(place.collection)!)[place.index] =
          id;
    } else {
      const own = this.children.get(place.parent) ?? this.children.set(place.parent, new Map()).get(place.parent)!;
      if (place.index === undefined) own.set(place.collection, id);
      else {
        const list = own.get(place.collection);
        const ids = Array.isArray(list) ? list : [];
        ids[place.index] = id;
        own.set(place.collection, ids);
      }
    }
    return id;
  }

  /** An attribute of the open statement: its field's number and the tokens of its values. */
  attribute(field: number, values: readonly TokenPosition[]): void {
    this.data[this.openCount]!++;
    this.push(field);
    this.push(values.length);
    for (const value of values) this.pushSpan(value);
  }

  get(path: string): Span | undefined {
    if (path === '') return { ...this.root };
    const parts = path.split('.');
    let at: number | undefined;
    let i: number;
    const single = this.singles.get(parts[0]!);
    if (single !== undefined) {
      at = single;
      i = 1;
    } else {
      at = indexInto(this.lists.get(parts[0]!), parts[1]);
      i = 2;
    }
    for (;;) {
      if (at === undefined) return undefined;
      if (i === parts.length) return this.spanAt(this.starts[at]! + ITEM, at);
      const own = this.children.get(at)?.get(parts[i]!);
      if (own === undefined)
        return this.fieldSpan(at, parts[i]!, parts.length - i === 2 ? parts[i + 1] : undefined, parts.length - i);
      if (typeof own === 'number') {
        at = own;
        i += 1;
      } else {
        at = indexInto(own, parts[i + 1]);
        i += 2;
      }
    }
  }

  /** A field of statement `at`, or (with `item`) one value of a list field. */
  private fieldSpan(at: number, field: string, item: string | undefined, depth: number): Span | undefined {
    if (depth > 2) return undefined;
    const start = this.starts[at]!;
    const table = this.tables[at]!;
    if (depth === 1 && field === table.positional)
      return this.data[start + POSITIONAL] ? this.spanAt(start + POSITIONAL, at) : undefined;
    const number = table.number.get(field);
    if (number === undefined) return undefined;
    let p = start + FIRST_ATTRIBUTE;
    for (let n = this.data[start + ATTRIBUTE_COUNT]!; n > 0; n--) {
      const values = this.data[p + 1]!;
      if (this.data[p] === number) {
        const first = p + 2;
        if (depth === 1) return this.joined(first, first + 3 * (values - 1), at);
        if (!table.isList[number]) return undefined;
        const index = indexOf(item);
        return index === undefined || index >= values ? undefined : this.spanAt(first + 3 * index, at);
      }
      p += 2 + 3 * values;
    }
    return undefined;
  }

  /** The span stored at `p` in statement `at`'s record. */
  private spanAt(p: number, at: number): Span {
    const span: Span = { line: this.data[p]!, column: this.data[p + 1]!, length: this.data[p + 2]! };
    const file = this.partFiles.get(at);
    return file === undefined ? span : { ...span, file };
  }

  /** From the first value to the end of the last, when both stand on one line; else the first value alone. */
  private joined(first: number, last: number, at: number): Span {
    const a = this.spanAt(first, at);
    if (this.data[last] !== a.line) return a;
    return { ...a, length: this.data[last + 1]! + this.data[last + 2]! - a.column };
  }
}

/** Where a statement is filed: `{ collection: 'site' }`, `{ collection: 'elements', index: 12 }`, or under a parent. */
export interface StatementPlace {
  collection: string;
  index?: number;
  parent?: number;
}

/** A path part as an index: a plain decimal number only (`01` or `1e0` names nothing). */
function indexOf(part: string | undefined): number | undefined {
  return part !== undefined && /^(0|[1-9]\d*)$/.test(part) ? Number(part) : undefined;
}

function indexInto<T>(list: readonly T[] | undefined, part: string | undefined): T | undefined {
  const index = indexOf(part);
  return list === undefined || index === undefined ? undefined : list[index];
}
