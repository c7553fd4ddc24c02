// Conservative unknowns: an instrumented layer whose sensor has no process connection, or which has
// no solver or final element in the model, cannot be shown independent, so it is unverified.
import { defineScenarioRule } from '../define.ts';
import { say } from '../../catalogue/catalogue.ts';
import { incompleteTrace as entry } from '../../catalogue/independence/incomplete-trace.ts';

export const incompleteTrace = defineScenarioRule(entry, {
  check(ctx) {
    return ctx.layers.flatMap((layer) => {
      const trace = layer.fn ? ctx.tracer.traceFunction(layer.fn.tag) : undefined;
      if (!trace || trace.missing.length === 0) return [];
      return [
        {
          parties: [layer.party],
          paths: [[layer.fn!.tag]],
          keyDetail: trace.missing.join('+'),
          says: say('incomplete-trace/untraced', { function: layer.fn!.tag, missing: [...trace.missing] }),
        },
      ];
    });
  },
});
