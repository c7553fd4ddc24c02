// Cut sets on the demo revisions, each expectation reasoned by hand from the .bulk text (line numbers of
// fixtures/demo/marrow-fen.bulk in brackets).
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadModelText, analyze, modelCutSets, type Model } from '../../../packages/core/src/index.ts';

function demo(name: string): Model {
  const loaded = loadModelText(name, readFileSync(new URL(`../../../fixtures/demo/${name}`, import.meta.url)));
  return loaded.model!;
}
const setsOf = (model: Model, scenario: string, maxOrder = 2) =>
  modelCutSets(model, { maxOrder, findings: analyze(model).findings }).find((s) => s.scenario === scenario)!;
const names = (s: ReturnType<typeof setsOf>) => s.cutSets.map((c) => c.elements.join('+'));

describe('cut sets of demo revision A', () => {
  const a = demo('marrow-fen.bulk');

  it('S-101: a plugged BR-101 with LT-103 failed starts the overfill and defeats both layers', () => {
    // LT-101 (LIC-101's sensor) and LT-102 (SIF-101's only sensor) sit on BR-101 [65-66]; LT-103 is LAH-101's only sensor [67, 125].
    const s = setsOf(a, 'S-101');
    expect(names(s)).toContain('BR-101+LT-103');
    const set = s.cutSets.find((c) => c.elements.join('+') === 'BR-101+LT-103')!;
    expect(set.paths).toEqual([
      { element: 'BR-101', party: 'cause', path: ['LIC-101', 'LT-101', 'BR-101'] },
      { element: 'BR-101', party: 'SIF-101', path: ['SIF-101', 'LT-102', 'BR-101'] },
      { element: 'LT-103', party: 'LAH-101', path: ['LAH-101', 'LT-103'] },
    ]);
    expect(set.findings).toContain('shared-bridle:S-101:LIC-101+SIF-101:BR-101');
  });

  it('S-101: UPS-1 alone is no cut set, since SIF-101 trips on its loss, but UPS-1 with LT-102 is', () => {
    // UPS-1 feeds BPCS-C1 (cause and LAH-101) and SIS-1 [24-26, 37-39]; SIF-101 is de-energise-to-trip with
    // valves that fail closed, so losing UPS-1 trips it (the rule shared-support gives a note).
    const s = setsOf(a, 'S-101');
    expect(s.cutSets.filter((c) => c.elements.length === 1)).toEqual([]);
    const pair = s.cutSets.find((c) => c.elements.join('+') === 'LT-102+UPS-1')!;
    expect(pair.findings).toContain('shared-support:S-101:LAH-101+SIF-101:UPS-1');
  });

  it('S-103 at order 3: one thermowell under both SIF-301 channels defeats the 1oo2 group', () => {
    // TT-302A and TT-302B both sit on TW-302 [104-105]; AI-1-03 carries TIC-301's sensor TT-301 [103]; TT-304 is TAH-304's sensor [106].
    expect(names(setsOf(a, 'S-103', 3))).toContain('AI-1-03+TT-304+TW-302');
  });

  it('S-104: an external cause has no element that starts it, so no cut set', () => {
    const s = setsOf(a, 'S-104');
    expect(s).toMatchObject({ noStartingElement: true, cutSets: [] });
  });
});

describe('cut sets of demo revision B (the mistakes designed out)', () => {
  const b = demo('marrow-fen-rev-b.bulk');

  it('has no single point of failure and no pair in any scenario', () => {
    for (const s of modelCutSets(b)) expect([s.scenario, s.cutSets]).toEqual([s.scenario, []]);
  });

  it('S-103: with a thermowell each, TW-302 is in no set of three (both channels must now fail)', () => {
    const s = setsOf(b, 'S-103', 3);
    expect(s.cutSets.length).toBeGreaterThan(0);
    expect(names(s).filter((n) => n.split('+').includes('TW-302'))).toEqual([]);
  });
});
