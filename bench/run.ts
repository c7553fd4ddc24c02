// `npm run bench`: generates the synthetic sites when needed, measures each size in its own process,
// times the real `bulkhead check`, prints one table and checks the 100k-element targets of issue 3.
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync, rmSync } from 'node:fs';
import { cpus, loadavg } from 'node:os';
import { join } from 'node:path';
import { parseArgs } from 'node:util';
import { ensureGenerated, GENERATED_DIR } from './generate.ts';
import type { Measurement } from './measure.ts';

const HERE = new URL('.', import.meta.url);
const ROOT = new URL('..', HERE);
const path = (relative: string, base = ROOT) => new URL(relative, base).pathname;

const { values } = parseArgs({
  options: {
    strict: { type: 'boolean', default: false },
    sizes: { type: 'string', default: '1000,10000,100000' },
    runs: { type: 'string', default: '3' },
  },
});
const sizes = values.sizes.split(',').map(Number);
const runs = Math.max(1, Number(values.runs));

interface CheckTiming {
  /** Best wall-clock time of `bulkhead check FILE` over the runs, node start-up included, milliseconds. */
  wallMs: number;
  maxRss: number;
  outputBytes: number;
}

/** The real CLI in a child process; the preloaded probe reports its peak memory on exit. */
function timeCheck(file: string, times: number, nodeFlags: string[] = []): CheckTiming {
  const rssFile = join(GENERATED_DIR, 'check.rss');
  const outFile = join(GENERATED_DIR, 'check.out');
  const walls: number[] = [];
  let maxRss = 0;
  for (let i = 0; i < times; i++) {
    rmSync(rssFile, { force: true });
    const start = performance.now();
    const child = spawnSync(
      'sh',
      ['-c', `exec "${process.execPath}" ${nodeFlags.join(' ')} --import "${path('rss-probe.mjs', HERE)}" "${path('packages/cli/bin/bulkhead.js')}" check "${file}" > "${outFile}"`],
      { env: { ...process.env, BULKHEAD_BENCH_RSS_FILE: rssFile }, stdio: ['ignore', 'ignore', 'pipe'], encoding: 'utf8' },
    );
    walls.push(performance.now() - start);
    if (child.status !== 0) throw new Error(`bulkhead check ${file} exited ${child.status}: ${child.stderr.slice(0, 500)}`);
    maxRss = Math.max(maxRss, existsSync(rssFile) ? Number(readFileSync(rssFile, 'utf8')) : 0);
  }
  return { wallMs: Math.min(...walls), maxRss, outputBytes: readFileSync(outFile).length };
}

function measureSize(bulk: string, json: string): Measurement {
  const child = spawnSync(process.execPath, ['--expose-gc', '--import', 'tsx', path('measure.ts', HERE), bulk, json, String(runs)], {
    cwd: path('.'),
    encoding: 'utf8',
    maxBuffer: 1 << 24,
  });
  if (child.status !== 0) throw new Error(`measuring ${bulk} failed:\n${child.stderr}`);
  return JSON.parse(child.stdout) as Measurement;
}

interface Row {
  size: number;
  m: Measurement;
  check: CheckTiming;
}

const ms = (n: number) => `${Math.round(n)}`;
/** Megabytes of 10^6 bytes, the unit of the 1 GB target. */
const mb = (bytes: number) => `${Math.round(bytes / 1e6)}`;

function table(rows: Row[]): string {
  const head = ['elements', 'functions', 'scenarios', 'findings', 'load', 'load json', 'graph', 'trace', 'rules', 'assess', 'analyze()', 'load+analyze', 'check (CLI)', 'peak MB', 'check MB'];
  const body = rows.map(({ m, check }) => [
    String(m.elements), String(m.functions), String(m.scenarios), String(m.findings),
    ms(m.best.load), ms(m.best.loadJson), ms(m.best.graph), ms(m.best.trace), ms(m.best.rules), ms(m.best.assess),
    ms(m.best.analyze), ms(m.best.load + m.best.analyze), ms(check.wallMs), mb(m.maxRss), mb(check.maxRss),
  ]);
  const widths = head.map((h, i) => Math.max(h.length, ...body.map((r) => r[i]!.length)));
  const line = (cells: string[]) => cells.map((c, i) => c.padStart(widths[i]!)).join('  ');
  return [line(head), line(widths.map((w) => '-'.repeat(w))), ...body.map(line)].join('\n');
}

interface Target {
  name: string;
  measured: string;
  ok: boolean;
}

