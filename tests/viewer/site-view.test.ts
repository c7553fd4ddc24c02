// What the analysis worker hands the page (apps/viewer/src/lib/site-view.ts): the site summary and the
// view of one focus must say exactly what the analysis says, only smaller.
import { readFileSync } from 'node:fs';
import { analyze, loadModelText, SEVERITY_RANK } from '@bulkhead/core';
import { describe, expect, it } from 'vitest';
import {
  focusView,
  OVERVIEW_FINDINGS_SHOWN,
  searchTags,
  SEARCH_LIMIT,
  summariseSite,
} from '../../apps/viewer/src/lib/site-view.ts';

const file = new URL('../../fixtures/demo/marrow-fen.bulk', import.meta.url);
const loaded = loadModelText('marrow-fen.bulk', readFileSync(file));
const model = loaded.model!;
const analysis = analyze(model, { spans: loaded.spans });

describe('summariseSite', () => {
  it('should give every scenario in model order with its verdicts, open findings and layers', () => {
    const summary = summariseSite(model, analysis);
    expect(summary.scenarios.map((s) => s.id)).toEqual(model.scenarios.map((s) => s.id));
    expect(summary.elements).toBe(model.elements.length);
    for (const row of summary.scenarios) {
      const a = analysis.assessments.find((x) => x.scenario === row.id)!;
      expect([row.claimed, row.after]).toEqual([a.meetsClaimed, a.meetsAfter]);
      expect(row.open).toBe(
        analysis.findings.filter((f) => f.scenario === row.id && f.severity !== 'note' && !f.accepted).length,
      );
      expect(row.layers).toEqual((model.scenarios.find((s) => s.id === row.id)!.layers ?? []).map((l) => l.function));
    }
    // The demo's S-101 has open findings (its SIF shares the loop's bridle), so the count is not trivially 0.
    expect(summary.scenarios.find((s) => s.id === 'S-101')!.open).toBeGreaterThan(0);
  });
});

describe('focusView', () => {
  it("should give a scenario's own findings, assessment and scene", () => {
    const view = focusView(model, analysis, 'S-101');
    expect(view.focus).toBe('S-101');
    expect(view.findings).toEqual(analysis.findings.filter((f) => f.scenario === 'S-101'));
    expect(view.findingTotal).toBe(view.findings.length);
    expect(view.assessment).toEqual(analysis.assessments.find((a) => a.scenario === 'S-101'));
    expect(view.scene.scenario).toBe('S-101');
  });

  it('should give the overview, most severe findings first, for no focus or an unknown one', () => {
    for (const focus of [undefined, 'S-NONE']) {
      const view = focusView(model, analysis, focus);
      expect(view.focus).toBeUndefined();
      expect(view.scene.view).toBe('overview');
      expect(view.findingTotal).toBe(analysis.findings.length);
      expect(view.findings).toHaveLength(Math.min(OVERVIEW_FINDINGS_SHOWN, analysis.findings.length));
      const ranks = view.findings.map((f) => SEVERITY_RANK[f.severity]);
      expect(ranks).toEqual([...ranks].sort((a, b) => b - a));
      expect(new Set(view.findings.map((f) => f.key))).toEqual(new Set(analysis.findings.map((f) => f.key)));
    }
  });
});

describe('searchTags', () => {
  it('should find tags by any part, case-insensitive, the whole tag first, with the scenarios relying on each', () => {
    const matches = searchTags(model, analysis, 'lt-10');
    const tags = matches.map((m) => m.tag);
    expect(tags).toEqual(expect.arrayContaining(['LT-101', 'LT-102', 'LT-103']));
    expect(tags.every((t) => t.toLowerCase().includes('lt-10'))).toBe(true);
    expect(searchTags(model, analysis, 'UPS-1')[0]!.tag).toBe('UPS-1');
    for (const m of matches) {
      const relying = new Set([
        m.tag,
        ...analysis.traces.filter((t) => t.elements.some((e) => e.tag === m.tag)).map((t) => t.function),
      ]);
      const expected = model.scenarios
        .filter((s) =>
          [s.cause.function ?? s.cause.element, ...(s.layers ?? []).map((l) => l.function)].some(
            (t) => t && relying.has(t),
          ),
        )
        .map((s) => s.id);
      expect(m.scenarios, m.tag).toEqual(expected);
    }
  });

  it('should find nothing for a blank query or a tag the site does not have', () => {
    expect(searchTags(model, analysis, '  ')).toEqual([]);
    expect(searchTags(model, analysis, 'no-such-tag')).toEqual([]);
  });

  it(`should answer at most ${SEARCH_LIMIT} tags`, () => {
    expect(searchTags(model, analysis, '-').length).toBe(
      Math.min(SEARCH_LIMIT, [...model.elements, ...model.functions].filter((x) => x.tag.includes('-')).length),
    );
  });
});
