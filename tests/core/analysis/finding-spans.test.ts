// Every finding points at the lines of the model file it concerns: its primary span (the claim of the
// layer, the enabler or modifier, the cause, or the `accept` statement) and related spans (the cause, the
// shared element's definition). Positions are counted by hand in the case model of tests/core/rules/harness.ts
// (invented test data): its base lines are 1 to 24, so the scenario starts on line 25.
import { describe, expect, it } from 'vitest';
import { analyze, loadModelText } from '@bulkhead/core';
import { analyseCase, modelText } from '../rules/harness.ts';

const where = (s: { line: number; column: number } | undefined) => (s ? `${s.line}:${s.column}` : 'none');

describe('finding spans', () => {
  const c = {
    name: 'spans',
    lines: {
      'SF-1':
        'sif SF-1 sensors=T-1 solver=S-1 finals=XV-1 trip=close trip-mode=de-energise sil=2 pfd=0.01 pfd-basis="test"',
    },
    scenario: [
      'scenario SC-1 category=c', // line 25
      '  cause function=LC-1 frequency=0.1', // 26: no basis
      '  layer SF-1', // 27
      '  modifier presence probability=0.5', // 28: no basis, above the presence limit
    ],
    extra: ['accept gone:SC-1 by="T. Tester (invented)" date=2026-11-01 reason="test"'], // 29: matches nothing
  };
  const findings = analyseCase(c).findings;
  const byRule = (rule: string) => findings.find((f) => f.rule === rule)!;

  it('puts an independence finding on the layer claim, with the cause and the shared element as related places', () => {
    const f = byRule('shared-sensor');
    expect(where(f.span)).toBe('27:9'); // `  layer SF-1`: SF-1 starts in column 9
    expect(f.related?.map((r) => [r.role, r.name, where(r.span)])).toEqual([
      ['cause', 'LC-1', '26:18'], // `  cause function=LC-1`
      ['element', 'T-1', '19:13'], // `transmitter T-1 ...`, the 19th base line
    ]);
  });

  it('puts a finding about a modifier on its line, a finding about the cause on the cause, and a stale acceptance on its statement', () => {
    expect(where(byRule('condition-no-basis').span)).toBe('28:12'); // `  modifier presence`
    expect(where(byRule('presence-above-limit').span)).toBe('28:12');
    expect(where(byRule('cause-no-basis').span)).toBe('26:18');
    expect(where(byRule('stale-justification').span)).toBe('29:8'); // `accept gone:SC-1`
  });

  it('gives no span to findings of a model built without the loader', () => {
    const loaded = loadModelText('case.bulk', modelText(c));
    const plain = analyze(loaded.model!);
    expect(plain.findings.length).toBe(findings.length);
    expect(plain.findings.filter((f) => f.span !== undefined || f.related !== undefined)).toEqual([]);
  });
});
