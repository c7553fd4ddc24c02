// The revision diff: the demo's two revisions give exactly the changes a reviewer lists by reading the two
// files side by side (checked by hand against `diff` of the files, 2026-12-02), and the properties any
// diff must have: A against A is empty, A->B mirrors B->A, a tag renamed everywhere is a rename, and
// reordering the statements of either side changes nothing.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  diffRevisions,
  isEmptyDiff,
  loadModelText,
  madeWorse,
  type Model,
  type RevisionDiff,
} from '../../../packages/core/src/index.ts';
import { generatedSite } from '../../helpers/generated-site.ts';
import { Random } from '../../helpers/random.ts';

const read = (name: string) => readFileSync(new URL(`../../../fixtures/demo/${name}`, import.meta.url), 'utf8');
function load(text: string, file = 'model.bulk'): Model {
  const loaded = loadModelText(file, text);
  if (!loaded.model) throw new Error(loaded.diagnostics.map((d) => d.message).join('; '));
  return loaded.model;
}
const REV_A = read('marrow-fen.bulk');
const REV_B = read('marrow-fen-rev-b.bulk');
const diff = (a: Model, b: Model) => diffRevisions({ model: a, label: 'old' }, { model: b, label: 'new' });

describe('the demo revisions A -> B, as a reviewer lists them by hand', () => {
  const d = diff(load(REV_A), load(REV_B));

  it('lists the elements revision B added and the attributes it changed', () => {
    expect(d.elements.added.map((e) => e.id)).toEqual(['BR-102', 'JB-102', 'N-102A', 'N-102B', 'TW-303']);
    expect(d.elements.removed).toEqual([]);
    expect(
      d.elements.changed.flatMap((e) => e.changes.map((c) => `${e.id} ${c.attribute}: ${c.old} -> ${c.new}`)),
    ).toEqual([
      'LT-102 housed-in: JB-101 -> JB-102',
      'LT-102 mounted-on: BR-101 -> BR-102',
      'LT-103 signal-via: AI-1-03 -> AI-2-01',
      'MS-100 signal-via: DO-1-02 -> DO-2-01',
      'TT-302B mounted-on: TW-302 -> TW-303',
      'TT-302B signal-via: AI-S-02 -> AI-S-01',
      'TW-302 title: Thermowell, SIS -> Thermowell, SIS A',
    ]);
  });

  it('lists the functions, settings and justifications revision B changed', () => {
    expect(d.functions.changed.flatMap((f) => f.changes.map((c) => `${f.id} ${c.attribute}`))).toEqual([
      'LAH-101 console',
      'LAH-101 raised-in',
      'SIF-201 pfh',
      'SIF-201 pfh-basis',
      'SIF-301 pfd-basis',
    ]);
    expect(d.settings.map((c) => c.attribute)).toEqual([
      'site based-on',
      'site description',
      'site revision',
      'site status',
    ]);
    expect(d.justifications.added).toEqual(['same-make-model:S-101:SIF-101+LAH-101:LT-103:LT-102']);
    expect(d.scenarios).toEqual({ added: [], removed: [], changed: [] });
    expect(d.renames).toEqual([]);
  });

  it('finds the ten findings the redesign removed and the one it accepted', () => {
    // Rev B gives LT-102 its own bridle and junction box, raises LAH-101 in BPCS-C2 on CON-2 (so CAB-1, CKT-11
    // and UPS-1 are no longer shared with it), gives TT-302B its own thermowell and card, and a basis to SIF-301.
    expect(d.disappeared.map((f) => f.key)).toEqual([
      'alarm-on-failed-bpcs:S-101:LIC-101+LAH-101:BPCS-C1',
      'shared-bridle:S-101:LIC-101+SIF-101:BR-101',
      'shared-housing:S-101:LIC-101+LAH-101:CAB-1',
      'shared-housing:S-101:LIC-101+SIF-101:JB-101',
      'shared-io:S-101:LIC-101+LAH-101:AI-1-03',
      'shared-support:S-101:LAH-101+SIF-101:UPS-1',
      'shared-support:S-101:LIC-101+LAH-101:CKT-11',
      'sif-claim-no-basis:S-103:SIF-301',
      'voted-group-common-cause:S-103:SIF-301:AI-S-02',
      'voted-group-common-cause:S-103:SIF-301:TW-302',
    ]);
    expect(d.appeared).toEqual([]);
    expect(d.severityChanged).toEqual([]);
    expect(d.acceptanceChanged.map((c) => [c.new.key, c.new.accepted])).toEqual([
      ['same-make-model:S-101:LAH-101+SIF-101:LT-102:LT-103', true],
    ]);
  });

  it('says three scenarios got better and none worse, with the figures before and after', () => {
    expect(d.verdicts.map((v) => `${v.scenario} ${v.change}`)).toEqual([
      'S-101 better',
      'S-102 same',
      'S-103 better',
      'S-104 better',
    ]);
    // S-101 rev B: 0.1/yr x 0.5 ignition x 0.005 x 0.1 = 2.5e-5 /yr (both layers credited), by hand.
    expect(d.verdicts[0]!.after!.mitigatedAfter).toBeCloseTo(2.5e-5, 12);
    // S-101 rev A: no layer credited: 0.1 x 0.5 = 0.05 /yr.
    expect(d.verdicts[0]!.before!.mitigatedAfter).toBeCloseTo(0.05, 12);
    expect(d.summary).toMatchObject({ worse: 0, better: 3, findingsAppeared: 0, findingsDisappeared: 10 });
    expect(madeWorse(d)).toBe(false);
    expect(madeWorse(diff(load(REV_B), load(REV_A)))).toBe(true);
  });
});

