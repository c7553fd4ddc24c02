// The rule case harness: each rule's table of small .bulk models that must, or must not, make it
// report, in the way a linter tests its rules. Case models are invented test data.
import { describe, expect, it } from 'vitest';
import { analyze, loadModelText, RULES, type Finding, type SeverityLevel } from '@bulkhead/core';

/** A clean site: one BPCS loop as the cause and one fully separate SIF. It gives no finding at all. */
export const BASE: Record<string, string> = {
  site: 'site "Rule test site (invented)"',
  category: 'category c tolerable=1e-4 harm=people',
  'UPS-A': 'ups UPS-A',
  'UPS-B': 'ups UPS-B',
  'CK-A': 'circuit CK-A powered-by=UPS-A',
  'CK-B': 'circuit CK-B powered-by=UPS-B',
  'IA-A': 'air-header IA-A',
  'IA-B': 'air-header IA-B',
  'C-1': 'controller C-1 system=bpcs powered-by=CK-A',
  'S-1': 'logic-solver S-1 system=sis powered-by=CK-B',
  'V-1': 'vessel V-1',
  'L-1': 'line L-1',
  'N-1': 'nozzle N-1 mounted-on=V-1',
  'N-2': 'nozzle N-2 mounted-on=V-1',
  'IO-1': 'io-card IO-1 signal-via=C-1 powered-by=CK-A',
  'IO-2': 'io-card IO-2 signal-via=S-1 powered-by=CK-B',
  'IO-3': 'io-card IO-3 signal-via=C-1 powered-by=CK-A',
  'IO-4': 'io-card IO-4 signal-via=S-1 powered-by=CK-B',
  'T-1': 'transmitter T-1 make="Acme" model="A1" mounted-on=N-1 signal-via=IO-1',
  'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=N-2 signal-via=IO-2',
  'CV-1': 'control-valve CV-1 fails-to=closed mounted-on=L-1 signal-via=IO-3 air-from=IA-A',
  'XV-1': 'shutdown-valve XV-1 fails-to=closed mounted-on=L-1 signal-via=IO-4 air-from=IA-B',
  'LC-1': 'loop LC-1 sensors=T-1 solver=C-1 finals=CV-1',
  'SF-1': 'sif SF-1 sensors=T-2 solver=S-1 finals=XV-1 trip=close trip-mode=de-energise sil=2 pfd=0.01',
};

export const BASE_SCENARIO = ['scenario SC-1 category=c', '  cause function=LC-1 frequency=0.1', '  layer SF-1'];

export interface Case {
  name: string;
  /** Lines replacing the base line of the same key, or added under a new key; `null` removes one. */
  lines?: Record<string, string | null>;
  /** The scenario block (with indented lines); defaults to BASE_SCENARIO. */
  scenario?: string[];
  /** Extra statements after the scenario (rule settings, accept lines). */
  extra?: string[];
}

export interface Expected {
  element?: string;
  parties: string[];
  severity: SeverityLevel;
  accepted?: boolean;
}

export interface InvalidCase extends Case {
  findings: Expected[];
}

export function modelText(c: Case): string {
  const lines = { ...BASE };
  for (const [key, line] of Object.entries(c.lines ?? {})) {
    if (line === null) delete lines[key];
    else lines[key] = line;
  }
  return [...Object.values(lines), ...(c.scenario ?? BASE_SCENARIO), ...(c.extra ?? [])].join('\n') + '\n';
}

export function analyseCase(c: Case): Finding[] {
  const loaded = loadModelText('case.bulk', modelText(c));
  if (!loaded.model) throw new Error(`case "${c.name}" does not load: ${loaded.diagnostics.map((d) => `${d.code} ${d.message} at ${d.span?.line}:${d.span?.column}`).join('; ')}`);
  return analyze(loaded.model, { spans: loaded.spans }).findings;
}

function summary(f: Finding): Expected {
  return {
    ...(f.element !== undefined ? { element: f.element } : {}),
    parties: f.parties.map((p) => p.tag ?? 'external'),
    severity: f.severity,
    ...(f.accepted ? { accepted: true } : {}),
  };
}

/** Runs a rule's table: valid cases report nothing for the rule; invalid ones report exactly what is listed. */
export function ruleTable(ruleId: string, table: { valid: Case[]; invalid: InvalidCase[] }): void {
  describe(`rule ${ruleId}`, () => {
    it('is a registered rule and its table has no duplicate cases', () => {
      expect(RULES.map((r) => r.id)).toContain(ruleId);
      const texts = [...table.valid, ...table.invalid].map((c) => modelText(c));
      expect(new Set(texts).size).toBe(texts.length);
      expect(table.valid.length).toBeGreaterThanOrEqual(2);
      expect(table.invalid.length).toBeGreaterThanOrEqual(2);
    });
    for (const c of table.valid) {
      it(`valid: ${c.name}`, () => {
        expect(analyseCase(c).filter((f) => f.rule === ruleId).map(summary)).toEqual([]);
      });
    }
    for (const c of table.invalid) {
      it(`invalid: ${c.name}`, () => {
        const got = analyseCase(c).filter((f) => f.rule === ruleId).map(summary);
        const order = (a: Expected, b: Expected) => JSON.stringify(a).localeCompare(JSON.stringify(b));
        expect(got.sort(order)).toEqual([...c.findings].sort(order));
      });
    }
  });
}
