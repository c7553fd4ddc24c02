// utility-loss-cause: when the loss of a utility starts the scenario, a layer that needs that utility to
// act is defeated by the same event.
import { defineSharedRule } from '../define.ts';
import { judged, severityOf, supportData } from '../support-judgement.ts';
import { say } from '../../catalogue/catalogue.ts';
import { utilityLossCause as entry } from '../../catalogue/independence/utility-loss-cause.ts';

export const utilityLossCause = defineSharedRule(entry, {
  groups: ['support'],
  claims: (element, pair) => pair.a.party.role === 'cause' && pair.a.party.tag === element.tag,
  // The cause is the loss of this very utility: its cause side is dangerous by definition.
  judge: (element, pair, inForce) => severityOf(judged(element, pair, false), inForce),
  message: (element, pair, _severity, beneath) =>
    say('utility-loss-cause/support', supportData(element, pair, judged(element, pair, false), beneath)),
});
