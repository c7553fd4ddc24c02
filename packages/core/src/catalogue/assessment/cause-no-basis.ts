// Assessment rule cause-no-basis: a limit the LOPA figures obey; the check lives in assess/.
import { ruleEntry } from '../define.ts';
import { formatFrequency } from '../../util/figures.ts';

export const causeNoBasis = ruleEntry({
  id: 'cause-no-basis',
  kind: 'assessment',
  title: 'Cause frequency without a basis',
  rationale:
    'An initiating-event frequency drives every figure of the scenario; one given without a basis (failure data, site history, a table row) is used as given but stays open until a basis is recorded or a justification accepts it.',
  source:
    'CCPS, Guidelines for Initiating Events and Independent Protection Layers (2015); CCPS, Guidelines for Enabling Conditions and Conditional Modifiers in Layer of Protection Analysis (2013)',
  defaultSeverity: 'needs-justification',
  messages: {
    'no-basis': (d: { frequency: number }) =>
      `the cause frequency ${formatFrequency(d.frequency)} is given without a basis; it is used as given, but record where it comes from (basis=) or accept it`,
  },
});
