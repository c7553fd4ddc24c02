// A loop-failure cause narrowed to one element: the whole loop can fail (transmitter, controller,
// valve, set point, manual mode), so narrowing needs a justification; until one is accepted the
// analysis keeps the whole loop as the cause.
import { defineScenarioRule } from '../define.ts';
import { say } from '../../catalogue/catalogue.ts';
import { causeNarrowed as entry } from '../../catalogue/independence/cause-narrowed.ts';

export const causeNarrowed = defineScenarioRule(entry, {
  check(ctx) {
    const { cause } = ctx.scenario;
    if (cause.function === undefined || cause.only === undefined) return [];
    const inLoop = ctx.tracer.closure(cause.only).size > 0 && ctx.cause.elements.has(cause.only);
    return [
      {
        parties: [{ role: 'cause', tag: cause.function }],
        element: cause.only,
        paths: [ctx.cause.elements.get(cause.only)?.path ?? [cause.function, cause.only]],
        says: say(inLoop ? 'cause-narrowed/narrowed' : 'cause-narrowed/outside-loop', {
          loop: cause.function,
          only: cause.only,
        }),
      },
    ];
  },
});
