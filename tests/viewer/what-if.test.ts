// What-if (apps/viewer/src/lib/what-if.ts) on the demo models: the changed model, never the input,
// and the lines that would make the change in the file.
import { readFileSync } from 'node:fs';
import { analyze, loadModelText, printBulk } from '@bulkhead/core';
import { describe, expect, it } from 'vitest';
import { applyWhatIf, isWhatIf, NO_WHAT_IF, statementsToPaste, twinTag } from '../../apps/viewer/src/lib/what-if.ts';

const load = (name: string) =>
  loadModelText(name, readFileSync(new URL(`../../fixtures/demo/${name}`, import.meta.url))).model!;
const revA = load('marrow-fen.bulk');
const revB = load('marrow-fen-rev-b.bulk');

describe('applyWhatIf', () => {
  it('should change nothing and need no statement without a question', () => {
    expect(isWhatIf(NO_WHAT_IF)).toBe(false);
    const same = applyWhatIf(revA, NO_WHAT_IF, '2026-12-02');
    expect(printBulk(same)).toBe(printBulk(revA));
    expect(statementsToPaste(revA, same)).toEqual({ add: [], remove: [] });
  });

  it('should accept a finding for the question, leaving the input model as it was', () => {
    const key = analyze(revA).findings.find((f) => f.severity === 'needs-justification' && !f.accepted)!.key;
    const text = printBulk(revA);
    const changed = applyWhatIf(revA, { ...NO_WHAT_IF, accept: [key] }, '2026-12-02');
    expect(printBulk(revA)).toBe(text);
    expect(analyze(changed).findings.find((f) => f.key === key)!.accepted).toBeDefined();
    expect(statementsToPaste(revA, changed).add).toEqual([
      `accept ${key} by="WHAT-IF" date=2026-12-02 reason="What-if in the viewer: the team has not decided this"`,
    ]);
  });

  it("should withdraw an acceptance the model records (revision B's one justification)", () => {
    const key = revB.justifications![0]!.finding;
    const changed = applyWhatIf(revB, { ...NO_WHAT_IF, reject: [key] }, '2026-12-02');
    expect(analyze(changed).findings.find((f) => f.key === key)?.accepted).toBeUndefined();
    expect(statementsToPaste(revB, changed).remove).toHaveLength(1);
    expect(statementsToPaste(revB, changed).remove[0]).toMatch(
      new RegExp(`^accept ${key.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')} `),
    );
  });

  it('should give the relier its own copy of the element under an unused tag, and ignore a relier that does not link to it', () => {
    expect(twinTag(revA, 'BR-101')).toBe('BR-101-TWIN');
    const changed = applyWhatIf(
      revA,
      { ...NO_WHAT_IF, twins: [{ element: 'BR-101', relier: 'LT-102' }] },
      '2026-12-02',
    );
    expect(changed.elements.find((e) => e.tag === 'LT-102')!.mountedOn).toEqual(['BR-101-TWIN']);
    expect(changed.elements.find((e) => e.tag === 'LT-101')!.mountedOn).toEqual(['BR-101']);
    expect(changed.elements.find((e) => e.tag === 'BR-101-TWIN')!.kind).toBe('bridle');
    expect(twinTag(changed, 'BR-101')).toBe('BR-101-TWIN2');
    const untouched = applyWhatIf(
      revA,
      { ...NO_WHAT_IF, twins: [{ element: 'BR-101', relier: 'XV-101' }] },
      '2026-12-02',
    );
    expect(untouched.elements.length).toBe(revA.elements.length);
  });
});
