// Multi-file models: `part "path"` names another .bulk file relative to the naming file. The split model
// must load as the same model written in one file, and every problem must point into the file it is in.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  analyze,
  formatModelFile,
  joinRelative,
  loadModelText,
  printJson,
  renderDiagnostics,
  type PartReader,
} from '@bulkhead/core';

function reader(files: Record<string, string>): PartReader {
  return (path) => (path in files ? new TextEncoder().encode(files[path]) : { problem: 'no such file' });
}

const DEMO = readFileSync('fixtures/demo/marrow-fen.bulk', 'utf8');

/** The demo split in three: head and scenarios in the main file, supports and the plant in two parts. */
function splitDemo(): { main: string; files: Record<string, string> } {
  const lines = DEMO.split('\n');
  const at = (text: string) => lines.findIndex((l) => l.startsWith(text));
  const plant = at('# ---- V-101 feed surge drum');
  const functions = at('# ---- Functions');
  const supports = at('# ---- Supports');
  const main = [
    ...lines.slice(0, supports),
    'part "units/supports.bulk"',
    'part "units/plant.bulk"',
    ...lines.slice(functions),
  ].join('\n');
  return {
    main,
    files: {
      'site/units/supports.bulk': lines.slice(supports, plant).join('\n'),
      'site/units/plant.bulk': lines.slice(plant, functions).join('\n'),
    },
  };
}

describe('a model split over part files', () => {
  it('loads as the same model, and gives the same findings, as the demo in one file', () => {
    const { main, files } = splitDemo();
    const split = loadModelText('site/main.bulk', main, { readPart: reader(files) });
    const whole = loadModelText('marrow-fen.bulk', DEMO);
    expect(split.diagnostics).toEqual([]);
    expect(split.parts).toEqual(['site/units/supports.bulk', 'site/units/plant.bulk']);
    expect(printJson(split.model!)).toBe(printJson(whole.model!));
    const keys = (r: typeof split) => analyze(r.model!).findings.map((f) => f.key);
    expect(keys(split)).toEqual(keys(whole));
  });

  it('names both files when a tag is defined in two of them', () => {
    const { main, files } = splitDemo();
    const result = loadModelText('site/main.bulk', `${main}\nvessel V-101 title="again"\n`, {
      readPart: reader(files),
    });
    const duplicate = result.diagnostics.find((d) => d.code === 'BH301')!;
    expect(duplicate.span?.file).toBeUndefined();
    expect(duplicate.related?.[0]?.span.file).toBe('site/units/plant.bulk');
    const text = renderDiagnostics([duplicate], result.source);
    expect(text).toContain('see also site/units/plant.bulk line 2, column 8: first defined here');
    expect(text).toContain('vessel V-101 title="Feed surge drum"');
  });

  it('reports a syntax error inside a part at that file, line and column', () => {
    const result = loadModelText('m.bulk', 'site s\npart "p.bulk"\n', {
      readPart: reader({ 'p.bulk': 'vessel V-1\nvessel V-2 title="open\n' }),
    });
    expect(result.model).toBeUndefined();
    const text = renderDiagnostics(result.diagnostics, result.source);
    expect(text).toContain('where    p.bulk:2:18');
    expect(result.diagnostics[0]!.code).toBe('BH110');
  });

  it('reports a cycle of parts with the chain of files, and still ends', () => {
    const files = { 'a/b.bulk': 'part "../c.bulk"\n', 'c.bulk': 'part "a/b.bulk"\n' };
    const result = loadModelText('c.bulk', 'site s\npart "a/b.bulk"\n', { readPart: reader(files) });
    const cycle = result.diagnostics.find((d) => d.code === 'BH122')!;
    expect(cycle.message).toBe('part files name one another in a cycle: c.bulk -> a/b.bulk -> c.bulk');
    expect(cycle.span).toMatchObject({ file: 'a/b.bulk', line: 1, column: 6 });
  });

  it('reports a missing part at the statement that names it', () => {
    const result = loadModelText('m.bulk', 'site s\npart "gone.bulk"\n', { readPart: reader({}) });
    expect(result.diagnostics).toMatchObject([{ code: 'BH123', span: { line: 2, column: 6 } }]);
  });

  it('refuses a part given as an absolute path or a non-.bulk file, and a part that names the site', () => {
    const codes = (text: string, files: Record<string, string> = {}) =>
      loadModelText('m.bulk', `site s\n${text}\n`, { readPart: reader(files) }).diagnostics.map((d) => d.code);
    expect(codes('part "/etc/x.bulk"')).toEqual(['BH124']);
    expect(codes('part "x.json"')).toEqual(['BH124']);
    expect(codes('part "p.bulk"', { 'p.bulk': 'site other\n' })).toEqual(['BH124']);
  });

  it('says a part cannot be read where no reader is given (as in the browser)', () => {
    const result = loadModelText('m.bulk', 'site s\npart "p.bulk"\n');
    expect(result.diagnostics.map((d) => d.code)).toEqual(['BH123']);
  });
});

describe('joinRelative', () => {
  // Path rules as POSIX path resolution defines them (from memory of POSIX.1 pathname resolution).
  it.each([
    ['main.bulk', 'p.bulk', 'p.bulk'],
    ['site/main.bulk', 'units/p.bulk', 'site/units/p.bulk'],
    ['site/units/p.bulk', '../q.bulk', 'site/q.bulk'],
    ['/abs/site/m.bulk', './p.bulk', '/abs/site/p.bulk'],
    ['m.bulk', '../up.bulk', '../up.bulk'],
    ['win\\site\\m.bulk', 'p.bulk', 'win/site/p.bulk'],
  ])('%s + %s = %s', (from, written, expected) => {
    expect(joinRelative(from, written)).toBe(expected);
  });
});

describe('formatting one file of a split model', () => {
  it('keeps part statements and their comments, and a part file without a site', () => {
    const text = 'site s\n# the plant, regenerated by import\npart   "units/p.bulk"   # generated\nvessel V-1\n';
    expect(formatModelFile(text)).toBe(
      'site "s"\n\n# the plant, regenerated by import\npart "units/p.bulk" # generated\n\nvessel V-1\n',
    );
    expect(formatModelFile('vessel   V-1\nnozzle N-1 mounted-on=V-1\n')).toBe(
      'vessel V-1\nnozzle N-1 mounted-on=V-1\n',
    );
  });

  it('refuses a file with a syntax error', () => {
    expect(formatModelFile('vessel V-1 title="open\n')).toBeUndefined();
  });
});
