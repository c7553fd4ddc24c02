// A seeded mutation fuzzer over the demo models and the bad-input corpus: each input is a seed file with
// one to four mutations of the kinds that broke the loader before (byte flips, truncation, swapped and
// duplicated lines, object property names as keywords, huge and over-precise numbers, deep nesting, long
// lines, deep indentation, CRLF, BOM, NUL, invalid UTF-8), run in-process through the loader, the
// analysis, SIF verification and every renderer. Shared by the suite's fixed-budget test and `npm run fuzz`.
import { readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import {
  analyze,
  CODES,
  loadModelText,
  printBulk,
  printJson,
  renderDiagnostics,
  renderReport,
  renderVerificationsText,
  REPORT_FORMATS,
  splitLines,
  verifyModel,
  type Span,
} from '@bulkhead/core';
import { scenarioScene, siteOverview } from '@bulkhead/layout';
import { Random } from '../helpers/random.ts';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));

export interface Seed {
  name: string;
  bytes: Uint8Array;
}

/** The demo models (both forms) and every file of the bad-input corpus. */
export function seeds(): Seed[] {
  const from = (dir: string) =>
    readdirSync(`${ROOT}${dir}`)
      .filter((f) => /\.(bulk|json)$/.test(f))
      .sort()
      .map((f) => ({ name: `${dir}${f}`, bytes: new Uint8Array(readFileSync(`${ROOT}${dir}${f}`)) }));
  return [...from('fixtures/demo/'), ...from('fixtures/bad/')];
}

const OBJECT_NAMES = [
  '__proto__',
  'constructor',
  'toString',
  'valueOf',
  'hasOwnProperty',
  'prototype',
  '__defineSetter__',
];
const KEYWORDS = [
  'site',
  'policy',
  'category',
  'rule',
  'scenario',
  'accept',
  'vessel',
  'transmitter',
  'sif',
  'loop',
  'alarm',
  'cause',
  'layer',
  'enabler',
  'modifier',
  'cable',
];
const NUMBERS = [
  '1e309',
  '-1e309',
  '1e-400',
  '0.00500000000000000000001',
  '99999999999999999999999',
  '-0',
  'NaN',
  'Infinity',
  '0x10',
  '1e',
  '.',
  '9'.repeat(400),
  '0.1e+99999',
];
const enc = new TextEncoder();
const dec = new TextDecoder('utf-8', { fatal: false });

function splice(bytes: Uint8Array, at: number, removeAsked: number, insert: Uint8Array): Uint8Array {
  const remove = Math.min(removeAsked, bytes.length - at);
  const out = new Uint8Array(bytes.length - remove + insert.length);
  out.set(bytes.subarray(0, at), 0);
  out.set(insert, at);
  out.set(bytes.subarray(at + remove), at + insert.length);
  return out;
}

function lines(bytes: Uint8Array): string[] {
  return dec.decode(bytes).split('\n');
}

type Mutation = (bytes: Uint8Array, r: Random, other: () => Uint8Array) => Uint8Array;

