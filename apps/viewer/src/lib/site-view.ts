// What the page needs from a model and its analysis, computed in the analysis worker: a short summary of
// the site and, per focus, the scene to lay out with its assessment and findings. The model and the
// analysis stay in the worker; only these small pieces cross to the page, so a large site never makes
// the page copy or walk all of it.
import { SEVERITY_RANK, type Analysis, type Finding, type Model, type ScenarioAssessment } from '@bulkhead/core';
import { scenarioScene, siteOverview, type Scene } from '@bulkhead/layout';

export interface ScenarioRow {
  id: string;
  title?: string;
  claimed?: boolean;
  after?: boolean;
  /** Unaccepted findings above note level. */
  open: number;
  /** The claimed layers' functions in order (layer 1 first), to name the sides of a finding. */
  layers: string[];
}

export interface SiteSummary {
  siteName: string;
  elements: number;
  functions: number;
  scenarios: ScenarioRow[];
  findings: number;
}

export interface FocusView {
  /** The scenario in focus; undefined for the site overview. */
  focus?: string;
  scene: Scene;
  assessment?: ScenarioAssessment;
  /** The scenario's findings; for the overview, those of the whole site up to OVERVIEW_FINDINGS_SHOWN. */
  findings: Finding[];
  /** How many findings there are in all for this focus (more than `findings` holds in a large overview). */
  findingTotal: number;
}

/** The overview lists this many findings at most; past it, it points to the scenarios. */
export const OVERVIEW_FINDINGS_SHOWN = 100;

const isOpen = (f: Finding) => f.severity !== 'note' && !f.accepted;

export function summariseSite(model: Model, analysis: Analysis): SiteSummary {
  const assessments = new Map(analysis.assessments.map((a) => [a.scenario, a]));
  const open = new Map<string, number>();
  for (const f of analysis.findings) if (f.scenario !== undefined && isOpen(f)) open.set(f.scenario, (open.get(f.scenario) ?? 0) + 1);
  return {
    siteName: model.site.name,
    elements: model.elements.length,
    functions: model.functions.length,
    findings: analysis.findings.length,
    scenarios: model.scenarios.map((s) => {
      const a = assessments.get(s.id);
      return {
        id: s.id,
        ...(s.title ? { title: s.title } : {}),
        ...(a ? { claimed: a.meetsClaimed, after: a.meetsAfter } : {}),
        open: open.get(s.id) ?? 0,
        layers: (s.layers ?? []).map((l) => l.function),
      };
    }),
  };
}

export function focusView(model: Model, analysis: Analysis, focus: string | undefined): FocusView {
  if (focus !== undefined && model.scenarios.some((s) => s.id === focus)) {
    const findings = analysis.findings.filter((f) => f.scenario === focus);
    const assessment = analysis.assessments.find((a) => a.scenario === focus);
    return { focus, scene: scenarioScene(model, analysis, focus), ...(assessment ? { assessment } : {}), findings, findingTotal: findings.length };
  }
  // The most severe first across the site; the sort is stable, so scenario order holds within a severity.
  const shown = [...analysis.findings].sort((a, b) => SEVERITY_RANK[b.severity] - SEVERITY_RANK[a.severity]).slice(0, OVERVIEW_FINDINGS_SHOWN);
  return {
    scene: siteOverview(model, analysis),
    findings: shown,
    findingTotal: analysis.findings.length,
  };
}