/** B -> A read back as A -> B: what was added was removed, what appeared disappeared, worse is better. */
function mirrored(d: RevisionDiff): unknown {
  const swapItems = (i: RevisionDiff['elements']) => ({
    added: i.removed,
    removed: i.added,
    changed: i.changed.map((c) => ({
      ...c,
      changes: c.changes.map((x) => ({
        attribute: x.attribute,
        ...(x.new !== undefined ? { old: x.new } : {}),
        ...(x.old !== undefined ? { new: x.old } : {}),
      })),
    })),
  });
  const flip = { worse: 'better', better: 'worse', added: 'removed', removed: 'added', same: 'same' } as const;
  return {
    elements: swapItems(d.elements),
    functions: swapItems(d.functions),
    appeared: d.disappeared.map((f) => f.key),
    disappeared: d.appeared.map((f) => f.key),
    severity: d.severityChanged.map((c) => [c.new.key, c.old.severity]),
    verdicts: d.verdicts.map((v) => [v.scenario, flip[v.change]]),
  };
}
const shape = (d: RevisionDiff) => ({
  elements: d.elements,
  functions: d.functions,
  appeared: d.appeared.map((f) => f.key),
  disappeared: d.disappeared.map((f) => f.key),
  severity: d.severityChanged.map((c) => [c.new.key, c.new.severity]),
  verdicts: d.verdicts.map((v) => [v.scenario, v.change]),
});

