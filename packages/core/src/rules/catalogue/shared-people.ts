// People: the same operator answering two alarms, an operator whose error is the cause, a shared
// console, and an alarm that relies on the BPCS controller or display that fails in the cause.
import { defineSharedRule, describeSide } from '../define.ts';
import { sharedMessage } from './messages.ts';

export const alarmOnFailedBpcs = defineSharedRule({
  id: 'alarm-on-failed-bpcs',
  title: 'Alarm raised or shown by the BPCS that fails in the cause',
  rationale: 'An operator response that relies only on the BPCS controller or display that has failed is not independent of a BPCS cause.',
  source: 'CCPS, Layer of Protection Analysis (2001), ch. 6 (human response as an IPL)',
  defaultSeverity: 'voids-credit',
  groups: ['solver', 'people'],
  coversDependencies: (element) => element.kind === 'controller' || element.kind === 'logic-solver',
  claims: (element, pair) =>
    pair.a.party.role === 'cause' && pair.a.fn !== undefined && pair.b.fn?.kind === 'alarm' && (element.kind !== 'operator'),
  message: (element, pair) =>
    `alarm \`${pair.b.party.tag}\` is raised or shown through ${element.kind} \`${element.tag}\`, which ${describeSide(pair.a)} relies on: not independent`,
});

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
