// The viewer's state: the last load attempt, the last good model and its analysis, what is focused
// and selected, and the drawing. Components read it and call its methods; they hold no logic.
import { analyze, loadModelText, type Analysis, type Diagnostic, type LoadResult, type Model } from '@bulkhead/core';
import { scenarioScene, siteOverview, type Drawing, type Scene } from '@bulkhead/layout';
import { detailsOf, type Details } from './details.ts';
import { SupersededError, type LayoutClient } from './layout-client.ts';

export type Origin = 'served' | 'opened';

export interface GoodModel {
  model: Model;
  analysis: Analysis;
  fileName: string;
  revision: number;
}

export class Viewer {
  /** The latest load attempt, good or bad. */
  result = $state.raw<LoadResult | undefined>();
  fileName = $state<string | undefined>();
  origin = $state<Origin | undefined>();
  /** The last model that loaded without errors; kept when a later save has errors. */
  good = $state.raw<GoodModel | undefined>();
  analysisError = $state<string | undefined>();
  /** Scenario id in focus; undefined shows the site overview. */
  focus = $state<string | undefined>();
  selected = $state<string | undefined>();
  finding = $state<string | undefined>();
  drawing = $state.raw<Drawing | undefined>();
  layoutMs = $state<number | undefined>();
  layoutError = $state<string | undefined>();
  laying = $state(false);
  /** Bumped whenever a finding is clicked, so the graph re-centres even on the same finding. */
  centreRequest = $state(0);
  private revision = 0;

  /** Why the served file cannot be read just now (deleted, renamed, a directory); undefined when it can. */
  missing = $state<string | undefined>();

  errors: Diagnostic[] = $derived(this.result?.diagnostics.filter((d) => d.severity === 'error') ?? []);
  warnings: Diagnostic[] = $derived(this.result?.diagnostics.filter((d) => d.severity === 'warning') ?? []);
  /** The file as it is now does not load (errors, or gone) but an earlier good version is still shown. */
  stale = $derived((this.errors.length > 0 || this.missing !== undefined) && this.good !== undefined);

  scene: Scene | undefined = $derived.by(() => {
    const good = this.good;
    if (!good) return undefined;
    const id = this.focus;
    if (id !== undefined && good.model.scenarios.some((s) => s.id === id)) return scenarioScene(good.model, good.analysis, id);
    return siteOverview(good.model, good.analysis);
  });

  assessment = $derived(this.focus === undefined ? undefined : this.good?.analysis.assessments.find((a) => a.scenario === this.focus));

  findings = $derived(
    this.good ? this.good.analysis.findings.filter((f) => this.focus === undefined || f.scenario === this.focus) : [],
  );

  details: Details | undefined = $derived(
    this.good && this.selected !== undefined ? detailsOf(this.good.model, this.good.analysis, this.selected) : undefined,
  );

  /** The served file is gone or unreadable: keep the last good view, marked stale, until it returns. */
  markMissing(fileName: string, reason: string): void {
    this.fileName = fileName;
    this.origin = 'served';
    this.missing = reason;
  }

  /** Loads a model from text or bytes; on errors the diagnostics show and the last good view stays. */
  load(fileName: string, bytes: Uint8Array | string, origin: Origin): void {
    let result: LoadResult;
    try {
      result = loadModelText(fileName, bytes);
    } catch (e) {
      // The loader answers every input with diagnostics; should it ever throw, say so and keep the view.
      this.analysisError = `the model could not be read: ${e instanceof Error ? e.message : String(e)}`;
      return;
    }
    this.missing = undefined;
    this.result = result;
    this.fileName = fileName;
    this.origin = origin;
    if (!result.model) {
      // A save with errors keeps the last good view of the same file; another file's view would mislead.
      if (this.good && this.good.fileName !== fileName) this.clearModel();
      return;
    }
    let analysis: Analysis;
    try {
      analysis = analyze(result.model, { spans: result.spans });
      this.analysisError = undefined;
    } catch (e) {
      this.analysisError = e instanceof Error ? e.message : String(e);
      return;
    }
    const sameFile = this.good?.fileName === fileName;
    this.good = { model: result.model, analysis, fileName, revision: ++this.revision };
    if (!sameFile) {
      this.focus = result.model.scenarios[0]?.id;
      this.selected = undefined;
      this.finding = undefined;
    } else {
      if (this.focus !== undefined && !result.model.scenarios.some((s) => s.id === this.focus)) this.focus = undefined;
      if (this.finding !== undefined && !analysis.findings.some((f) => f.key === this.finding)) this.finding = undefined;
    }
  }

  private clearModel(): void {
    this.good = undefined;
    this.drawing = undefined;
    this.focus = undefined;
    this.selected = undefined;
    this.finding = undefined;
  }

  focusScenario(id: string | undefined): void {
    if (this.focus === id) return;
    this.focus = id;
    this.finding = undefined;
    this.selected = undefined;
  }

  select(tag: string | undefined): void {
    this.selected = tag;
  }

  showFinding(key: string): void {
    const finding = this.good?.analysis.findings.find((f) => f.key === key);
    if (!finding) return;
    if (finding.scenario && finding.scenario !== this.focus) this.focusScenario(finding.scenario);
    this.finding = key;
    this.selected = finding.element;
    this.centreRequest++;
  }

  clearFinding(): void {
    this.finding = undefined;
  }

  /** Lays out a scene in the worker; an answer for an older scene is dropped. */
  async layout(client: LayoutClient, scene: Scene): Promise<void> {
    this.laying = true;
    try {
      const answer = await client.layout(scene);
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
