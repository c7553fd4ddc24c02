// Two layers in one SIS logic solver. IEC 61511 allows many SIFs in one safety solver, so this is not
// the BPCS case (a failing controller acting against itself, or two BPCS layers in one controller): the
// solver is a common element of both layers and must be counted once when their combined PFD is verified.
import { defineSharedRule, type PairContext } from '../define.ts';
import type { Element } from '../../model/schema.ts';

function bothLayersInSis(element: Element, pair: PairContext): boolean {
  return pair.a.party.role === 'layer' && pair.b.party.role === 'layer' && element.kind === 'logic-solver' && 'system' in element && element.system === 'sis';
}

export const sharedSisSolver = defineSharedRule({
  id: 'shared-sis-solver',
  title: 'Two layers in one SIS logic solver',
  rationale:
    'Several SIFs may run in one SIS logic solver, but a failure of the solver defeats all of them at once: credit both only after verifying their combined PFD with the solver counted once (in series with the two, not once per layer).',
  source:
    'IEC 61511-1:2016 9.4 (common cause between protection layers) and 11.9 (the PFD calculation includes common elements) [from memory for the clauses]; IEC 61508-6:2010 Annex D (common cause); CCPS, Guidelines for Initiating Events and Independent Protection Layers (2015) [from memory]',
  defaultSeverity: 'needs-justification',
  groups: ['solver'],
  claims: bothLayersInSis,
  // The solver with its power and cabinet is one unit: what is said of it covers them.
  coversDependencies: () => true,
  message: (element, pair) =>
    `layers \`${pair.a.party.tag}\` and \`${pair.b.party.tag}\` both run in SIS logic solver \`${element.tag}\`: verify the combined PFD with the solver counted once before crediting both`,
});
