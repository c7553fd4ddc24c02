// shared-actuation: a stuck actuator or a failed solenoid or positioner stops the valve whichever
// function commands it.
import { defineSharedRule, sharedData } from '../define.ts';
import { sharedActuation as entry } from '../../catalogue/independence/shared-actuation.ts';
import { say } from '../../catalogue/catalogue.ts';

export const sharedActuation = defineSharedRule(entry, {
  groups: ['actuation'],
  message: (element, pair, severity, beneath) =>
    say('shared-actuation/shared', sharedData(element, pair, severity, beneath)),
});
