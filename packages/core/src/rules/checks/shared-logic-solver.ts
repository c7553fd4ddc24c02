// shared-logic-solver: a controller or logic solver that fails in the cause cannot act against it, and
// two BPCS layers in one controller earn at most one credit.
import { defineSharedRule, sharedData, type PairContext } from '../define.ts';
import { say } from '../../catalogue/catalogue.ts';
import { sharedLogicSolver as entry } from '../../catalogue/independence/shared-logic-solver.ts';

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

export const sharedLogicSolver = defineSharedRule(entry, {
  groups: ['solver'],
  // The controller with its power and cabinet is one unit: what is said of it covers them.
  coversDependencies: () => true,
  judge: (element, pair, inForce) => {
    // Two BPCS layers in one controller: the assessment's bpcs-same-controller rule limits their credit.
    if (bothBpcsLayers(pair)) return 'note';
    // The older allowance is for a loop failure, never for the failure of the controller itself.
    if (pair.a.party.role === 'cause' && pair.a.party.tag !== element.tag && pair.policy.sharedSolver === 'allow')
      return 'note';
    return inForce;
  },
  message: (element, pair, severity, beneath) =>
    say('shared-logic-solver/shared', {
      ...sharedData(element, pair, severity, beneath),
      bpcsLayers: !bothBpcsLayers(pair)
        ? 'no'
        : pair.policy.sameControllerLayers === 'both'
          ? 'both-credited'
          : 'limited',
    }),
});
