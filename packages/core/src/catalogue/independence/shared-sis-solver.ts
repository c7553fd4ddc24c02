// Two layers in one SIS logic solver. IEC 61511 allows many SIFs in one safety solver, so this is not
// the BPCS case (a failing controller acting against itself, or two BPCS layers in one controller): the
// solver is a common element of both layers and must be counted once when their combined PFD is verified.
import { ruleEntry } from '../define.ts';
import { beneathWords } from '../words.ts';

export const sharedSisSolver = ruleEntry({
  id: 'shared-sis-solver',
  kind: 'independence',
  title: 'Two layers in one SIS logic solver',
  rationale:
    'Several SIFs may run in one SIS logic solver, but a failure of the solver defeats all of them at once: credit both only after verifying their combined PFD with the solver counted once (in series with the two, not once per layer).',
  source:
    'IEC 61511-1:2016 9.4 (common cause between protection layers) and 11.9 (the PFD calculation includes common elements) [from memory for the clauses]; IEC 61508-6:2010 Annex D (common cause); CCPS, Guidelines for Initiating Events and Independent Protection Layers (2015) [from memory]',
  defaultSeverity: 'needs-justification',
  messages: {
    'both-layers': (d: { layers: [string, string]; element: string; beneath: string[] }) =>
      `layers \`${d.layers[0]}\` and \`${d.layers[1]}\` both run in SIS logic solver \`${d.element}\`: verify the combined PFD with the solver counted once before crediting both` +
      beneathWords(d.beneath),
  },
});
