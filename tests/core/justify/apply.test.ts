// applyJustifications: acceptance marks findings and never removes one; a justification that matches no
// finding is itself a finding at the `accept` statement. The findings below are invented test data.
import { describe, expect, it } from 'vitest';
import {
  applyJustifications,
  STALE_JUSTIFICATION,
  DUPLICATE_JUSTIFICATION,
} from '../../../packages/core/src/justify/index.ts';
import type { Finding } from '../../../packages/core/src/vocabulary/types.ts';
import { say } from '../../../packages/core/src/catalogue/catalogue.ts';
import { loadInvented } from '../../report/invented.ts';

const finding = (key: string, severity: Finding['severity'] = 'voids-credit'): Finding => ({
  key,
  rule: key.split(':')[0]!,
  title: 'invented',
  severity,
  scenario: 'S-1',
  parties: [{ role: 'layer', tag: 'SIF-1' }],
  paths: [],
  ...say('incomplete-trace/untraced', { function: 'invented', missing: [] }),
  message: 'invented',
  rationale: 'invented',
  source: 'invented',
});
const accept = (key: string, by = 'A', date = '2024-01-01', reason = 'ok') => ({ finding: key, by, date, reason });

describe('applyJustifications', () => {
  it('should leave findings untouched and report nothing when there are no justifications', () => {
    const input = [finding('r:S-1:a'), finding('r:S-1:b')];
    const out = applyJustifications(input, undefined);
    expect(out.findings).toEqual(input);
    expect(out.stale).toEqual([]);
  });

  it('should mark the finding whose key matches as accepted and keep every finding in order', () => {
    const input = [finding('r:S-1:a'), finding('r:S-1:b', 'needs-justification')];
    const out = applyJustifications(input, [accept('r:S-1:b', 'A. Reviewer', '2024-05-01', 'checked')]);
    expect(out.findings.map((f) => f.key)).toEqual(['r:S-1:a', 'r:S-1:b']);
    expect(out.findings[0]!.accepted).toBeUndefined();
    expect(out.findings[1]!.accepted).toEqual({ by: 'A. Reviewer', date: '2024-05-01', reason: 'checked' });
    expect(out.findings[1]!.severity).toBe('needs-justification');
    expect(input[1]!.accepted).toBeUndefined(); // the input is not mutated
    expect(out.stale).toEqual([]);
  });

  it('should match keys exactly, not by prefix or case', () => {
    const out = applyJustifications([finding('r:S-1:a')], [accept('r:S-1'), accept('R:S-1:A')]);
    expect(out.findings[0]!.accepted).toBeUndefined();
    expect(out.stale.map((f) => f.key).sort()).toEqual([
      `${STALE_JUSTIFICATION}:R:S-1:A`,
      `${STALE_JUSTIFICATION}:r:S-1`,
    ]);
  });

  it('should turn a justification that matches no finding into a needs-justification finding', () => {
    const out = applyJustifications([finding('r:S-1:a')], [accept('gone:S-9', 'B', '2024-06-01')]);
    expect(out.stale).toHaveLength(1);
    const stale = out.stale[0]!;
    expect(stale.rule).toBe(STALE_JUSTIFICATION);
    expect(stale.severity).toBe('needs-justification');
    expect(stale.key).toBe(`${STALE_JUSTIFICATION}:gone:S-9`);
    expect(stale.messageId).toBe('stale-justification/matches-nothing');
    expect(stale.data).toEqual({ key: 'gone:S-9', by: 'B', date: '2024-06-01' });
    expect(stale.message).toBe('the justification for `gone:S-9` (by B, 2024-06-01) matches no finding');
    expect(stale.accepted).toBeUndefined();
  });

  it('should point a stale finding at the accept statement in the model file', () => {
    const loaded = loadInvented();
    const out = applyJustifications([], loaded.model.justifications, loaded.spans);
    // The invented model has two accept statements on lines 20 and 21 and no findings here: both are stale.
    expect(out.stale.map((f) => f.key)).toEqual([
      `${STALE_JUSTIFICATION}:no-such-finding:S-9`,
      `${STALE_JUSTIFICATION}:same-make-model:S-1:LIC-1:SIF-1:LT-2`,
    ]);
    expect(out.locations[`${STALE_JUSTIFICATION}:no-such-finding:S-9`]).toMatchObject({ line: 21, column: 8 });
    expect(out.locations[`${STALE_JUSTIFICATION}:same-make-model:S-1:LIC-1:SIF-1:LT-2`]).toMatchObject({
      line: 20,
      column: 8,
    });
  });

  it('should not let a justification accept a stale finding (it is stale itself)', () => {
    const out = applyJustifications([], [accept('gone'), accept(`${STALE_JUSTIFICATION}:gone`)]);
    expect(out.stale.map((f) => f.key)).toEqual([
      `${STALE_JUSTIFICATION}:gone`,
      `${STALE_JUSTIFICATION}:${STALE_JUSTIFICATION}:gone`,
    ]);
  });

  it('should keep the most recent of two acceptances, whatever their order, and note the duplicate', () => {
    const older = accept('r:S-1:a', 'A', '2023-01-01', 'old');
    const newer = accept('r:S-1:a', 'B', '2024-01-01', 'new');
    for (const order of [
      [older, newer],
      [newer, older],
    ]) {
      const out = applyJustifications([finding('r:S-1:a')], order);
      expect(out.findings[0]!.accepted).toEqual({ by: 'B', date: '2024-01-01', reason: 'new' });
      expect(out.stale.map((f) => [f.rule, f.severity])).toEqual([[DUPLICATE_JUSTIFICATION, 'note']]);
      expect(out.stale.map((f) => [f.messageId, f.data])).toEqual([
        ['duplicate-justification/accepted-again', { key: 'r:S-1:a', count: 2, by: 'B', date: '2024-01-01' }],
      ]);
    }
  });

  describe('a key written with the two layers the other way round (keys once followed list order)', () => {
    const pair = (rule: string, key: string, element: string): Finding => ({
      ...finding(key, 'needs-justification'),
      rule,
      parties: [
        { role: 'layer', tag: 'AL-1' },
        { role: 'layer', tag: 'SIF-1' },
      ],
      element,
    });

    it('still accepts a shared-element finding, and is not stale', () => {
      const input = [pair('shared-housing', 'shared-housing:S-1:AL-1+SIF-1:CAB-1', 'CAB-1')];
      const out = applyJustifications(input, [accept('shared-housing:S-1:SIF-1+AL-1:CAB-1')]);
      expect(out.findings[0]!.accepted).toBeDefined();
      expect(out.findings[0]!.key).toBe('shared-housing:S-1:AL-1+SIF-1:CAB-1');
      expect(out.stale).toEqual([]);
    });

    it('still accepts a same-make-model finding, whose two devices swap places too', () => {
      const input = [pair('same-make-model', 'same-make-model:S-1:AL-1+SIF-1:LT-2:LT-1', 'LT-2')];
      expect(
        applyJustifications(input, [accept('same-make-model:S-1:SIF-1+AL-1:LT-1:LT-2')]).findings[0]!.accepted,
      ).toBeDefined();
      const wrong = applyJustifications(input, [accept('same-make-model:S-1:SIF-1+AL-1:LT-2:LT-1')]);
      expect(wrong.findings[0]!.accepted).toBeUndefined();
      expect(wrong.stale.map((f) => f.rule)).toEqual([STALE_JUSTIFICATION]);
    });

    it('does not swap a cause and a layer: the cause is always named first', () => {
      const input = [
        {
          ...finding('shared-io:S-1:LIC-1+SIF-1:IO-1'),
          rule: 'shared-io',
          parties: [
            { role: 'cause' as const, tag: 'LIC-1' },
            { role: 'layer' as const, tag: 'SIF-1' },
          ],
          element: 'IO-1',
        },
      ];
      expect(
        applyJustifications(input, [accept('shared-io:S-1:SIF-1+LIC-1:IO-1')]).findings[0]!.accepted,
      ).toBeUndefined();
    });
  });
});
