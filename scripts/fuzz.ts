// `npm run fuzz [-- --inputs N --seed S]`: the suite's mutation fuzzer at a larger budget (50,000 inputs
// by default). Prints inputs tried, crashes, slow inputs (over 1 s per 100 KB, with a 250 ms floor for a
// run's fixed cost, in CPU time of this process, as the machine may be shared; a slow input is run twice
// more and judged by its best run) and positions outside the file. Each problem input is written to fuzz-out/ to become a corpus
// file; exits 1 when there is any.
import { mkdirSync, writeFileSync } from 'node:fs';
import { parseArgs } from 'node:util';
import { budgetMs, makeInput, runOne, seeds } from '../tests/fuzz/fuzzer.ts';

const { values } = parseArgs({
  options: { inputs: { type: 'string', default: '50000' }, seed: { type: 'string', default: '1' } },
});
const total = Number(values.inputs);
const seed = Number(values.seed);
const all = seeds();
const out = 'fuzz-out';
const problems: { kind: string; label: string; detail: string; bytes: Uint8Array; name: string }[] = [];
let loaded = 0;
let bytesTried = 0;
let worstPer100k = 0;
let slowest = 0;
const started = performance.now();

for (let i = 0; i < total; i++) {
  const input = makeInput(all, seed, i);
  bytesTried += input.bytes.length;
  let outcome = runOne(input);
  if (outcome.loaded) loaded++;
  if (outcome.cpuMs > budgetMs(input.bytes.length)) {
    for (let again = 0; again < 2; again++) {
      const retry = runOne(input);
      if (retry.cpuMs < outcome.cpuMs) outcome = retry;
    }
  }
  if (input.bytes.length >= 50 * 1024)
    worstPer100k = Math.max(worstPer100k, (outcome.cpuMs * 100 * 1024) / input.bytes.length);
  slowest = Math.max(slowest, outcome.cpuMs);
  const note = (kind: string, detail: string) =>
    problems.push({ kind, label: input.label, detail, bytes: input.bytes, name: input.name });
  if (outcome.crash) note('crash', outcome.crash);
  if (outcome.cpuMs > budgetMs(input.bytes.length))
    note(
      'slow',
      `${outcome.cpuMs.toFixed(0)} ms CPU (${outcome.ms.toFixed(0)} ms wall) for ${input.bytes.length} bytes`,
    );
  if (outcome.outside.length) note('outside', outcome.outside.slice(0, 3).join('; '));
  if ((i + 1) % 5000 === 0)
    process.stdout.write(
      `  ${i + 1} inputs, ${problems.length} problems, ${((performance.now() - started) / 1000).toFixed(0)} s\n`,
    );
}

const count = (kind: string) => problems.filter((p) => p.kind === kind).length;
if (problems.length) {
  mkdirSync(out, { recursive: true });
  problems.forEach((p, n) => {
    const extension = p.name.slice(p.name.lastIndexOf('.'));
    writeFileSync(`${out}/${p.kind}-${n}${extension}`, p.bytes);
    process.stdout.write(`${p.kind}: ${p.label}: ${p.detail} (saved as ${out}/${p.kind}-${n}${extension})\n`);
  });
}
process.stdout.write(
  [
    `fuzz: seed ${seed}, ${all.length} seed files`,
    `inputs tried:        ${total} (${(bytesTried / 1048576).toFixed(1)} MB; ${loaded} loaded and went through analysis and every renderer)`,
    `crashes:             ${count('crash')}`,
    `slow inputs:         ${count('slow')} (over 1 s per 100 KB of CPU time, floor 250 ms; slowest input ${slowest.toFixed(0)} ms; worst ${worstPer100k.toFixed(0)} ms per 100 KB among inputs of 50 KB or more)`,
    `positions outside:   ${count('outside')}`,
    `time:                ${((performance.now() - started) / 1000).toFixed(0)} s`,
  ].join('\n') + '\n',
);
process.exit(problems.length ? 1 : 0);
