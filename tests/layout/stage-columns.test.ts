// The scenario sheet in stage columns: each box in its stage's column, stages left to right in loop
// order, chains stacked down a column, square-cornered routes from the relying box to the box relied
// on that never run through a box, crossings counted right, and a sheet that holds still across a
// save that changes one figure. Checked on the demo and on generated sites (invented data).
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyze, type Model } from '@bulkhead/core';
import {
  countCrossings,
  layoutStageColumns,
  PARTITIONS,
  scenarioScene,
  STAGES,
  type Drawing,
  type DrawnBox,
  type Point,
} from '@bulkhead/layout';
import { generateSite, generateWideScenario } from '../../bench/site-generator.ts';
import { demo, small } from './fixtures.ts';

function sheets(model: Model): Map<string, { drawing: Drawing; partition: Map<string, number> }> {
  const analysis = analyze(model);
  const out = new Map<string, { drawing: Drawing; partition: Map<string, number> }>();
  for (const s of model.scenarios) {
    const scene = scenarioScene(model, analysis, s.id);
    out.set(s.id, {
      drawing: layoutStageColumns(scene),
      partition: new Map(scene.nodes.map((n) => [n.id, n.partition])),
    });
  }
  return out;
}

const onBorder = (p: Point, b: DrawnBox) =>
  (p.x >= b.x - 0.5 &&
    p.x <= b.x + b.width + 0.5 &&
    (Math.abs(p.y - b.y) < 0.6 || Math.abs(p.y - b.y - b.height) < 0.6)) ||
  (p.y >= b.y - 0.5 &&
    p.y <= b.y + b.height + 0.5 &&
    (Math.abs(p.x - b.x) < 0.6 || Math.abs(p.x - b.x - b.width) < 0.6));

/** A segment that enters a box's inside (1 px in from its border). */
function throughBox(a: Point, b: Point, box: DrawnBox): boolean {
  const [x1, x2] = [Math.min(a.x, b.x), Math.max(a.x, b.x)];
  const [y1, y2] = [Math.min(a.y, b.y), Math.max(a.y, b.y)];
  return x2 > box.x + 1 && x1 < box.x + box.width - 1 && y2 > box.y + 1 && y1 < box.y + box.height - 1;
}

/** Every geometric promise of a sheet; returns the broken ones as readable lines. */
function problems(d: Drawing, partition: Map<string, number>): string[] {
  const out: string[] = [];
  const boxes = new Map(d.boxes.map((b) => [b.id, b]));
  const stageIndex = (id: string) => STAGES.findIndex((s) => s.partitions.includes(partition.get(id)!));
  const stages = d.stages ?? [];
  for (const b of d.boxes) {
    const band = stages.find((s) => s.label === STAGES[stageIndex(b.id)]!.label);
    if (!band || b.x < band.x || b.x + b.width > band.x + band.width) out.push(`${b.id} outside its stage column`);
    if (b.x < 0 || b.y < 0 || b.x + b.width > d.width || b.y + b.height > d.height) out.push(`${b.id} off the sheet`);
    for (const o of d.boxes)
      if (
        o.id < b.id &&
        !(b.x + b.width <= o.x || o.x + o.width <= b.x || b.y + b.height <= o.y || o.y + o.height <= b.y)
      )
        out.push(`${b.id} overlaps ${o.id}`);
  }
  for (let i = 1; i < stages.length; i++)
    if (stages[i]!.x <= stages[i - 1]!.x + stages[i - 1]!.width) out.push(`${stages[i]!.label} not right of the last`);
  const order = stages.map((s) => STAGES.findIndex((x) => x.label === s.label));
  if (order.some((v, i) => i > 0 && v <= order[i - 1]!)) out.push(`stages out of order: ${order.join(',')}`);
  for (const e of d.edges)
    for (const lane of e.lanes) {
      const p = lane.points;
      if (!onBorder(p[0]!, boxes.get(e.source)!)) out.push(`${e.id} does not start on ${e.source}`);
      if (!onBorder(p[p.length - 1]!, boxes.get(e.target)!)) out.push(`${e.id} does not end on ${e.target}`);
      for (let i = 1; i < p.length; i++) {
        if (p[i]!.x !== p[i - 1]!.x && p[i]!.y !== p[i - 1]!.y) out.push(`${e.id} has a slanted run`);
        for (const box of d.boxes) if (throughBox(p[i - 1]!, p[i]!, box)) out.push(`${e.id} runs through ${box.id}`);
      }
    }
  return out;
}

