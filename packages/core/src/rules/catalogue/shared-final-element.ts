// shared-final-element: a valve or motor starter that fails in the cause, or sticks, cannot also be what
// a layer relies on to act.
import { defineSharedRule } from '../define.ts';
import { sharedMessage } from './messages.ts';

export const sharedFinalElement = defineSharedRule({
  id: 'shared-final-element',
  title: 'Shared final element',
  rationale: 'A valve or motor starter that fails in the cause, or is stuck, cannot also be what a layer relies on to act.',
  source: 'IEC 61511-1:2016 11.2.10; ANSI/ISA-S84.01-1996 Annex B.1.3 (separation of final elements)',
  defaultSeverity: 'voids-credit',
  groups: ['final', 'mechanical'],
  message: sharedMessage('final element'),
});
