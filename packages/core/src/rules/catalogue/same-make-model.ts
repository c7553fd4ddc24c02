// Diversity: instruments of the same make and model on the two sides share systematic failures
// (a firmware fault, a wrong calibration procedure), so the pairing asks for a justification.
import { groupOf } from '../../model/kinds.ts';
import type { Element } from '../../model/schema.ts';
import { defineScenarioRule, describeSide, sidesInKeyOrder, type FindingDraft, type ScenarioContext, type Side } from '../define.ts';

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
      const make = 'make' in right ? `${right.make} ${right.model}` : '';
      drafts.push({
        parties: [a.party, b.party],
        element: right.tag,
        keyDetail: other.tag,
        paths: [a.elements.get(other.tag)!.path, b.elements.get(right.tag)!.path],
        message: `\`${right.tag}\` in ${describeSide(b)} and \`${other.tag}\` in ${describeSide(a)} are the same make and model (${make}): systematic common cause`,
      });
    }
  }
  return drafts;
}

export const sameMakeModel = defineScenarioRule({
  id: 'same-make-model',
  title: 'Same make and model on both sides',
  rationale: 'Identical devices share systematic faults; diverse separation matters most at higher SIL, identical separation is generally accepted at SIL 1.',
  source: 'ANSI/ISA-S84.01-1996 Annex B.1.2 (identical vs diverse separation); IEC 61511-1:2016 9.4 (diversity) [from memory for the clause]',
  defaultSeverity: 'needs-justification',
  check(ctx) {
    const sides = sidesInKeyOrder(ctx);
    const drafts: FindingDraft[] = [];
    for (let i = 0; i < sides.length; i++) for (let j = i + 1; j < sides.length; j++) drafts.push(...compare(sides[i]!, sides[j]!, ctx));
    return drafts;
  },
});
