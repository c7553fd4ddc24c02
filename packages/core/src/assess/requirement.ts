// The requirement on the scenario's SIF (or on a new SIF when none is claimed and the scenario falls short):
// required PFD, RRF and SIL, and the demand mode, with the PFH band instead when demand exceeds once a year.
import type { SifRequirement } from '../vocabulary/types.ts';
import type { FunctionKind } from '../model/kinds.ts';
import { HOURS_PER_YEAR, LOW_DEMAND_LIMIT_PER_YEAR, BEYOND_SIL_4, highDemandBand, requiredSil, requiredSilForPfh } from './bands.ts';
import { edgeRelation, formatFrequency, formatPerHour } from './format.ts';
import { above, product, type Edge } from './numbers.ts';

export interface CreditedLayer {
  tag: string;
  kind: FunctionKind;
  pfd: number;
}

export interface RequirementInput {
  tolerable: number;
  edge: Edge;
  causeFrequency: number;
  enablers: number;
  modifiers: number;
  /** The layers the headline figure credits, in claim order. */
  credited: readonly CreditedLayer[];
  /** The scenario's claimed SIF, if any. */
  sif?: string;
  /** Whether the headline figure meets the criterion. */
  meets: boolean;
}

export type ScenarioSifRequirement = SifRequirement & { function?: string };

export function sifRequirement(input: RequirementInput): ScenarioSifRequirement | undefined {
  const others = input.credited.filter((l) => l.tag !== input.sif);
  if (input.sif === undefined && input.meets) return undefined;
  const base = product([input.causeFrequency, input.enablers, input.modifiers, ...others.map((l) => l.pfd)]);
  const requiredPfd = input.tolerable / base;
  const requiredRrf = base / input.tolerable;
  const lowDemandSil = requiredSil(requiredPfd, input.edge);
  // The SIF is taken to act last: every other credited non-SIF layer reduces the demand on it.
  const demandRate = product([input.causeFrequency, input.enablers, ...others.filter((l) => l.kind !== 'sif').map((l) => l.pfd)]);
  const name = input.sif ?? 'a new SIF';
  const demandBasis = `demand on ${name} ${formatFrequency(demandRate)}`;
  const demandHow = '(demand = cause x enablers x the credited non-SIF layers, all taken to act before the SIF)';
  if (!above(demandRate, LOW_DEMAND_LIMIT_PER_YEAR)) {
    return {
      ...(input.sif !== undefined ? { function: input.sif } : {}),
      requiredPfd,
      requiredRrf,
      sil: lowDemandSil,
      demandRate,
      mode: 'low-demand',
      note: `${demandBasis}: low demand, the PFDavg bands of IEC 61511-1:2016 Table 4 apply ${demandHow}`,
    };
  }
  // High demand: the SIF's own dangerous failures (PFH x 8,760 h) start the release; only the modifiers,
  // which act after the release, still reduce it.
  const requiredPfh = input.tolerable / (input.modifiers * HOURS_PER_YEAR);
  const sil = requiredSilForPfh(requiredPfh, input.edge);
  const band = highDemandBand(sil);
  return {
    ...(input.sif !== undefined ? { function: input.sif } : {}),
    requiredPfd,
    requiredRrf,
    sil,
    demandRate,
    mode: 'high-demand',
    ...(band ? { pfhBand: { sil: band.sil, low: band.low, high: band.high } } : {}),
    requiredPfh,
    lowDemandSil,
    note:
      `${demandBasis}: more than once a year, so high demand; the low-demand PFD bands do not apply. ` +
      `Required PFH ${edgeRelation(input.edge)} ${formatPerHour(requiredPfh)} (tolerable / (modifiers x 8,760 h)), ` +
      (sil === BEYOND_SIL_4 ? 'beyond SIL 4' : sil === 0 ? 'no SIL needed' : `SIL ${sil}`) +
      ` by IEC 61511-1:2016 Table 5 ${demandHow}`,
  };
}
