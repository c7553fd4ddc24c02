// Findings and loader diagnostics share one renderer (the notice look): verdict and what is shared first,
// then where, the path from each side, why and the key. Pinned on a small site built from the rule-table
// base (invented data, for the look only; the verdict itself is pinned by the rule tables).
import { describe, expect, it } from 'vitest';
import { analyze, loadModelText, ModelLocator, renderFindingText } from '@bulkhead/core';
import { BASE, BASE_SCENARIO } from '../core/rules/harness.ts';

function site(layerLine: string): string {
  const lines = { ...BASE, 'BR-1': 'bridle BR-1 mounted-on=N-1,N-2' } as Record<string, string>;
  lines['T-1'] = 'transmitter T-1 make="Acme" model="A1" mounted-on=BR-1 signal-via=IO-1';
  lines['T-2'] = 'transmitter T-2 make="Brill" model="B2" mounted-on=BR-1 signal-via=IO-2';
  return [...Object.values(lines), ...BASE_SCENARIO.slice(0, 2), layerLine].join('\n') + '\n';
}

function renderOnly(text: string): string {
  const loaded = loadModelText('site.bulk', text);
  if (!loaded.model) throw new Error(JSON.stringify(loaded.diagnostics));
  const analysis = analyze(loaded.model, { spans: loaded.spans });
  const finding = analysis.findings.find((f) => f.rule === 'shared-bridle');
  if (!finding) throw new Error('no shared-bridle finding');
  return renderFindingText(finding, loaded.source, new ModelLocator(loaded.model, loaded.spans));
}

describe('a finding in the notice look', () => {
  it('reads verdict first, then where, paths, element, why and key', () => {
    const text = site('  layer SF-1');
    const line = text.split('\n').findIndex((l) => l === '  layer SF-1') + 1;
    const bridleLine = text.split('\n').findIndex((l) => l.startsWith('bridle BR-1')) + 1;
    const out = renderOnly(text).split('\n');
    expect(out[0]).toMatch(
      /^Credit voided: layer `SF-1` and the failing loop `LC-1` both rely on bridle or manifold `BR-1`/,
    );
    expect(out[1]).toBe(`  where    site.bulk:${line}:9, the claim of layer SF-1`);
    expect(out[2]).toBe('           ┆   layer SF-1');
    expect(out[3]).toBe('           ┆         ‾‾‾‾');
    expect(out[4]).toBe('  cause    LC-1 -> T-1 -> BR-1');
    expect(out[5]).toBe('  layer    SF-1 -> T-2 -> BR-1');
    expect(out[6]).toBe(`  element  BR-1, defined at line ${bridleLine}, column 8`);
    expect(out[7]).toMatch(/^ {2}why {6}.+\(.+\)$/);
    expect(out[8]).toBe('  key      shared-bridle:SC-1:LC-1+SF-1:BR-1 (rule shared-bridle)');
    expect(out).toHaveLength(9);
  });

  it('shortens a long claim line around the claim, as loader diagnostics do', () => {
    const long = `  layer SF-1 basis="${'x'.repeat(3000)}"`;
    const out = renderOnly(site(long)).split('\n');
    const excerpt = out.find((l) => l.includes('┆   layer SF-1'))!;
    expect(excerpt.length).toBeLessThan(140);
    expect(excerpt.endsWith('…')).toBe(true);
  });

  it('masks control characters in the excerpt, so it cannot move the terminal cursor', () => {
    const out = renderOnly(site('  layer SF-1 basis="a\u0007b"'));
    expect(out).not.toContain('\u0007');
  });
});
