// People: the same operator answering two alarms, an operator whose error is the cause, a shared
// console, and an alarm that relies on the BPCS controller or display that fails in the cause.
import type { Element } from '../../model/schema.ts';
import { defineSharedRule, describeSide, type PairContext } from '../define.ts';
import { sharedMessage } from './messages.ts';

function allowedBySolverPolicy(element: Element, pair: PairContext): boolean {
  return pair.policy.sharedSolver === 'allow' && (element.kind === 'controller' || element.kind === 'logic-solver') && pair.a.party.tag !== element.tag;
}

export const alarmOnFailedBpcs = defineSharedRule({
  id: 'alarm-on-failed-bpcs',
  title: 'Alarm raised or shown by the BPCS that fails in the cause',
  rationale:
    'An operator response that relies only on the BPCS controller or display that has failed is not independent of a BPCS cause. Older CCPS practice allowed an alarm with its own sensor and I/O in the same controller; policy shared-solver=allow follows it.',
  source: 'CCPS, Layer of Protection Analysis (2001), ch. 6 (human response as an IPL; older allowance for a shared controller)',
  defaultSeverity: 'voids-credit',
  groups: ['solver', 'people'],
  coversDependencies: (element) => element.kind === 'controller' || element.kind === 'logic-solver',
  claims: (element, pair) =>
    pair.a.party.role === 'cause' && pair.a.fn !== undefined && pair.b.fn?.kind === 'alarm' && (element.kind !== 'operator'),
  // The older practice the policy switch follows: an alarm with its own sensor and I/O may run in the
  // failing loop's controller. Its own sensor or card shared with the loop is still reported by their rules.
  judge: (element, pair, inForce) => (allowedBySolverPolicy(element, pair) ? 'note' : inForce),
  message: (element, pair) =>
    `alarm \`${pair.b.party.tag}\` is raised or shown through ${element.kind} \`${element.tag}\`, which ${describeSide(pair.a)} relies on: ` +
    (allowedBySolverPolicy(element, pair)
      ? 'allowed under policy shared-solver=allow (older practice: its own sensor and I/O), a note'
      : 'not independent'),
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