/** Each mutation by name, so a crasher's report says what was done to its seed. */
export const MUTATIONS: Record<string, Mutation> = {
  'flip a byte': (b, r) => {
    if (b.length === 0) return b;
    const out = b.slice();
    const at = r.int(out.length);
    out[at] = out[at]! ^ (1 << r.int(8));
    return out;
  },
  truncate: (b, r) => b.slice(0, r.int(b.length + 1)),
  'swap two lines': (b, r) => {
    const l = lines(b);
    const [x, y] = [r.int(l.length), r.int(l.length)];
    [l[x], l[y]] = [l[y]!, l[x]!];
    return enc.encode(l.join('\n'));
  },
  'repeat a line': (b, r) => {
    const l = lines(b);
    const x = r.int(l.length);
    l.splice(x, 0, ...Array<string>(1 + r.int(3)).fill(l[x]!));
    return enc.encode(l.join('\n'));
  },
  'drop a line': (b, r) => {
    const l = lines(b);
    l.splice(r.int(l.length), 1);
    return enc.encode(l.join('\n'));
  },
  'odd keyword': (b, r) => {
    const l = lines(b);
    const word = r.next() < 0.6 ? r.pick(OBJECT_NAMES) : r.pick(KEYWORDS);
    const indent = r.next() < 0.5 ? '  ' : '';
    const rest = r.pick([
      '',
      ' X-1',
      ` ${r.pick(OBJECT_NAMES)}=1`,
      ` ${r.pick(OBJECT_NAMES)}`,
      ' tag=constructor',
      ` ${word}=${word}`,
    ]);
    l.splice(r.int(l.length + 1), 0, `${indent}${word}${rest}`);
    return enc.encode(l.join('\n'));
  },
  'odd word in place': (b, r) => {
    const text = dec.decode(b);
    const words = [...text.matchAll(/[A-Za-z0-9_.-]+/g)];
    if (words.length === 0) return b;
    const w = r.pick(words);
    const by = r.next() < 0.5 ? r.pick(OBJECT_NAMES) : r.pick(NUMBERS);
    return enc.encode(text.slice(0, w.index) + by + text.slice(w.index! + w[0].length));
  },
  'huge or precise number': (b, r) => {
    const text = dec.decode(b);
    const numbers = [...text.matchAll(/\d+(\.\d+)?(e-?\d+)?/g)];
    if (numbers.length === 0) return enc.encode(`${text} ${r.pick(NUMBERS)}`);
    const n = r.pick(numbers);
    return enc.encode(text.slice(0, n.index) + r.pick(NUMBERS) + text.slice(n.index! + n[0].length));
  },
  'deep nesting': (b, r) => {
    const depth = 50 + r.int(20_000);
    const open = r.next() < 0.5 ? '['.repeat(depth) : '{"a":'.repeat(depth);
    return splice(
      b,
      r.int(b.length + 1),
      0,
      enc.encode(open + (r.next() < 0.5 ? (open[0] === '[' ? ']' : '1}').repeat(depth) : '')),
    );
  },
  'long line': (b, r) => {
    const unit = r.pick(['x', '!', 'a=1 ', 'A-1,', '"', '\\', '# ', ' ', 'é', '\t']);
    return splice(b, r.int(b.length + 1), 0, enc.encode(unit.repeat(1 + r.int(60_000))));
  },
  'deep indentation': (b, r) => {
    const l = lines(b);
    const x = r.int(l.length);
    l[x] = (r.next() < 0.8 ? ' ' : '\t').repeat(1 + r.int(40_000)) + l[x];
    return enc.encode(l.join('\n'));
  },
  'line endings': (b, r) => enc.encode(dec.decode(b).replace(/\n/g, r.pick(['\r\n', '\r', '\n\r', '\u2028']))),
  'byte-order mark': (b) => splice(b, 0, 0, new Uint8Array([0xef, 0xbb, 0xbf])),
  'NUL byte': (b, r) => splice(b, r.int(b.length + 1), 0, new Uint8Array([0])),
  'invalid UTF-8': (b, r) =>
    splice(
      b,
      r.int(b.length + 1),
      0,
      new Uint8Array(
        r.pick([[0xff], [0xc0, 0x80], [0x80], [0xed, 0xa0, 0x80], [0xf4, 0x90, 0x80, 0x80], [0xe2, 0x82]]),
      ),
    ),
  'splice another seed': (b, r, other) => {
    const o = other();
    const from = r.int(o.length + 1);
    return splice(b, r.int(b.length + 1), r.int(64), o.subarray(from, from + r.int(400)));
  },
  'repeat a chunk': (b, r) => {
    if (b.length === 0) return b;
    const from = r.int(b.length);
    const chunk = b.subarray(from, from + 1 + r.int(200));
    const times = 2 + r.int(500);
    const many = new Uint8Array(chunk.length * times);
    for (let i = 0; i < times; i++) many.set(chunk, i * chunk.length);
    return splice(b, from, 0, many);
  },
};
const MUTATION_NAMES = Object.keys(MUTATIONS);

export interface FuzzInput {
  /** Replays the input: `seed file`, the mutations applied, and the input number. */
  label: string;
  name: string;
  bytes: Uint8Array;
}

