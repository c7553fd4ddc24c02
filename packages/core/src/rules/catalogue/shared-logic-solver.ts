// shared-logic-solver: a controller or logic solver that fails in the cause cannot act against it, and
// two BPCS layers in one controller earn at most one credit.
import { defineSharedRule, type PairContext } from '../define.ts';
import { sharedMessage } from './messages.ts';

function bothBpcsLayers(pair: PairContext): boolean {
  const isBpcs = (tag: string | undefined) => {
    const fn = tag ? pair.fn(tag) : undefined;
    if (!fn) return false;
    const solver = fn.kind === 'alarm' ? fn.raisedIn : 'solver' in fn ? fn.solver : undefined;
    const element = solver ? pair.element(solver) : undefined;
    return element !== undefined && 'system' in element && element.system === 'bpcs';
  };
  return pair.a.party.role === 'layer' && isBpcs(pair.a.party.tag) && isBpcs(pair.b.party.tag);
}

export const sharedLogicSolver = defineSharedRule({
  id: 'shared-logic-solver',
  title: 'Shared controller or logic solver',
  rationale:
    'A controller that fails in the cause cannot be relied on to act against it, and two BPCS layers in one controller earn at most one credit. Older CCPS practice allowed a shared BPCS controller under conditions; set policy shared-solver=allow or same-controller-layers=both to follow it.',
  source: 'IEC 61511-1:2016 9.3 (BPCS layers, one controller); CCPS, Layer of Protection Analysis (2001), ch. 6 (older allowance)',
  defaultSeverity: 'voids-credit',
  groups: ['solver'],
  // The controller with its power and cabinet is one unit: what is said of it covers them.
  coversDependencies: () => true,
  judge: (element, pair, inForce) => {
    // Two BPCS layers in one controller: the assessment's bpcs-same-controller rule limits their credit.
    if (bothBpcsLayers(pair)) return 'note';
    // The older allowance is for a loop failure, never for the failure of the controller itself.
    if (pair.a.party.role === 'cause' && pair.a.party.tag !== element.tag && pair.policy.sharedSolver === 'allow') return 'note';
    return inForce;
  },
  message: (element, pair, severity) =>
    sharedMessage('controller or logic solver')(element, pair, severity) +
    (bothBpcsLayers(pair)
      ? pair.policy.sameControllerLayers === 'both'
        ? '; as two BPCS layers in one controller both may be credited under policy same-controller-layers=both'
        : '; as two BPCS layers in one controller their credit is limited by rule bpcs-same-controller'
      : ''),
});
