// Order of action: whether each claimed layer acts before the scenario's SIF (and so lowers the demand on it)
// or after it (and so lowers what follows the SIF's own failures). Stated on the layer line, else by kind.
import type { LayerClaim, PlantFunction } from '../model/schema.ts';
import type { BpcsFacts } from './facts.ts';

/** `unknown` counts as neither: it lowers neither the demand on the SIF nor the high-demand hazard (conservative). */
export type Acts = 'before' | 'after' | 'unknown';

export interface LayerOrder {
  acts: Acts;
  /** Whether the layer line says so (`acts=`); otherwise the default for the layer's kind. */
  stated: boolean;
}

/**
 * Defaults by kind (common practice, no source): an alarm or a BPCS loop or trip is set to act before the SIF
 * trips; a relief valve or rupture disc is set above the trip and acts after it. Anything else (another SIF, a
 * check valve) has no default order, and is taken the conservative way in each figure.
 */
export function defaultOrder(fn: PlantFunction, facts: BpcsFacts): Acts {
  if (fn.kind === 'alarm' || fn.kind === 'loop' || fn.kind === 'trip') return 'before';
  if (fn.kind === 'device') {
    const kind = facts[fn.tag]?.deviceKind;
    if (kind === 'relief-valve' || kind === 'rupture-disc') return 'after';
  }
  return 'unknown';
}

export function orderOf(claim: LayerClaim, fn: PlantFunction, facts: BpcsFacts): LayerOrder {
  if (claim.acts !== undefined) return { acts: claim.acts, stated: true };
  return { acts: defaultOrder(fn, facts), stated: false };
}

/** One credited layer as the demand and hazard arithmetic sees it. */
export interface OrderedLayer {
  tag: string;
  pfd: number;
  acts: Acts;
}

/** The layers in `layers` that act on the given side of the SIF, in the order given. */
export function acting(layers: readonly OrderedLayer[], side: 'before' | 'after'): OrderedLayer[] {
  return layers.filter((l) => l.acts === side);
}

/** The order used, in words, for the output: "before SIF-1: LAH-1; after: PSV-1; order unknown: SIF-2". */
export function orderText(sif: string, layers: readonly { tag: string; acts: Acts; stated?: boolean }[]): string {
  const names = (acts: Acts) =>
    layers.filter((l) => l.acts === acts).map((l) => `${l.tag}${l.stated ? ' (stated)' : ''}`);
  const parts = [
    `acting before ${sif}: ${names('before').join(', ') || 'none'}`,
    `after it: ${names('after').join(', ') || 'none'}`,
  ];
  const unknown = names('unknown');
  if (unknown.length > 0) parts.push(`order unknown, taken the conservative way: ${unknown.join(', ')}`);
  return parts.join('; ');
}
