// A BPCS loop-failure cause covers all of its parts (CCPS, Guidelines for Initiating Events and IPLs, 2015):
// narrowing it needs a justification, and until one is accepted the whole loop is the cause.
import { describe, expect, it } from 'vitest';
import { analyseCase, ruleTable } from './cases.ts';

const narrowed = ['scenario SC-1 category=c', '  cause function=LC-1 only=CV-1 frequency=0.1', '  layer SF-1'];
const accept = 'accept cause-narrowed:SC-1:LC-1:CV-1 by="T. Tester (invented)" date=2026-11-01 reason="Valve failure only (test)"';
const sifOnLoopTransmitter = { 'SF-1': 'sif SF-1 sensors=T-1 solver=S-1 finals=XV-1 trip=close trip-mode=de-energise sil=2 pfd=0.01' };

ruleTable('cause-narrowed', {
  valid: [
    { name: 'whole-loop cause' },
    { name: 'element cause', scenario: ['scenario SC-1 category=c', '  cause element=CV-1 frequency=0.1', '  layer SF-1'] },
  ],
  invalid: [
    { name: 'narrowed to the control valve', scenario: narrowed, findings: [{ element: 'CV-1', parties: ['LC-1'], severity: 'needs-justification' }] },
    { name: 'narrowed and accepted', scenario: narrowed, extra: [accept], findings: [{ element: 'CV-1', parties: ['LC-1'], severity: 'needs-justification', accepted: true }] },
  ],
});

describe('a narrowed cause', () => {
  it('counts as the whole loop until accepted, so a SIF on the loop transmitter is still voided', () => {
    const findings = analyseCase({ name: 'x', scenario: narrowed, lines: sifOnLoopTransmitter });
    expect(findings.some((f) => f.rule === 'shared-sensor' && f.element === 'T-1')).toBe(true);
  });
  it('narrows to the named element once accepted, so the loop transmitter is no longer shared', () => {
    const findings = analyseCase({ name: 'y', scenario: narrowed, lines: sifOnLoopTransmitter, extra: [accept] });
    expect(findings.some((f) => f.rule === 'shared-sensor')).toBe(false);
  });
});
