// shared-actuation: a stuck actuator or a failed solenoid or positioner stops the valve whichever
// function commands it.
import { defineSharedRule } from '../define.ts';
import { sharedMessage } from './messages.ts';

export const sharedActuation = defineSharedRule({
  id: 'shared-actuation',
  title: 'Shared actuator, solenoid or positioner',
  rationale: 'A stuck actuator or a failed solenoid or positioner stops the valve whichever function commands it.',
  source: 'CCPS, Layer of Protection Analysis (2001), ch. 6; IEC 61511-1:2016 9.4',
  defaultSeverity: 'voids-credit',
  groups: ['actuation'],
  message: sharedMessage('actuator, solenoid or positioner'),
});
