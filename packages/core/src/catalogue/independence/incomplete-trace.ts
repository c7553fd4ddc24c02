// Conservative unknowns: an instrumented layer whose sensor has no process connection, or which has
// no solver or final element in the model, cannot be shown independent, so it is unverified.
import { ruleEntry } from '../define.ts';

/** A part an instrumented layer needs but the model does not give: the layer is unverified. */
export type MissingPart = 'sensor' | 'process-connection' | 'solver' | 'final-element' | 'operator';

const PART_WORDS: Record<MissingPart, string> = {
  sensor: 'no sensor',
  'process-connection': 'a sensor with no process connection',
  solver: 'no controller or logic solver',
  'final-element': 'no final element',
  operator: 'no operator',
};

export const incompleteTrace = ruleEntry({
  id: 'incomplete-trace',
  kind: 'independence',
  title: 'Incomplete trace: independence unverified',
  rationale:
    'What the model does not say is never taken as independence; complete the model or record an accepted justification.',
  source:
    'CCPS, Layer of Protection Analysis (2001), ch. 6 (an IPL must be auditable); conservative default of this tool',
  defaultSeverity: 'voids-credit',
  messages: {
    untraced: (d: { function: string; missing: MissingPart[] }) =>
      `\`${d.function}\` cannot be traced: the model gives ${d.missing.map((m) => PART_WORDS[m]).join(', ')}; its independence is unverified`,
  },
});
