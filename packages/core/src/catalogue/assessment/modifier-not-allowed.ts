// Assessment rule modifier-not-allowed: a limit the LOPA figures obey; the check lives in assess/.
import { ruleEntry } from '../define.ts';
import { formatProbability } from '../../util/figures.ts';

export const modifierNotAllowed = ruleEntry({
  id: 'modifier-not-allowed',
  kind: 'assessment',
  title: 'Conditional modifier on a criterion that is not harm to people',
  rationale:
    'Conditional modifiers (ignition, presence, injury) apply only when the consequence criterion is harm to people, not loss of containment or asset damage; the modifier is not applied.',
  source: 'CCPS, Layer of Protection Analysis (2001), conditional modifiers',
  defaultSeverity: 'voids-credit',
  messages: {
    'not-people': (d: { modifier: string; probability: number; category: string; harm: string }) =>
      `the ${d.modifier} modifier (${formatProbability(d.probability)}) applies only to harm to people; category \`${d.category}\` is ${d.harm}, so it is not applied`,
  },
});
