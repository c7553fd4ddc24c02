// Common cause inside a voted group: 1oo2 channels on one tapping are no better than one channel,
// and the redundancy the PFD claim rests on is not there.
import { say } from '../../catalogue/catalogue.ts';
import { defineScenarioRule, type FindingDraft } from '../define.ts';
import { failsSafeOnLoss } from '../fail-direction.ts';
import { votedGroupCommonCause as entry } from '../../catalogue/independence/voted-group-common-cause.ts';

export const votedGroupCommonCause = defineScenarioRule(entry, {
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
            if (closures.some((other, j) => j !== i && other.has(tag)))
              (shared.get(tag) ?? shared.set(tag, []).get(tag)!).push(heads[i]!);
          }
        });
        // Report only the elements closest to the channels: what a shared element relies on is shared too.
        const candidates = [...shared.keys()];
        const reported = candidates.filter(
          (tag) => !candidates.some((other) => other !== tag && ctx.tracer.closure(other).has(tag)),
        );
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
              says: say('voted-group-common-cause/own-solver-card', {
                role,
                channels,
                function: fn.tag,
                element: tag,
                solver: fn.solver,
              }),
            });
            continue;
          }
          drafts.push({
            parties: [layer.party],
            element: tag,
            paths: [layer.elements.get(tag)?.path ?? [fn.tag, tag]],
            says: say('voted-group-common-cause/shared-in-group', {
              role,
              channels,
              function: fn.tag,
              element: tag,
              kind: element.kind,
            }),
          });
        }
      }
    }
    return drafts;
  },
});
