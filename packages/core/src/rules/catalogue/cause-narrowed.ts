// A loop-failure cause narrowed to one element: the whole loop can fail (transmitter, controller,
// valve, set point, manual mode), so narrowing needs a justification; until one is accepted the
// analysis keeps the whole loop as the cause.
import { defineScenarioRule } from '../define.ts';

export const causeNarrowed = defineScenarioRule({
  id: 'cause-narrowed',
  title: 'Cause narrowed to one element of a loop',
  rationale:
    'A BPCS loop-failure cause covers all of its parts and also wrong set points, miscalibration and manual operation; narrowing it to one element must be justified. Until it is accepted, the whole loop is the cause.',
  source: 'CCPS, Guidelines for Initiating Events and Independent Protection Layers (2015), BPCS loop failure',
  defaultSeverity: 'needs-justification',
  check(ctx) {
    const { cause } = ctx.scenario;
    if (cause.function === undefined || cause.only === undefined) return [];
    const inLoop = ctx.tracer.closure(cause.only).size > 0 && ctx.cause.elements.has(cause.only);
    return [{
      parties: [{ role: 'cause', tag: cause.function }],
      element: cause.only,
      paths: [ctx.cause.elements.get(cause.only)?.path ?? [cause.function, cause.only]],
      message: inLoop
        ? `the cause is narrowed from loop \`${cause.function}\` to \`${cause.only}\`; until accepted, the whole loop counts as the cause`
        : `the cause is narrowed to \`${cause.only}\`, which loop \`${cause.function}\` does not use; the whole loop counts as the cause`,
    }];
  },
});
