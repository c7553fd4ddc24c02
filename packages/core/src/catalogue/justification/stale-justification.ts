// stale-justification: an `accept` statement that names no finding; the check lives in justify/.
// It needs a justification rather than being a note: an acceptance that no longer refers to anything
// cannot void credit by itself, but someone must look at it (the finding it was written for may have
// changed key while the problem remains), so `--fail-on needs-justification` catches it and SARIF shows
// it as a warning. A note would let it pass review unseen; that is what this rule exists to stop.
import { ruleEntry } from '../define.ts';

export const staleJustification = ruleEntry({
  id: 'stale-justification',
  kind: 'justification',
  title: 'Justification matches no finding',
  rationale:
    'An acceptance is evidence only while it refers to a finding that exists. A justification left behind after a change of the model may mean the finding it was written for was fixed, or that it changed its key and now stands unaccepted: a reviewer must decide which and remove or rewrite the justification.',
  source: 'common practice, no source',
  defaultSeverity: 'needs-justification',
  messages: {
    'matches-nothing': (d: { key: string; by: string; date: string }) =>
      `the justification for \`${d.key}\` (by ${d.by}, ${d.date}) matches no finding`,
  },
});
