// Diversity: instruments of the same make and model on the two sides share systematic failures
// (a firmware fault, a wrong calibration procedure), so the pairing asks for a justification.
import { groupOf } from '../../model/kinds.ts';
import type { Element } from '../../model/schema.ts';
import { say } from '../../catalogue/catalogue.ts';
import {
  defineScenarioRule,
  sideRef,
  sidesInKeyOrder,
  type FindingDraft,
  type ScenarioContext,
  type Side,
} from '../define.ts';
import { sameMakeModel as entry } from '../../catalogue/independence/same-make-model.ts';

function identity(element: Element): string | undefined {
  if (!('make' in element) || !('model' in element) || !element.make || !element.model) return undefined;
  return `${element.make.trim().toLowerCase()}\u0000${element.model.trim().toLowerCase()}`;
}

function devices(side: Side, ctx: ScenarioContext): Element[] {
  return [...side.elements.values()]
    .filter((t) => t.group === 'sensor' || t.group === 'final' || t.group === 'actuation')
    .map((t) => ctx.element(t.tag));
}

function compare(a: Side, b: Side, ctx: ScenarioContext): FindingDraft[] {
  const drafts: FindingDraft[] = [];
  const left = devices(a, ctx);
  for (const right of devices(b, ctx)) {
    const id = identity(right);
    if (!id) continue;
    for (const other of left) {
      if (other.tag === right.tag || identity(other) !== id || groupOf(other.kind) !== groupOf(right.kind)) continue;
      drafts.push({
        parties: [a.party, b.party],
        element: right.tag,
        keyDetail: other.tag,
        paths: [a.elements.get(other.tag)!.path, b.elements.get(right.tag)!.path],
        says: say('same-make-model/same-device', {
          element: right.tag,
          other: other.tag,
          a: sideRef(a),
          b: sideRef(b),
          make: 'make' in right ? (right.make ?? '') : '',
          model: 'model' in right ? (right.model ?? '') : '',
        }),
      });
    }
  }
  return drafts;
}

export const sameMakeModel = defineScenarioRule(entry, {
  check(ctx) {
    const sides = sidesInKeyOrder(ctx);
    const drafts: FindingDraft[] = [];
    for (let i = 0; i < sides.length; i++)
      for (let j = i + 1; j < sides.length; j++) drafts.push(...compare(sides[i]!, sides[j]!, ctx));
    return drafts;
  },
});
