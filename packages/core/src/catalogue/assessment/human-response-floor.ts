// Assessment rule human-response-floor: a limit the LOPA figures obey; the check lives in assess/.
import { ruleEntry } from '../define.ts';
import { formatProbability } from '../../util/figures.ts';

export const humanResponseFloor = ruleEntry({
  id: 'human-response-floor',
  kind: 'assessment',
  title: 'Operator response claims a PFD better than 0.1 without a human-reliability basis',
  rationale:
    'An alarm with operator response is credited at PFD 0.1 at best, wherever the alarm is raised (BPCS, SIS or a panel), unless a documented human-reliability analysis supports a lower figure (hra-basis).',
  source:
    'CCPS, Layer of Protection Analysis (2001), Table 6.5 (human response); CCPS, Guidelines for Initiating Events and Independent Protection Layers (2015), human IPLs',
  defaultSeverity: 'voids-credit',
  messages: {
    capped: (d: { function: string; claimed: number; best: number }) =>
      `\`${d.function}\` claims PFD ${formatProbability(d.claimed)} for an operator response; without a human-reliability analysis (hra-basis=) it is credited at ${formatProbability(d.best)} at best`,
  },
});
