// alarm-on-failed-bpcs: an alarm raised or shown by the BPCS controller or display that fails in the
// cause is not independent of it (policy shared-solver=allow follows the older allowance).
import type { Element } from '../../model/schema.ts';
import { defineSharedRule, describeSide, type PairContext } from '../define.ts';

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
