// The rule case harness: each rule's table of small .bulk models that must, or must not, make it
// report, in the way a linter tests its rules. Case models are invented test data.
import { describe, expect, it } from 'vitest';
import { analyze, loadModelText, RULES, type Analysis, type MessageId, type SeverityLevel } from '@bulkhead/core';

/**
 * A clean site: one BPCS loop LC-1 as the cause and one fully separate SIF SF-1, each with its own
 * nozzle, transmitter, card, solver, power, air and valve. Alone it gives no finding at all (checked in
 * registry.test.ts). Keys name the line a case may replace; a case adds lines under new keys.
 */
export const BASE: Readonly<Record<string, string>> = {
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
  'T-1': 'transmitter T-1 make="Acme" model="A1" mounted-on=N-1 signal-via=IO-1 supply=from-signal',
  'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=N-2 signal-via=IO-2 supply=from-signal',
  'CV-1': 'control-valve CV-1 fails-to=closed mounted-on=L-1 signal-via=IO-3 air-from=IA-A',
  'XV-1': 'shutdown-valve XV-1 fails-to=closed mounted-on=L-1 signal-via=IO-4 air-from=IA-B',
  'LC-1': 'loop LC-1 sensors=T-1 solver=C-1 finals=CV-1',
  'SF-1': 'sif SF-1 sensors=T-2 solver=S-1 finals=XV-1 trip=close trip-mode=de-energise sil=2 pfd=0.01',
};

// A SIS trip solenoid on the BPCS control valve (the issue's item 12): the valve takes its signal from the BPCS
// positioner ZP-1 (card IO-3, controller C-1) and from the SIS solenoid XY-1 (card IO-4, solver S-1).
export const solenoidOnBpcsValve: Readonly<Record<string, string>> = {
  'ZP-1': 'positioner ZP-1 fails-to=closed signal-via=IO-3 air-from=IA-A',
  'XY-1': 'solenoid XY-1 fails-to=closed supply=from-signal signal-via=IO-4',
  'CV-1': 'control-valve CV-1 fails-to=closed mounted-on=L-1 signal-via=ZP-1,XY-1 air-from=IA-A',
  'SF-1': 'sif SF-1 sensors=T-2 solver=S-1 finals=CV-1 trip=close trip-mode=de-energise sil=2 pfd=0.01',
};
// The cause states a basis so the assessment's own cause-no-basis finding stays out of the independence tables.
export const BASE_SCENARIO: readonly string[] = [
  'scenario SC-1 category=c',
  '  cause function=LC-1 frequency=0.1 basis="rule table"',
  '  layer SF-1',
];

/** A scenario SC-1 on category c with the given cause line (a basis added when it has none) and layers (`layer X` lines). */
export function scenario(cause: string, ...layers: string[]): string[] {
  const withBasis = /frequency=/.test(cause) && !/basis=/.test(cause) ? `${cause} basis="rule table"` : cause;
  return ['scenario SC-1 category=c', `  cause ${withBasis}`, ...layers.map((l) => `  layer ${l}`)];
}

export interface Case {
  name: string;
  /** Lines replacing the base line of the same key, or added under a new key; `null` removes one. */
  lines?: Readonly<Record<string, string | null>>;
  /** The scenario block (with indented lines); defaults to BASE_SCENARIO. */
  scenario?: readonly string[];
  /** Extra statements after the scenario (rule settings, accept lines). */
  extra?: readonly string[];
  /**
   * Where the rule or value this case checks comes from: a standard with edition and clause, "common
   * practice, no source", or "from memory". Shown in the test name.
   */
  source?: string;
}

/**
 * One finding a case must produce: the rule is the table's; parties are the tags of the sides. The message id
 * is always checked; its data and the primary span (`line:column` in the case model) when the case gives them.
 */
export interface Expected {
  key: string;
  messageId: MessageId;
  data?: unknown;
  at?: string;
  severity: SeverityLevel;
  element?: string;
  parties: string[];
  accepted?: boolean;
}

export interface InvalidCase extends Case {
  findings: Expected[];
}

export interface RuleTable {
  valid: Case[];
  invalid: InvalidCase[];
}

export function modelText(c: Case): string {
  const lines: Record<string, string> = { ...BASE };
  for (const [key, line] of Object.entries(c.lines ?? {})) {
    if (line === null) delete lines[key];
    else lines[key] = line;
  }
  return [...Object.values(lines), ...(c.scenario ?? BASE_SCENARIO), ...(c.extra ?? [])].join('\n') + '\n';
}

