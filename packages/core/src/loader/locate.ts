// Where each part of a finding or report points in the model file: a claimed layer, a shared element's
// definition, a cause, an `accept` statement. Spans come from the loader; a model built in code has none,
// and that is fine.
import type { Span } from '../diagnostics/diagnostic.ts';
import type { RelatedSpan } from '../vocabulary/types.ts';
import type { SpanMap } from '../bulk/to-model.ts';
import { spanAt } from './schema-issues.ts';
import type { Model } from '../model/schema.ts';

/** Findings about one enabler or modifier: outputs point at its line, not at the cause. */
export const FACTOR_RULES: ReadonlySet<string> = new Set([
  'condition-no-basis',
  'modifier-not-allowed',
  'presence-above-limit',
]);

export class ModelLocator {
  private readonly scenarioIndex: Map<string, number>;
  private readonly elementIndex: Map<string, number>;
  private readonly functionIndex: Map<string, number>;
  private readonly justificationIndex: Map<string, number>;

  constructor(
    private readonly model: Model,
    private readonly spans: SpanMap | undefined,
  ) {
    const indexOf = <T>(list: readonly T[], key: (item: T) => string) => {
      const map = new Map<string, number>();
      list.forEach((item, i) => {
        if (!map.has(key(item))) map.set(key(item), i);
      });
      return map;
    };
    this.scenarioIndex = indexOf(model.scenarios, (s) => s.id);
    this.elementIndex = indexOf(model.elements, (e) => e.tag);
    this.functionIndex = indexOf(model.functions, (f) => f.tag);
    this.justificationIndex = indexOf(model.justifications ?? [], (j) => j.finding);
  }

  private at(path: (string | number)[]): Span | undefined {
    return this.spans ? spanAt(this.spans, path) : undefined;
  }

  element(tag: string): Span | undefined {
    const i = this.elementIndex.get(tag);
    return i === undefined ? undefined : this.at(['elements', i, 'tag']);
  }

  function(tag: string): Span | undefined {
    const i = this.functionIndex.get(tag);
    return i === undefined ? undefined : this.at(['functions', i, 'tag']);
  }

  /** The `layer` line that claims a function in a scenario, or the function's definition if it is not claimed there. */
  layer(scenario: string | undefined, tag: string): Span | undefined {
    const i = scenario === undefined ? undefined : this.scenarioIndex.get(scenario);
    const j = i === undefined ? -1 : (this.model.scenarios[i]!.layers ?? []).findIndex((l) => l.function === tag);
    if (i !== undefined && j >= 0) return this.at(['scenarios', i, 'layers', j, 'function']);
    return this.function(tag);
  }

  cause(scenario: string): Span | undefined {
    const i = this.scenarioIndex.get(scenario);
    if (i === undefined) return undefined;
    const cause = this.model.scenarios[i]!.cause;
    const field =
      cause.only !== undefined
        ? 'only'
        : cause.function !== undefined
          ? 'function'
          : cause.element !== undefined
            ? 'element'
            : 'external';
    return this.at(['scenarios', i, 'cause', field]);
  }

  /**
   * The enabler or modifier line a finding about one factor names by the last part of its key: `enabler-2` is the
   * second enabler, `presence` the first presence modifier, `ignition-2` the second ignition modifier.
   */
  factor(scenario: string, findingKey: string): Span | undefined {
    const i = this.scenarioIndex.get(scenario);
    if (i === undefined) return undefined;
    const tag = findingKey.slice(findingKey.lastIndexOf(':') + 1);
    const s = this.model.scenarios[i]!;
    const enabler = /^enabler-(\d+)$/.exec(tag);
    if (enabler)
      return s.enablers?.[Number(enabler[1]) - 1]
        ? this.at(['scenarios', i, 'enablers', Number(enabler[1]) - 1, 'title'])
        : undefined;
    const [, kind, nth] = /^([a-z]+)(?:-(\d+))?$/.exec(tag) ?? [];
    let seen = 0;
    const j = (s.modifiers ?? []).findIndex((m) => m.kind === kind && ++seen === Number(nth ?? 1));
    return j >= 0 ? this.at(['scenarios', i, 'modifiers', j, 'kind']) : undefined;
  }

  scenario(id: string): Span | undefined {
    const i = this.scenarioIndex.get(id);
    return i === undefined ? undefined : this.at(['scenarios', i, 'id']);
  }

  justification(findingKey: string): Span | undefined {
    const i = this.justificationIndex.get(findingKey);
    return i === undefined ? undefined : this.at(['justifications', i, 'finding']);
  }
}

/** Rules whose finding is about an `accept` statement: its key is the rule id, a colon, and the key accepted. */
const ABOUT_ACCEPTANCE: ReadonlySet<string> = new Set(['stale-justification', 'duplicate-justification']);

/** What placing a finding needs: an analysis finding or a report's copy of one. */
interface Located {
  key: string;
  rule: string;
  scenario?: string | undefined;
  parties: readonly { role: 'cause' | 'layer'; tag?: string | undefined }[];
  element?: string | undefined;
  accepted?: unknown;
}

/**
 * Where a finding points: its primary span (the claim of the layer it concerns, else the enabler or modifier,
 * else the cause; for a finding about a justification, the `accept` statement) and the other places it
 * concerns (the other layer, the cause, the shared element's definition, the accepting statement). Places the
 * model has no span for are left out.
 */
export function findingSpans(finding: Located, locate: ModelLocator): { span?: Span; related: RelatedSpan[] } {
  const related: RelatedSpan[] = [];
  const add = (role: RelatedSpan['role'], name: string, span: Span | undefined) => {
    if (span) related.push({ role, name, span });
  };
  let span: Span | undefined;
  if (ABOUT_ACCEPTANCE.has(finding.rule) && finding.key.startsWith(`${finding.rule}:`)) {
    span = locate.justification(finding.key.slice(finding.rule.length + 1));
    return span ? { span, related } : { related };
  }
  const primary = [...finding.parties].reverse().find((p) => p.role === 'layer' && p.tag !== undefined);
  const scenario = finding.scenario;
  if (primary?.tag !== undefined) span = locate.layer(scenario, primary.tag);
  else if (scenario !== undefined && FACTOR_RULES.has(finding.rule)) span = locate.factor(scenario, finding.key);
  else if (scenario !== undefined) span = locate.cause(scenario);
  for (const party of finding.parties) {
    if (party.role === 'layer' && party !== primary && party.tag !== undefined)
      add('layer', party.tag, locate.layer(scenario, party.tag));
    if (party.role === 'cause' && scenario !== undefined && (primary !== undefined || FACTOR_RULES.has(finding.rule))) {
      add('cause', party.tag ?? 'external', locate.cause(scenario));
    }
  }
  if (finding.element !== undefined) add('element', finding.element, locate.element(finding.element));
  if (finding.accepted) add('accept', finding.key, locate.justification(finding.key));
  return span ? { span, related } : { related };
}
