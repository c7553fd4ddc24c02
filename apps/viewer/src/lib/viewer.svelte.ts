// The viewer's state: the last load attempt, the last good site's summary, what is focused and
// selected, the focused view and the drawing. Reading and analysing happen in the analysis worker
// (AnalysisClient), layout in the layout worker; this class only holds what the page shows.
import type { Diagnostic, Finding } from '@bulkhead/core';
import type { Drawing } from '@bulkhead/layout';
import type { Details } from './details.ts';
import type { LayoutClient } from './layout-client.ts';
import { SupersededError } from './worker-requests.ts';
import type { AnalysisClient } from './analysis-client.ts';
import type { LoadOutcome } from './analysis-protocol.ts';
import type { ServedParts } from './live.ts';
import type { FocusView, SiteSummary } from './site-view.ts';
import type { ViewLink } from './link.ts';
import { modelContentHash } from '@bulkhead/core';
import { isWhatIf, NO_WHAT_IF, type WhatIf } from './what-if.ts';
import type { CompareView } from './compare-view.ts';
import type { EarlierFile } from './analysis-protocol.ts';

export type Origin = 'served' | 'opened';

export interface GoodSite {
  summary: SiteSummary;
  fileName: string;
  revision: number;
  /** core's modelContentHash of the file and its parts as loaded (the report's hash), for the title block. */
  sha256: string;
  /** How many files the hash covers: the model file and its parts. */
  files: number;
}

/** Why the earlier revision compared with does not load just now; the comparison shown is its last good one. */
export interface CompareTrouble {
  fileName: string;
  diagnostics: Diagnostic[];
  /** The served earlier file is gone or unreadable. */
  missing?: string;
}

/** An overview with more areas than this is shown as a table, not laid out as a graph. */
export const OVERVIEW_GRAPH_LIMIT = 60;

export class Viewer {
  /** The latest load attempt, good or bad. */
  result = $state.raw<LoadOutcome | undefined>();
  fileName = $state<string | undefined>();
  origin = $state<Origin | undefined>();
  /** The last site that loaded without errors; kept when a later save has errors. */
  good = $state.raw<GoodSite | undefined>();
  analysisError = $state<string | undefined>();
  /** What the analysis worker is doing, while it reads or analyses a file. */
  progress = $state<string | undefined>();
  /** Scenario id in focus; undefined shows the site overview. */
  focus = $state<string | undefined>();
  /** The focused scenario's (or the overview's) scene, assessment and findings, from the worker. */
  view = $state.raw<FocusView | undefined>();
  selected = $state<string | undefined>();
  details = $state.raw<Details | undefined>();
  finding = $state<string | undefined>();
  drawing = $state.raw<Drawing | undefined>();
  layoutMs = $state<number | undefined>();
  layoutError = $state<string | undefined>();
  laying = $state(false);
  /** The what-if in force (none: the file's own model), and the statements that would make it real. */
  whatIf = $state.raw<WhatIf>(NO_WHAT_IF);
  whatIfStatements = $state.raw<{ add: string[]; remove: string[] }>({ add: [], remove: [] });
  whatIfActive = $derived(isWhatIf(this.whatIf));
  /** The centre shows the all-scenarios matrix instead of the graph. */
  matrix = $state(false);
  /** What changed since an earlier file the reviewer opened to compare with; undefined: no comparison. */
  comparison = $state.raw<CompareView | undefined>();
  compareTrouble = $state.raw<CompareTrouble | undefined>();
  /** The comparison itself failed (not the earlier file's errors: those are compareTrouble). */
  compareFailure = $state<string | undefined>();
  /** Counts compare questions, so only the newest answer is shown. */
  private compareAsked = 0;
  /** Bumped whenever a finding is clicked, so the graph re-centres even on the same finding. */
  centreRequest = $state(0);
  private revision = 0;

  /** Why the served file cannot be read just now (deleted, renamed, a directory); undefined when it can. */
  missing = $state<string | undefined>();
  /** The served file was missing and the last load read it again: said once, until the next load or focus. */
  back = $state(false);

  errors: Diagnostic[] = $derived(this.result?.diagnostics.filter((d) => d.severity === 'error') ?? []);
  warnings: Diagnostic[] = $derived(this.result?.diagnostics.filter((d) => d.severity === 'warning') ?? []);
  /** The file as it is now does not load (errors, or gone) but an earlier good version is still shown. */
  stale = $derived((this.errors.length > 0 || this.missing !== undefined) && this.good !== undefined);

