// Where the time goes: loads a model and analyses it under the V8 sampling profiler, then prints the
// functions with the most self time and the most inclusive time. `npx tsx bench/profile.ts FILE [TOP]`;
// given a .cpuprofile (from `node --cpu-prof`, e.g. of the real CLI) it summarises that instead.
import { readFileSync, writeFileSync } from 'node:fs';
import { Session, type Profiler } from 'node:inspector';
import { analyze, loadModelText } from '@bulkhead/core';

function post<T>(session: Session, method: string, params?: object): Promise<T> {
  return new Promise((resolve, reject) =>
    session.post(method, params ?? {}, (e, r) => (e ? reject(e) : resolve(r as T))),
  );
}

interface Row {
  name: string;
  self: number;
  total: number;
}

/** Self and inclusive milliseconds per function (recursion counted once per stack). */
function summarise(profile: Profiler.Profile): Row[] {
  const nodes = new Map(profile.nodes.map((n) => [n.id, n]));
  const parent = new Map<number, number>();
  for (const n of profile.nodes) for (const c of n.children ?? []) parent.set(c, n.id);
  const label = (n: Profiler.ProfileNode) => {
    const f = n.callFrame;
    const file = f.url.replace(/^.*\/(packages|node_modules)\//, '$1/');
    return `${f.functionName || '(anonymous)'} ${file}:${f.lineNumber + 1}`;
  };
  const rows = new Map<string, Row>();
  const row = (name: string) => rows.get(name) ?? rows.set(name, { name, self: 0, total: 0 }).get(name)!;
  const deltas = profile.timeDeltas ?? [];
  (profile.samples ?? []).forEach((id, i) => {
    const ms = (deltas[i + 1] ?? deltas[i] ?? 0) / 1000;
    let node = nodes.get(id);
    if (!node) return;
    row(label(node)).self += ms;
    const seen = new Set<string>();
    for (; node; node = nodes.get(parent.get(node.id) ?? -1)) {
      const name = label(node);
      if (seen.has(name)) continue;
      seen.add(name);
      row(name).total += ms;
    }
  });
  return [...rows.values()];
}

// Piped into `head`, the rest of the table is not wanted: stop quietly.
process.stdout.on('error', (e: NodeJS.ErrnoException) => process.exit(e.code === 'EPIPE' ? 0 : 1));
const [file, topArg, out] = process.argv.slice(2);
if (!file) throw new Error('usage: npx tsx bench/profile.ts FILE|PROFILE.cpuprofile [TOP] [OUT.cpuprofile]');
const top = Number(topArg ?? 25);
const show = (rows: Row[], title: string, key: 'self' | 'total') => {
  process.stdout.write(`\n${title}\n`);
  for (const r of [...rows].sort((a, b) => b[key] - a[key]).slice(0, top)) {
    process.stdout.write(`${r[key].toFixed(0).padStart(8)} ms  ${r.name}\n`);
  }
};
let profile: Profiler.Profile;
if (file.endsWith('.cpuprofile')) {
  profile = JSON.parse(readFileSync(file, 'utf8')) as Profiler.Profile;
} else {
  const session = new Session();
  session.connect();
  await post(session, 'Profiler.enable');
  await post(session, 'Profiler.setSamplingInterval', { interval: 200 });
  await post(session, 'Profiler.start');
  const t0 = performance.now();
  const loaded = loadModelText(file, readFileSync(file));
  const t1 = performance.now();
  if (!loaded.model) throw new Error(`${file} does not load`);
  analyze(loaded.model, { spans: loaded.spans });
  const t2 = performance.now();
  profile = (await post<{ profile: Profiler.Profile }>(session, 'Profiler.stop')).profile;
  if (out) writeFileSync(out, JSON.stringify(profile));
  process.stdout.write(`load ${(t1 - t0).toFixed(0)} ms, analyze ${(t2 - t1).toFixed(0)} ms (under the profiler)\n`);
}
const rows = summarise(profile);
show(rows, 'self time', 'self');
show(rows, 'inclusive time', 'total');
