// Checks the exported JSON Schema with a general-purpose validator (ajv, draft 2020-12): the demo JSON
// twins pass, broken twins fail, and the schema itself is pinned so a zod upgrade that changes it shows.
import { readFileSync } from 'node:fs';
import Ajv2020 from 'ajv/dist/2020.js';
import { describe, expect, it } from 'vitest';
import { modelJsonSchema } from '@bulkhead/core';
import { runCli } from '../../helpers/cli.ts';

const DEMO = new URL('../../../fixtures/demo/', import.meta.url);
type Json = Record<string, unknown> & {
  elements: Record<string, unknown>[];
  categories: Record<string, unknown>[];
  scenarios: Record<string, unknown>[];
};

function demo(file = 'marrow-fen.json'): Json {
  return JSON.parse(readFileSync(new URL(file, DEMO), 'utf8')) as Json;
}

function validator() {
  const ajv = new Ajv2020({ allErrors: true, strict: false });
  return ajv.compile(modelJsonSchema());
}

describe('the JSON Schema of a model', () => {
  it('is a draft 2020-12 schema that ajv compiles in strict mode', () => {
    const schema = modelJsonSchema();
    expect(schema.$schema).toBe('https://json-schema.org/draft/2020-12/schema');
    // Strict mode rejects unknown keywords and other sloppiness in the schema itself.
    expect(() => new Ajv2020({ strict: true, allowMatchingProperties: true }).compile(schema)).not.toThrow();
  });

  it.each(['marrow-fen.json', 'marrow-fen-rev-b.json'])('accepts the demo twin %s', (file) => {
    const validate = validator();
    const ok = validate(demo(file));
    expect(validate.errors ?? []).toEqual([]);
    expect(ok).toBe(true);
  });

  const broken: [string, (m: Json) => void, string][] = [
    ['an enum value outside the list', (m) => (m.categories[0]!.harm = 'persons'), 'enum'],
    ['a missing required field', (m) => delete m.elements[0]!.tag, 'required'],
    ['an unknown element kind', (m) => (m.elements[0]!.kind = 'vesel'), 'oneOf'],
    ['an unknown field', (m) => (m.elements[0]!.colour = 'red'), 'additionalProperties'],
    ['a number given as text', (m) => (m.categories[0]!.tolerable = '1e-4'), 'type'],
    [
      'an empty list of sensors',
      (m) => ((m as unknown as { functions: { sensors: unknown[] }[] }).functions[0]!.sensors = []),
      'minItems',
    ],
    ['a comment with a line break', (m) => (m.elements[0]!.comments = ['one\ntwo']), 'pattern'],
    ['no site', (m) => delete m.site, 'required'],
  ];
  it.each(broken)('rejects a twin with %s', (_, breakIt, keyword) => {
    const model = demo();
    breakIt(model);
    const validate = validator();
    expect(validate(model)).toBe(false);
    expect((validate.errors ?? []).map((e) => e.keyword)).toContain(keyword);
  });

  it('agrees with the loader on the broken twins (both reject)', async () => {
    const { loadModelText } = await import('@bulkhead/core');
    for (const [, breakIt] of broken) {
      const model = demo();
      breakIt(model);
      expect(loadModelText('broken.json', JSON.stringify(model)).model).toBeUndefined();
    }
  });

  it('is what `bulkhead schema` prints', async () => {
    const r = await runCli(['schema']);
    expect(r.code).toBe(0);
    expect(JSON.parse(r.stdout)).toEqual(modelJsonSchema());
  });

  it('matches the pinned copy (a zod upgrade that changes the schema must update it on purpose)', async () => {
    await expect(JSON.stringify(modelJsonSchema(), null, 2) + '\n').toMatchFileSnapshot(
      './__snapshots__/model.schema.json',
    );
  });
});
