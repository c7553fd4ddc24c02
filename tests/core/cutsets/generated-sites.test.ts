// Cut sets from the real pipeline (text -> model -> graph -> traces -> tree -> MOCUS) against brute force
// on 500 seeded generated small sites. The brute force is written apart from the tree builder: it asks,
// for every set of at most two elements, whether the graph lets their failure start the scenario and
// defeat every layer (a layer: its solver's reach, or N-M+1 voted channels' reach), then keeps the
// minimal sets. Failure direction is kept out of these sites (valves fail in place, no drives-to).
import { describe, expect, it } from 'vitest';
import {
  buildPlantGraph,
  loadModelText,
  minimalSets,
  modelCutSets,
  Tracer,
  type Model,
} from '../../../packages/core/src/index.ts';
import { generatedSite } from '../../helpers/generated-site.ts';

/** Minimal sets of at most two elements whose failure starts S-1 and defeats each layer, by trying them all. */
function bruteForceCutSets(model: Model): string[][] {
  const tracer = new Tracer(buildPlantGraph(model));
  const basic = model.elements.map((e) => e.tag).filter((t) => tracer.group(t) !== 'equipment');
  const reach = (tag: string) => tracer.closure(tag);
  const hit = (tag: string, failed: ReadonlySet<string>) => [...reach(tag)].some((t) => failed.has(t));
  const fns = new Map(model.functions.map((f) => [f.tag, f]));
  const defeatedGroup = (heads: string[], voting: string | undefined, failed: ReadonlySet<string>) => {
    const [m, n] = voting ? voting.split('oo').map(Number) : [heads.length, heads.length];
    return heads.filter((h) => hit(h, failed)).length >= n! - m! + 1;
  };
  const scenario = model.scenarios[0]!;
  const occurs = (failed: ReadonlySet<string>) => {
    const loop = fns.get('LIC-1') as { sensors: string[]; solver: string; finals: string[] };
    const started = [...loop.sensors, loop.solver, ...loop.finals].some((t) => hit(t, failed));
    return (
      started &&
      (scenario.layers ?? []).every((claim) => {
        const f = fns.get(claim.function) as {
          solver: string;
          sensors: string[];
          finals: string[];
          sensorVoting?: string;
          finalVoting?: string;
        };
        return (
          hit(f.solver, failed) ||
          defeatedGroup(f.sensors, f.sensorVoting, failed) ||
          defeatedGroup(f.finals, f.finalVoting, failed)
        );
      })
    );
  };
  const found: string[][] = [];
  for (let i = 0; i < basic.length; i++) {
    if (occurs(new Set([basic[i]!]))) found.push([basic[i]!]);
    for (let j = i + 1; j < basic.length; j++)
      if (occurs(new Set([basic[i]!, basic[j]!]))) found.push([basic[i]!, basic[j]!]);
  }
  return minimalSets(found);
}

describe('cut sets of generated small sites against brute force', () => {
  it('match on 500 seeded sites at order 2, and the sites are not trivial', () => {
    const mismatches: string[] = [];
    let singles = 0;
    let pairs = 0;
    for (let seed = 1; seed <= 500; seed++) {
      const loaded = loadModelText('generated.bulk', generatedSite(seed));
      if (!loaded.model) throw new Error(`seed ${seed}: ${loaded.diagnostics.map((d) => d.message).join('; ')}`);
      const fast = modelCutSets(loaded.model, { maxOrder: 2 })[0]!.cutSets.map((c) => c.elements);
      const slow = bruteForceCutSets(loaded.model);
      if (JSON.stringify(fast) !== JSON.stringify(slow))
        mismatches.push(`seed ${seed}: ${JSON.stringify(fast)} vs ${JSON.stringify(slow)}`);
      singles += slow.filter((s) => s.length === 1).length;
      pairs += slow.filter((s) => s.length === 2).length;
    }
    expect(mismatches.slice(0, 5)).toEqual([]);
    // Both kinds occur often enough that the comparison means something.
    expect(singles).toBeGreaterThan(100);
    expect(pairs).toBeGreaterThan(1000);
  });
});
