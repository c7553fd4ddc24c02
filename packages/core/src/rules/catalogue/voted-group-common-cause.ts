// Common cause inside a voted group: 1oo2 channels on one tapping are no better than one channel,
// and the redundancy the PFD claim rests on is not there.
import { defineScenarioRule, type FindingDraft } from '../define.ts';
import { failsSafeOnLoss } from '../fail-direction.ts';

export const votedGroupCommonCause = defineScenarioRule({
  id: 'voted-group-common-cause',
  title: 'Common cause inside a voted group',
  rationale:
    'Channels of a MooN group that share an element are not covered by the beta factor: the shared element is a single point of failure in series with the group, so the group is no better than one channel.',
  source: 'IEC 61508-6:2010 Annex B and D (common cause in voted groups); ISA-TR84.00.02 (simplified PFD equations)',
  defaultSeverity: 'needs-justification',
  check(ctx) {
    const drafts: FindingDraft[] = [];
    for (const layer of ctx.layers) {
      const fn = layer.fn;
      if (!fn || (fn.kind !== 'sif' && fn.kind !== 'trip' && fn.kind !== 'loop')) continue;
      // The solver and what it relies on are a subsystem of their own, shared by design.
      const solverSide = ctx.tracer.closure(fn.solver);
      for (const role of ['sensor', 'final'] as const) {
        const heads = role === 'sensor' ? fn.sensors : fn.finals;
        if (heads.length < 2) continue;
        const shared = new Map<string, string[]>();
        const closures = heads.map((h) => ctx.tracer.closure(h));
        closures.forEach((closure, i) => {
          for (const tag of closure) {
            if (solverSide.has(tag) || ctx.tracer.group(tag) === 'equipment') continue;
            if (closures.some((other, j) => j !== i && other.has(tag))) (shared.get(tag) ?? shared.set(tag, []).get(tag)!).push(heads[i]!);
          }
        });
        // Report only the elements closest to the channels: what a shared element relies on is shared too.
        const candidates = [...shared.keys()];
        const reported = candidates.filter((tag) => !candidates.some((other) => other !== tag && ctx.tracer.closure(other).has(tag)));
        for (const tag of reported.sort()) {
          const element = ctx.element(tag);
          if (ctx.tracer.group(tag) === 'support' && failsSafeOnLoss(layer, element, ctx)) continue;
          const channels = [...new Set(shared.get(tag))].sort(); // by tag, not list order
          // An input or output card of the function's own logic solver belongs to the logic-solver subsystem,
          // a single point in series with the solver that SIF verification counts there (issue 16, item 6).
          if (element.kind === 'io-card' && ctx.tracer.closure(tag).has(fn.solver)) {
            drafts.push({
              parties: [layer.party],
              element: tag,
              paths: [layer.elements.get(tag)?.path ?? [fn.tag, tag]],
              severity: 'note',
              message: `the ${role} channels ${channels.map((c) => `\`${c}\``).join(', ')} of \`${fn.tag}\` share \`${tag}\`, a card of its own logic solver \`${fn.solver}\`: part of the logic-solver subsystem, counted there by \`bulkhead verify\`, not a common cause of the voted group`,
            });
            continue;
          }
          drafts.push({
            parties: [layer.party],
            element: tag,
            paths: [layer.elements.get(tag)?.path ?? [fn.tag, tag]],
            message: `the ${role} channels ${channels.map((c) => `\`${c}\``).join(', ')} of \`${fn.tag}\` all rely on ${element.kind} \`${tag}\`: the voted group is no better than one channel`,
          });
        }
      }
    }
    return drafts;
  },
});
