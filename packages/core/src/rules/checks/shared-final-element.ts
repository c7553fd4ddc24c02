// shared-final-element: a valve or motor starter that fails in the cause, or sticks, cannot also be what
// a layer relies on to act.
import { defineSharedRule, sharedData } from '../define.ts';
import { sharedFinalElement as entry } from '../../catalogue/independence/shared-final-element.ts';
import { say } from '../../catalogue/catalogue.ts';

export const sharedFinalElement = defineSharedRule(entry, {
  groups: ['final', 'mechanical'],
  message: (element, pair, severity, beneath) =>
    say('shared-final-element/shared', sharedData(element, pair, severity, beneath)),
});
