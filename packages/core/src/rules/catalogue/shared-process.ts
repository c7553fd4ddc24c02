// Shared-element rules for the process side: tappings and nozzles, bridles and manifolds, impulse lines.
// A plugged or isolated connection blinds every instrument on it at once.
import { defineSharedRule } from '../define.ts';
import { sharedMessage } from './messages.ts';

export const sharedProcessConnection = defineSharedRule({
  id: 'shared-process-connection',
  title: 'Shared process connection',
  rationale: 'A nozzle, tapping or root valve that plugs, freezes or is left isolated defeats every instrument on it.',
  source: 'CCPS, Layer of Protection Analysis (2001), ch. 6 (independence); IEC 61511-1:2016 9.4 (common cause between layers)',
  defaultSeverity: 'voids-credit',
  groups: ['connection'],
  claims: (element) => element.kind === 'nozzle' || element.kind === 'tapping' || element.kind === 'root-valve',
  message: sharedMessage('process connection'),
});

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

export const sharedImpulseLine = defineSharedRule({
  id: 'shared-impulse-line',
  title: 'Shared impulse line or capillary',
  rationale: 'A blocked, leaking or frozen impulse line gives the same wrong reading to every instrument on it.',
  source: 'CCPS, Layer of Protection Analysis (2001), ch. 6; IEC 61511-1:2016 9.4',
  defaultSeverity: 'voids-credit',
  groups: ['impulse'],
  message: sharedMessage('impulse line'),
});
