// The harness itself: it must refuse a broken table and a case that does not load cleanly, and it must
// see a wrong expectation, or a passing table would prove nothing.
import { describe, expect, it } from 'vitest';
import { analyseCase, checkTable, ruleFindings, type Case, type InvalidCase } from './harness.ts';

const sharedOnN1 = {
  'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=N-1 signal-via=IO-2 supply=from-signal',
};
const onN1: InvalidCase = {
  name: 'on N-1',
  lines: sharedOnN1,
  findings: [
    {
      key: 'shared-process-connection:SC-1:LC-1+SF-1:N-1',
      messageId: 'shared-process-connection/shared',
      severity: 'voids-credit',
      element: 'N-1',
      parties: ['LC-1', 'SF-1'],
    },
  ],
};
const onTapping: InvalidCase = {
  ...onN1,
  name: 'on TP-1',
  lines: {
    'TP-1': 'tapping TP-1 mounted-on=V-1',
    'T-1': 'transmitter T-1 mounted-on=TP-1 signal-via=IO-1 supply=from-signal',
    'T-2': 'transmitter T-2 mounted-on=TP-1 signal-via=IO-2 supply=from-signal',
  },
};
const valid: Case[] = [{ name: 'base' }, { name: 'a second UPS title', lines: { 'UPS-B': 'ups UPS-B title="B"' } }];
const sound = { valid, invalid: [onN1, onTapping] };

describe('the rule case harness', () => {
  it('accepts a sound table', () => {
    expect(() => checkTable('shared-process-connection', sound)).not.toThrow();
  });

  it('rejects a case that repeats another model, even under another name or spacing', () => {
    const again: Case = { name: 'base again', lines: { 'UPS-A': 'ups  UPS-A' } };
    expect(() => checkTable('shared-process-connection', { ...sound, valid: [...valid, again] })).toThrow(
      /cases "base" and "base again" are the same model/,
    );
  });

  it('rejects two cases with one name', () => {
    expect(() =>
      checkTable('shared-process-connection', { ...sound, invalid: [onN1, { ...onTapping, name: 'on N-1' }] }),
    ).toThrow(/2 cases are named "on N-1"/);
  });

  it('rejects an unknown rule, a short table, a foreign key, a finding listed twice and an invalid case without findings', () => {
    expect(() => checkTable('shared-nothing', sound)).toThrow(/no rule `shared-nothing`/);
    expect(() => checkTable('shared-process-connection', { valid: [valid[0]!], invalid: [onN1] })).toThrow(
      /1 valid cases.*1 invalid cases/,
    );
    expect(() => checkTable('shared-bridle', sound)).toThrow(/is not a key of rule shared-bridle/);
    expect(() =>
      checkTable('shared-process-connection', {
        ...sound,
        invalid: [onTapping, { ...onN1, findings: [onN1.findings[0]!, onN1.findings[0]!] }],
      }),
    ).toThrow(/lists a finding twice/);
    expect(() =>
      checkTable('shared-process-connection', { ...sound, invalid: [onTapping, { ...onN1, findings: [] }] }),
    ).toThrow(/lists no finding/);
  });

  it('fails loudly on a case that does not load cleanly, naming the diagnostic', () => {
    expect(() =>
      analyseCase({
        name: 'typo',
        lines: { 'T-2': 'transmitter T-2 mounted-on=N-9 signal-via=IO-2 supply=from-signal' },
      }),
    ).toThrow(/case "typo" does not load cleanly: BH300/);
  });

  it('sees a wrong severity, a missing finding and an extra one', () => {
    const got = ruleFindings('shared-process-connection', onN1);
    expect(got).toEqual(onN1.findings);
    expect(got).not.toEqual([{ ...onN1.findings[0]!, severity: 'note' }]);
    expect(got).not.toEqual([]);
    expect(ruleFindings('shared-process-connection', { name: 'base' })).not.toEqual(onN1.findings);
  });

  it('sees a wrong message id, wrong message data and a wrong position when a case gives them', () => {
    const want = onN1.findings[0]!;
    const pinned = {
      ...want,
      data: {
        a: { role: 'cause', tag: 'LC-1', functionKind: 'loop' },
        b: { role: 'layer', tag: 'SF-1' },
        element: 'N-1',
        kind: 'nozzle',
        severity: 'voids-credit',
        beneath: [],
      },
      at: '27:9',
    };
    expect(ruleFindings('shared-process-connection', onN1, [pinned])).toEqual([pinned]);
    expect(ruleFindings('shared-process-connection', onN1)).not.toEqual([
      { ...want, messageId: 'shared-bridle/shared' },
    ]);
    const wrongData = { ...pinned, data: { ...pinned.data, element: 'N-2' } };
    expect(ruleFindings('shared-process-connection', onN1, [wrongData])).not.toEqual([wrongData]);
    const wrongPlace = { ...pinned, at: '26:9' };
    expect(ruleFindings('shared-process-connection', onN1, [wrongPlace])).not.toEqual([wrongPlace]);
  });
});
