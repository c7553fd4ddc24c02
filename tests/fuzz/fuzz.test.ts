// The fuzzer in the suite: 2,000 seeded mutations of the demo models and the bad-input corpus, each
// through the loader, the analysis and every renderer. None may throw, and every position a diagnostic or
// a SARIF result gives must lie in the file. Speed is judged by `npm run fuzz`, not here.
import { describe, expect, it } from 'vitest';
import { makeInput, runOne, seeds } from './fuzzer.ts';

const SEED = 20_261_202;
const BATCHES = 4;
const PER_BATCH = 500;

describe('seeded mutation fuzzing (2,000 inputs)', () => {
  const all = seeds();

  it('has the demo models and the whole bad-input corpus to start from', () => {
    expect(all.filter((s) => s.name.startsWith('fixtures/demo/')).length).toBeGreaterThanOrEqual(2);
    expect(all.filter((s) => s.name.startsWith('fixtures/bad/')).length).toBeGreaterThanOrEqual(60);
  });

  it.each(Array.from({ length: BATCHES }, (_, i) => i))('batch %i: no crash, no position outside the file', (batch) => {
    const problems: string[] = [];
    let loaded = 0;
    for (let i = batch * PER_BATCH; i < (batch + 1) * PER_BATCH; i++) {
      const input = makeInput(all, SEED, i);
      const outcome = runOne(input);
      if (outcome.loaded) loaded++;
      if (outcome.crash) problems.push(`${input.label}: ${outcome.crash}`);
      for (const o of outcome.outside) problems.push(`${input.label}: outside the file: ${o}`);
    }
    expect(problems).toEqual([]);
    // A canary: some inputs must get through the loader, or the analysis and renderers were never fuzzed.
    expect(loaded).toBeGreaterThan(PER_BATCH / 50);
  });
});
