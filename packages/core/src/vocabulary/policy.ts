// The owner's policy switches with their defaults and the source of each default, resolved once per model
// so every rule reads the same values.
import type { Model } from '../model/schema.ts';

export interface ResolvedPolicy {
  sameControllerLayers: 'one-credit' | 'both' | 'none';
  sharedSolver: 'void' | 'allow';
  minResponseMinutes: number;
  presenceLimit: number;
  conditionCreditLimit: number;
}

export const POLICY_DEFAULTS: ResolvedPolicy = {
  sameControllerLayers: 'one-credit', // IEC 61511-1:2016 9.3
  sharedSolver: 'void', // IEC 61511 reading
  minResponseMinutes: 10, // CCPS, Layer of Protection Analysis (2001) (from memory)
  presenceLimit: 0.1, // owner's policy, common practice
  // Two orders of magnitude for enablers and modifiers together: owner's policy; the figure is from memory (CCPS,
  // Guidelines for Enabling Conditions and Conditional Modifiers in LOPA (2013) discusses limiting the combined credit).
  conditionCreditLimit: 100,
};

/** Best PFD a BPCS layer may claim: RRF 10 (IEC 61511-1:2016 9.3). */
export const BPCS_LAYER_BEST_PFD = 0.1;
/** Best PFD an operator response may claim without a human-reliability analysis (CCPS 2001 Table 6.5; CCPS 2015). */
export const HUMAN_RESPONSE_BEST_PFD = 0.1;
/** Most BPCS layers credited in one scenario (IEC 61511-1:2016 9.3). */
export const BPCS_LAYERS_PER_SCENARIO = 2;
/** Lowest frequency a BPCS loop-failure cause may claim without a justification (IEC 61511-1:2003 8.2.2). */
export const BPCS_CAUSE_LOWEST_FREQUENCY = 0.1;

export function resolvedPolicy(model: Model): ResolvedPolicy {
  const p = model.policy ?? {};
  return {
    sameControllerLayers: p.sameControllerLayers ?? POLICY_DEFAULTS.sameControllerLayers,
    sharedSolver: p.sharedSolver ?? POLICY_DEFAULTS.sharedSolver,
    minResponseMinutes: p.minResponseMinutes ?? POLICY_DEFAULTS.minResponseMinutes,
    presenceLimit: p.presenceLimit ?? POLICY_DEFAULTS.presenceLimit,
    conditionCreditLimit: p.conditionCreditLimit ?? POLICY_DEFAULTS.conditionCreditLimit,
  };
}
