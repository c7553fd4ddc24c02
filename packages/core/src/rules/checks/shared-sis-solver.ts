// Two layers in one SIS logic solver. IEC 61511 allows many SIFs in one safety solver, so this is not
// the BPCS case (a failing controller acting against itself, or two BPCS layers in one controller): the
// solver is a common element of both layers and must be counted once when their combined PFD is verified.
import { defineSharedRule, type PairContext } from '../define.ts';
import { say } from '../../catalogue/catalogue.ts';
import type { Element } from '../../model/schema.ts';
import { sharedSisSolver as entry } from '../../catalogue/independence/shared-sis-solver.ts';

function bothLayersInSis(element: Element, pair: PairContext): boolean {
  return (
    pair.a.party.role === 'layer' &&
    pair.b.party.role === 'layer' &&
    element.kind === 'logic-solver' &&
    'system' in element &&
    element.system === 'sis'
  );
}

export const sharedSisSolver = defineSharedRule(entry, {
  groups: ['solver'],
  claims: bothLayersInSis,
  // The solver with its power and cabinet is one unit: what is said of it covers them.
  coversDependencies: () => true,
  message: (element, pair, _severity, beneath) =>
    say('shared-sis-solver/both-layers', {
      layers: [pair.a.party.tag!, pair.b.party.tag!],
      element: element.tag,
      beneath,
    }),
});
