// What an exported or printed sheet carries so it can be filed and found again: the title block
// (site, file, content hash, revision, date, the revision compared with, the finding shown, the LOPA
// figures) and a file name that holds the scenario and the revision, so exports of two revisions never
// overwrite each other.
import { modelFilesWords, type Finding, type ScenarioAssessment } from '@bulkhead/core';
import type { TitleRow } from '@bulkhead/layout';
import { formatFigure, formatTimes } from './format.ts';
import { sifNeedWords } from './lopa-words.ts';
import { revisionWords, type CompareView } from './compare-view.ts';

export interface SheetSource {
  siteName: string;
  fileName: string;
  /** core's modelContentHash: the file's SHA-256, or over the file and its parts (the report's hash). */
  sha256: string;
  /** How many files the hash covers (the model file and its parts). */
  files: number;
  /** The model's own revision mark, when it states one. */
  revision?: string;
  /** The model's document number, when it states one. */
  document?: string;
  /** While comparing: the earlier revision, in words ("MF-100-LOPA-001 rev A (marrow-fen.bulk)"). */
  comparedWith?: string;
}

export function isoDate(day: Date): string {
  return `${day.getFullYear()}-${String(day.getMonth() + 1).padStart(2, '0')}-${String(day.getDate()).padStart(2, '0')}`;
}

/**
 * The revision as a sheet's file name carries it: the model's own mark and the first 12 hex digits of its
 * hash, so an edit saved without a new revision mark does not overwrite the last export either.
 */
export function revisionMark(source: SheetSource): string {
  const hash = `sha-${source.sha256.slice(0, 12)}`;
  return source.revision !== undefined ? `rev-${source.revision}_${hash}` : hash;
}

export function titleRows(
  source: SheetSource,
  day: Date,
  shown: { title: string; assessment?: ScenarioAssessment; finding?: Finding },
): TitleRow[] {
  const rows: TitleRow[] = [
    { label: 'site', value: source.siteName },
    { label: 'sheet', value: shown.title },
    { label: 'file', value: source.fileName },
    {
      label: 'SHA-256',
      value: source.files > 1 ? `${source.sha256} over ${modelFilesWords(source.files)}` : source.sha256,
    },
    {
      label: 'revision',
      value:
        source.revision !== undefined
          ? `${source.document !== undefined ? `${source.document} ` : ''}rev ${source.revision}`
          : 'not stated in the model; the SHA-256 identifies this version',
    },
    ...(source.comparedWith !== undefined ? [{ label: 'compared with', value: source.comparedWith }] : []),
    { label: 'date', value: isoDate(day) },
  ];
  if (shown.finding) rows.push({ label: 'finding shown', value: `${shown.finding.title} (${shown.finding.key})` });
  const a = shown.assessment;
  if (a) {
    rows.push(
      {
        label: 'LOPA per year',
        value: `as claimed ${formatFigure(a.mitigatedClaimed)}, after independence ${formatFigure(a.mitigatedAfter)}, tolerable ${formatFigure(a.tolerable)}`,
      },
      {
        label: 'verdict',
        value: `${a.meetsAfter ? 'meets' : 'falls short'} after independence, gap ${formatTimes(a.gap)}x`,
      },
    );
    const need = sifNeedWords(a);
    if (need) rows.push({ label: 'SIF', value: need });
  }
  return rows;
}

/** "marrow-fen_S-101_rev-A_sha-3f9a2c1b04de.svg": the file, what the sheet shows, and the revision. */
export function sheetFileName(source: SheetSource, shows: string, extension: string): string {
  const base = source.fileName.replace(/\.(bulk|json)$/i, '');
  const safe = (text: string) => text.replace(/[^A-Za-z0-9._-]+/g, '-');
  return `${safe(base)}_${safe(shows)}_${safe(revisionMark(source))}.${extension}`;
}

/** The sheet's source for the site the page shows, and the earlier revision while comparing. */
export function sheetSourceOf(
  good: {
    summary: { siteName: string; revision?: string; document?: string };
    fileName: string;
    sha256: string;
    files: number;
  },
  comparison: CompareView | undefined,
): SheetSource {
  const { siteName, revision, document } = good.summary;
  return {
    siteName,
    fileName: good.fileName,
    sha256: good.sha256,
    files: good.files,
    ...(revision !== undefined ? { revision } : {}),
    ...(document !== undefined ? { document } : {}),
    ...(comparison ? { comparedWith: revisionWords(comparison.old) } : {}),
  };
}
