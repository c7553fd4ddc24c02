// The page's side of the analysis worker (analysis.worker.ts). Loads are answered in order; for the
// focus and the details only the newest request matters, so an answer to an older one is dropped.
import type { Details } from './details.ts';
import type { AnalysisReply, CompareOutcome, EarlierFile, LoadOutcome, WhatIfOutcome } from './analysis-protocol.ts';
import type { WhatIf } from './what-if.ts';
import type { ServedParts } from './live.ts';
import type { FocusView, RankingView, TagMatch } from './site-view.ts';
import { WorkerRequests } from './worker-requests.ts';

export class AnalysisClient {
  private readonly requests = new WorkerRequests<AnalysisReply>(
    new Worker(new URL('./analysis.worker.ts', import.meta.url), { type: 'module' }),
    'analysis',
  );

  /** Reads and analyses a file (with its part files, when served) in the worker; `progress` hears each stage. */
  load(
    fileName: string,
    bytes: Uint8Array,
    parts: ServedParts | undefined,
    progress?: (stage: string) => void,
  ): Promise<LoadOutcome> {
    return this.requests.send(
      { load: { fileName, bytes, ...(parts ? { parts } : {}) } },
      (r) => ('loaded' in r ? { value: r.loaded } : undefined),
      progress ? { progress } : {},
    );
  }

  /** The scene, assessment and findings of one scenario, or of the site overview (undefined). */
  focus(scenario: string | undefined): Promise<FocusView> {
    return this.requests.send({ focus: scenario ?? null }, (r) => ('view' in r ? { value: r.view } : undefined), {
      channel: 'focus',
    });
  }

  details(tag: string): Promise<Details | undefined> {
    return this.requests.send({ details: tag }, (r) => ('details' in r ? { value: r.details } : undefined), {
      channel: 'details',
    });
  }

  /** Tags across the site containing `query`, with the scenarios that rely on each. */
  search(query: string): Promise<TagMatch[]> {
    return this.requests.send({ search: query }, (r) => ('matches' in r ? { value: r.matches } : undefined), {
      channel: 'search',
    });
  }

  /** Analyses the file's model as the what-if changes it (none: back to the file's own). */
  whatIf(question: WhatIf): Promise<WhatIfOutcome> {
    return this.requests.send({ whatIf: question }, (r) => ('whatIf' in r ? { value: r.whatIf } : undefined), {
      channel: 'what-if',
    });
  }

  /** The top of the site-wide common-cause ranking of what the page shows (the file, or its what-if). */
  ranking(): Promise<RankingView> {
    return this.requests.send({ ranking: true }, (r) => ('ranking' in r ? { value: r.ranking } : undefined), {
      channel: 'ranking',
    });
  }

  /** What changed from an earlier file (kept in the worker) to what the page shows; null: the one kept. */
  compare(earlier: EarlierFile | null): Promise<CompareOutcome> {
    return this.requests.send({ compare: earlier }, (r) => ('compared' in r ? { value: r.compared } : undefined), {
      channel: 'compare',
    });
  }

  terminate(): void {
    this.requests.terminate();
  }
}
