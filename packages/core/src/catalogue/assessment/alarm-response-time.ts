// Assessment rule alarm-response-time: a limit the LOPA figures obey; the check lives in assess/.
import { ruleEntry } from '../define.ts';

export const alarmResponseTime = ruleEntry({
  id: 'alarm-response-time',
  kind: 'assessment',
  title: 'Too little time for the operator response',
  rationale:
    'An alarm with operator response earns credit only when the time available is at least the minimum in the criteria (policy min-response-minutes, default 10).',
  source: 'CCPS, Layer of Protection Analysis (2001), human response with at least 10 minutes (from memory)',
  defaultSeverity: 'voids-credit',
  messages: {
    'too-little-time': (d: { function: string; minutes: number; required: number }) =>
      `\`${d.function}\` allows ${d.minutes} minutes for the response; the criteria ask for at least ${d.required}`,
  },
});
