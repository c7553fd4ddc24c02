// Layout benchmark: how long layout takes (stage columns for a scenario, elk.bundled.js for the site
// overview: the code the viewer's worker runs) for the
// demo's scenarios, a focused scenario of about 300 nodes, and a 5,000-element site's overview.
// `runLayoutBench()` is for bench/run.ts; `npx tsx bench/layout.ts` prints the table on its own.
import { pathToFileURL } from 'node:url';
import { analyze, type Model } from '@bulkhead/core';
import { scenarioScene, siteOverview, type Scene } from '@bulkhead/layout';
import { layoutScene } from '@bulkhead/layout/elk';
import { demoModel, generateSite, generateWideScenario } from './site-generator.ts';

export interface LayoutBenchResult {
  name: string;
  nodes: number;
  edges: number;
  /** Median of the timed runs, milliseconds. */
  medianMs: number;
  maxMs: number;
  /** The target, when there is one (issue 6: a 300-node focused scenario under a second). */
  limitMs?: number;
  ok: boolean;
}

async function time(name: string, scene: Scene, repeats: number, limitMs?: number): Promise<LayoutBenchResult> {
  await layoutScene(scene); // warm-up: the first ELK run pays for JIT compilation
  const runs: number[] = [];
  for (let i = 0; i < repeats; i++) {
    const t = performance.now();
    await layoutScene(scene);
    runs.push(performance.now() - t);
  }
  runs.sort((a, b) => a - b);
  const medianMs = Math.round(runs[Math.floor(runs.length / 2)]!);
  const maxMs = Math.round(runs[runs.length - 1]!);
  return {
    name,
    nodes: scene.nodes.length,
    edges: scene.edges.length,
    medianMs,
    maxMs,
    ...(limitMs ? { limitMs } : {}),
    ok: limitMs === undefined || maxMs < limitMs,
  };
}

function scenes(model: Model) {
  const analysis = analyze(model);
  return {
    analysis,
    scene: (id: string) => scenarioScene(model, analysis, id),
    overview: () => siteOverview(model, analysis),
  };
}

export async function runLayoutBench(
  options: { repeats?: number; focusedNodes?: number; siteElements?: number } = {},
): Promise<LayoutBenchResult[]> {
  const repeats = options.repeats ?? 5;
  const results: LayoutBenchResult[] = [];
  const demo = scenes(demoModel());
  for (const a of demo.analysis.assessments)
    results.push(await time(`demo ${a.scenario}`, demo.scene(a.scenario), repeats));

  const wide = scenes(generateWideScenario(options.focusedNodes ?? 300));
  results.push(await time('focused scenario, ~300 nodes', wide.scene('S-WIDE'), repeats, 1000));

  const siteModel = generateSite(options.siteElements ?? 5000);
  const site = scenes(siteModel);
  results.push(await time(`site overview, ${siteModel.elements.length} elements`, site.overview(), repeats, 1000));
  const first = siteModel.scenarios[0]!.id;
  results.push(
    await time(`one scenario of the ${siteModel.elements.length}-element site`, site.scene(first), repeats, 1000),
  );
  return results;
}

export function formatLayoutBench(results: LayoutBenchResult[]): string {
  const rows = results.map(
    (r) =>
      `${r.name.padEnd(44)} ${String(r.nodes).padStart(5)} ${String(r.edges).padStart(5)} ${String(r.medianMs).padStart(7)} ${String(r.maxMs).padStart(7)} ${r.limitMs ? `< ${r.limitMs}`.padStart(7) : '       '} ${r.ok ? 'ok' : 'SLOW'}`,
  );
  return [`${'layout (in process)'.padEnd(44)} nodes edges  median     max  target`, ...rows].join('\n') + '\n';
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  const results = await runLayoutBench();
  process.stdout.write(formatLayoutBench(results));
  process.exitCode = results.every((r) => r.ok) ? 0 : 1;
}
