// Properties of the independence analysis over generated sites (site-arbitrary.ts, invented test data):
// sharing never adds credit, a site with nothing shared has no independence finding, and tags are names.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyze, loadModelText, RULE_IDS, type Analysis, type ScenarioAssessment } from '@bulkhead/core';
import { canonicalTags, sharingArb, siteArb, siteText, tagArb, type Sharing } from './site-arbitrary.ts';

function analysed(text: string): Analysis {
  const loaded = loadModelText('property.bulk', text);
  if (!loaded.model || loaded.diagnostics.length > 0) {
    throw new Error(
      `generated site does not load cleanly: ${loaded.diagnostics.map((d) => `${d.code} ${d.message} at ${d.span?.line}`).join('; ')}\n${text}`,
    );
  }
  return analyze(loaded.model, { spans: loaded.spans });
}

const siteWithSharings = siteArb.chain((site) =>
  fc.tuple(
    fc.constant(site),
    fc.array(sharingArb(site), { maxLength: site.layers.length > 1 || site.cause === 'loop' ? 3 : 0 }),
  ),
);

describe('independence properties', () => {
  it('adding a shared dependency between two sides never increases the credit they get', () => {
    // Each sharing hangs a fresh element (tapping, circuit, junction box, network, cabinet, air header) on
    // the same part of two sides; the credit is read from the assessment after each one.
    fc.assert(
      fc.property(siteWithSharings, ([site, sharings]) => {
        let before = analysed(siteText(site)).assessments[0]!;
        for (let k = 1; k <= sharings.length; k++) {
          const after = analysed(siteText(site, sharings.slice(0, k))).assessments[0]!;
          expect(after.mitigatedAfter).toBeGreaterThanOrEqual(before.mitigatedAfter * (1 - 1e-12));
          expect(after.layers.filter((l) => l.credited).length).toBeLessThanOrEqual(
            before.layers.filter((l) => l.credited).length,
          );
          before = after;
        }
      }),
      { numRuns: 80 },
    );
  });

  it('a site in which nothing is shared between cause and layers or between layers gives no independence finding', () => {
    fc.assert(
      fc.property(siteArb, (site) => {
        const analysis = analysed(siteText(site));
        expect(analysis.findings.filter((f) => RULE_IDS.has(f.rule)).map((f) => f.key)).toEqual([]);
        // Nothing bears on any layer but the assessment's own limits (at most two BPCS layers).
        for (const layer of analysis.assessments[0]!.layers) {
          expect(layer.reasons?.filter((r) => RULE_IDS.has(r.rule)) ?? [], layer.function).toEqual([]);
          expect(['independent', 'not-selected'], layer.function).toContain(layer.verdict);
        }
      }),
      { numRuns: 60 },
    );
  });

  it('a single shared dependency between the cause loop and a layer is found', () => {
    // The converse of the last property, so that it cannot pass by finding nothing anywhere.
    const withLayer = siteArb.filter((s) => s.cause === 'loop' && s.layers.some((l) => l.kind !== 'device'));
    fc.assert(
      fc.property(
        withLayer,
        fc.constantFrom<Sharing['kind']>('tapping', 'sensor-circuit', 'network', 'cabinet'),
        (site, kind) => {
          const layer = site.layers.findIndex((l) => l.kind !== 'device') + 1;
          const analysis = analysed(siteText(site, [{ kind, between: [0, layer] }]));
          const found = analysis.findings.filter((f) => RULE_IDS.has(f.rule) && f.element === 'SH0');
          expect(found.map((f) => f.parties.map((p) => p.tag))).toEqual([['LOOP0', `F${layer}`]]);
        },
      ),
      { numRuns: 40 },
    );
  });

  it('renaming every tag changes no verdict, credit or figure', () => {
    const renamed = siteWithSharings.chain(([site, sharings]) => {
      const tags = canonicalTags(site, sharings);
      const names = fc.uniqueArray(tagArb, {
        minLength: tags.length,
        maxLength: tags.length,
        comparator: (a, b) => a.toLowerCase() === b.toLowerCase(),
      });
      return fc.tuple(fc.constant(site), fc.constant(sharings), names);
    });
    fc.assert(
      fc.property(renamed, ([site, sharings, names]) => {
        const tags = canonicalTags(site, sharings);
        const map = new Map(tags.map((t, i) => [t, names[i]!]));
        const back = new Map(tags.map((t, i) => [names[i]!, t]));
        const before = analysed(siteText(site, sharings));
        const tied = before.assessments.some(hasTie);
        const after = analysed(siteText(site, sharings, (t) => map.get(t) ?? t));
        expect(decisions(after, (t) => back.get(t) ?? t, tied)).toEqual(decisions(before, (t) => t, tied));
      }),
      { numRuns: 60 },
    );
  });
});

/**
 * Whether two layers of equal PFD are credited differently. Then the choice between them is an exact tie,
 * which assess/credit.ts breaks by tag in lexicographic order (by design, tests/core/assess/credit.test.ts),
 * so a renaming may choose the other one: the figures stay equal, the layer verdicts may not.
 */
function hasTie(a: ScenarioAssessment): boolean {
  return a.layers.some((x) =>
    a.layers.some(
      (y) =>
        x !== y &&
        ((x.allowedPfd === y.allowedPfd && x.credited !== y.credited) ||
          ((x.allowedPfdIfAccepted ?? x.allowedPfd) === (y.allowedPfdIfAccepted ?? y.allowedPfd) &&
            x.creditedIfAccepted !== y.creditedIfAccepted)),
    ),
  );
}

const figure = (x: number) => Number(x.toPrecision(12));

/** The decisions of an analysis with every tag mapped back to its canonical name; layer choices unless tied. */
function decisions(analysis: Analysis, canonical: (tag: string) => string, tied: boolean) {
  return analysis.assessments.map((a) => ({
    scenario: canonical(a.scenario),
    figures: [a.mitigatedClaimed, a.mitigatedAfter, a.mitigatedIfAccepted, a.gap].map(figure),
    meets: [a.meetsClaimed, a.meetsAfter, a.meetsIfAccepted],
    findings: analysis.findings
      .filter((f) => f.scenario === a.scenario)
      .map((f) => `${f.rule} ${f.severity} ${f.element === undefined ? '-' : canonical(f.element)}`)
      .sort(),
    ...(tied
      ? {}
      : {
          sil: a.sif?.sil,
          layers: a.layers.map((l) => ({
            fn: canonical(l.function),
            verdict: l.verdict,
            credited: l.credited,
            creditedIfAccepted: l.creditedIfAccepted,
            allowedPfd: l.allowedPfd,
          })),
        }),
  }));
}
