// shared-console: a console shared by two functions can mislead or blind both.
import { defineSharedRule } from '../define.ts';
import { sharedMessage } from './messages.ts';

export const sharedConsole = defineSharedRule({
  id: 'shared-console',
  title: 'Shared console',
  rationale: 'A console shared by two functions can mislead or blind both; whether that voids credit depends on the alarm design.',
  source: 'Common practice, no source; CCPS, Guidelines for Initiating Events and Independent Protection Layers (2015)',
  defaultSeverity: 'needs-justification',
  groups: ['people'],
  claims: (element) => element.kind === 'console',
  message: sharedMessage('console'),
});
