// How the viewer names revisions (apps/viewer/src/lib/compare-view.ts) and what the sheet's title block
// and file name carry (apps/viewer/src/lib/sheet.ts): the model's own document and revision when it
// states them, the file name otherwise; the hash with the number of files it covers; the revision
// compared with while comparing. The demo's two revisions state document="MF-100-LOPA-001" and
// revision="A" / "B" (fixtures/demo).
import { readFileSync } from 'node:fs';
import { analyze, loadModelText } from '@bulkhead/core';
import { describe, expect, it } from 'vitest';
import { compareView, revisionName, revisionWords } from '../../apps/viewer/src/lib/compare-view.ts';
import { sheetFileName, sheetSourceOf, titleRows } from '../../apps/viewer/src/lib/sheet.ts';
import { summariseSite } from '../../apps/viewer/src/lib/site-view.ts';

function demo(name: string) {
  const loaded = loadModelText(name, readFileSync(new URL(`../../fixtures/demo/${name}`, import.meta.url)));
  if (!loaded.model) throw new Error(`${name} does not load`);
  return { model: loaded.model, analysis: analyze(loaded.model, { spans: loaded.spans }), fileName: name };
}

describe('revisionName', () => {
  it.each([
    [{ document: 'MF-100-LOPA-001', revision: 'A' }, 'MF-100-LOPA-001 rev A', 'rev A'],
    [{ revision: '2' }, 'rev 2', 'rev 2'],
    // A document number alone does not tell two revisions apart: the file name does.
    [{ document: 'MF-100-LOPA-001' }, 'plant.bulk', 'plant.bulk'],
    [{}, 'plant.bulk', 'plant.bulk'],
  ])('should name %o as %s', (site, label, short) => {
    const name = revisionName(site, 'plant.bulk');
    expect(name).toEqual({ label, short, fileName: 'plant.bulk' });
  });

  it('should add the file name to the label only when they differ', () => {
    expect(revisionWords(revisionName({ revision: 'A' }, 'plant.bulk'))).toBe('rev A (plant.bulk)');
    expect(revisionWords(revisionName({}, 'plant.bulk'))).toBe('plant.bulk');
  });
});

describe('the compare of the demo revisions', () => {
  it('should name both revisions by their document and revision', () => {
    const view = compareView(demo('marrow-fen.bulk'), demo('marrow-fen-rev-b.bulk'));
    expect(view.old).toEqual({ label: 'MF-100-LOPA-001 rev A', short: 'rev A', fileName: 'marrow-fen.bulk' });
    expect(view.now).toEqual({ label: 'MF-100-LOPA-001 rev B', short: 'rev B', fileName: 'marrow-fen-rev-b.bulk' });
  });
});

describe('the title block', () => {
  const b = demo('marrow-fen-rev-b.bulk');
  const summary = summariseSite(b.model, b.analysis);
  const sha256 = 'ab'.repeat(32);
  const day = new Date(2026, 0, 31);

  it("should carry the model's revision, the files the hash covers and the revision compared with", () => {
    const view = compareView(demo('marrow-fen.bulk'), b);
    const source = sheetSourceOf({ summary, fileName: 'marrow-fen-rev-b.bulk', sha256, files: 2 }, view);
    const rows = Object.fromEntries(titleRows(source, day, { title: 'S-101' }).map((r) => [r.label, r.value]));
    expect(rows['revision']).toBe('MF-100-LOPA-001 rev B');
    expect(rows['SHA-256']).toBe(`${sha256} over 2 files: the model file and 1 part file`);
    expect(rows['compared with']).toBe('MF-100-LOPA-001 rev A (marrow-fen.bulk)');
    expect(rows['date']).toBe('2026-01-31');
  });

  it('should show the bare hash for one file, and no compare row when not comparing', () => {
    const source = sheetSourceOf({ summary, fileName: 'marrow-fen-rev-b.bulk', sha256, files: 1 }, undefined);
    const rows = Object.fromEntries(titleRows(source, day, { title: 'S-101' }).map((r) => [r.label, r.value]));
    expect(rows['SHA-256']).toBe(sha256);
    expect(rows['compared with']).toBeUndefined();
  });

  it('should name an export by file, scenario, revision and hash, so two saves of one revision differ', () => {
    const source = sheetSourceOf({ summary, fileName: 'marrow-fen-rev-b.bulk', sha256, files: 1 }, undefined);
    expect(sheetFileName(source, 'S-101', 'svg')).toBe('marrow-fen-rev-b_S-101_rev-B_sha-abababababab.svg');
    const { revision: _stated, ...unstated } = source;
    expect(_stated).toBe('B');
    expect(sheetFileName(unstated, 'S-101', 'svg')).toBe('marrow-fen-rev-b_S-101_sha-abababababab.svg');
  });
});
