// shared-impulse-line: a blocked, leaking or frozen impulse line or capillary gives every instrument
// on it the same wrong reading.
import { defineSharedRule, sharedData } from '../define.ts';
import { sharedImpulseLine as entry } from '../../catalogue/independence/shared-impulse-line.ts';
import { say } from '../../catalogue/catalogue.ts';

export const sharedImpulseLine = defineSharedRule(entry, {
  groups: ['impulse'],
  message: (element, pair, severity, beneath) =>
    say('shared-impulse-line/shared', sharedData(element, pair, severity, beneath)),
});
