// The loader's limits, each with its own code, on both sides of the edge: line length (BH105), JSON
// nesting (BH106), dependency-chain depth (BH107), numbers a double cannot hold (BH121), and the cap
// on repeated diagnostics ("and N more like this"). Times are measured in `npm run fuzz`, not here.
import { describe, expect, it } from 'vitest';
import { loadModelText, renderDiagnostics } from '@bulkhead/core';
import { heldExactly } from '../../../packages/core/src/util/decimal.ts';
import { MAX_LINE_LENGTH } from '../../../packages/core/src/bulk/parser.ts';
import { MAX_JSON_DEPTH } from '../../../packages/core/src/json/reader.ts';
import { MAX_DEPENDENCY_DEPTH } from '../../../packages/core/src/loader/cycles.ts';

const SITE = 'site "Limits"\ncategory c tolerable=1e-4 harm=people\n';
const codes = (file: string, text: string) =>
  loadModelText(file, text).diagnostics.map((d) => `${d.code} ${d.span?.line}:${d.span?.column}`);

/** A chain of `links` links: cable W-0 relies on W-1, ... on W-links. */
function chain(links: number): string {
  let text = SITE;
  for (let i = 0; i < links; i++) text += `cable W-${i} signal-via=W-${i + 1}\n`;
  return `${text}cable W-${links}\n`;
}

describe('numbers a double holds (IEEE 754 binary64 keeps 15 to 17 significant decimal digits; ECMAScript Number::toString gives the shortest text that reads back)', () => {
  it.each([
    ['0.1', true],
    ['1e-4', true],
    ['1.50e-3', true],
    ['0.005', true],
    ['100', true],
    ['-0', true],
    ['0.30000000000000004', true], // the double nearest 0.1 + 0.2, written in full
    ['123456789012345', true], // 15 digits always fit
    ['9007199254740993', false], // 2^53 + 1 is read as 2^53
    ['0.00500000000000000000001', false], // issue 10: read as 0.005
    ['0.1000000000000000055511151231257827', false], // the exact value of the double 0.1, but not its shortest form
    ['1e-400', false], // underflows to 0
    ['1e400', true], // infinite: left to the range checks (BH305)
  ])('%s -> %s', (literal, held) => {
    expect(heldExactly(literal)).toBe(held);
  });

  it('a .bulk number with too many digits is refused, not rewritten, and points at the number (BH121)', () => {
    expect(codes('m.bulk', SITE.replace('1e-4', '0.00500000000000000000001'))).toEqual(['BH121 2:22']);
  });

  it('a JSON number with too many digits is refused (BH121)', () => {
    const text =
      '{ "site": { "name": "J" }, "categories": [{ "id": "c", "tolerable": 0.00500000000000000000001, "harm": "people" }], "elements": [], "functions": [], "scenarios": [] }';
    expect(codes('m.json', text)).toEqual(['BH121 1:69']);
  });
});

describe('line length (BH105)', () => {
  const line = (n: number) => `vessel V-1 title="${'x'.repeat(n - 'vessel V-1 title=""'.length)}"`;

  it(`a line of exactly ${MAX_LINE_LENGTH} characters loads`, () => {
    expect(line(MAX_LINE_LENGTH)).toHaveLength(MAX_LINE_LENGTH);
    expect(codes('m.bulk', `${SITE}${line(MAX_LINE_LENGTH)}\n`)).toEqual([]);
  });

  it('one character more is refused once, at the first character past the limit, and the line is not read', () => {
    expect(codes('m.bulk', `${SITE}${line(MAX_LINE_LENGTH + 1)}\n`)).toEqual([`BH105 3:${MAX_LINE_LENGTH + 1}`]);
  });

  it('a line of a million stray characters gives one diagnostic, not a million', () => {
    expect(codes('m.bulk', `${SITE}vessel V-1 ${'!'.repeat(1_000_000)}\n`)).toEqual([`BH105 3:${MAX_LINE_LENGTH + 1}`]);
  });

  it('a comment line is kept whole, however long (fmt keeps every comment)', () => {
    const result = loadModelText('m.bulk', `${SITE}#${'c'.repeat(50_000)}\nvessel V-1\n`);
    expect(result.diagnostics).toEqual([]);
    expect(result.model?.elements[0]?.comments?.[0]).toHaveLength(50_000);
  });
});

