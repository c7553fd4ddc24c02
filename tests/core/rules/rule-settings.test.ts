// A model may raise or lower a rule's severity with a `rule` statement; the finding takes the severity in
// force, the credit follows it, and the rule set in force (analysis.rules) shows the change and its reason.
import { describe, expect, it } from 'vitest';
import { RULES } from '@bulkhead/core';
import { analyseCase } from './harness.ts';

const oneJunctionBox = {
  'JB-1': 'junction-box JB-1',
  'T-1': 'transmitter T-1 make="Acme" model="A1" mounted-on=N-1 signal-via=IO-1 housed-in=JB-1 supply=from-signal',
  'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=N-2 signal-via=IO-2 housed-in=JB-1 supply=from-signal',
};
const KEY = 'shared-housing:SC-1:LC-1+SF-1:JB-1';

describe('a rule setting in the model', () => {
  it('raises shared-housing to voids-credit: the finding, the layer and the rule set in force all say so', () => {
    const analysis = analyseCase({
      name: 'raised',
      lines: oneJunctionBox,
      extra: ['rule shared-housing severity=voids-credit reason="Owner standard MF-S-4 (invented)"'],
    });
    expect(analysis.findings.find((f) => f.key === KEY)?.severity).toBe('voids-credit');
    expect(analysis.assessments[0]!.layers[0]).toMatchObject({
      function: 'SF-1',
      verdict: 'voided',
      credited: false,
      creditedIfAccepted: false,
    });
    expect(analysis.rules.find((r) => r.id === 'shared-housing')).toEqual({
      id: 'shared-housing',
      title: RULES.find((r) => r.id === 'shared-housing')!.title,
      severity: 'voids-credit',
      defaultSeverity: 'needs-justification',
      source: RULES.find((r) => r.id === 'shared-housing')!.source,
      reason: 'Owner standard MF-S-4 (invented)',
    });
  });

  it('lowers it to a note: the layer keeps its credit and the note is still listed', () => {
    const analysis = analyseCase({
      name: 'lowered',
      lines: oneJunctionBox,
      extra: ['rule shared-housing severity=note reason="Separate glands (invented)"'],
    });
    expect(analysis.findings.find((f) => f.key === KEY)?.severity).toBe('note');
    expect(analysis.assessments[0]!.layers[0]).toMatchObject({
      function: 'SF-1',
      verdict: 'independent',
      credited: true,
    });
    expect(analysis.rules.find((r) => r.id === 'shared-housing')).toMatchObject({
      severity: 'note',
      defaultSeverity: 'needs-justification',
    });
  });

  it('by default leaves every independence rule at its default severity, with no reason', () => {
    const analysis = analyseCase({ name: 'default', lines: oneJunctionBox });
    expect(analysis.assessments[0]!.layers[0]).toMatchObject({
      verdict: 'open',
      credited: false,
      creditedIfAccepted: true,
    });
    for (const rule of RULES) {
      const inForce = analysis.rules.find((r) => r.id === rule.id);
      expect(inForce, rule.id).toMatchObject({ severity: rule.defaultSeverity, defaultSeverity: rule.defaultSeverity });
      expect(inForce, rule.id).not.toHaveProperty('reason');
    }
  });
});
