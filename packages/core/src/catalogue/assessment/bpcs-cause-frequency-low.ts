// Assessment rule bpcs-cause-frequency-low: a limit the LOPA figures obey; the check lives in assess/.
import { ruleEntry } from '../define.ts';
import { formatFrequency } from '../../util/figures.ts';

export const bpcsCauseFrequencyLow = ruleEntry({
  id: 'bpcs-cause-frequency-low',
  kind: 'assessment',
  title: 'BPCS loop failure claimed below 0.1 per year',
  rationale:
    'A BPCS not designed to IEC 61511 may not be assumed to fail dangerously less often than 1e-5 per hour (about 0.0876 per year, conventionally 0.1 per year); a lower figure needs a justification and 0.1 is used until then.',
  source: 'IEC 61511-1:2003 8.2.2 (kept in 2016)',
  defaultSeverity: 'needs-justification',
  messages: {
    'below-floor': (d: { frequency: number; lowest: number }) =>
      `the BPCS loop failure is claimed at ${formatFrequency(d.frequency)}, below ${formatFrequency(d.lowest)}; ${formatFrequency(d.lowest)} is used until a justification accepts it`,
  },
});