  /** The view of the current focus, once the worker has answered for it. */
  current: FocusView | undefined = $derived(this.view && this.view.focus === this.focus ? this.view : undefined);
  assessment = $derived(this.current?.assessment);
  findings: Finding[] = $derived(this.current?.findings ?? []);
  /** The finding whose proof is shown, once the view that holds it is in. */
  focusedFinding: Finding | undefined = $derived(
    this.finding === undefined ? undefined : this.findings.find((f) => f.key === this.finding),
  );
  /** A large site's overview: too many areas to draw, so the page shows them as a table. */
  overviewTable = $derived(
    this.current !== undefined &&
      this.current.focus === undefined &&
      this.current.scene.nodes.length > OVERVIEW_GRAPH_LIMIT,
  );

  /** The served file is gone or unreadable: keep the last good view, marked stale, until it returns. */
  markMissing(fileName: string, reason: string): void {
    this.fileName = fileName;
    this.origin = 'served';
    this.missing = reason;
    this.back = false;
  }

  /** Reads and analyses a file in the worker; on errors the diagnostics show and the last good view stays. */
  async load(
    client: AnalysisClient,
    fileName: string,
    bytes: Uint8Array,
    origin: Origin,
    parts?: ServedParts,
  ): Promise<void> {
    this.progress = `reading ${fileName}`;
    let outcome: LoadOutcome;
    let hash: { sha256: string; files: unknown[] };
    try {
      [outcome, hash] = await Promise.all([
        client.load(fileName, bytes, parts, (stage) => (this.progress = stage)),
        modelContentHash(
          { name: fileName, bytes },
          (parts ?? []).flatMap(([name, part]) => (part instanceof Uint8Array ? [{ name, bytes: part }] : [])),
        ),
      ]);
    } catch (e) {
      this.analysisError = e instanceof Error ? e.message : String(e);
      this.progress = undefined;
      return;
    }
    this.progress = undefined;
    this.back = this.missing !== undefined;
    this.missing = undefined;
    this.result = outcome;
    // A new load replaces the model a what-if was made from (the worker has dropped it).
    if (outcome.summary) this.clearWhatIfState();
    this.fileName = fileName;
    this.origin = origin;
    if (outcome.analysisError) {
      this.analysisError = outcome.analysisError;
      return;
    }
    if (!outcome.summary) {
      // A save with errors keeps the last good view of the same file; another file's view would mislead.
      if (this.good && this.good.fileName !== fileName) this.clearModel();
      return;
    }
    this.analysisError = undefined;
    performance.mark('bulkhead:analysed');
    const summary = outcome.summary;
    const sameFile = this.good?.fileName === fileName;
    this.good = { summary, fileName, revision: ++this.revision, sha256: hash.sha256, files: hash.files.length };
    // A new revision of the file is compared again with the earlier one kept.
    if (this.comparison) void this.compare(client, null);
    if (!sameFile) {
      this.focus = summary.scenarios[0]?.id;
      this.selected = undefined;
      this.finding = undefined;
    } else if (this.focus !== undefined && !summary.scenarios.some((s) => s.id === this.focus)) {
      this.focus = undefined;
    }
  }

  /** Asks the worker for the focused view of the current revision; an older answer is dropped. */
  async fetchView(client: AnalysisClient, focus: string | undefined): Promise<void> {
    try {
      const view = await client.focus(focus);
      performance.mark('bulkhead:view');
      this.view = view;
      if (this.finding !== undefined && !view.findings.some((f) => f.key === this.finding)) this.finding = undefined;
    } catch (e) {
      if (!(e instanceof SupersededError)) this.analysisError = e instanceof Error ? e.message : String(e);
    }
  }

  async fetchDetails(client: AnalysisClient, tag: string | undefined): Promise<void> {
    if (tag === undefined) {
      this.details = undefined;
      return;
    }
    try {
      const details = await client.details(tag);
      if (this.selected === tag) this.details = details;
    } catch (e) {
      if (!(e instanceof SupersededError)) this.details = undefined;
    }
  }

  private clearModel(): void {
    this.good = undefined;
    this.view = undefined;
    this.drawing = undefined;
    this.focus = undefined;
    this.selected = undefined;
    this.finding = undefined;
  }

