// The loader reports every problem in one pass, each at its own position, and renders them in the
// notice look; golden files pin the rendered text (mark under the right column, see-also and to-fix lines).
import { describe, expect, it } from 'vitest';
import { loadModelText, renderDiagnostics } from '@bulkhead/core';

const THREE_DEFECTS = `site "Three defects"
category people-serious tolerable=1e-4 harm=people
vessel V-1
nozzle N-1 mounted-on=V-1
transmitter LT-1 variable=level mounted-on=N-1
transmitter LT-2 variable=level mounted-on=N-1
controller BPCS-1 system=bpcs
logic-solver SIS-1 system=sis
control-valve LV-1 fails-to=closed mounted-on=V-1
shutdown-valve XV-1 fails-to=closed mounted-on=V-1
loop LIC-1 sensors=LT-1 solver=BPCS-1 finals=LV-1
sif SIF-1 sensors=LT-3 solver=SIS-1 finals=XV-1 pfd=0.05
scenario S-1 category=people-serius
  cause function=LIC-1 frequency=0.1
  layer SIF-1 pfd=1.5
`;

function render(file: string, text: string): string {
  const result = loadModelText(file, text);
  return renderDiagnostics(result.diagnostics, result.source) + '\n';
}

describe('one pass reports every problem', () => {
  it('gives three diagnostics for a file with three defects, in source order', () => {
    const result = loadModelText('three.bulk', THREE_DEFECTS);
    expect(result.model).toBeUndefined();
    expect(result.diagnostics.map((d) => [d.code, d.span?.line, d.span?.column])).toEqual([
      ['BH300', 12, 19],
      ['BH311', 13, 23],
      ['BH304', 15, 19],
    ]);
  });

  it('goes on after syntax errors to the checks beyond the schema', () => {
    const text = THREE_DEFECTS.replace('vessel V-1', 'vessel V-1 ;').replace(
      'tolerable=1e-4',
      'tolerable=1e-4 harm=people',
    );
    const codes = loadModelText('t.bulk', text).diagnostics.map((d) => d.code);
    expect(codes).toEqual(['BH117', 'BH111', 'BH300', 'BH311', 'BH304']);
  });

  it('reports problems in a JSON model in one pass too', () => {
    const json = JSON.stringify(
      {
        site: { name: 'J' },
        categories: [{ id: 'c', tolerable: 0, harm: 'people' }],
        elements: [{ kind: 'vessel', tag: 'V-1', mountedOn: ['V-9'] }],
        functions: [],
        scenarios: [],
      },
      null,
      2,
    );
    expect(loadModelText('t.json', json).diagnostics.map((d) => d.code)).toEqual(['BH305', 'BH300']);
  });
});

describe('rendered diagnostics (golden files)', () => {
  it('three defects in .bulk: carets under the values, did-you-mean help', async () => {
    await expect(render('models/three.bulk', THREE_DEFECTS)).toMatchFileSnapshot('./__golden__/three-defects.txt');
  });

  it('a duplicate with a note pointing at the first definition', async () => {
    const text = THREE_DEFECTS.replace('sensors=LT-3', 'sensors=LT-2')
      .replace('people-serius', 'people-serious')
      .replace('pfd=1.5', 'pfd=0.05')
      .replace('controller BPCS-1 system=bpcs', 'controller BPCS-1 system=bpcs\nswitch LT-1');
    await expect(render('dup.bulk', text)).toMatchFileSnapshot('./__golden__/duplicate-with-note.txt');
  });

  it('a JSON trailing comma, a long line cut around the caret, and a tab in the line', async () => {
    const json = '{\n  "site": { "name": "x" },\n\t"categories": [],\n}\n';
    const long = `site "Long"\nvessel ${'V'.repeat(300)} title="t"\nvessel V-1 title="${'x'.repeat(200)}" mounted-on=V-9 # after\n`;
    await expect(render('trailing.json', json) + '\n' + render('long.bulk', long)).toMatchFileSnapshot(
      './__golden__/json-and-long-line.txt',
    );
  });

  it('puts the mark under the reported column, counted in characters of the line', () => {
    const out = render('three.bulk', THREE_DEFECTS).split('\n');
    const at = out.findIndex((l) => l.includes('┆ sif SIF-1'));
    const rail = out[at]!.indexOf('┆ ') + 2;
    const source = out[at]!.slice(rail);
    const mark = out[at + 1]!.slice(rail);
    expect(source.slice(mark.indexOf('‾'), mark.lastIndexOf('‾') + 1)).toBe('LT-3');
  });

  it('shows control characters as ? so an excerpt cannot move the terminal cursor', () => {
    const out = render('ctl.bulk', 'site "x"\nvessel V-1 \u001b[2J\n');
    expect(out).not.toContain('\u001b');
    expect(out).toContain('vessel V-1 ?[2J');
  });
});
