// Words shared by the independence messages: how a side is named, and how a shared element is said,
// so every finding about a shared element reads the same way whichever rule raises it.
import type { SeverityLevel } from '../model/schema.ts';
import { tagList } from './define.ts';

/** One side of a comparison as a message names it: a claimed layer, or the cause (a function, an element, or external). */
export interface SideRef {
  role: 'cause' | 'layer';
  tag?: string;
  /** For a cause that is a function: its kind (loop, sif, ...). */
  functionKind?: string;
}

export function sideWords(side: SideRef): string {
  if (side.role === 'layer') return `layer \`${side.tag}\``;
  if (side.functionKind !== undefined) return `the failing ${side.functionKind} \`${side.tag}\``;
  return side.tag !== undefined ? `the failing element \`${side.tag}\`` : 'the external cause';
}

/** What every shared-element message says: the two sides, the element, and what lies beneath it that it speaks for. */
export interface SharedElementData {
  a: SideRef;
  b: SideRef;
  element: string;
  kind: string;
  /** Shared elements under this one, not listed on their own because this finding covers them. */
  beneath: string[];
}

export interface SharedVerdictData extends SharedElementData {
  severity: SeverityLevel;
}

/** The closing words for the shared elements beneath the one named. */
export function beneathWords(beneath: readonly string[]): string {
  return beneath.length ? ` (and through it ${tagList(beneath)})` : '';
}

function verdictWords(severity: SeverityLevel): string {
  return severity === 'voids-credit' ? 'not independent' : severity === 'note' ? 'shared' : 'possibly not independent';
}

export function sharedElementHead(what: string, d: SharedVerdictData): string {
  return `${sideWords(d.b)} and ${sideWords(d.a)} both rely on ${what} \`${d.element}\` (${d.kind}): ${verdictWords(d.severity)}`;
}

/** The message of a rule whose finding says only that the sides share `what`. */
export function sharedElementWords(what: string) {
  return (d: SharedVerdictData): string => sharedElementHead(what, d) + beneathWords(d.beneath);
}

/**
 * Why the loss of a shared support was judged able (or not) to drive the cause the dangerous way. `cause` is
 * the cause's tag (absent for a cause without one); `direction` the dangerous direction the cause states.
 */
export type CauseReason =
  | { reason: 'no-direction' }
  | { reason: 'output-direction'; direction: string }
  | { reason: 'sensor-relies'; cause?: string }
  | { reason: 'no-fail-position'; cause?: string; direction: string }
  | { reason: 'not-judged'; cause?: string }
  | { reason: 'other-route'; cause?: string }
  | { reason: 'final-unstated'; head: string }
  | {
      reason: 'moves-dangerous' | 'moves-away';
      heads: string[];
      positions: string[];
      cause?: string;
      direction: string;
    };

function causeWords(cause: string | undefined): string {
  return cause !== undefined ? `\`${cause}\`` : 'the cause';
}

export function causeReasonWords(r: CauseReason): string {
  switch (r.reason) {
    case 'no-direction':
      return 'no dangerous direction stated (drives-to), taken as dangerous';
    case 'output-direction':
      return `a ${r.direction} output cannot be judged from fail positions, so any loss counts`;
    case 'sensor-relies':
      return `${causeWords(r.cause)}'s sensor relies on it and may read wrong, driving the loop either way`;
    case 'no-fail-position':
      return `${causeWords(r.cause)} states no fail position on loss of supply, so it may fail ${r.direction}`;
    case 'not-judged':
      return `${causeWords(r.cause)} cannot be judged by direction`;
    case 'other-route':
      return `it reaches ${causeWords(r.cause)} other than through its final elements`;
    case 'final-unstated':
      return `a final element or actuator of ${tagList([r.head])} states no fail position`;
    case 'moves-dangerous':
      return `its loss leaves ${tagList(r.heads)} ${r.positions.join('/')}, and ${causeWords(r.cause)} is dangerous ${r.direction}`;
    case 'moves-away':
      return `its loss drives ${tagList(r.heads)} ${r.positions.join('/')}, away from the dangerous ${r.direction} of ${causeWords(r.cause)}: it cannot start the scenario`;
  }
}

/** How the cause side of a shared support was judged: whether its loss can start the scenario, and why. */
export interface CauseJudgementData {
  dangerous: boolean;
  why: CauseReason;
}

export interface SupportData extends SharedElementData {
  /** The layer (of the two) that the loss drives to its trip position, if any. */
  safeLayer?: string;
  cause?: CauseJudgementData;
}

/** A shared power, air or hydraulic supply, judged on both sides (rules shared-support and utility-loss-cause). */
export function supportWords(d: SupportData): string {
  const both = `${sideWords(d.b)} and ${sideWords(d.a)} both rely on ${d.kind} \`${d.element}\``;
  const causeSide = d.cause ? `; cause side: ${causeReasonWords(d.cause.why)}` : '';
  let said: string;
  if (d.safeLayer !== undefined)
    said = `${both}: shared, fails safe for \`${d.safeLayer}\` (layer side: its loss drives it to the trip position${causeSide})`;
  else if (d.cause?.dangerous === false) {
    said = `${both}: shared, not a dangerous common cause (cause side: ${causeReasonWords(d.cause.why)}; layer side: its loss does not drive \`${d.b.tag}\` to a safe state)`;
  } else said = `${both}: not independent (layer side: its loss does not drive the layer to a safe state${causeSide})`;
  return said + beneathWords(d.beneath);
}
