// The .bulk language end to end through the loader: statements, values and their types, lists,
// continuation lines, escapes, spans of values, and the canonical printer keeping every comment.
import { describe, expect, it } from 'vitest';
import { loadModelText, printBulk, type Model } from '@bulkhead/core';

const BASE = `site "Test site"
category c1 tolerable=1e-4 harm=people
vessel V-1
nozzle N-1 mounted-on=V-1
transmitter LT-1 variable=level mounted-on=N-1
transmitter LT-2 variable=level mounted-on=N-1
controller C-1 system=bpcs
logic-solver SIS-1 system=sis
control-valve LV-1 fails-to=closed
shutdown-valve XV-1 fails-to=closed
loop L-1 sensors=LT-1 solver=C-1 finals=LV-1
sif SIF-1 sensors=LT-1,LT-2 sensor-voting=1oo2 solver=SIS-1 finals=XV-1 pfd=0.01
scenario SC-1 category=c1
  cause function=L-1 frequency=0.1
  layer SIF-1 pfd=0.01
`;

function loadOk(text: string, file = 'test.bulk'): Model {
  const result = loadModelText(file, text);
  expect(result.diagnostics).toEqual([]);
  return result.model!;
}

describe('reading .bulk', () => {
  it('maps statements to the model: positional tag, typed values, lists, scenario lines', () => {
    const model = loadOk(BASE);
    expect(model.site).toEqual({ name: 'Test site' });
    expect(model.categories).toEqual([{ id: 'c1', tolerable: 1e-4, harm: 'people' }]);
    expect(model.elements[2]).toEqual({ kind: 'transmitter', tag: 'LT-1', variable: 'level', mountedOn: ['N-1'] });
    expect(model.functions[1]).toMatchObject({
      kind: 'sif',
      tag: 'SIF-1',
      sensors: ['LT-1', 'LT-2'],
      sensorVoting: '1oo2',
      pfd: 0.01,
    });
    expect(model.scenarios[0]).toEqual({
      id: 'SC-1',
      category: 'c1',
      cause: { function: 'L-1', frequency: 0.1 },
      layers: [{ function: 'SIF-1', pfd: 0.01 }],
    });
  });

  it('continues a statement on indented key=value lines', () => {
    const model = loadOk(
      BASE.replace('nozzle N-1 mounted-on=V-1', 'nozzle N-1\n  mounted-on=V-1\n  title="Bridle nozzle"'),
    );
    expect(model.elements[1]).toEqual({ kind: 'nozzle', tag: 'N-1', title: 'Bridle nozzle', mountedOn: ['V-1'] });
  });

  it('reads the number forms of the language', () => {
    for (const [written, value] of [
      ['1e-4', 1e-4],
      ['0.1', 0.1],
      ['.5', 0.5],
      ['2.5E-3', 2.5e-3],
      ['+1', 1],
      ['1e+0', 1],
    ] as const) {
      const model = loadOk(BASE.replace('pfd=0.01\nscenario', `pfd=${written}\nscenario`));
      expect(model.functions[1]!.pfd).toBe(value);
    }
  });

  it('unescapes strings: quotes, backslashes, tabs, line breaks and code points', () => {
    const model = loadOk(BASE.replace('site "Test site"', 'site "a \\"b\\" c\\\\d\\te\\nf\\r\\u{1F6A7}"'));
    expect(model.site.name).toBe('a "b" c\\d\te\nf\r\u{1F6A7}');
  });

  it('keeps text with spaces, commas and # inside quotes', () => {
    const model = loadOk(BASE.replace('vessel V-1', 'vessel V-1 title="Drum #1, east side"'));
    expect(model.elements[0]!.title).toBe('Drum #1, east side');
  });

  it('treats `constructor` and `toString` as ordinary tags (no Object.prototype lookups)', () => {
    const model = loadOk(BASE.replace(/LV-1/g, 'constructor').replace(/XV-1/g, 'toString'));
    expect(model.functions[0]!.kind === 'loop' && model.functions[0]!.finals).toEqual(['constructor']);
  });

  it('rejects kind= as an attribute (the keyword is the kind)', () => {
    const result = loadModelText('t.bulk', BASE.replace('vessel V-1', 'vessel V-1 kind=pump'));
    expect(result.model).toBeUndefined();
    expect(result.diagnostics.map((d) => d.code)).toEqual(['BH118']);
  });
});

describe('spans', () => {
  it('records the position of every value, list item and statement', () => {
    const result = loadModelText('t.bulk', BASE);
    const at = (path: string) => {
      const s = result.spans.get(path);
      return s && `${s.line}:${s.column}+${s.length}`;
    };
    expect(at('elements.2')).toBe('5:13+4'); // the tag LT-1 names the statement
    expect(at('elements.2.tag')).toBe('5:13+4');
    expect(at('elements.2.variable')).toBe('5:27+5');
    expect(at('elements.2.mountedOn.0')).toBe('5:44+3');
    expect(at('functions.1.sensors')).toBe('12:19+9'); // the whole list LT-1,LT-2
    expect(at('functions.1.sensors.1')).toBe('12:24+4');
    expect(at('scenarios.0.cause')).toBe('14:3+5');
    expect(at('scenarios.0.cause.frequency')).toBe('14:32+3');
    expect(at('scenarios.0.layers.0.pfd')).toBe('15:19+4');
    expect(at('categories.0.tolerable')).toBe('2:23+4');
  });

  it('records spans for JSON values and keys too', () => {
    const json =
      '{\n  "site": { "name": "J" },\n  "categories": [],\n  "elements": [ { "kind": "vessel", "tag": "V-1" } ],\n  "functions": [],\n  "scenarios": []\n}\n';
    const result = loadModelText('t.json', json);
    expect(result.diagnostics).toEqual([]);
    expect(result.spans.get('elements.0.tag')).toEqual({ line: 4, column: 44, length: 5 });
    expect(result.spans.get('site.name#key')).toEqual({ line: 2, column: 13, length: 6 });
  });
});

