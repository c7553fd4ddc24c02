// shared-support: a shared power, air or hydraulic supply, judged by the direction of failure on both
// sides (see support-judgement.ts).
import { defineSharedRule } from '../define.ts';
import { judged, severityOf, supportData } from '../support-judgement.ts';
import { say } from '../../catalogue/catalogue.ts';
import { sharedSupport as entry } from '../../catalogue/independence/shared-support.ts';

export const sharedSupport = defineSharedRule(entry, {
  groups: ['support'],
  judge: (element, pair, inForce) => severityOf(judged(element, pair, true), inForce),
  message: (element, pair, _severity, beneath) =>
    say('shared-support/support', supportData(element, pair, judged(element, pair, true), beneath)),
});
