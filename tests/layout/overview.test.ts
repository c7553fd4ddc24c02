// The site overview: process units and the solvers their functions use, grouped by system, and for a
// 5,000-element site a bounded number of nodes with a note saying what is left out.
import { describe, expect, it } from 'vitest';
import { analyze } from '@bulkhead/core';
import { OVERVIEW_NODE_LIMIT, siteOverview } from '@bulkhead/layout';
import { layoutScene } from '@bulkhead/layout/elk';
import { generateSite } from '../../bench/site-generator.ts';
import { demo } from './fixtures.ts';

describe('siteOverview', () => {
  it('should show each unit the functions measure and each solver, by system', async () => {
    const { model, analysis } = demo();
    const scene = siteOverview(model, analysis);
    expect(scene.nodes.map((n) => n.id)).toEqual(['BPCS-C1', 'BPCS-C2', 'C-201', 'R-301', 'SIS-1', 'V-101']);
    expect(scene.clusters.map((c) => [c.label, c.children])).toEqual([
      ['BPCS', ['BPCS-C1', 'BPCS-C2']],
      ['SIS', ['SIS-1']],
    ]);
    expect(scene.notes).toEqual([]);
    const drawing = await layoutScene(scene);
    for (const c of drawing.clusters) {
      const kids = drawing.boxes.filter((b) => scene.clusters.find((x) => x.id === c.id)!.children.includes(b.id));
      for (const b of kids)
        expect(
          b.x >= c.x && b.y >= c.y && b.x + b.width <= c.x + c.width && b.y + b.height <= c.y + c.height,
          `${b.id} in ${c.label}`,
        ).toBe(true);
    }
  });

  it('should count open findings on the units they touch', () => {
    const { model, analysis } = demo();
    const scene = siteOverview(model, analysis);
    const open = (scenario: string) =>
      analysis.findings.filter((f) => f.scenario === scenario && f.severity !== 'note' && !f.accepted).length;
    expect(scene.nodes.find((n) => n.id === 'V-101')!.findingCount).toBe(open('S-101'));
  });

  it('should keep a 5,000-element site (invented) within the node limit and say what it left out', () => {
    const model = generateSite(5000);
    expect(model.elements.length).toBeGreaterThanOrEqual(5000);
    const scene = siteOverview(model, analyze(model));
    expect(scene.nodes.length).toBeLessThanOrEqual(OVERVIEW_NODE_LIMIT);
    expect(scene.notes.join(' ')).toMatch(/are not drawn/);
    const ids = new Set(scene.nodes.map((n) => n.id));
    for (const e of scene.edges) expect(ids.has(e.source) && ids.has(e.target)).toBe(true);
    // Every unit drawn keeps all the solvers it uses.
    const units = scene.nodes.filter((n) => n.group === 'equipment');
    expect(units.length).toBeGreaterThan(0);
    for (const u of units) expect(scene.edges.some((e) => e.source === u.id)).toBe(true);
  });
});