function targets(rows: Row[]): Target[] {
  const big = rows.find((r) => r.size === 100000);
  const mid = rows.find((r) => r.size === 10000);
  if (!big) return [];
  const t = big.m.best;
  const out: Target[] = [
    { name: 'analysis after loading takes no longer than loading', measured: `analyze() ${ms(t.analyze)} ms vs load ${ms(t.load)} ms`, ok: t.analyze <= t.load },
    { name: 'whole `bulkhead check` under 3 s', measured: `${ms(big.check.wallMs)} ms (best of ${Math.min(runs, 3)}, node start-up included)`, ok: big.check.wallMs < 3000 },
    // The real command's peak; the measuring process also loads the JSON twin and analyses twice, so it is shown, not judged.
    { name: 'peak memory under 1 GB', measured: `check ${mb(big.check.maxRss)} MB (measuring process ${mb(big.m.maxRss)} MB)`, ok: big.check.maxRss < 1e9 },
  ];
  if (mid) {
    // Time per element may grow by at most 10% from 10k to 100k: 10x the elements, at most 11x the time.
    const growth = (a: number, b: number) => (b / a) / (big.m.elements / mid.m.elements) * 10;
    const pipeline = growth(mid.m.best.load + mid.m.best.analyze, t.load + t.analyze);
    const detail = (['load', 'graph', 'trace', 'rules', 'assess'] as const).map((k) => `${k} ${growth(mid.m.best[k], t[k]).toFixed(1)}x`).join(', ');
    out.push({ name: 'time grows linearly (10x elements, at most 11x time)', measured: `load+analyze ${pipeline.toFixed(1)}x (${detail})`, ok: pipeline <= 11 });
  }
  return out;
}

async function layoutBenchmark(): Promise<void> {
  if (!existsSync(path('layout.ts', HERE))) {
    process.stdout.write('\nlayout benchmark: not present\n');
    return;
  }
  const layout = (await import('./layout.ts')) as { runLayoutBench?: () => Promise<unknown>; formatLayoutBench?: (r: never) => string };
  if (!layout.runLayoutBench) {
    process.stdout.write('\nlayout benchmark: bench/layout.ts exports no runLayoutBench\n');
    return;
  }
  const results = await layout.runLayoutBench();
  process.stdout.write('\n' + (layout.formatLayoutBench ? layout.formatLayoutBench(results as never) : JSON.stringify(results, null, 2) + '\n'));
}

const loadAtStart = loadavg()[0]!;
const rows: Row[] = [];
for (const size of sizes) {
  process.stderr.write(`site of ${size} elements: generating if needed, then measuring\n`);
  const files = ensureGenerated(size);
  const m = measureSize(files.bulk, files.json);
  if (m.replicaFindings !== m.findings) throw new Error(`the stage replica found ${m.replicaFindings} findings, analyze() ${m.findings}: bench/measure.ts no longer follows analyze()`);
  rows.push({ size, m, check: timeCheck(files.bulk, Math.min(runs, 3)) });
}

process.stdout.write(`Bulkhead benchmark: synthetic sites, best of ${runs} runs (check: of ${Math.min(runs, 3)}), times in ms, node ${process.version}, ${cpus().length} cores\n`);
process.stdout.write(`load average (1 min) at start ${loadAtStart.toFixed(2)}, at end ${loadavg()[0]!.toFixed(2)}: other work on the machine inflates the times\n`);
process.stdout.write('load = parse + validate (.bulk); stages follow analyze(); analyze() is timed whole; check = `bulkhead check` in a child process\n\n');
process.stdout.write(table(rows) + '\n');
const results = targets(rows);
if (results.length) {
  process.stdout.write('\nTargets for the 100k-element site (issue 3):\n');
  for (const r of results) process.stdout.write(`  ${r.ok ? 'PASS' : 'FAIL'}  ${r.name}: ${r.measured}\n`);
}
// Not a target: how much a larger young generation (fewer scavenges of the long-lived model) would
// give the CLI, so whoever owns its start-up can weigh the flag.
const largest = rows[rows.length - 1];
if (largest) {
  const flag = '--max-semi-space-size=64';
  const tuned = timeCheck(ensureGenerated(largest.size).bulk, Math.min(runs, 3), [flag]);
  process.stdout.write(`\nFor comparison, not a target: \`node ${flag}\` check of the ${largest.m.elements}-element site: ${ms(tuned.wallMs)} ms, ${mb(tuned.maxRss)} MB\n`);
}
await layoutBenchmark();
if (values.strict && results.some((r) => !r.ok)) process.exitCode = 1;
