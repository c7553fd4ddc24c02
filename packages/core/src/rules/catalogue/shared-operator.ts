// shared-operator: two responses by one person, or a response by the person whose error is the cause.
import { defineSharedRule } from '../define.ts';
import { sharedMessage } from './messages.ts';

export const sharedOperator = defineSharedRule({
  id: 'shared-operator',
  title: 'Same operator',
  rationale: 'Two human responses by one person, or a response by the person whose error is the cause, are not independent.',
  source: 'CCPS, Layer of Protection Analysis (2001), ch. 6',
  defaultSeverity: 'voids-credit',
  groups: ['people'],
  claims: (element) => element.kind === 'operator',
  message: sharedMessage('operator'),
});
