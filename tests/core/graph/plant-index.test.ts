// The plant index the analysis walks (graph/plant-index.ts) must hold exactly the public graphology graph
// (graph/plant-graph.ts): the same nodes, and each node's edges in the order a walk of the graph meets
// them, so that traces and the paths they show are the same whichever of the two is walked. The order of
// a graph's edges is graphology's (keyed by target, array-index keys first, newest edge first per target):
// graphology 0.26 source, EdgeData.attachMulti and forEachMulti, and ECMA-262 OrdinaryOwnPropertyKeys.
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { buildPlantGraph, loadModelText, PlantIndex, Tracer, type Model } from '@bulkhead/core';
import { validModel } from '../bulk/model-arbitrary.ts';

/** The index as plain data: each node with its attributes and its edges in order. */
function dump(index: PlantIndex): unknown[] {
  return index.tags.map((tag, n) => ({
    tag,
    kind: index.kinds[n],
    group: index.groups[n],
    supply: index.supplies[n],
    edges: Array.from({ length: index.edgeStart[n + 1]! - index.edgeStart[n]! }, (_, k) => {
      const e = index.edgeStart[n]! + k;
      return [index.tags[index.edgeTarget[e]!], index.edgeRole[e], index.edgeChannel[e]];
    }),
  }));
}

const same = (model: Model) =>
  expect(dump(PlantIndex.ofModel(model))).toEqual(dump(PlantIndex.ofGraph(buildPlantGraph(model))));

/** Every string of the model that is a tag, renamed (other strings stay). */
function renamed(model: Model, name: (tag: string) => string): Model {
  const tags = new Set([...model.elements.map((e) => e.tag), ...model.functions.map((f) => f.tag)]);
  const walk = (v: unknown): unknown =>
    typeof v === 'string'
      ? tags.has(v)
        ? name(v)
        : v
      : Array.isArray(v)
        ? v.map(walk)
        : v && typeof v === 'object'
          ? Object.fromEntries(Object.entries(v).map(([k, x]) => [k, walk(x)]))
          : v;
  return walk(model) as Model;
}

describe('the plant index', () => {
  it('holds the graph of each demo model, edge for edge in walk order', () => {
    for (const file of ['marrow-fen.bulk', 'marrow-fen-rev-b.bulk']) {
      const loaded = loadModelText(file, readFileSync(new URL(`../../../fixtures/demo/${file}`, import.meta.url)));
      same(loaded.model!);
    }
  });

  it('holds the graph of random models, tags that read as numbers included', () => {
    fc.assert(
      fc.property(validModel, fc.array(fc.nat(400), { minLength: 60, maxLength: 60 }), (model, numbers) => {
        same(model);
        // Some tags renamed to numbers: object keys that JavaScript puts first, in numeric order ("9" before "10").
        const tags = [...model.elements.map((e) => e.tag), ...model.functions.map((f) => f.tag)];
        const names = new Map(
          tags.map((t, i) => [t, i % 3 === 0 ? String(numbers[i % numbers.length]! * 100 + i) : t]),
        );
        same(renamed(model, (t) => names.get(t)!));
      }),
      { numRuns: 60 },
    );
  });

  it('keeps two links to one element, and a function using one element twice, in walk order', () => {
    const model = {
      site: { name: 'Index site (invented)' },
      categories: [],
      scenarios: [],
      elements: [
        { kind: 'ups', tag: '9' },
        { kind: 'ups', tag: '10' },
        { kind: 'cabinet', tag: 'CAB-1' },
        {
          kind: 'transmitter',
          tag: 'LT-1',
          variable: 'level',
          poweredBy: ['10', 'CAB-1', '9'],
          housedIn: ['CAB-1', '9'],
          signalVia: ['NOT-DEFINED'],
        },
      ],
      functions: [{ kind: 'loop', tag: 'LC-1', sensors: ['LT-1'], solver: 'LT-1', finals: ['LT-1'] }],
    } as unknown as Model;
    same(model);
    const edges = dump(PlantIndex.ofModel(model))[3] as { edges: unknown[] };
    // "9" and "10" first in numeric order; per target the role sorted last comes first; unknown tags dropped.
    expect(edges.edges).toEqual([
      ['9', 'poweredBy', -1],
      ['9', 'housedIn', -1],
      ['10', 'poweredBy', -1],
      ['CAB-1', 'poweredBy', -1],
      ['CAB-1', 'housedIn', -1],
    ]);
    expect(new Tracer(PlantIndex.ofModel(model)).traceFunction('LC-1')).toEqual(
      new Tracer(buildPlantGraph(model)).traceFunction('LC-1'),
    );
  });

  it('refuses a model with a repeated tag, as the graph does', () => {
    const model = {
      site: { name: 'x' },
      categories: [],
      scenarios: [],
      functions: [],
      elements: [
        { kind: 'ups', tag: 'U' },
        { kind: 'ups', tag: 'U' },
      ],
    } as unknown as Model;
    expect(() => buildPlantGraph(model)).toThrow();
    expect(() => PlantIndex.ofModel(model)).toThrow(/two nodes tagged U/);
  });

  it('gives the graph it was read from, and builds the graph of a model only when asked', () => {
    const loaded = loadModelText(
      'marrow-fen.bulk',
      readFileSync(new URL('../../../fixtures/demo/marrow-fen.bulk', import.meta.url)),
    );
    const graph = buildPlantGraph(loaded.model!);
    expect(new Tracer(graph).graph).toBe(graph);
    const tracer = Tracer.ofModel(loaded.model!);
    expect(tracer.graph.order).toBe(graph.order);
    expect(tracer.graph.size).toBe(graph.size);
    expect(tracer.graph).toBe(tracer.graph);
  });
});
