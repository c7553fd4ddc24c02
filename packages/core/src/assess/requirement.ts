// The requirement on the scenario's SIF (or on a new SIF when none is claimed and the scenario falls short):
// required PFD, RRF and SIL, the demand on it from the layers acting before it, and in high demand the PFH instead.
import type { SifRequirement } from '../vocabulary/types.ts';
import type { FunctionKind } from '../model/kinds.ts';
import { HOURS_PER_YEAR, BEYOND_SIL_4, highDemandBand, requiredSil, requiredSilForPfh } from './bands.ts';
import { DEMAND_FORMULA, HIGH_DEMAND_FORMULA, HIGH_DEMAND_SOURCE, demandOn, isHighDemand } from './demand.ts';
import { edgeRelation, formatFrequency, formatPerHour, formatProbability, formatRatio } from './format.ts';
import { decadeLog10, meetsCriterion, product, type Edge } from './numbers.ts';
import { acting, orderText, type Acts } from './order.ts';

export interface CreditedLayer {
  tag: string;
  kind: FunctionKind;
  pfd: number;
  acts: Acts;
  /** Whether the layer line states the order (shown in the order text). */
  stated?: boolean;
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

function silWords(sil: number): string {
  return sil === BEYOND_SIL_4 ? 'beyond SIL 4' : sil === 0 ? 'no SIL needed' : `SIL ${sil}`;
}

/**
 * On an exact decade the two edge conventions give different SILs; the output names the one not in force
 * (RRF 100 is SIL 1 by the RRF column of IEC 61511-1:2016 Table 4 if equality is allowed, SIL 2 if not).
 */
function otherReading(required: number, edge: Edge, table: 'Table 4' | 'Table 5'): string | undefined {
  const log = decadeLog10(required);
  if (!Number.isInteger(log)) return undefined;
  const other: Edge = edge === 'below' ? 'at-most' : 'below';
  const silOf = (e: Edge) => (table === 'Table 4' ? requiredSil(required, e) : requiredSilForPfh(required, e));
  const sil = silOf(other);
  if (sil === silOf(edge)) return undefined;
  const figure = table === 'Table 4' ? `RRF ${formatRatio(1 / required)}` : `PFH ${formatPerHour(required)}`;
  const column = table === 'Table 4' ? 'the RRF column of IEC 61511-1:2016 Table 4' : 'IEC 61511-1:2016 Table 5';
  return other === 'at-most'
    ? `${figure}: ${silWords(sil)} by ${column} if the criterion allows equality`
    : `${figure}: ${silWords(sil)} if the criterion requires strictly below (common practice)`;
}

export function sifRequirement(input: RequirementInput): ScenarioSifRequirement | undefined {
  const others = input.credited.filter((l) => l.tag !== input.sif);
  if (input.sif === undefined && input.meets) return undefined;
  const base = product([input.causeFrequency, input.enablers, input.modifiers, ...others.map((l) => l.pfd)]);
  const requiredPfd = input.tolerable / base;
  const requiredRrf = base / input.tolerable;
  const lowDemandSil = requiredSil(requiredPfd, input.edge);
  const noReductionNeeded = meetsCriterion(base, input.tolerable, input.edge);
  const demandRate = demandOn(input.causeFrequency, input.enablers, others);
  const name = input.sif ?? 'a new SIF';
  const order = orderText(name, others);
  const common = {
    ...(input.sif !== undefined ? { function: input.sif } : {}),
    requiredPfd,
    requiredRrf,
    demandRate,
    order,
    ...(noReductionNeeded ? { noReductionNeeded } : {}),
  };
  const demandBasis = `demand on ${name} ${formatFrequency(demandRate)} (${DEMAND_FORMULA}; ${order})`;
  if (!isHighDemand(demandRate)) {
    const reading = noReductionNeeded ? undefined : otherReading(requiredPfd, input.edge, 'Table 4');
    return {
      ...common,
      sil: lowDemandSil,
      mode: 'low-demand',
      ...(reading !== undefined ? { otherReading: reading } : {}),
      note: `${demandBasis}: at most once a year, low demand; the PFDavg bands of IEC 61511-1:2016 Table 4 apply`,
    };
  }
  // High demand: the SIF's own dangerous failures start the hazard; what acts after it and the modifiers still reduce it.
  const after = product(acting(others, 'after').map((l) => l.pfd));
  const requiredPfh = input.tolerable / (HOURS_PER_YEAR * after * input.modifiers);
  const sil = requiredSilForPfh(requiredPfh, input.edge);
  const band = highDemandBand(sil);
  const reading = noReductionNeeded ? undefined : otherReading(requiredPfh, input.edge, 'Table 5');
  const formula = `${HIGH_DEMAND_FORMULA} (${HIGH_DEMAND_SOURCE})`;
  return {
    ...common,
    sil,
    mode: 'high-demand',
    ...(band ? { pfhBand: { sil: band.sil, low: band.low, high: band.high } } : {}),
    requiredPfh,
    lowDemandSil,
    formula,
    ...(reading !== undefined ? { otherReading: reading } : {}),
    note:
      `${demandBasis}: more than once a year, high demand; the SIF is judged by PFH against IEC 61511-1:2016 Table 5, not by PFD. ` +
      `Required PFH ${edgeRelation(input.edge)} ${formatPerHour(requiredPfh)} = tolerable / (8,760 h x ${formatProbability(after)} acting after x ${formatProbability(input.modifiers)} modifiers): ${silWords(sil)}. ` +
      `Formula: ${formula}`,
  };
}
