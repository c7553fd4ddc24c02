// A loop-failure cause narrowed to one element: the whole loop can fail (transmitter, controller,
// valve, set point, manual mode), so narrowing needs a justification; until one is accepted the
// analysis keeps the whole loop as the cause.
import { ruleEntry } from '../define.ts';

export const causeNarrowed = ruleEntry({
  id: 'cause-narrowed',
  kind: 'independence',
  title: 'Cause narrowed to one element of a loop',
  rationale:
    'A BPCS loop-failure cause covers all of its parts and also wrong set points, miscalibration and manual operation; narrowing it to one element must be justified. Until it is accepted, the whole loop is the cause.',
  source: 'CCPS, Guidelines for Initiating Events and Independent Protection Layers (2015), BPCS loop failure',
  defaultSeverity: 'needs-justification',
  messages: {
    narrowed: (d: { loop: string; only: string }) =>
      `the cause is narrowed from loop \`${d.loop}\` to \`${d.only}\`; until accepted, the whole loop counts as the cause`,
    'outside-loop': (d: { loop: string; only: string }) =>
      `the cause is narrowed to \`${d.only}\`, which loop \`${d.loop}\` does not use; the whole loop counts as the cause`,
  },
});
