// shared-bridle: two level instruments on one bridle, chamber or manifold both read wrong when it
// plugs or is valved out.
import { ruleEntry } from '../define.ts';
import { sharedElementWords } from '../words.ts';

export const sharedBridle = ruleEntry({
  id: 'shared-bridle',
  kind: 'independence',
  title: 'Shared bridle, chamber or manifold',
  rationale: 'Two level instruments on one bridle or external chamber both read wrong when it plugs or is valved out.',
  source: 'Common practice, no source (two transmitters on one bridle share a common cause); CCPS LOPA (2001) ch. 6',
  defaultSeverity: 'voids-credit',
  messages: { shared: sharedElementWords('bridle or manifold') },
});
