// The words beside the LOPA figures (apps/viewer/src/lib/lopa-words.ts) and a finding's proof
// (apps/viewer/src/lib/proof.ts), on the demo's analysis: they must name what the analysis decided.
import { readFileSync } from 'node:fs';
import { analyze, loadModelText } from '@bulkhead/core';
import { scenarioScene } from '@bulkhead/layout';
import { describe, expect, it } from 'vitest';
import { groupByLayer, layerWhy, sifNeedWords } from '../../apps/viewer/src/lib/lopa-words.ts';
import { acceptStatement, chainsOf } from '../../apps/viewer/src/lib/proof.ts';

const file = new URL('../../fixtures/demo/marrow-fen.bulk', import.meta.url);
const loaded = loadModelText('marrow-fen.bulk', readFileSync(file));
const model = loaded.model!;
const analysis = analyze(model, { spans: loaded.spans });
const s101 = analysis.assessments.find((a) => a.scenario === 'S-101')!;

describe('sifNeedWords', () => {
  it("should say an independent SIF is needed when the scenario's own SIF is voided (demo S-101: SIF-101 on the loop's bridle)", () => {
    const sif101 = s101.layers.find((l) => l.function === 'SIF-101')!;
    expect(sif101.credited).toBe(false);
    expect(sifNeedWords(s101)).toBe(
      `an independent SIF needs SIL ${s101.sif!.sil} (SIF-101 as drawn has no credit: voided, shares BR-101 with the cause (shared-bridle))`,
    );
  });

  it('should name the SIF plainly when it keeps its credit', () => {
    for (const a of analysis.assessments.filter(
      (x) => x.sif?.function && x.layers.find((l) => l.function === x.sif!.function)?.credited,
    )) {
      expect(sifNeedWords(a)).toMatch(new RegExp(`^${a.sif!.function} needs (SIL \\d|no SIL|more than SIL 4)$`));
    }
  });
});

describe('layerWhy', () => {
  it('should name each deciding finding by its element and rule, and say nothing for a credited layer with none', () => {
    for (const a of analysis.assessments) {
      for (const layer of a.layers) {
        const deciding = (layer.reasons ?? []).filter((r) => !r.accepted && r.effect !== 'note');
        const why = layerWhy(layer);
        if (deciding.length === 0) expect(why).toBe('');
        for (const r of deciding) expect(why).toContain(`(${r.rule})`);
      }
    }
  });
});

describe('groupByLayer', () => {
  it('should put every finding of a scenario in exactly one group, under the first layer it names', () => {
    for (const s of model.scenarios) {
      const layers = (s.layers ?? []).map((l) => l.function);
      const findings = analysis.findings.filter((f) => f.scenario === s.id);
      const groups = groupByLayer(findings, layers);
      expect(groups.flatMap((g) => g.findings).length).toBe(findings.length);
      for (const g of groups) {
        for (const f of g.findings) {
          const first = layers.find((t) => f.parties.some((p) => p.role === 'layer' && p.tag === t));
          expect(g.layer, f.key).toBe(first);
        }
      }
    }
  });
});

describe('chainsOf', () => {
  it('should give one chain per party, ending before the shared element they meet at', () => {
    const finding = analysis.findings.find((f) => f.rule === 'shared-bridle' && f.scenario === 'S-101')!;
    const scene = scenarioScene(model, analysis, 'S-101');
    const proof = chainsOf(finding, scene.sides, scene.findings.find((p) => p.key === finding.key)?.through?.nodes);
    expect(proof.meeting).toBe('BR-101');
    expect(proof.chains.map((c) => c.tags)).toEqual(finding.paths.map((p) => p.slice(0, -1)));
    expect(proof.chains.map((c) => c.letter)).toEqual(['C', '1']);
    // The bridle is mounted on two nozzles (the demo's N-101A and N-101B); both sides reach them through it.
    expect(proof.through).toEqual(['N-101A', 'N-101B']);
  });
});

describe('acceptStatement', () => {
  it('should write an accept statement with the date of the day given', () => {
    expect(acceptStatement('k:S-1:A+B:X', new Date(2026, 11, 2))).toBe(
      'accept k:S-1:A+B:X by="NAME" date=2026-12-02 reason="WHY THE TEAM ACCEPTS IT"',
    );
  });
});