/** Loads and analyses a case; any diagnostic at all (error or warning) fails it: cases must be clean. */
export function analyseCase(c: Case): Analysis {
  const loaded = loadModelText('case.bulk', modelText(c));
  if (!loaded.model || loaded.diagnostics.length > 0) {
    const said = loaded.diagnostics.map(
      (d) => `${d.code} ${d.severity} ${d.message} at ${d.span?.line}:${d.span?.column}`,
    );
    throw new Error(`case "${c.name}" does not load cleanly: ${said.join('; ') || 'no model'}`);
  }
  return analyze(loaded.model, { spans: loaded.spans });
}

function summary(f: Analysis['findings'][number], wanted?: Expected): Expected {
  return {
    key: f.key,
    messageId: f.messageId,
    ...(wanted && 'data' in wanted ? { data: f.data } : {}),
    ...(wanted?.at !== undefined ? { at: f.span ? `${f.span.line}:${f.span.column}` : 'no span' } : {}),
    severity: f.severity,
    ...(f.element !== undefined ? { element: f.element } : {}),
    parties: f.parties.map((p) => p.tag ?? 'external'),
    ...(f.accepted ? { accepted: true } : {}),
  };
}

/**
 * Checks a table before it runs, so a mistake in the table cannot pass as a result: the rule exists,
 * there are at least two cases of each kind, no two cases share a name or a model, every invalid case
 * lists at least one finding, and every listed key belongs to the rule and is listed once.
 */
export function checkTable(ruleId: string, table: RuleTable): void {
  const problems: string[] = [];
  if (!RULES.some((r) => r.id === ruleId)) problems.push(`no rule \`${ruleId}\` in RULES`);
  if (table.valid.length < 2) problems.push(`${table.valid.length} valid cases; at least 2 are needed`);
  if (table.invalid.length < 2) problems.push(`${table.invalid.length} invalid cases; at least 2 are needed`);
  const names = new Map<string, number>();
  const models = new Map<string, string>();
  for (const c of [...table.valid, ...table.invalid]) {
    names.set(c.name, (names.get(c.name) ?? 0) + 1);
    const text = modelText(c).replace(/[ \t]+/g, ' ');
    const first = models.get(text);
    if (first !== undefined) problems.push(`cases "${first}" and "${c.name}" are the same model`);
    else models.set(text, c.name);
  }
  for (const [name, count] of names) if (count > 1) problems.push(`${count} cases are named "${name}"`);
  for (const c of table.invalid) {
    if (c.findings.length === 0) problems.push(`invalid case "${c.name}" lists no finding; make it a valid case`);
    const keys = c.findings.map((f) => f.key);
    for (const key of keys)
      if (!key.startsWith(`${ruleId}:`))
        problems.push(`case "${c.name}": key \`${key}\` is not a key of rule ${ruleId}`);
    for (const f of c.findings)
      if (!f.messageId.startsWith(`${ruleId}/`))
        problems.push(`case "${c.name}": message \`${f.messageId}\` is not a message of rule ${ruleId}`);
    if (new Set(keys).size !== keys.length) problems.push(`case "${c.name}" lists a finding twice`);
  }
  if (problems.length > 0) throw new Error(`table of ${ruleId}: ${problems.join('; ')}`);
}

const byKey = (a: Expected, b: Expected) => (a.key < b.key ? -1 : a.key > b.key ? 1 : 0);

/** The findings of one rule for a case, as the tables write them (with data and span where `wanted` lists them), sorted by key. */
export function ruleFindings(ruleId: string, c: Case, wanted: readonly Expected[] = []): Expected[] {
  const byWantedKey = new Map(wanted.map((w) => [w.key, w]));
  return analyseCase(c)
    .findings.filter((f) => f.rule === ruleId)
    .map((f) => summary(f, byWantedKey.get(f.key)))
    .sort(byKey);
}
const titled = (kind: string, c: Case) => `${kind}: ${c.name}${c.source ? ` [${c.source}]` : ''}`;

/** Runs a rule's table: valid cases report nothing for the rule; invalid ones exactly what is listed. */
export function ruleTable(ruleId: string, table: RuleTable): void {
  describe(`rule ${ruleId}`, () => {
    it('has a sound table (known rule, two cases of each kind, no duplicates, keys of this rule)', () => {
      expect(() => checkTable(ruleId, table)).not.toThrow();
    });
    for (const c of table.valid) {
      it(titled('valid', c), () => {
        expect(ruleFindings(ruleId, c)).toEqual([]);
      });
    }
    for (const c of table.invalid) {
      it(titled('invalid', c), () => {
        expect(ruleFindings(ruleId, c, c.findings)).toEqual([...c.findings].sort(byKey));
      });
    }
  });
}
