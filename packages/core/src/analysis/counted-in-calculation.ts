// Issue 16, item 3: a voted-group common cause becomes a number. Where a SIF's failure data are complete, the
// element its channels share is a single point in series with the group in the computed PFDavg, so the finding
// no longer withholds credit: the layer is credited at the larger of its claimed and computed PFD (never better
// than claimed). Incomplete data leave the finding as the rule raised it.
import { claimedPfdOf, claimedPfhOf } from '../assess/layers.ts';
import type { BpcsFacts } from '../assess/facts.ts';
import { renderMessage, say } from '../catalogue/catalogue.ts';
import type { FunctionKindOf, Model } from '../model/schema.ts';
import { computeSif, verificationComplete, type SifCalculation } from '../reliability/compute.ts';
import { FailureDataIndex } from '../reliability/figures.ts';
import type { Tracer } from '../trace/trace.ts';
import type { Finding } from '../vocabulary/types.ts';

type Sif = FunctionKindOf<'sif'>;

export function countSharedInCalculation(
  model: Model,
  tracer: Tracer,
  findings: readonly Finding[],
  facts: BpcsFacts,
): Finding[] {
  if (!findings.some((f) => f.messageId === 'voted-group-common-cause/shared-in-group')) return [...findings];
  const data = new FailureDataIndex(model);
  const functions = new Map(model.functions.map((f) => [f.tag, f]));
  const scenarios = new Map(model.scenarios.map((s) => [s.id, s]));
  const calculations = new Map<string, SifCalculation>();
  const calculationOf = (sif: Sif): SifCalculation =>
    calculations.get(sif.tag) ?? calculations.set(sif.tag, computeSif(tracer, data, sif)).get(sif.tag)!;
  return findings.map((f) => {
    if (f.messageId !== 'voted-group-common-cause/shared-in-group') return f;
    const fn = functions.get(f.data.function);
    const claim = scenarios.get(f.scenario ?? '')?.layers?.find((l) => l.function === f.data.function);
    if (fn?.kind !== 'sif' || claim === undefined) return f;
    const calc = calculationOf(fn);
    if (!verificationComplete(calc)) return f;
    const claimed = claimedPfdOf(claim, fn, facts).claimed.value;
    const claimedPfh = claimedPfhOf(fn)?.value;
    const counted = {
      ...f.data,
      computed: calc.pfd,
      claimed,
      computedPfh: calc.pfh,
      ...(claimedPfh !== undefined ? { claimedPfh } : {}),
    };
    // A figure within the claim leaves nothing to justify; a figure above it caps the credit until the claim is
    // justified. The PFH counts too: the scenario may judge the SIF in high demand.
    const within = calc.pfd <= claimed && (claimedPfh === undefined || calc.pfh <= claimedPfh);
    const says = within
      ? say('voted-group-common-cause/counted-within-claim', counted)
      : say('voted-group-common-cause/counted-claim-missed', counted);
    return { ...f, ...says, message: renderMessage(says), ...(within ? { severity: 'note' as const } : {}) };
  });
}
