// duplicate-justification: one finding accepted by several `accept` statements; the check lives in justify/.
import { ruleEntry } from '../define.ts';

export const duplicateJustification = ruleEntry({
  id: 'duplicate-justification',
  kind: 'justification',
  title: 'Finding accepted more than once',
  rationale:
    'Two acceptances of one finding may disagree; the report shows the most recent one and lists this so a reviewer can remove the other.',
  source: 'common practice, no source',
  defaultSeverity: 'note',
  messages: {
    'accepted-again': (d: { key: string; count: number; by: string; date: string }) =>
      `\`${d.key}\` is accepted by ${d.count} justifications; the one by ${d.by} on ${d.date} is shown`,
  },
});
