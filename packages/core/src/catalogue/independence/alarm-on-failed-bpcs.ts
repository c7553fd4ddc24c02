// alarm-on-failed-bpcs: an alarm raised or shown by the BPCS controller or display that fails in the
// cause is not independent of it (policy shared-solver=allow follows the older allowance).
import { ruleEntry } from '../define.ts';
import { beneathWords, sideWords, type SideRef } from '../words.ts';

export const alarmOnFailedBpcs = ruleEntry({
  id: 'alarm-on-failed-bpcs',
  kind: 'independence',
  title: 'Alarm raised or shown by the BPCS that fails in the cause',
  rationale:
    'An operator response that relies only on the BPCS controller or display that has failed is not independent of a BPCS cause. Older CCPS practice allowed an alarm with its own sensor and I/O in the same controller; policy shared-solver=allow follows it.',
  source:
    'CCPS, Layer of Protection Analysis (2001), ch. 6 (human response as an IPL; older allowance for a shared controller)',
  defaultSeverity: 'voids-credit',
  messages: {
    raised: (d: {
      alarm: string;
      element: string;
      kind: string;
      cause: SideRef;
      allowedByPolicy: boolean;
      beneath: string[];
    }) =>
      `alarm \`${d.alarm}\` is raised or shown through ${d.kind} \`${d.element}\`, which ${sideWords(d.cause)} relies on: ` +
      (d.allowedByPolicy
        ? 'allowed under policy shared-solver=allow (older practice: its own sensor and I/O), a note'
        : 'not independent') +
      beneathWords(d.beneath),
  },
});
