// Issue 16, item 1: a site keeps its failure data in a data file of its own, named by `part "file.bulk"`.
// The rows in the part must give the same verification and the same credit as the rows written in the main
// file, and a problem in a row must point at the part file, its line and column. The model is invented.
import { describe, expect, it } from 'vitest';
import { analyze, loadModelText, renderDiagnostics, verifyModel, type PartReader } from '@bulkhead/core';
import { BETA, COMPUTED, PLANT, row, scenario } from './credit-model.ts';

function reader(files: Record<string, string>): PartReader {
  return (path) => (path in files ? new TextEncoder().encode(files[path]) : { problem: 'no such file' });
}

const DATA = [
  '# Site failure data table (invented), kept apart from the plant model\n',
  row('TT-1', 1e-7),
  row('TT-2', 1e-7),
  row('TW-1', 1e-7),
  row('LS-1', 1e-9),
  row('XV-1', 1e-7),
  BETA,
].join('');

const MAIN = `${PLANT}${scenario(0.01)}part "data/failure-data.bulk"\n`;

describe('failure data in a part file', () => {
  const split = loadModelText('site/main.bulk', MAIN, { readPart: reader({ 'site/data/failure-data.bulk': DATA }) });
  const whole = loadModelText('whole.bulk', PLANT + scenario(0.01) + DATA);

  it('loads the rows from the part, and verifies the SIF as if they were written in the main file', () => {
    expect(split.diagnostics).toEqual([]);
    expect(split.parts).toEqual(['site/data/failure-data.bulk']);
    expect(split.model!.failureData?.map((r) => r.id)).toEqual(['FD-TT-1', 'FD-TT-2', 'FD-TW-1', 'FD-LS-1', 'FD-XV-1']);
    const [fromPart] = verifyModel(split.model!);
    const [inline] = verifyModel(whole.model!);
    expect(fromPart!.pfd).toBeCloseTo(COMPUTED, 8);
    expect(fromPart!.pfd).toBe(inline!.pfd);
    // No finding on the inputs; only the HFT check (SIL 3 needed, HFT 1) speaks, from the requirement, not the rows.
    expect(fromPart!.findings.filter((f) => f.code !== 'hft-short')).toEqual([]);
  });

  it('credits the SIF by its computed PFD in check, as the inline rows do', () => {
    const key = 'voted-group-common-cause:S-1:SIF-1:TW-1';
    const f = analyze(split.model!).findings.find((x) => x.key === key)!;
    expect(f.messageId).toBe('voted-group-common-cause/counted-within-claim');
    expect(f.message).toBe(analyze(whole.model!).findings.find((x) => x.key === key)!.message);
  });

  it('points a problem in a row at the part file, its line and column', () => {
    // Line 3 of the part: FD-TT-2, with a proof-test coverage below 1 and no mission time (BH344).
    const bad = DATA.replace(
      `${row('TT-2', 1e-7)}`,
      row('TT-2', 1e-7).replace('proof-test-coverage=1', 'proof-test-coverage=0.9'),
    );
    const result = loadModelText('site/main.bulk', MAIN, { readPart: reader({ 'site/data/failure-data.bulk': bad }) });
    expect(result.model).toBeUndefined();
    const problem = result.diagnostics.find((d) => d.code === 'BH344')!;
    expect(problem.span).toMatchObject({ file: 'site/data/failure-data.bulk', line: 3 });
    // The span marks the value, just after `proof-test-coverage=`.
    const column = bad.split('\n')[2]!.indexOf('proof-test-coverage=0.9') + 'proof-test-coverage='.length + 1;
    expect(problem.span?.column).toBe(column);
    expect(renderDiagnostics([problem], result.source)).toContain(`site/data/failure-data.bulk:3:${column}`);
  });
});
