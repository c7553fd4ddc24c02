// Enabling conditions and conditional modifiers: which apply in each figure (harm criterion, presence limit, a stated
// basis) and the owner's limit on their combined credit (CCPS, Enabling Conditions and Conditional Modifiers, 2013).
import type { Finding, ScenarioAssessment } from '../vocabulary/types.ts';
import type { Model, Scenario } from '../model/schema.ts';
import { say } from '../catalogue/catalogue.ts';
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

function noBasis(
  model: Model,
  scenario: Scenario,
  tag: string,
  factor: 'enabler' | 'modifier',
  name: string,
  probability: number,
): Finding {
  return limitFinding(model, scenario.id, {
    tags: [tag],
    parties: [],
    says: say('condition-no-basis/no-basis', { factor, name, probability }),
  });
}

export function assessConditions(model: Model, scenario: Scenario, harm: string, mine: Finding[]): Conditions {
  const policy = resolvedPolicy(model);
  const enablers = (scenario.enablers ?? []).map((e, i): EnablerEntry => {
    const entry: EnablerEntry = {
      title: e.title,
      probability: e.probability,
      ...(e.basis !== undefined ? { basis: e.basis } : {}),
      allowed: true,
    };
    if (e.basis === undefined) {
      const f = noBasis(model, scenario, `enabler-${i + 1}`, 'enabler', e.title, e.probability);
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
      found.push(
        limitFinding(model, scenario.id, {
          tags: [tag],
          parties: [],
          says: say('modifier-not-allowed/not-people', {
            modifier: m.kind,
            probability: m.probability,
            category: scenario.category,
            harm,
          }),
        }),
      );
    } else {
      if (m.kind === 'presence' && above(m.probability, policy.presenceLimit)) {
        found.push(
          limitFinding(model, scenario.id, {
            tags: [tag],
            parties: [],
            says: say('presence-above-limit/above-limit', { probability: m.probability, limit: policy.presenceLimit }),
          }),
        );
      }
      if (m.basis === undefined) found.push(noBasis(model, scenario, tag, 'modifier', m.kind, m.probability));
    }
    for (const f of found) {
      mine.push(f);
      bar(entry, f);
    }
    return entry;
  });

  const rawEnablers = (figure: Figure | 'claimed') =>
    product(enablers.filter((e) => applied(e, figure)).map((e) => e.probability));
  const rawModifiers = (figure: Figure | 'claimed') =>
    product(modifiers.filter((m) => applied(m, figure)).map((m) => m.probability));
  // The owner's limit on the combined credit: judged on the factors the "if accepted" figure would apply (a superset
  // of the headline figure's), so accepting the other findings cannot take the credit past the limit unseen.
  const floor = 1 / policy.conditionCreditLimit;
  const combined = rawEnablers('if-accepted') * rawModifiers('if-accepted');
  let limit: Finding | undefined;
  if (below(combined, floor)) {
    limit = limitFinding(model, scenario.id, {
      tags: [],
      parties: [],
      says: say('condition-credit-limit/above-limit', { product: combined, limit: policy.conditionCreditLimit }),
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
