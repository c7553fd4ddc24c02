// Small models for the assessment tests: a .bulk preamble with one BPCS with two controllers and one SIS,
// a loader that fails loudly, and a maker for the independence findings the trace rules would produce.
import { loadModelText, say, type Model } from '@bulkhead/core';
import type { Finding, Party } from '../../../packages/core/src/vocabulary/types.ts';
import { assessScenario, type AssessOutput } from '../../../packages/core/src/assess/index.ts';

/**
 * Categories (invented criteria), solvers, and a few instruments that scenarios can claim as layers. Active
 * elements say supply=self-contained: these tests are about the arithmetic, and the supply rules have their own tables.
 */
export const PREAMBLE = `
site "Test works (invented)"
category people tolerable=1e-4 harm=people
category people-at-most tolerable=1e-4 harm=people edge=at-most
category loc tolerable=1e-3 harm=containment
category asset tolerable=1e-3 harm=asset
controller C1 system=bpcs supply=self-contained
controller C2 system=bpcs supply=self-contained
controller C3 system=bpcs supply=self-contained
logic-solver SIS-1 system=sis supply=self-contained
vessel V-1
nozzle N-1 mounted-on=V-1
nozzle N-2 mounted-on=V-1
nozzle N-3 mounted-on=V-1
nozzle N-4 mounted-on=V-1
transmitter LT-1 mounted-on=N-1 supply=self-contained
transmitter LT-2 mounted-on=N-2 supply=self-contained
transmitter LT-3 mounted-on=N-3 supply=self-contained
transmitter LT-4 mounted-on=N-4 supply=self-contained
control-valve LV-1 mounted-on=V-1 supply=self-contained
shutdown-valve XV-1 mounted-on=V-1 fails-to=closed supply=self-contained
motor-starter MS-1 fails-to=off supply=self-contained
operator OP-1
relief-valve PSV-1 mounted-on=V-1
rupture-disc RD-1 mounted-on=V-1
check-valve NRV-1 mounted-on=V-1
loop LIC-1 sensors=LT-1 solver=C1 finals=LV-1
`;

export function load(text: string): Model {
  const result = loadModelText('test.bulk', PREAMBLE + text);
  if (!result.model) {
    throw new Error(
      result.diagnostics.map((d) => `${d.code} ${d.span?.line}:${d.span?.column} ${d.message}`).join('\n'),
    );
  }
  return result.model;
}

/** Loads the preamble plus `text` and assesses the scenario `id` (the only one when omitted). */
export function assess(text: string, findings: Finding[] = [], id?: string): AssessOutput {
  const model = load(text);
  const scenario = id === undefined ? model.scenarios[0] : model.scenarios.find((s) => s.id === id);
  if (!scenario) throw new Error(`no scenario ${id ?? ''}`);
  return assessScenario({ model, scenario, findings });
}

/** An independence finding as the trace rules would make it, built by hand (the rules are not under test). */
export function independenceFinding(
  scenario: string,
  rule: string,
  parties: Party[],
  options: { severity?: Finding['severity']; element?: string; accepted?: boolean } = {},
): Finding {
  const tags = parties.map((p) => p.tag ?? '-');
  return {
    key: [rule, scenario, ...tags].join(':'),
    rule,
    title: rule,
    severity: options.severity ?? 'voids-credit',
    scenario,
    parties,
    ...(options.element !== undefined ? { element: options.element } : {}),
    paths: parties.map(() => []),
    // What it says is not under test here; any message of the catalogue serves.
    ...say('incomplete-trace/untraced', { function: `hand-built ${rule}`, missing: [] }),
    message: `hand-built ${rule}`,
    rationale: 'test input',
    source: 'test input',
    ...(options.accepted ? { accepted: { by: 'test', date: '2026-01-01', reason: 'test' } } : {}),
  };
}

export const cause = (tag?: string): Party => ({ role: 'cause', ...(tag !== undefined ? { tag } : {}) });
export const layer = (tag: string): Party => ({ role: 'layer', tag });

/** Verdicts by layer tag, for compact expectations. */
export function verdicts(out: AssessOutput): Record<string, string> {
  return Object.fromEntries(out.assessment.layers.map((l) => [l.function, l.verdict]));
}

export function ruleIds(out: AssessOutput): string[] {
  return out.findings.map((f) => f.rule).sort();
}
