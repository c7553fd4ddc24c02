// shared-process-connection: a nozzle, tapping or root valve that plugs, freezes or is left isolated
// blinds every instrument on it at once.
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
