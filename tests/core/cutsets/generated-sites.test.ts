// Cut sets from the real pipeline (text -> model -> graph -> traces -> tree -> MOCUS) against brute force
// on 500 seeded generated small sites. The brute force is written apart from the tree builder: it asks,
// for every set of at most two elements, whether the graph lets their failure start the scenario and
// defeat every layer (a layer: its solver's reach, or N-M+1 voted channels' reach), then keeps the
// minimal sets. Failure direction is kept out of these sites (valves fail in place, no drives-to).
import { describe, expect, it } from 'vitest';
import { buildPlantGraph, loadModelText, minimalSets, modelCutSets, Tracer, type Model } from '../../../packages/core/src/index.ts';
import { Random } from '../../helpers/random.ts';

function generatedSite(seed: number): string {
  const r = new Random(seed);
  const pick = <T,>(items: readonly T[]) => r.pick(items);
  const lines = [
    'site "Generated test site"',
    'category loss title="Loss" tolerable=1e-4 harm=asset',
    'ups UPS-1',
    'ups UPS-2',
    'air-header IA-1',
  ];
  const circuits = ['CKT-1', 'CKT-2'];
  for (const c of circuits) lines.push(`circuit ${c} powered-by=${pick(['UPS-1', 'UPS-2'])}`);
  lines.push('cabinet CAB-1', 'cabinet CAB-2');
  lines.push(`controller BPCS-1 system=bpcs powered-by=${pick(circuits)} housed-in=${pick(['CAB-1', 'CAB-2'])}`);
  lines.push(`logic-solver SIS-1 system=sis powered-by=${pick(circuits)} housed-in=${pick(['CAB-1', 'CAB-2'])}`);
  const cards = ['AI-1', 'AI-2', 'AI-S1', 'AI-S2'];
  for (const card of cards) lines.push(`io-card ${card} signal-via=${card.includes('S') ? 'SIS-1' : 'BPCS-1'} powered-by=${pick(circuits)}`);
  lines.push('io-card DO-1 signal-via=BPCS-1 powered-by=' + pick(circuits), 'io-card DO-S1 signal-via=SIS-1 powered-by=' + pick(circuits));
  lines.push('vessel V-1', 'line L-1');
  const nozzles = ['N-1', 'N-2', 'N-3'];
  for (const n of nozzles) lines.push(`nozzle ${n} mounted-on=V-1`);
  const transmitters = ['T-1', 'T-2', 'T-3', 'T-4'];
  for (const t of transmitters) lines.push(`transmitter ${t} variable=level supply=from-signal mounted-on=${pick(nozzles)} signal-via=${pick(cards)}`);
  lines.push(`control-valve CV-1 fails-to=in-place mounted-on=L-1 signal-via=DO-1 air-from=IA-1`);
  const valves = ['XV-1', 'XV-2'];
  for (const v of valves) lines.push(`shutdown-valve ${v} fails-to=in-place mounted-on=L-1 signal-via=${pick(['DO-S1', 'DO-1'])} air-from=IA-1`);
  const [a, b, c] = r.shuffle(transmitters);
  lines.push(`loop LIC-1 sensors=${a} solver=BPCS-1 finals=CV-1`);
  const sifVoting = pick(['1oo2', '2oo2']);
  const finals = r.next() < 0.5 ? `finals=XV-1` : `finals=XV-1,XV-2 final-voting=${pick(['1oo2', '2oo2'])}`;
  lines.push(`sif SIF-1 sensors=${b},${c} sensor-voting=${sifVoting} solver=SIS-1 ${finals} trip=close trip-mode=energise sil=1 pfd=0.05`);
  lines.push(`trip TR-1 sensors=${pick(transmitters)} solver=${pick(['SIS-1', 'BPCS-1'])} finals=${pick(valves)} trip=close trip-mode=energise pfd=0.1`);
  lines.push('scenario S-1 title="Generated" category=loss', '  cause function=LIC-1 frequency=0.1 basis="generated"', '  layer SIF-1 pfd=0.05 basis="generated"');
  if (r.next() < 0.7) lines.push('  layer TR-1 pfd=0.1 basis="generated"');
  return lines.join('\n') + '\n';
}

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
        const f = fns.get(claim.function) as { solver: string; sensors: string[]; finals: string[]; sensorVoting?: string; finalVoting?: string };
        return hit(f.solver, failed) || defeatedGroup(f.sensors, f.sensorVoting, failed) || defeatedGroup(f.finals, f.finalVoting, failed);
      })
    );
  };
  const found: string[][] = [];
  for (let i = 0; i < basic.length; i++) {
    if (occurs(new Set([basic[i]!]))) found.push([basic[i]!]);
    for (let j = i + 1; j < basic.length; j++) if (occurs(new Set([basic[i]!, basic[j]!]))) found.push([basic[i]!, basic[j]!]);
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
      if (JSON.stringify(fast) !== JSON.stringify(slow)) mismatches.push(`seed ${seed}: ${JSON.stringify(fast)} vs ${JSON.stringify(slow)}`);
      singles += slow.filter((s) => s.length === 1).length;
      pairs += slow.filter((s) => s.length === 2).length;
    }
    expect(mismatches.slice(0, 5)).toEqual([]);
    // Both kinds occur often enough that the comparison means something.
    expect(singles).toBeGreaterThan(100);
    expect(pairs).toBeGreaterThan(1000);
  });
});
