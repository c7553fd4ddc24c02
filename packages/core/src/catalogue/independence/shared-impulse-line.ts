// shared-impulse-line: a blocked, leaking or frozen impulse line or capillary gives every instrument
// on it the same wrong reading.
import { ruleEntry } from '../define.ts';
import { sharedElementWords } from '../words.ts';

export const sharedImpulseLine = ruleEntry({
  id: 'shared-impulse-line',
  kind: 'independence',
  title: 'Shared impulse line or capillary',
  rationale: 'A blocked, leaking or frozen impulse line gives the same wrong reading to every instrument on it.',
  source: 'CCPS, Layer of Protection Analysis (2001), ch. 6; IEC 61511-1:2016 9.4',
  defaultSeverity: 'voids-credit',
  messages: { shared: sharedElementWords('impulse line') },
});
