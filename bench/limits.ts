// `npm run bench:limits`: the hostile inputs of issue 10, each read as `bulkhead check` reads it (load,
// then render the diagnostics) and timed: a 20,000-deep dependency chain, a 1 MB line, and 50 KB inputs
// of long lines, deep indentation and many mistakes. Each must finish (load or fail with a coded
// diagnostic) within its budget; best of three runs, wall and CPU time, as the machine may be shared.
import { analyze, loadModelText, renderDiagnostics } from '@bulkhead/core';

const SITE = 'site "Limits"\ncategory c tolerable=1e-4 harm=people\n';

function chain(links: number): string {
  const lines = [SITE];
  for (let i = 0; i < links; i++) lines.push(`cable W-${i} signal-via=W-${i + 1}\n`);
  lines.push(`cable W-${links}\n`);
  return lines.join('');
}

/** Budget 0: the fuzzer's rule, 1 s per 100 KB (at least 250 ms). */
const CASES: { name: string; file: string; text: () => string; budgetMs: number }[] = [
  { name: '20,000-deep dependency chain', file: 'chain.bulk', text: () => chain(20_000), budgetMs: 2000 },
  {
    name: '1 MB line of unknown attributes (.bulk)',
    file: 'line.bulk',
    text: () => `${SITE}vessel V-1 ${'x=1 '.repeat(262_144)}\n`,
    budgetMs: 2000,
  },
  {
    name: '1 MB line of stray characters (.bulk)',
    file: 'stray.bulk',
    text: () => `${SITE}vessel V-1 ${'!'.repeat(1 << 20)}\n`,
    budgetMs: 2000,
  },
  {
    name: '1 MB one-line JSON of unknown fields',
    file: 'line.json',
    text: () => `{"site":{"name":"L"},${Array.from({ length: 100_000 }, (_, i) => `"f${i}":1`).join(',')}}`,
    budgetMs: 2000,
  },
  {
    name: '1 MB of JSON nested 524,288 deep',
    file: 'deep.json',
    text: () => '['.repeat(1 << 19) + ']'.repeat(1 << 19),
    budgetMs: 2000,
  },
  {
    name: '50 KB: five 9,990-character lines of unknown attributes',
    file: 'attrs.bulk',
    text: () => SITE + `vessel V-1 ${'x=1 '.repeat(2490)}\n`.repeat(5),
    budgetMs: 0,
  },
  {
    name: '50 KB: five lines indented 9,990 spaces',
    file: 'indent.bulk',
    text: () => `${SITE}vessel V-1\n${`${' '.repeat(9990)}title=a\n`.repeat(5)}`,
    budgetMs: 0,
  },
  {
    name: '50 KB: 2,500 unknown references',
    file: 'refs.bulk',
    text: () => SITE + Array.from({ length: 2500 }, (_, i) => `nozzle N-${i} mounted-on=Q-${i}\n`).join(''),
    budgetMs: 0,
  },
];

const cpuMs = () => {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1000;
};

let failed = 0;
for (const c of CASES) {
  const text = c.text();
  let best = { wall: Infinity, cpu: Infinity };
  let said = '';
  for (let run = 0; run < 3; run++) {
    const wall0 = performance.now();
    const cpu0 = cpuMs();
    const result = loadModelText(c.file, new TextEncoder().encode(text));
    renderDiagnostics(result.diagnostics, result.source);
    if (result.model) analyze(result.model, { spans: result.spans });
    const wall = performance.now() - wall0;
    const cpu = cpuMs() - cpu0;
    if (wall < best.wall) best = { wall, cpu };
    said = result.model ? 'loads' : `${result.diagnostics[0]?.code} (${result.diagnostics.length} shown)`;
  }
  const budget = c.budgetMs || Math.max(250, (1000 * text.length) / (100 * 1024));
  const ok = best.wall <= budget;
  if (!ok) failed++;
  process.stdout.write(
    `${ok ? 'ok  ' : 'SLOW'} ${c.name.padEnd(58)} ${(text.length / 1024).toFixed(0).padStart(5)} KB  ${best.wall.toFixed(0).padStart(5)} ms wall  ${best.cpu.toFixed(0).padStart(5)} ms CPU  (budget ${budget.toFixed(0)} ms)  ${said}\n`,
  );
}
process.exit(failed ? 1 : 0);
