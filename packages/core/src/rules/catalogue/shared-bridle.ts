// shared-bridle: two level instruments on one bridle, chamber or manifold both read wrong when it
// plugs or is valved out.
import { defineSharedRule } from '../define.ts';
import { sharedMessage } from './messages.ts';

export const sharedBridle = defineSharedRule({
  id: 'shared-bridle',
  title: 'Shared bridle, chamber or manifold',
  rationale: 'Two level instruments on one bridle or external chamber both read wrong when it plugs or is valved out.',
  source: 'Common practice, no source (two transmitters on one bridle share a common cause); CCPS LOPA (2001) ch. 6',
  defaultSeverity: 'voids-credit',
  groups: ['connection'],
  claims: (element) => element.kind === 'bridle' || element.kind === 'manifold',
  message: sharedMessage('bridle or manifold'),
});
