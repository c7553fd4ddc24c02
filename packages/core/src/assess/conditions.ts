// Enabling conditions and conditional modifiers: which apply in each figure (harm criterion, presence limit, a stated
// basis) and the owner's limit on their combined credit (CCPS, Enabling Conditions and Conditional Modifiers, 2013).
import type { Finding, ScenarioAssessment } from '../vocabulary/types.ts';
import type { Model, Scenario } from '../model/schema.ts';
import { formatProbability, formatRatio } from './format.ts';
import { inForce, limitFinding, type Figure } from './limits.ts';
import { above, below, product } from './numbers.ts';
import { resolvedPolicy } from '../vocabulary/policy.ts';

type EnablerEntry = ScenarioAssessment['enablers'][number];
type ModifierEntry = ScenarioAssessment['modifiers'][number];

export interface Conditions {
  enablers: EnablerEntry[];
  modifiers: ModifierEntry[];
  /** Product of the enablers applied in a figure (claimed: all of them). */
  enablerProduct(figure: Figure | 'claimed'): number;
  /** Product of the modifiers applied in a figure, raised where the combined-credit limit is in force. */
  modifierProduct(figure: Figure | 'claimed'): number;
}

function applied(entry: { allowed: boolean; allowedIfAccepted?: boolean }, figure: Figure | 'claimed'): boolean {
  if (figure === 'claimed') return true;
  return figure === 'after' ? entry.allowed : (entry.allowedIfAccepted ?? entry.allowed);
}

/** Records a finding's effect on one factor: not applied in the figures where it is in force. */
function bar<T extends { allowed: boolean; allowedIfAccepted?: boolean; finding?: string }>(entry: T, f: Finding): T {
  // A factor barred by an earlier finding stays barred; the first finding is the one shown.
  if (entry.finding !== undefined) return entry;
  entry.allowed = !inForce(f, 'after');
  entry.allowedIfAccepted = !inForce(f, 'if-accepted');
  entry.finding = f.key;
  return entry;
}

function noBasis(model: Model, scenario: Scenario, tag: string, what: string, probability: number): Finding {
  return limitFinding(model, scenario.id, 'condition-no-basis', {
    tags: [tag],
    parties: [],
    message: `the ${what} (${formatProbability(probability)}) is given without a basis; it is not applied until a basis is recorded (basis=) or a justification accepts it`,
  });
}

export function assessConditions(model: Model, scenario: Scenario, harm: string, mine: Finding[]): Conditions {
  const policy = resolvedPolicy(model);
  const enablers = (scenario.enablers ?? []).map((e, i): EnablerEntry => {
    const entry: EnablerEntry = { title: e.title, probability: e.probability, ...(e.basis !== undefined ? { basis: e.basis } : {}), allowed: true };
    if (e.basis === undefined) {
      const f = noBasis(model, scenario, `enabler-${i + 1}`, `enabling condition "${e.title}"`, e.probability);
      mine.push(f);
      bar(entry, f);
    }
    return entry;
  });
  const seen = new Map<string, number>();
  const modifiers = (scenario.modifiers ?? []).map((m): ModifierEntry => {
    const count = (seen.get(m.kind) ?? 0) + 1;
    seen.set(m.kind, count);
    const tag = count === 1 ? m.kind : `${m.kind}-${count}`;
    const entry: ModifierEntry = {
      kind: m.kind,
      ...(m.title !== undefined ? { title: m.title } : {}),
      probability: m.probability,
      ...(m.basis !== undefined ? { basis: m.basis } : {}),
      allowed: true,
    };
    const found: Finding[] = [];
    if (harm !== 'people') {
      found.push(limitFinding(model, scenario.id, 'modifier-not-allowed', {
        tags: [tag],
        parties: [],
        message: `the ${m.kind} modifier (${formatProbability(m.probability)}) applies only to harm to people; category \`${scenario.category}\` is ${harm}, so it is not applied`,
      }));
    } else {
      if (m.kind === 'presence' && above(m.probability, policy.presenceLimit)) {
        found.push(limitFinding(model, scenario.id, 'presence-above-limit', {
          tags: [tag],
          parties: [],
          message: `presence ${formatProbability(m.probability)} is above the policy limit ${formatProbability(policy.presenceLimit)}; it is not applied until a justification accepts it`,
        }));
      }
      if (m.basis === undefined) found.push(noBasis(model, scenario, tag, `${m.kind} modifier`, m.probability));
    }
    for (const f of found) {
      mine.push(f);
      bar(entry, f);
    }
    return entry;
  });

  const rawEnablers = (figure: Figure | 'claimed') => product(enablers.filter((e) => applied(e, figure)).map((e) => e.probability));
  const rawModifiers = (figure: Figure | 'claimed') => product(modifiers.filter((m) => applied(m, figure)).map((m) => m.probability));
  // The owner's limit on the combined credit: judged on the factors the "if accepted" figure would apply (a superset
  // of the headline figure's), so accepting the other findings cannot take the credit past the limit unseen.
  const floor = 1 / policy.conditionCreditLimit;
  const combined = rawEnablers('if-accepted') * rawModifiers('if-accepted');
  let limit: Finding | undefined;
  if (below(combined, floor)) {
    limit = limitFinding(model, scenario.id, 'condition-credit-limit', {
      tags: [],
      parties: [],
      message:
        `enablers and modifiers together give a credit of ${formatRatio(1 / combined)} (product ${formatProbability(combined)}), above the policy limit of ${formatRatio(policy.conditionCreditLimit)}; ` +
        `${formatRatio(policy.conditionCreditLimit)} is used until a justification accepts it`,
    });
    mine.push(limit);
  }
  // The excess credit is taken back on the modifier side, so the demand on the SIF keeps the enablers as stated.
  const modifierProduct = (figure: Figure | 'claimed') => {
    const raw = rawModifiers(figure);
    if (figure === 'claimed' || !limit || !inForce(limit, figure)) return raw;
    const both = rawEnablers(figure) * raw;
    return below(both, floor) ? raw * (floor / both) : raw;
  };
  return { enablers, modifiers, enablerProduct: rawEnablers, modifierProduct };
}
