// Assessment rule sif-claim-no-basis: a limit the LOPA figures obey; the check lives in assess/.
import { ruleEntry } from '../define.ts';
import { formatPerHour, formatProbability } from '../../util/figures.ts';

/** A SIF figure given with no verification basis: a PFD, or in high demand a PFH. */
export interface UnverifiedClaim {
  function: string;
  quantity: 'PFD' | 'PFH';
  claimed: number;
}

const figure = (d: UnverifiedClaim, x: number) => (d.quantity === 'PFH' ? formatPerHour(x) : formatProbability(x));
const head = (d: UnverifiedClaim) =>
  `\`${d.function}\` claims ${d.quantity} ${figure(d, d.claimed)} with no verification basis (${d.quantity === 'PFH' ? 'pfh-basis=' : 'pfd-basis= or basis= on the layer line'})`;

export const sifClaimNoBasis = ruleEntry({
  id: 'sif-claim-no-basis',
  kind: 'assessment',
  title: 'SIF claims a PFD or PFH without a verification basis',
  rationale:
    "A SIF's PFD (or, in high demand, PFH) must come from a SIL verification; a figure given without a basis is credited only at the conservative edge of its claimed SIL band, or not at all without a SIL, until a basis is recorded or a justification accepts it.",
  source: 'IEC 61511-1:2016 11.9 (SIF probability of failure verification) [from memory for the clause]',
  defaultSeverity: 'needs-justification',
  messages: {
    'no-sil': (d: UnverifiedClaim) =>
      `${head(d)} and no SIL: it earns no credit until a basis is recorded or a justification accepts it`,
    'at-band-edge': (d: UnverifiedClaim & { sil: number; edge: number }) =>
      `${head(d)}: credited at the edge of SIL ${d.sil}, ${figure(d, d.edge)}, until a basis is recorded or a justification accepts it`,
  },
});