describe('properties of every diff', () => {
  const sites = Array.from({ length: 40 }, (_, i) => load(generatedSite(i + 1)));

  it('diff A A is empty, for the demo revisions and 40 generated sites', () => {
    for (const model of [load(REV_A), load(REV_B), ...sites]) expect(isEmptyDiff(diff(model, model))).toBe(true);
  });

  it('diff A B and diff B A are mirror images (demo and 39 pairs of generated sites)', () => {
    const pairs: [Model, Model][] = [
      [load(REV_A), load(REV_B)],
      ...sites.slice(1).map((s, i): [Model, Model] => [sites[i]!, s]),
    ];
    let nonEmpty = 0;
    for (const [a, b] of pairs) {
      const forward = diff(a, b);
      if (!isEmptyDiff(forward)) nonEmpty++;
      expect(shape(diff(b, a))).toEqual(mirrored(forward));
    }
    expect(nonEmpty).toBeGreaterThan(30);
  });

  it('reports a tag renamed everywhere as a rename, its findings as the same findings', () => {
    // LT-102 and the bridle it sits on, BR-101 (which N-101A/B carry), renamed in every statement.
    const renamed = REV_A.replace(/\bLT-102\b/g, 'LT-902').replace(/\bBR-101\b/g, 'BR-901');
    const d = diff(load(REV_A), load(renamed));
    expect(d.renames).toEqual([
      { kind: 'element', old: 'BR-101', new: 'BR-901' },
      { kind: 'element', old: 'LT-102', new: 'LT-902' },
    ]);
    expect([d.elements, d.functions]).toEqual([
      { added: [], removed: [], changed: [] },
      { added: [], removed: [], changed: [] },
    ]);
    expect([d.appeared, d.disappeared, d.severityChanged]).toEqual([[], [], []]);
    expect(d.verdicts.every((v) => v.change === 'same')).toBe(true);
  });

  it('matches a renamed function and a renamed scenario the same way', () => {
    const renamed = REV_A.replace(/\bSIF-101\b/g, 'SIF-901').replace(/\bS-101\b/g, 'S-901');
    const d = diff(load(REV_A), load(renamed));
    expect(d.renames).toEqual([
      { kind: 'function', old: 'SIF-101', new: 'SIF-901' },
      { kind: 'scenario', old: 'S-101', new: 'S-901' },
    ]);
    expect([d.appeared, d.disappeared, d.severityChanged]).toEqual([[], [], []]);
    expect(d.verdicts.find((v) => v.scenario === 'S-901')).toMatchObject({ oldId: 'S-101', change: 'same' });
  });

  it('a renamed element that also changed is a removal and an addition, not a silent rename', () => {
    const changed = REV_A.replace(/\bLT-102\b/g, 'LT-902').replace(
      'technology=radar supply=from-signal mounted-on=BR-101 signal-via=AI-S-01',
      'technology=dp supply=from-signal mounted-on=BR-101 signal-via=AI-S-01',
    );
    const d = diff(load(REV_A), load(changed));
    expect(d.renames).toEqual([]);
    expect(d.elements.removed.map((e) => e.id)).toEqual(['LT-102']);
    expect(d.elements.added.map((e) => e.id)).toEqual(['LT-902']);
  });

  it('is the same whatever the order of statements on either side', () => {
    const random = new Random(15);
    const shuffled = (m: Model): Model => ({
      ...m,
      elements: random.shuffle(m.elements),
      functions: random.shuffle(m.functions),
      scenarios: random.shuffle(m.scenarios),
    });
    const a = load(REV_A);
    const b = load(REV_B);
    const expected = JSON.stringify(diff(a, b));
    for (let i = 0; i < 5; i++) expect(JSON.stringify(diff(shuffled(a), shuffled(b)))).toBe(expected);
    expect(isEmptyDiff(diff(a, shuffled(a)))).toBe(true);
  });
});

describe('justifications a change makes stale', () => {
  it('reports the acceptance of a finding the change removed, and counts it as worse', () => {
    // Rev B accepts same-make-model for LT-102/LT-103; giving LT-103 another model removes that finding.
    const remade = REV_B.replace(
      'transmitter LT-103 variable=level make="Orrin" model="GR-7"',
      'transmitter LT-103 variable=level make="Orrin" model="GR-9"',
    );
    expect(remade).not.toBe(REV_B);
    const d = diff(load(REV_B), load(remade));
    expect(d.staleJustifications).toEqual([
      { finding: 'same-make-model:S-101:SIF-101+LAH-101:LT-103:LT-102', reason: 'it no longer matches any finding' },
    ]);
    expect(d.disappeared.map((f) => f.rule)).toEqual(['same-make-model']);
    expect(madeWorse(d)).toBe(true);
  });
});
