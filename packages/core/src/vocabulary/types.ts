// The data that flows between analysis stages: traces, findings and assessments. Renderers and the
// viewer read only these shapes, so they are plain data (no classes, no Maps) and JSON-serialisable.
import type { ElementGroup, ElementKind, FunctionKind, LinkField } from '../model/kinds.ts';
import type { SeverityLevel } from '../model/schema.ts';
import type { Span } from '../diagnostics/diagnostic.ts';
import type { FindingMessage } from '../catalogue/catalogue.ts';
import type { MissingPart } from '../catalogue/independence/incomplete-trace.ts';

export type { MissingPart };

/** How a function reaches an element: through one of its roles, or through an element's link. */
export type EdgeRole = 'sensor' | 'solver' | 'final' | 'raisedIn' | 'console' | 'operator' | 'device' | LinkField;

export interface TracedElement {
  tag: string;
  kind: ElementKind;
  group: ElementGroup;
  /** Tags from the function (first) to this element (last): the shortest explanation of why it is there. */
  path: string[];
  /** The link taken at each step; `links.length === path.length - 1`. */
  links: EdgeRole[];
}

export interface ChannelTrace {
  role: 'sensor' | 'final';
  /** The channel's own element (the transmitter or valve). */
  head: string;
  /** Every element the channel relies on, the head included, sorted by tag. */
  elements: string[];
}

export interface FunctionTrace {
  function: string;
  kind: FunctionKind;
  /** Every element the function relies on, sorted by tag. Tracing stops at process equipment. */
  elements: TracedElement[];
  channels: ChannelTrace[];
  /** Parts an instrumented layer needs but the model does not give: the layer is unverified. */
  missing: MissingPart[];
}

/** One side of a finding: the initiating cause, or a claimed layer. */
export interface Party {
  role: 'cause' | 'layer';
  /** The function (or, for an element cause, the element) on this side; absent for an external cause. */
  tag?: string;
}

export interface Acceptance {
  by: string;
  date: string;
  reason: string;
}

/** A place in the model file that a finding also concerns, and what it is there. */
export interface RelatedSpan {
  /** What the place is: `layer`, `element`, `cause`, `factor`, `accept`. */
  role: 'layer' | 'element' | 'cause' | 'factor' | 'accept';
  /** The tag, key or factor named there. */
  name: string;
  span: Span;
}

/**
 * A finding. What it says is data (`messageId` and `data`, typed by the rule catalogue); `message` is those
 * words rendered once, kept so every consumer reads the same text.
 */
export type Finding = FindingFacts & FindingMessage;

export interface FindingFacts {
  /** Stable key: justifications and report diffs refer to it. */
  key: string;
  rule: string;
  title: string;
  severity: SeverityLevel;
  scenario?: string;
  /** One party (a finding about a layer alone) or two (cause and layer, or layer and layer). */
  parties: Party[];
  /** The shared element, when there is one. */
  element?: string;
  /** For each party, the path of tags from it to the shared element. */
  paths: string[][];
  /** The words of `messageId` with `data`, as catalogue.ts renders them. */
  message: string;
  rationale: string;
  source: string;
  /** Present when a justification in the model accepts the finding. */
  accepted?: Acceptance;
  /** Where the finding points in the model file (the claim it concerns), when the loader gave spans. */
  span?: Span;
  /** The other places it concerns: the shared element's definition, the cause, the other layer. */
  related?: RelatedSpan[];
}

export type LayerVerdict = 'independent' | 'voided' | 'unverified' | 'open' | 'accepted' | 'not-selected';

export interface RuleInForce {
  id: string;
  title: string;
  severity: SeverityLevel;
  defaultSeverity: SeverityLevel;
  source: string;
  /** Why the severity differs from the default, when the model changed it. */
  reason?: string;
}

/** Where a number came from: the model, a SIL band edge, or the built-in defaults table. */
export interface Sourced {
  value: number;
  origin: 'model' | 'sil-band' | 'default';
  /** The user's basis text, or the defaults table row's source. */
  basis?: string;
}

