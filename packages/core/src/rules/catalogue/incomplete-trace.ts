// Conservative unknowns: an instrumented layer whose sensor has no process connection, or which has
// no solver or final element in the model, cannot be shown independent, so it is unverified.
import { defineScenarioRule } from '../define.ts';

const PART_WORDS = {
  sensor: 'no sensor',
  'process-connection': 'a sensor with no process connection',
  solver: 'no controller or logic solver',
  'final-element': 'no final element',
  operator: 'no operator',
} as const;

export const incompleteTrace = defineScenarioRule({
  id: 'incomplete-trace',
  title: 'Incomplete trace: independence unverified',
  rationale: 'What the model does not say is never taken as independence; complete the model or record an accepted justification.',
  source: 'CCPS, Layer of Protection Analysis (2001), ch. 6 (an IPL must be auditable); conservative default of this tool',
  defaultSeverity: 'voids-credit',
  check(ctx) {
    return ctx.layers.flatMap((layer) => {
      const trace = layer.fn ? ctx.tracer.traceFunction(layer.fn.tag) : undefined;
      if (!trace || trace.missing.length === 0) return [];
      return [{
        parties: [layer.party],
        paths: [[layer.fn!.tag]],
        keyDetail: trace.missing.join('+'),
        message: `\`${layer.fn!.tag}\` cannot be traced: the model gives ${trace.missing.map((m) => PART_WORDS[m]).join(', ')}; its independence is unverified`,
      }];
    });
  },
});
