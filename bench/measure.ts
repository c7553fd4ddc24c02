// One benchmark size, run in its own process (node --expose-gc --import tsx) so its peak memory is its
// own: times load and each analysis stage in analyze()'s order, then analyze() whole, and prints JSON.
import { readFileSync } from 'node:fs';
import {
  analyze,
  applyJustifications,
  assessScenario,
  bpcsFactsOf,
  loadModelText,
  PlantIndex,
  ruleEnvironment,
  runRules,
  Tracer,
  type Finding,
  type Model,
} from '@bulkhead/core';

export interface StageTimes {
  read: number;
  load: number;
  /** The same site from its JSON twin. */
  loadJson: number;
  /** A bare JSON.parse of the JSON twin's text: the floor that check is measured against. */
  jsonParse: number;
  /** Building the plant index the tracer walks (the graphology graph is no longer built by analyze()). */
  graph: number;
  trace: number;
  rules: number;
  assess: number;
  /** analyze() called as a whole on the loaded model (not the sum of the stages above). */
  analyze: number;
}

export interface Measurement {
  file: string;
  elements: number;
  functions: number;
  scenarios: number;
  findings: number;
  /** Best (least) of the runs per stage, milliseconds: the machine is shared, and other load only ever adds time. */
  best: StageTimes;
  runs: number;
  /** process.resourceUsage().maxRSS, bytes: the high-water mark of the whole child process. */
  maxRss: number;
  /** Findings from the stage-by-stage replica, which must equal analyze()'s (a check on the replica). */
  replicaFindings: number;
}

const gc = (globalThis as { gc?: () => void }).gc ?? (() => {});

/** The stages of analyze() one by one, each timed; analysis/analyze.ts is the order to follow. */
function stages(model: Model, times: Partial<StageTimes>): number {
  let t = performance.now();
  const lap = (stage: keyof StageTimes) => {
    const now = performance.now();
    times[stage] = now - t;
    t = now;
  };
  const index = PlantIndex.ofModel(model);
  lap('graph');
  const tracer = new Tracer(index);
  model.functions.map((f) => tracer.traceFunction(f.tag));
  lap('trace');
  const env = ruleEnvironment(model, tracer);
  const raw: Finding[] = model.scenarios.flatMap((s) => runRules(env, s));
  lap('rules');
  const independent = applyJustifications(raw, model.justifications).findings;
  const bpcs = bpcsFactsOf(model);
  const byScenario = new Map<string | undefined, Finding[]>();
  for (const f of independent) (byScenario.get(f.scenario) ?? byScenario.set(f.scenario, []).get(f.scenario)!).push(f);
  const assessed = model.scenarios.map((scenario) =>
    assessScenario({ model, scenario, findings: byScenario.get(scenario.id) ?? [], bpcs, functions: env.functions }),
  );
  const all = [...independent, ...assessed.flatMap((a) => a.findings)];
  const { stale } = applyJustifications(all, model.justifications);
  lap('assess');
  return all.length + stale.length;
}

function least(values: number[]): number {
  return Math.min(...values);
}

export function measure(file: string, jsonFile: string, runs: number): Measurement {
  const samples: StageTimes[] = [];
  let model: Model | undefined;
  let findings = 0;
  let replicaFindings = 0;
  for (let run = 0; run < runs; run++) {
    const times: Partial<StageTimes> = {};
    // The JSON twin first, and dropped before the .bulk load, so two models never share the peak.
    const jsonBytes = readFileSync(jsonFile);
    const jsonText = jsonBytes.toString('utf8');
    gc();
    let t = performance.now();
    JSON.parse(jsonText);
    times.jsonParse = performance.now() - t;
    gc();
    t = performance.now();
    if (!loadModelText(jsonFile, jsonBytes).model) throw new Error(`${jsonFile} does not load`);
    times.loadJson = performance.now() - t;
    gc();
    t = performance.now();
    const bytes = readFileSync(file);
    times.read = performance.now() - t;
    t = performance.now();
    const loaded = loadModelText(file, bytes);
    times.load = performance.now() - t;
    if (!loaded.model)
      throw new Error(
        `${file} does not load: ${loaded.diagnostics
          .map((d) => `${d.code} ${d.message}`)
          .slice(0, 3)
          .join('; ')}`,
      );
    model = loaded.model;
    replicaFindings = stages(model, times);
    gc();
    t = performance.now();
    findings = analyze(model, { spans: loaded.spans }).findings.length;
    times.analyze = performance.now() - t;
    samples.push(times as StageTimes);
  }
  const keys = Object.keys(samples[0]!) as (keyof StageTimes)[];
  return {
    file,
    elements: model!.elements.length,
    functions: model!.functions.length,
    scenarios: model!.scenarios.length,
    findings,
    replicaFindings,
    best: Object.fromEntries(keys.map((k) => [k, least(samples.map((s) => s[k]))])) as unknown as StageTimes,
    runs,
    maxRss: process.resourceUsage().maxRSS * 1024,
  };
}

const [file, jsonFile, runs] = process.argv.slice(2);
if (file && jsonFile) process.stdout.write(JSON.stringify(measure(file, jsonFile, Number(runs ?? 3))) + '\n');
