// Names every JavaScript object carries (`__proto__`, `constructor`, `toString`, ...) written where the
// user names things: each must get the same coded diagnostic as any other unknown word, never a crash.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyze, loadModelText, printBulk, printJson, renderReport, REPORT_FORMATS } from '@bulkhead/core';

const OBJECT_NAMES = [
  '__proto__',
  'constructor',
  'toString',
  'valueOf',
  'hasOwnProperty',
  'isPrototypeOf',
  '__defineGetter__',
];
const BASE = readFileSync(new URL('../../../fixtures/bad/unknown-scenario-line.bulk', import.meta.url), 'utf8').replace(
  '  layr SIF-1',
  '  layer SIF-1',
);

const codes = (file: string, text: string) =>
  loadModelText(file, text).diagnostics.map((d) => `${d.code} ${d.span?.line}:${d.span?.column}`);

describe('object property names in the places a user names things', () => {
  it('the base model is valid, so each case below has exactly one defect', () => {
    expect(loadModelText('base.bulk', BASE).diagnostics).toEqual([]);
  });

  it.each(OBJECT_NAMES)('`%s` as a statement keyword is an unknown statement (BH115)', (name) => {
    expect(codes('m.bulk', `${BASE}${name} X-1\n`)).toEqual(['BH115 21:1']);
  });

  it.each(OBJECT_NAMES)('`%s` as a scenario line is an unknown scenario line (BH115)', (name) => {
    expect(codes('m.bulk', `${BASE}  ${name} SIF-1\n`)).toEqual(['BH115 21:3']);
  });

  it.each(OBJECT_NAMES.filter((n) => !n.startsWith('_')))(
    '`%s` as an attribute key is an unknown attribute (BH118)',
    (name) => {
      expect(codes('m.bulk', BASE.replace('vessel V-1', `vessel V-1 ${name}=1`))).toEqual(['BH118 5:12']);
    },
  );

  it.each(OBJECT_NAMES)('`%s` as a JSON key of the model and of an element is an unknown field (BH203)', (name) => {
    const model = JSON.parse(printJson(loadModelText('base.bulk', BASE).model!)) as { elements: object[] };
    const top = printJson(model as never).replace('{\n', `{\n  "${name}": 1,\n`);
    expect(codes('m.json', top)).toEqual(['BH203 2:3']);
    const inner = printJson(model as never).replace('"kind": "vessel",', `"kind": "vessel", "${name}": 1,`);
    expect(loadModelText('m.json', inner).diagnostics.map((d) => d.code)).toEqual(['BH203']);
  });

  it.each(OBJECT_NAMES.filter((n) => !n.startsWith('_')))(
    '`%s` is a valid tag: loaded, analysed, printed and reported like any other',
    (name) => {
      // SARIF lists findings only, and this model has none; the other formats list every function.

      const text = BASE.replaceAll('LIC-1', name);
      const loaded = loadModelText('m.bulk', text);
      expect(loaded.diagnostics).toEqual([]);
      const analysis = analyze(loaded.model!);
      expect(analysis.assessments.map((a) => a.scenario)).toEqual(['S-1']);
      expect(printBulk(loaded.model!)).toContain(`loop ${name} `);
      for (const format of REPORT_FORMATS.filter((f) => f !== 'sarif'))
        expect(
          renderReport(
            { model: loaded.model!, analysis, file: 'm.bulk', sha256: '0'.repeat(64), toolVersion: '0.0.0' },
            format,
          ),
        ).toContain(name);
    },
  );
});
