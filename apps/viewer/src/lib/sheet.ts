// What an exported or printed sheet carries so it can be filed and found again: the title block
// (site, file, content hash, revision, date, the finding shown, the LOPA figures) and a file name that
// holds the scenario and the revision, so exports of two revisions never overwrite each other.
import type { Finding, ScenarioAssessment } from '@bulkhead/core';
import type { TitleRow } from '@bulkhead/layout';
import { formatFigure, formatTimes } from './format.ts';
import { sifNeedWords } from './lopa-words.ts';

export interface SheetSource {
  siteName: string;
  fileName: string;
  /** SHA-256 of the file's bytes, lower-case hex. */
  sha256: string;
  /** The model's own revision mark, when it states one. */
  revision?: string;
}

/** SHA-256 of bytes as lower-case hex, with the browser's own digest (off the main thread's JS). */
export async function sha256Hex(bytes: Uint8Array): Promise<string> {
  const digest = await crypto.subtle.digest('SHA-256', bytes as Uint8Array<ArrayBuffer>);
  return [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, '0')).join('');
}

export function isoDate(day: Date): string {
  return `${day.getFullYear()}-${String(day.getMonth() + 1).padStart(2, '0')}-${String(day.getDate()).padStart(2, '0')}`;
}

/** The revision as a sheet names it: the model's own mark, else the first 12 hex digits of its hash. */
export function revisionMark(source: SheetSource): string {
  return source.revision ?? `sha-${source.sha256.slice(0, 12)}`;
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
    { label: 'SHA-256', value: source.sha256 },
    { label: 'revision', value: source.revision ?? 'not stated in the model; the SHA-256 identifies this version' },
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

/** "marrow-fen_S-101_sha-3f9a2c1b04de.svg": the file, what the sheet shows, and the revision. */
export function sheetFileName(source: SheetSource, shows: string, extension: string): string {
  const base = source.fileName.replace(/\.(bulk|json)$/i, '');
  const safe = (text: string) => text.replace(/[^A-Za-z0-9._-]+/g, '-');
  return `${safe(base)}_${safe(shows)}_${safe(revisionMark(source))}.${extension}`;
}
