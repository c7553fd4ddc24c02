// alarm-on-failed-bpcs: an alarm raised or shown by the BPCS controller or display that fails in the
// cause is not independent of it (policy shared-solver=allow follows the older allowance).
import type { Element } from '../../model/schema.ts';
import { defineSharedRule, sideRef, type PairContext } from '../define.ts';
import { say } from '../../catalogue/catalogue.ts';
import { alarmOnFailedBpcs as entry } from '../../catalogue/independence/alarm-on-failed-bpcs.ts';

function allowedBySolverPolicy(element: Element, pair: PairContext): boolean {
  return (
    pair.policy.sharedSolver === 'allow' &&
    (element.kind === 'controller' || element.kind === 'logic-solver') &&
    pair.a.party.tag !== element.tag
  );
}

export const alarmOnFailedBpcs = defineSharedRule(entry, {
  groups: ['solver', 'people'],
  coversDependencies: (element) => element.kind === 'controller' || element.kind === 'logic-solver',
  claims: (element, pair) =>
    pair.a.party.role === 'cause' &&
    pair.a.fn !== undefined &&
    pair.b.fn?.kind === 'alarm' &&
    element.kind !== 'operator',
  // The older practice the policy switch follows: an alarm with its own sensor and I/O may run in the
  // failing loop's controller. Its own sensor or card shared with the loop is still reported by their rules.
  judge: (element, pair, inForce) => (allowedBySolverPolicy(element, pair) ? 'note' : inForce),
  message: (element, pair, _severity, beneath) =>
    say('alarm-on-failed-bpcs/raised', {
      alarm: pair.b.party.tag!,
      element: element.tag,
      kind: element.kind,
      cause: sideRef(pair.a),
      allowedByPolicy: allowedBySolverPolicy(element, pair),
      beneath,
    }),
});
