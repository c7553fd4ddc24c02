// No path from missing data to "independent" (issue 9, Done when): deleting any one dependency link, supply
// declaration or support from a valid generated site (site-arbitrary.ts, invented test data) never turns an
// unverified layer into an independent one, and never turns a voided or open layer into an independent one
// unless the deleted link was the shared one: it pointed at an element a finding against that layer named,
// or at the element through which the layer reached it. The conservative rule of this tool (what the model
// does not say is never independence), checked over every single deletion.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyze, LINK_FIELDS, loadModelText, type Analysis, type Model } from '@bulkhead/core';
import { sharingArb, siteArb, siteText } from './site-arbitrary.ts';

const SUPPORT_KINDS = new Set(['power-supply', 'ups', 'circuit', 'air-header', 'hydraulic-supply']);

interface Deletion {
  what: string;
  /** The element the deleted link pointed at, or the support deleted. */
  target: string;
  model: Model;
}

type Links = Partial<Record<(typeof LINK_FIELDS)[number], string[]>> & { supply?: string };

/** Every model with exactly one link, one supply= declaration or one support element taken out. */
function deletions(model: Model): Deletion[] {
  const out: Deletion[] = [];
  model.elements.forEach((element, i) => {
    const links = element as Links;
    for (const field of LINK_FIELDS) {
      (links[field] ?? []).forEach((target, j) => {
        const copy = structuredClone(model);
        const list = (copy.elements[i] as Links)[field]!;
        list.splice(j, 1);
        if (list.length === 0) delete (copy.elements[i] as Links)[field];
        out.push({ what: `${element.tag}.${field}=${target}`, target, model: copy });
      });
    }
    if (links.supply !== undefined) {
      const copy = structuredClone(model);
      delete (copy.elements[i] as Links).supply;
      out.push({ what: `${element.tag}.supply`, target: element.tag, model: copy });
    }
    if (SUPPORT_KINDS.has(element.kind)) {
      const copy = structuredClone(model);
      copy.elements.splice(i, 1);
      for (const other of copy.elements as Links[]) {
        for (const field of LINK_FIELDS) {
          const kept = other[field]?.filter((t) => t !== element.tag);
          if (kept === undefined) continue;
          if (kept.length > 0) other[field] = kept;
          else delete other[field];
        }
      }
      out.push({ what: `support ${element.tag}`, target: element.tag, model: copy });
    }
  });
  return out;
}

/** What each layer's findings named before: the shared elements and the elements each path passed on the way. */
function sharedFor(analysis: Analysis, layer: string): Set<string> {
  const tags = new Set<string>();
  for (const f of analysis.findings) {
    if (!f.parties.some((p) => p.role === 'layer' && p.tag === layer) || f.element === undefined) continue;
    tags.add(f.element);
    for (const path of f.paths) for (const t of path.slice(1)) tags.add(t);
  }
  return tags;
}

const siteWithSharings = siteArb.chain((site) =>
  fc.tuple(
    fc.constant(site),
    fc.array(sharingArb(site), { maxLength: site.layers.length > 1 || site.cause === 'loop' ? 2 : 0 }),
  ),
);

describe('deleting one link or support', () => {
  it('never turns unverified into independent, nor voided or open into independent unless the link was the shared one', () => {
    fc.assert(
      fc.property(siteWithSharings, ([site, sharings]) => {
        const loaded = loadModelText('property.bulk', siteText(site, sharings));
        if (!loaded.model || loaded.diagnostics.length > 0) throw new Error('generated site does not load cleanly');
        const before = analyze(loaded.model);
        const verdicts = new Map(before.assessments[0]!.layers.map((l) => [l.function, l.verdict]));
        for (const d of deletions(loaded.model)) {
          for (const layer of analyze(d.model).assessments[0]!.layers) {
            const was = verdicts.get(layer.function);
            // "Not selected" is the credit choice between independent layers, not a verdict on independence:
            // it may become independent when a deletion leaves its rival unverified.
            if (layer.verdict !== 'independent' || was === 'independent' || was === 'not-selected') continue;
            const why = `${layer.function} was ${was}, became independent after deleting ${d.what}`;
            expect(was, why).not.toBe('unverified');
            expect(sharedFor(before, layer.function).has(d.target), why).toBe(true);
          }
        }
      }),
      { numRuns: 25 },
    );
  });

  it("finds deletions that matter: taking out a SIF solver's supply leaves it unverified, not independent", () => {
    // The converse, so the property cannot pass by never changing a verdict.
    const loaded = loadModelText(
      'one.bulk',
      siteText({
        cause: 'loop',
        layers: [
          { kind: 'sif', channels: 1, connection: 'nozzle', tripMode: 'energise', failsTo: 'closed', pfd: 0.01 },
        ],
      }),
    );
    const cut = deletions(loaded.model!).find((d) => d.what === 'S1.poweredBy=K1')!;
    expect(analyze(cut.model).assessments[0]!.layers[0]).toMatchObject({
      function: 'F1',
      verdict: 'unverified',
      credited: false,
    });
  });
});