export interface LayerAssessment {
  function: string;
  kind: FunctionKind;
  title?: string;
  claimedPfd: Sourced;
  /** The PFD the rules allow (a BPCS layer capped at 0.1, an alarm with too little time: 1). */
  allowedPfd: number;
  verdict: LayerVerdict;
  /** Whether the headline "after independence" figure credits this layer. */
  credited: boolean;
  /** Whether the "if open findings are accepted" figure credits it. */
  creditedIfAccepted: boolean;
  /** Keys of the findings that decide the verdict. */
  findings: string[];
  /** The PFD the "if open findings are accepted" figure allows, when it differs from allowedPfd. */
  allowedPfdIfAccepted?: number;
  /** The controller or logic solver the layer runs in, and its system. */
  solver?: string;
  system?: 'bpcs' | 'sis' | 'machine' | 'relay';
  /** Each finding that bears on the layer and what it does, in the order the assessment applied them. */
  reasons?: LayerReason[];
  /** Whether it acts before or after the scenario's SIF (unknown: taken the conservative way), and whether the model says so. */
  acts?: 'before' | 'after' | 'unknown';
  actsStated?: boolean;
  /** The scenario's SIF in high demand: the PFH (per hour) claimed and the PFH the rules allow. */
  claimedPfh?: Sourced;
  allowedPfh?: number;
}

/** What one finding does to a layer's credit. */
export interface LayerReason {
  key: string;
  rule: string;
  severity: SeverityLevel;
  /** voids: no credit; caps: PFD limited to `cap`; unverified: incomplete trace; conflict: with the layer `with`. */
  effect: 'voids' | 'caps' | 'unverified' | 'conflict' | 'note';
  accepted?: boolean;
  element?: string;
  /** The other party: 'cause' or another layer's tag. */
  with?: string;
  cap?: number;
}

export interface SifRequirement {
  /** PFD the SIF must achieve (strictly below it when the edge is "below"). */
  requiredPfd: number;
  requiredRrf: number;
  /** 0 when no SIL is needed (RRF at most 10), else 1 to 4; 5 when beyond SIL 4. */
  sil: number;
  demandRate: number;
  mode: 'low-demand' | 'high-demand';
  /** High demand only: the PFH band (per hour) that applies instead. */
  pfhBand?: { sil: number; low: number; high: number };
  note: string;
  /** High demand only: the PFH (per hour) the SIF must reach, and the SIL the low-demand table would give. */
  requiredPfh?: number;
  lowDemandSil?: number;
  /** The other layers already meet the criterion under its edge convention: no risk reduction is asked of the SIF. */
  noReductionNeeded?: boolean;
  /** At an exact decade edge, the SIL the other edge convention would give, in words. */
  otherReading?: string;
  /** The order used: which credited layers act before and after the SIF. */
  order?: string;
  /** High demand: how the hazard frequency is worked out, and its source. */
  formula?: string;
}

export interface CreditAlternative {
  layers: string[];
  pfdProduct: number;
  /** The scenario's mitigated frequency with this set credited, per year. */
  mitigated?: number;
}

export interface ScenarioAssessment {
  scenario: string;
  title?: string;
  category: string;
  harm: 'people' | 'containment' | 'asset';
  tolerable: number;
  edge: 'below' | 'at-most';
  /** frequencyAfter / frequencyIfAccepted: present when a limit rule replaces the claimed frequency. */
  cause: {
    label: string;
    frequency: Sourced;
    frequencyAfter?: number;
    frequencyIfAccepted?: number;
    /** The cause's element set as the rules compared it (a narrowed cause: the whole loop until accepted), sorted. */
    elements?: string[];
  };
  /** allowed, allowedIfAccepted, finding: as for modifiers (an enabler with no basis is not applied until accepted). */
  enablers: {
    title: string;
    probability: number;
    basis?: string;
    allowed: boolean;
    allowedIfAccepted?: boolean;
    finding?: string;
  }[];
  /** allowed: in the headline figure; allowedIfAccepted: in the "if accepted" figure; finding: the key that bars it. */
  modifiers: {
    kind: string;
    title?: string;
    probability: number;
    basis?: string;
    allowed: boolean;
    allowedIfAccepted?: boolean;
    finding?: string;
  }[];
  layers: LayerAssessment[];
  /** Mitigated frequency with every claim taken at face value, per year. */
  mitigatedClaimed: number;
  /** After independence: only credited layers, per year. The headline figure. */
  mitigatedAfter: number;
  /** As after independence, but with every open (needs-justification) finding accepted. */
  mitigatedIfAccepted: number;
  /** mitigatedAfter / tolerable: above 1 (or at 1 with edge "below") the scenario falls short. */
  gap: number;
  meetsClaimed: boolean;
  meetsAfter: boolean;
  meetsIfAccepted?: boolean;
  /** The SIF requirement: for the scenario's SIF, or for a SIF that would close the gap. */
  sif?: SifRequirement & { function?: string };
  /** Other sets of mutually independent layers considered, best first. */
  alternatives: CreditAlternative[];
  findings: string[];
}

export interface Analysis {
  traces: FunctionTrace[];
  findings: Finding[];
  assessments: ScenarioAssessment[];
  rules: RuleInForce[];
}