  focusScenario(id: string | undefined): void {
    this.matrix = false;
    if (this.focus === id) return;
    this.back = false;
    this.focus = id;
    this.finding = undefined;
    this.selected = undefined;
  }

  select(tag: string | undefined): void {
    this.selected = tag;
  }

  showFinding(key: string): void {
    const finding = this.findings.find((f) => f.key === key);
    if (!finding) return;
    if (finding.scenario && finding.scenario !== this.focus) this.focusScenario(finding.scenario);
    this.finding = key;
    // The proof shows the finding; the element card stays closed so it covers none of the graph.
    this.selected = undefined;
    this.centreRequest++;
  }

  clearFinding(): void {
    this.finding = undefined;
  }

  private clearWhatIfState(): void {
    this.whatIf = NO_WHAT_IF;
    this.whatIfStatements = { add: [], remove: [] };
  }

  /** Asks the worker to analyse the model as `question` changes it, and shows that; never writes the file. */
  async askWhatIf(client: AnalysisClient, question: WhatIf): Promise<void> {
    const good = this.good;
    if (!good) return;
    try {
      const outcome = await client.whatIf(question);
      this.whatIf = question;
      this.whatIfStatements = { add: outcome.add, remove: outcome.remove };
      this.good = { ...good, summary: outcome.summary, revision: ++this.revision };
      if (this.comparison) void this.compare(client, null);
    } catch (e) {
      if (!(e instanceof SupersededError)) this.analysisError = e instanceof Error ? e.message : String(e);
    }
  }

  /**
   * Compares what the page shows with an earlier revision (null: the one the worker keeps). If the earlier
   * file does not load, its errors are kept to show and the last comparison stays.
   */
  async compare(client: AnalysisClient, earlier: EarlierFile | null): Promise<void> {
    const question = ++this.compareAsked;
    try {
      const outcome = await client.compare(earlier);
      // An answer to an earlier question, or to one asked before Stop, is dropped.
      if (question !== this.compareAsked) return;
      this.compareFailure = undefined;
      if (outcome.diagnostics.length > 0) {
        this.compareTrouble = {
          fileName: earlier?.fileName ?? this.comparison?.old.fileName ?? '',
          diagnostics: outcome.diagnostics,
        };
        return;
      }
      if (earlier) this.compareTrouble = undefined;
      if (outcome.view) this.comparison = outcome.view;
    } catch (e) {
      if (!(e instanceof SupersededError)) this.compareFailure = e instanceof Error ? e.message : String(e);
    }
  }

  /** The served earlier revision is gone or unreadable: say so, keep the last comparison. */
  markEarlierMissing(fileName: string, reason: string): void {
    this.compareTrouble = { fileName, diagnostics: [], missing: reason };
  }

  stopComparing(): void {
    this.compareAsked++;
    this.comparison = undefined;
    this.compareTrouble = undefined;
    this.compareFailure = undefined;
  }

  /** What is in view, as a link (lib/link.ts). */
  get link(): ViewLink {
    if (this.matrix) return { matrix: true };
    return {
      ...(this.focus ? { scenario: this.focus } : {}),
      ...(this.finding ? { finding: this.finding } : {}),
      ...(this.selected ? { element: this.selected } : {}),
    };
  }

  /**
   * Shows what a link names, once a site is loaded. A finding opens its proof as soon as the scenario's
   * findings are in (fetchView keeps it only if the scenario has it); an unknown scenario is ignored.
   */
  followLink(link: ViewLink): void {
    const summary = this.good?.summary;
    if (!summary) return;
    if (link.scenario && summary.scenarios.some((s) => s.id === link.scenario)) this.focusScenario(link.scenario);
    this.matrix = link.matrix === true;
    const tag = link.element ?? link.layer;
    this.selected = tag;
    if (link.finding) {
      this.finding = link.finding;
      this.centreRequest++;
    }
  }

  /** Lays out a scene in the worker; an answer for an older scene is dropped. */
  async layout(client: LayoutClient, scene: FocusView['scene']): Promise<void> {
    this.laying = true;
    try {
      const answer = await client.layout(scene);
      performance.mark('bulkhead:drawn');
      this.drawing = answer.drawing;
      this.layoutMs = answer.ms;
      this.layoutError = undefined;
      this.laying = false;
    } catch (e) {
      if (e instanceof SupersededError) return;
      this.layoutError = e instanceof Error ? e.message : String(e);
      this.laying = false;
    }
  }
}
