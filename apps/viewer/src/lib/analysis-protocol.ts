// The messages between the page and the analysis worker (analysis.worker.ts). Everything here is plain
// data, so it crosses postMessage as it is.
import type { Diagnostic, LoadResult } from '@bulkhead/core';
import type { Details } from './details.ts';
import type { WhatIf } from './what-if.ts';
import type { ServedParts } from './live.ts';
import type { CompareView } from './compare-view.ts';
import type { FocusView, RankingView, SiteSummary, TagMatch } from './site-view.ts';

export type AnalysisRequest =
  /** `parts` only when the page is served with the part files; without them a `part` line is an error. */
  | { id: number; load: { fileName: string; bytes: Uint8Array; parts?: ServedParts } }
  /** null: the site overview. */
  | { id: number; focus: string | null }
  | { id: number; details: string }
  | { id: number; search: string }
  | { id: number; whatIf: WhatIf }
  | { id: number; ranking: true }
  /** An earlier revision to compare with (kept in the worker); null: compare again with the one kept. */
  | { id: number; compare: EarlierFile | null };

/** An earlier revision's file, with its part files when the server sends them. */
export interface EarlierFile {
  fileName: string;
  bytes: Uint8Array;
  parts?: ServedParts;
}

/** A comparison: the earlier file's errors when it does not load, else the changes. */
export interface CompareOutcome {
  diagnostics: Diagnostic[];
  view?: CompareView;
}

/** A load attempt: its diagnostics, and when the model loaded and analysed, the site's summary. */
export interface LoadOutcome {
  format: LoadResult['format'];
  diagnostics: Diagnostic[];
  /** The file's lines only when there are errors to show; otherwise none. */
  source: LoadResult['source'];
  summary?: SiteSummary;
  analysisError?: string;
}

/** The site as the what-if has it, and the statements that would make it so in the file. */
export interface WhatIfOutcome {
  summary: SiteSummary;
  add: string[];
  remove: string[];
}

export type AnalysisReply =
  | { id: number; progress: string }
  | { id: number; loaded: LoadOutcome }
  | { id: number; view: FocusView }
  | { id: number; details: Details | undefined }
  | { id: number; matches: TagMatch[] }
  | { id: number; whatIf: WhatIfOutcome }
  | { id: number; ranking: RankingView }
  | { id: number; compared: CompareOutcome }
  | { id: number; error: string };