describe('the canonical printer', () => {
  const COMMENTED = `# leading comment for site
site "Comment site" # trailing on site
category c1 tolerable=1e-4 harm=people

# before vessel
#
#   indented text inside a comment
vessel V-1 # vessel trailing
nozzle N-1
  mounted-on=V-1 # continuation trailing
transmitter LT-1 variable=level mounted-on=N-1
controller C-1 system=bpcs
control-valve LV-1
loop L-1 sensors=LT-1 solver=C-1 finals=LV-1
sif S-1 sensors=LT-1 solver=C-1 finals=LV-1
scenario SC-1 category=c1 # scenario trailing
  # inside scenario, before cause
  cause function=L-1 frequency=0.1
  # before layer
  layer S-1 pfd=0.1 # layer trailing
# end of file 1
#end of file 2, no space
`;

  it('keeps every comment: leading, trailing, on continuation lines, inside scenarios, at the end', () => {
    const model = loadOk(COMMENTED);
    expect(model.site.comments).toEqual([' leading comment for site']);
    expect(model.site.trailingComment).toBe(' trailing on site');
    expect(model.elements[0]!.comments).toEqual([' before vessel', '', '   indented text inside a comment']);
    expect(model.elements[1]!.trailingComment).toBe(' continuation trailing');
    expect(model.scenarios[0]!.trailingComment).toBe(' scenario trailing');
    expect(model.scenarios[0]!.cause.comments).toEqual([' inside scenario, before cause']);
    expect(model.scenarios[0]!.layers![0]!.comments).toEqual([' before layer']);
    expect(model.scenarios[0]!.layers![0]!.trailingComment).toBe(' layer trailing');
    expect(model.endComments).toEqual([' end of file 1', 'end of file 2, no space']);
    const printed = printBulk(model);
    for (const line of COMMENTED.split('\n').filter((l) => l.includes('#'))) {
      expect(printed).toContain(line.slice(line.indexOf('#')));
    }
    expect(loadOk(printed)).toEqual(model);
  });

  it('prints canonical text: one line a statement, sections apart, scenario lines indented', () => {
    expect(printBulk(loadOk(COMMENTED))).toBe(`# leading comment for site
site "Comment site" # trailing on site
category c1 tolerable=1e-4 harm=people

# before vessel
#
#   indented text inside a comment
vessel V-1 # vessel trailing
nozzle N-1 mounted-on=V-1 # continuation trailing
transmitter LT-1 variable=level mounted-on=N-1
controller C-1 system=bpcs
control-valve LV-1

loop L-1 sensors=LT-1 solver=C-1 finals=LV-1
sif S-1 sensors=LT-1 solver=C-1 finals=LV-1

scenario SC-1 category=c1 # scenario trailing
  # inside scenario, before cause
  cause function=L-1 frequency=0.1
  # before layer
  layer S-1 pfd=0.1 # layer trailing

# end of file 1
#end of file 2, no space
`);
  });

  it('is idempotent: formatting formatted text changes nothing', () => {
    for (const text of [BASE, COMMENTED]) {
      const once = printBulk(loadOk(text));
      expect(printBulk(loadOk(once))).toBe(once);
    }
  });

  it('orders attributes by the schema, whatever order they were written in', () => {
    const a = printBulk(
      loadOk(
        BASE.replace(
          'transmitter LT-1 variable=level mounted-on=N-1',
          'transmitter LT-1 mounted-on=N-1 variable=level',
        ),
      ),
    );
    expect(a).toContain('transmitter LT-1 variable=level mounted-on=N-1\n');
  });

  it('quotes what a bare word cannot hold and escapes control characters', () => {
    const model = loadOk(BASE);
    model.site.name = 'tab\there "q" back\\slash \r\n \u0001 \ud800 end';
    model.elements[0]!.title = 'plain';
    const printed = printBulk(model);
    expect(printed).toContain('site "tab\\there \\"q\\" back\\\\slash \\r\\n \\u{1} \\u{d800} end"');
    expect(printed.split('\n')[0]).toMatch(/^site /); // no raw line break inside the string
    expect(loadOk(printed).site.name).toBe(model.site.name);
  });

  it('prints small numbers in exponent form and reads them back exactly', () => {
    const model = loadOk(BASE);
    for (const n of [1e-9, 1e-4, 0.001, 0.1, 0.3, 1, 1e21, 1 / 3, 2.5e-7, 123456.789]) {
      model.categories[0]!.tolerable = n;
      const printed = printBulk(model);
      expect(loadOk(printed).categories[0]!.tolerable).toBe(n);
    }
    model.categories[0]!.tolerable = 1e-9;
    expect(printBulk(model)).toContain('tolerable=1e-9 ');
  });
});
