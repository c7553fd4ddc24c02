// `npm run bench:import`: a 10,000-row instrument index (with a 10,000-row I/O list merged by tag, and
// the cards, cabinets and supplies they name) imported by the built `bulkhead import`, wall clock over
// three runs. Target (issue 13): under 5 s. A benchmark line, never a timed unit test.
import { spawnSync } from 'node:child_process';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { cpus, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const ROWS = Number(process.argv[2] ?? 10_000);
const BIN = fileURLToPath(new URL('../packages/cli/bin/bulkhead.js', import.meta.url));
const dir = join(tmpdir(), `bulkhead-bench-import-${ROWS}`);
mkdirSync(dir, { recursive: true });

const cards = Math.ceil(ROWS / 16);
const index = ['Tag No.,Type,Service,Measured Variable,Manufacturer,Model No.,Process Connection,Supply,Loop No.'];
const io = ['Tag No.,I/O Card,Channel'];
const system = [
  'Tag No.,Type,Service,System,Cabinet,Fed From,Signal Via',
  'UPS-1,ups,Instrument UPS,,,,',
  'CAB-1,cabinet,Marshalling cabinet,,,,',
  'C-1,controller,Controller,bpcs,CAB-1,UPS-1,',
];
const plant = ['Tag,Type,Service,Mounted On', 'V-1,vessel,Drum,'];
for (let c = 1; c <= cards; c++) system.push(`AI-${c},io-card,Input card ${c},,CAB-1,UPS-1,C-1`);
for (let i = 1; i <= ROWS; i++) {
  plant.push(`N-${i},nozzle,Nozzle ${i},V-1`);
  index.push(`PT-${i},transmitter,"Pressure, point ${i}",pressure,Calder,PX-3,N-${i},from-signal,PIC-${i}`);
  io.push(`PT-${i},AI-${Math.ceil(i / 16)},${((i - 1) % 16) + 1}`);
}
const files = { 'index.csv': index, 'io-list.csv': io, 'control-system.csv': system, 'equipment.csv': plant };
for (const [name, lines] of Object.entries(files)) writeFileSync(join(dir, name), lines.join('\r\n') + '\r\n');

// Wall clock and CPU time (user + system, from bench/rss-probe.mjs): on a shared, loaded machine the
// wall clock counts time spent waiting for a core, so both are printed, with the load average.
const PROBE = fileURLToPath(new URL('rss-probe.mjs', import.meta.url));
const probeFile = join(dir, 'probe.json');
const runs: { wall: number; cpu: number; rss: number }[] = [];
for (let run = 0; run < 3; run++) {
  const start = performance.now();
  const args = [
    '--import',
    PROBE,
    BIN,
    'import',
    ...Object.keys(files).map((f) => join(dir, f)),
    '-o',
    join(dir, 'plant.bulk'),
    '--force',
  ];
  const child = spawnSync(process.execPath, args, {
    encoding: 'utf8',
    env: { ...process.env, BULKHEAD_BENCH_RSS_FILE: probeFile },
  });
  const wall = performance.now() - start;
  if (child.status !== 0) throw new Error(`import exited ${child.status}: ${child.stderr.slice(0, 800)}`);
  const probe = JSON.parse(readFileSync(probeFile, 'utf8')) as { maxRss: number; cpuMs: number };
  runs.push({ wall, cpu: probe.cpuMs, rss: probe.maxRss });
}
const wall = Math.min(...runs.map((r) => r.wall));
const cpu = Math.min(...runs.map((r) => r.cpu));
const rss = Math.max(...runs.map((r) => r.rss));
process.stdout.write(
  `import of a ${ROWS.toLocaleString('en')}-row instrument index (+ I/O list, ${cards} cards, re-import over the last run): ` +
    `best wall ${wall.toFixed(0)} ms, CPU ${cpu.toFixed(0)} ms, peak ${(rss / 1048576).toFixed(0)} MB, load average ${loadavg()[0]!.toFixed(1)} on ${cpus().length} cores ` +
    `(target < 5000 ms: ${wall < 5000 ? 'met' : cpu < 5000 ? 'met in CPU time; the wall clock waited for a core' : 'MISSED'})\n`,
);
