// The report keeps the cause's element set for every kind of cause: a whole loop, one element, and a loop
// narrowed to one element (the whole loop until the narrowing is accepted, then the element's own set),
// and marks a layer's element as "in the cause" exactly when the rules compared it as such.
// The site is invented test data built on the rule tables' base site.
import { describe, expect, it } from 'vitest';
import { analyze, buildReportDocument, loadModelText } from '@bulkhead/core';
import { modelText, scenario } from '../core/rules/harness.ts';

function reportOf(causeLine: string, extra: string[] = []) {
  // SF-1's valve shares air header IA-A with CV-1, so IA-A is in the cause through CV-1 alone.
  const text = modelText({
    name: 'cause set',
    lines: { 'XV-1': 'shutdown-valve XV-1 fails-to=closed mounted-on=L-1 signal-via=IO-4 air-from=IA-A' },
    scenario: scenario(causeLine, 'SF-1'),
    extra,
  });
  const loaded = loadModelText('case.bulk', text);
  if (!loaded.model) throw new Error('case does not load');
  const doc = buildReportDocument({
    model: loaded.model,
    analysis: analyze(loaded.model),
    file: 'case.bulk',
    sha256: '0'.repeat(64),
    toolVersion: '0.0.0',
  });
  const [s] = doc.scenarios;
  const inCause = s!.layers[0]!.elements.filter((e) => e.inCause).map((e) => e.tag);
  return { elements: s!.cause.elements, inCause };
}

describe('the cause element set in reports', () => {
  it('is the whole loop for a loop-failure cause', () => {
    const { elements, inCause } = reportOf('function=LC-1 frequency=0.1');
    expect(elements).toEqual(['C-1', 'CK-A', 'CV-1', 'IA-A', 'IO-1', 'IO-3', 'L-1', 'N-1', 'T-1', 'UPS-A', 'V-1']);
    expect(inCause).toEqual(['IA-A', 'L-1', 'V-1']);
  });

  it('is the element and what it relies on for an element cause (not null)', () => {
    const { elements, inCause } = reportOf('element=CV-1 frequency=0.1');
    expect(elements).toEqual(['C-1', 'CK-A', 'CV-1', 'IA-A', 'IO-3', 'L-1', 'UPS-A']);
    expect(inCause).toEqual(['IA-A', 'L-1']);
  });

  it("is the whole loop for a narrowed cause until the narrowing is accepted, then the element's set", () => {
    const open = reportOf('function=LC-1 only=CV-1 frequency=0.1');
    expect(open.elements).toContain('T-1');
    expect(open.inCause).toEqual(['IA-A', 'L-1', 'V-1']);
    const accepted = reportOf('function=LC-1 only=CV-1 frequency=0.1', [
      'accept cause-narrowed:SC-1:LC-1:CV-1 by="A. Reviewer" date=2026-01-05 reason="Only the valve sticking leads here (invented)"',
    ]);
    expect(accepted.elements).toEqual(['C-1', 'CK-A', 'CV-1', 'IA-A', 'IO-3', 'L-1', 'UPS-A']);
    expect(accepted.inCause).toEqual(['IA-A', 'L-1']);
  });
});