/** The `index`-th input of a run with `seed`: deterministic, so any input can be made again alone. */
export function makeInput(all: readonly Seed[], seed: number, index: number): FuzzInput {
  const r = new Random((seed * 1_000_003 + index) >>> 0);
  // Half the inputs start from a demo model, so many still load and reach the analysis and renderers.
  const demos = all.filter((s) => s.name.startsWith('fixtures/demo/'));
  const base = r.next() < 0.5 && demos.length > 0 ? r.pick(demos) : r.pick(all);
  let bytes = base.bytes;
  const done: string[] = [];
  for (let n = r.next() < 0.4 ? 1 : 1 + r.int(4); n > 0; n--) {
    const name = r.pick(MUTATION_NAMES);
    bytes = MUTATIONS[name]!(bytes, r, () => r.pick(all).bytes);
    done.push(name);
  }
  // Now and then the file name says nothing, so the format is detected from the text.
  const name = r.next() < 0.1 ? base.name.replace(/\.(bulk|json)$/, '.model') : base.name;
  return { label: `#${index} ${base.name}: ${done.join(', ')}`, name, bytes };
}

export interface Outcome {
  crash?: string;
  /** Positions that do not lie in the file: diagnostic spans and SARIF regions. */
  outside: string[];
  /** Wall-clock time of the run. */
  ms: number;
  /** CPU time of this process during the run: what the input cost, whatever else the machine was doing. */
  cpuMs: number;
  loaded: boolean;
}

const cpuNow = () => {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1000;
};

function inside(lines: readonly string[], span: Span): boolean {
  const line = lines[span.line - 1];
  return line !== undefined && span.column >= 1 && span.column <= line.length + 1;
}

/** Load, and when it loads analyse, print and render in every format; never throws. */
export function runOne(input: FuzzInput): Outcome {
  const outside: string[] = [];
  const started = performance.now();
  const cpuStarted = cpuNow();
  let loaded = false;
  try {
    const result = loadModelText(input.name, input.bytes);
    // Text that is not UTF-8 is not decoded by the loader; its positions are checked against a lossy decoding.
    const lines = result.source.lines.length > 0 ? result.source.lines : splitLines(dec.decode(input.bytes));
    for (const d of result.diagnostics) {
      if (!(d.code in CODES)) throw new Error(`diagnostic with a code not in the catalogue: ${d.code}`);
      for (const span of [d.span, ...(d.related ?? []).map((x) => x.span)]) {
        if (span && !inside(lines, span)) outside.push(`${d.code} at ${span.line}:${span.column}`);
      }
    }
    renderDiagnostics(result.diagnostics, result.source);
    if (result.model) {
      loaded = true;
      const model = result.model;
      const analysis = analyze(model, { spans: result.spans });
      const report = {
        model,
        analysis,
        file: input.name,
        sha256: '0'.repeat(64),
        toolVersion: '0.0.0',
        spans: result.spans,
      };
      for (const format of REPORT_FORMATS) {
        const text = renderReport(report, format);
        if (format === 'sarif') outside.push(...sarifOutside(text, result.source.lines));
      }
      renderVerificationsText(verifyModel(model, undefined, analysis));
      printBulk(model);
      printJson(model);
      siteOverview(model, analysis);
      for (const s of model.scenarios.slice(0, 3)) scenarioScene(model, analysis, s.id);
    }
  } catch (e) {
    return {
      crash: e instanceof Error ? `${e.name}: ${e.message}` : String(e),
      outside,
      ms: performance.now() - started,
      cpuMs: cpuNow() - cpuStarted,
      loaded,
    };
  }
  return { outside, ms: performance.now() - started, cpuMs: cpuNow() - cpuStarted, loaded };
}

function sarifOutside(text: string, lines: readonly string[]): string[] {
  const out: string[] = [];
  const log = JSON.parse(text) as {
    runs: {
      results: { locations?: { physicalLocation?: { region?: { startLine?: number; startColumn?: number } } }[] }[];
    }[];
  };
  for (const result of log.runs[0]?.results ?? []) {
    for (const location of result.locations ?? []) {
      const region = location.physicalLocation?.region;
      if (region?.startLine === undefined) continue;
      if (!inside(lines, { line: region.startLine, column: region.startColumn ?? 1, length: 1 }))
        out.push(`SARIF region ${region.startLine}:${region.startColumn}`);
    }
  }
  return out;
}

/** "Slow" in the terms: over 1 s per 100 KB, with a floor for the fixed cost of any run. */
export function budgetMs(bytes: number, floorMs = 250): number {
  return Math.max(floorMs, (1000 * bytes) / (100 * 1024));
}
