// Assessment rule condition-no-basis: a limit the LOPA figures obey; the check lives in assess/.
import { ruleEntry } from '../define.ts';
import { formatProbability } from '../../util/figures.ts';

export const conditionNoBasis = ruleEntry({
  id: 'condition-no-basis',
  kind: 'assessment',
  title: 'Enabling condition or conditional modifier without a basis',
  rationale:
    'An enabling condition or conditional modifier is a credit like any layer and needs a stated basis (a study, records, a time fraction worked out); without one it is not applied until a basis is recorded or a justification accepts it.',
  source: 'CCPS, Guidelines for Enabling Conditions and Conditional Modifiers in Layer of Protection Analysis (2013)',
  defaultSeverity: 'needs-justification',
  messages: {
    'no-basis': (d: { factor: 'enabler' | 'modifier'; name: string; probability: number }) =>
      `the ${d.factor === 'enabler' ? `enabling condition "${d.name}"` : `${d.name} modifier`} (${formatProbability(d.probability)}) is given without a basis; it is not applied until a basis is recorded (basis=) or a justification accepts it`,
  },
});
