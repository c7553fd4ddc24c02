// shared-sensor: a transmitter or switch used by the failing loop, or by two layers, fails for both.
import { ruleEntry } from '../define.ts';
import { sharedElementWords } from '../words.ts';

export const sharedSensor = ruleEntry({
  id: 'shared-sensor',
  kind: 'independence',
  title: 'Shared sensor or transmitter',
  rationale:
    'A device used for control whose failure causes a demand may not also be used by the protection against it.',
  source: 'IEC 61511-1:2016 11.2.10 (same number in 2003); CCPS, Layer of Protection Analysis (2001), ch. 6',
  defaultSeverity: 'voids-credit',
  messages: { shared: sharedElementWords('sensor') },
});