describe('the scenario sheet in stage columns', () => {
  const { model } = demo();
  const demoSheets = sheets(model);

  for (const s of model.scenarios)
    it(`keeps every promise of the sheet in demo scenario ${s.id}`, () => {
      const { drawing, partition } = demoSheets.get(s.id)!;
      expect(problems(drawing, partition)).toEqual([]);
    });

  it('reads left to right as the loop does: process, sensors, signals in, solvers, signals out, finals, supports', () => {
    const d = demoSheets.get('S-101')!.drawing;
    expect(d.stages!.map((s) => s.label)).toEqual(STAGES.map((s) => s.label));
    const x = (tag: string) => d.boxes.find((b) => b.tag === tag)!.x;
    expect(x('V-101')).toBeLessThan(x('LT-101'));
    expect(x('LT-101')).toBeLessThan(x('AI-1-03'));
    expect(x('AI-1-03')).toBeLessThan(x('SIS-1'));
    expect(x('SIS-1')).toBeLessThan(x('DO-S-01'));
    expect(x('DO-S-01')).toBeLessThan(x('XV-101'));
    expect(x('XV-101')).toBeLessThan(x('UPS-1'));
  });

  it('stacks a chain down its column: the function over its solver, the bridle over its nozzles over the vessel', () => {
    const d = demoSheets.get('S-101')!.drawing;
    const box = (tag: string) => d.boxes.find((b) => b.tag === tag)!;
    const sif = box('SIF-101');
    const solver = box('SIS-1');
    expect(sif.y + sif.height).toBeLessThan(solver.y);
    const link = d.edges.find((e) => e.source === 'SIF-101' && e.target === 'SIS-1')!;
    expect(link.lanes[0]!.points).toEqual([
      { x: sif.x + sif.width / 2, y: sif.y + sif.height },
      { x: solver.x + solver.width / 2, y: solver.y },
    ]);
    expect(box('BR-101').y).toBeLessThan(box('N-101A').y);
    expect(box('N-101A').y).toBeLessThan(box('V-101').y);
  });

  it('holds every box still across a save that changes one claimed PFD', () => {
    const { model: edited } = small(demoText().replace('layer SIF-101 pfd=0.005', 'layer SIF-101 pfd=0.004'));
    const again = sheets(edited).get('S-101')!.drawing;
    const before = demoSheets.get('S-101')!.drawing;
    expect(again.boxes.map((b) => [b.id, b.x, b.y])).toEqual(before.boxes.map((b) => [b.id, b.x, b.y]));
    // The edit did reach the model (the claim is not drawn, so the sheet may rightly be identical).
    const claim = (m: Model) =>
      m.scenarios.find((x) => x.id === 'S-101')!.layers!.find((l) => l.function === 'SIF-101')!.pfd;
    expect([claim(model), claim(edited)]).toEqual([0.005, 0.004]);
  });

  it('keeps every promise on every scenario of a generated 1,000-element site (invented)', () => {
    const site = sheets(generateSite(1000));
    expect(site.size).toBeGreaterThan(10);
    for (const [id, { drawing, partition }] of site) expect(problems(drawing, partition), id).toEqual([]);
  });

  it('keeps every promise on a focused scenario of about 300 boxes (invented)', () => {
    const wide = sheets(generateWideScenario(300));
    for (const [id, { drawing, partition }] of wide) {
      expect(drawing.boxes.length).toBeGreaterThan(250);
      expect(problems(drawing, partition), id).toEqual([]);
    }
  });

  it('names a stage for every partition the scene uses', () => {
    const named = STAGES.flatMap((s) => s.partitions).sort((a, b) => a - b);
    expect(named).toEqual([...new Set(Object.values(PARTITIONS))].sort((a, b) => a - b));
  });
});

function demoText(): string {
  return readFileSync(new URL('../../fixtures/demo/marrow-fen.bulk', import.meta.url), 'utf8');
}

describe('countCrossings', () => {
  /** A route from x, y pairs. */
  const route = (...xy: number[]): Point[] =>
    Array.from({ length: xy.length / 2 }, (_, i) => ({ x: xy[2 * i]!, y: xy[2 * i + 1]! }));
  const cases: { name: string; routes: Record<string, Point[]>; crossings: number }[] = [
    { name: 'a plus sign', routes: { a: route(0, 5, 10, 5), b: route(5, 0, 5, 10) }, crossings: 1 },
    { name: 'a T (one ends on the other)', routes: { a: route(0, 5, 10, 5), b: route(5, 0, 5, 5) }, crossings: 0 },
    { name: 'parallel runs', routes: { a: route(0, 5, 10, 5), b: route(0, 7, 10, 7) }, crossings: 0 },
    { name: 'one route turning over itself', routes: { a: route(0, 5, 10, 5, 10, 0, 5, 0, 5, 10) }, crossings: 0 },
    {
      name: 'a square-cornered route crossing two runs',
      routes: { a: route(0, 0, 6, 0, 6, 10, 12, 10), b: route(3, 5, 9, 5), c: route(9, 2, 9, 12) },
      crossings: 2,
    },
  ];
  for (const c of cases)
    it(`counts ${c.crossings} for ${c.name}`, () => {
      expect(countCrossings(new Map(Object.entries(c.routes)))).toBe(c.crossings);
    });
});
