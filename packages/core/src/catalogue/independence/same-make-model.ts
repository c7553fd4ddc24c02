// Diversity: instruments of the same make and model on the two sides share systematic failures
// (a firmware fault, a wrong calibration procedure), so the pairing asks for a justification.
import { ruleEntry } from '../define.ts';
import { sideWords, type SideRef } from '../words.ts';

export const sameMakeModel = ruleEntry({
  id: 'same-make-model',
  kind: 'independence',
  title: 'Same make and model on both sides',
  rationale:
    'Identical devices share systematic faults; diverse separation matters most at higher SIL, identical separation is generally accepted at SIL 1.',
  source:
    'ANSI/ISA-S84.01-1996 Annex B.1.2 (identical vs diverse separation); IEC 61511-1:2016 9.4 (diversity) [from memory for the clause]',
  defaultSeverity: 'needs-justification',
  messages: {
    'same-device': (d: { element: string; other: string; a: SideRef; b: SideRef; make: string; model: string }) =>
      `\`${d.element}\` in ${sideWords(d.b)} and \`${d.other}\` in ${sideWords(d.a)} are the same make and model (${d.make} ${d.model}): systematic common cause`,
  },
});
