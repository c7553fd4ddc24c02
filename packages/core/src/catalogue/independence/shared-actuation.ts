// shared-actuation: a stuck actuator or a failed solenoid or positioner stops the valve whichever
// function commands it.
import { ruleEntry } from '../define.ts';
import { sharedElementWords } from '../words.ts';

export const sharedActuation = ruleEntry({
  id: 'shared-actuation',
  kind: 'independence',
  title: 'Shared actuator, solenoid or positioner',
  rationale: 'A stuck actuator or a failed solenoid or positioner stops the valve whichever function commands it.',
  source: 'CCPS, Layer of Protection Analysis (2001), ch. 6; IEC 61511-1:2016 9.4',
  defaultSeverity: 'voids-credit',
  messages: { shared: sharedElementWords('actuator, solenoid or positioner') },
});