describe('JSON nesting (BH106)', () => {
  const nested = (depth: number) =>
    `{ "site": { "name": "J" }, "x": ${'['.repeat(depth - 1)}${']'.repeat(depth - 1)} }`;

  it(`nesting of ${MAX_JSON_DEPTH} levels reaches the schema, which names the unknown field`, () => {
    expect(loadModelText('m.json', nested(MAX_JSON_DEPTH)).diagnostics.map((d) => d.code)).toContain('BH203');
  });

  it('one level more is refused at the bracket that opens it', () => {
    expect(codes('m.json', nested(MAX_JSON_DEPTH + 1))).toEqual([`BH106 1:${33 + MAX_JSON_DEPTH - 1}`]);
  });

  it('100,000 levels of arrays or of objects are refused, without running out of stack', () => {
    expect(codes('m.json', '['.repeat(100_000) + ']'.repeat(100_000))).toEqual([`BH106 1:${MAX_JSON_DEPTH + 1}`]);
    expect(codes('m.json', '{"a":'.repeat(100_000) + '1' + '}'.repeat(100_000))).toEqual([
      `BH106 1:${5 * MAX_JSON_DEPTH + 1}`,
    ]);
  });

  it('brackets inside strings do not count', () => {
    const text = `{ "site": { "name": "${'['.repeat(200)}\\"${'{'.repeat(200)}" } }`;
    expect(loadModelText('m.json', text).diagnostics.map((d) => d.code)).not.toContain('BH106');
  });
});

describe('dependency-chain depth (BH107)', () => {
  it(`a chain of ${MAX_DEPENDENCY_DEPTH} links loads`, () => {
    expect(codes('m.bulk', chain(MAX_DEPENDENCY_DEPTH))).toEqual([]);
  });

  it('one link more is refused once, at the element the longest chain starts from', () => {
    expect(codes('m.bulk', chain(MAX_DEPENDENCY_DEPTH + 1))).toEqual(['BH107 3:7']);
  });

  it('a chain 20,000 deep gets the same one diagnostic (issue 10: it used to exhaust memory in the tracer)', () => {
    const result = loadModelText('m.bulk', chain(20_000));
    expect(result.diagnostics.map((d) => d.code)).toEqual(['BH107']);
    expect(result.diagnostics[0]!.message).toContain('a chain of 20000 links');
  });

  it('a cycle is reported as a cycle, not as an endless chain', () => {
    const text = chain(3).replace('cable W-3\n', 'cable W-3 signal-via=W-0\n');
    expect(loadModelText('m.bulk', text).diagnostics.map((d) => d.code)).toEqual(['BH303']);
  });
});

describe('repeated diagnostics', () => {
  const text = `${SITE}${Array.from({ length: 500 }, (_, i) => `vessel V-${i} colour=red`).join('\n')}\n`;

  it('shows the first 20 of a code in file order and counts the rest on the last one shown', () => {
    const { diagnostics } = loadModelText('m.bulk', text);
    expect(diagnostics).toHaveLength(20);
    expect(diagnostics.map((d) => d.span?.line)).toEqual(Array.from({ length: 20 }, (_, i) => i + 3));
    expect(diagnostics.map((d) => d.more)).toEqual([...Array(19).fill(undefined), 480]);
  });

  it('says "and N more like this" in the rendered output', () => {
    const result = loadModelText('m.bulk', text);
    const rendered = renderDiagnostics(result.diagnostics, result.source);
    expect(rendered).toContain('  and      480 more like this (BH118), not shown');
    expect(rendered.match(/^ {2}code {5}BH118 /gm)).toHaveLength(20);
  });

  it('caps each code separately, so one flood never hides another kind of mistake', () => {
    const both = `${text}nozzle N-1 mounted-on=NOWHERE\n`;
    expect(new Set(loadModelText('m.bulk', both).diagnostics.map((d) => d.code))).toEqual(new Set(['BH118', 'BH300']));
  });

  it('an excerpt of a very long line is cut around its span', () => {
    const long = `${SITE}vessel V-1 title="${'y'.repeat(9_000)}" colour=red\n`;
    const result = loadModelText('m.bulk', long);
    const rendered = renderDiagnostics(result.diagnostics, result.source);
    expect(rendered).toContain('colour=red');
    expect(Math.max(...rendered.split('\n').map((l) => l.length))).toBeLessThan(200);
  });
});
