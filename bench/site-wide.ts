// `npm run bench:site-wide [-- SIZE...]`: minimal cut sets at order 2, the common-cause ranking and the
// revision diff on the generated sites (default: the 100k site), each timed after the analysis they
// read, best of three. Benchmark figures only; no target is judged here.
import { readFileSync } from 'node:fs';
import { analyze, diffRevisions, loadModelText, modelCutSets, rankCommonCauses, type Model } from '@bulkhead/core';
import { ensureGenerated } from './generate.ts';

function best<T>(runs: number, work: () => T): { ms: number; result: T } {
  let ms = Infinity;
  let result: T | undefined;
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    result = work();
    ms = Math.min(ms, performance.now() - start);
  }
  return { ms, result: result! };
}

/** The next revision a designer might make: one transmitter renamed everywhere and one valve's fail action changed. */
function revised(model: Model): Model {
  const sensor = model.elements.find((e) => e.kind === 'transmitter')!.tag;
  const valve = model.elements.find((e) => e.kind === 'shutdown-valve')!.tag;
  const text = JSON.stringify(model).replaceAll(`"${sensor}"`, `"${sensor}-R"`);
  const next = JSON.parse(text) as Model;
  next.elements = next.elements.map((e) => (e.tag === valve ? ({ ...e, failsTo: 'in-place' } as typeof e) : e));
  return next;
}

const sizes = process.argv
  .slice(2)
  .map(Number)
  .filter((n) => n > 0);
for (const size of sizes.length ? sizes : [100000]) {
  const files = ensureGenerated(size);
  const model = loadModelText(files.bulk, readFileSync(files.bulk)).model!;
  const analysis = best(3, () => analyze(model));
  const cutSets = best(3, () => modelCutSets(model, { maxOrder: 2, findings: analysis.result.findings }));
  const sets = cutSets.result.flatMap((s) => s.cutSets);
  const singles = sets.filter((c) => c.elements.length === 1).length;
  const ranking = best(3, () => rankCommonCauses(model, analysis.result));
  const next = revised(model);
  const nextAnalysis = analyze(next);
  const diff = best(3, () =>
    diffRevisions(
      { model, label: 'old', analysis: analysis.result },
      { model: next, label: 'new', analysis: nextAnalysis },
    ),
  );
  const line = (what: string, ms: number, detail: string) =>
    process.stdout.write(
      `${String(size).padStart(7)} elements  ${what.padEnd(26)} ${String(Math.round(ms)).padStart(6)} ms  ${detail}\n`,
    );
  line('analyze()', analysis.ms, `${model.scenarios.length} scenarios, ${analysis.result.findings.length} findings`);
  // Ratios to analyze() in the same process: the machine may be shared, and load inflates every time alike.
  const ratio = (ms: number) => `${(ms / analysis.ms).toFixed(2)}x analyze()`;
  line(
    'cut sets, order 2 (MOCUS)',
    cutSets.ms,
    `${ratio(cutSets.ms)}; ${sets.length} minimal cut sets: ${singles} single points, ${sets.length - singles} pairs`,
  );
  line('common-cause ranking', ranking.ms, `${ratio(ranking.ms)}; ${ranking.result.length} elements ranked`);
  line(
    'diff (analyses given)',
    diff.ms,
    `${ratio(diff.ms)}; ${diff.result.renames.length} rename, ${diff.result.elements.changed.length} element changed, ${diff.result.verdicts.filter((v) => v.change !== 'same').length} scenarios changed verdict`,
  );
}
