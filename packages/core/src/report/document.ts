// The report document: one normalised, sorted view of a model's assessment that every report format
// renders. Its zod schema is the documented, versioned shape of the JSON report (formatVersion below).
import { z } from 'zod';
import { SEVERITIES } from '../model/schema.ts';

/**
 * Raise when a field is removed or changes meaning; adding an optional field keeps the version.
 * Readers should refuse a formatVersion they do not know.
 */
/** 2: adds `cutSets` and `commonCauses` (issue 15). */
export const REPORT_FORMAT_VERSION = 2;

const Severity = z.enum(SEVERITIES);
const Tags = z.array(z.string());

const Sourced = z
  .strictObject({
    value: z.number(),
    origin: z.enum(['model', 'sil-band', 'default']).meta({
      description:
        'model: the user wrote it; sil-band: the conservative edge of the claimed SIL; default: the built-in table',
    }),
    basis: z.string().optional(),
  })
  .meta({ id: 'SourcedNumber', description: 'A number and where it came from' });

const PolicySwitch = z
  .strictObject({
    name: z.string().meta({ description: 'The switch as written in a .bulk policy statement' }),
    value: z.string(),
    origin: z.enum(['model', 'default']),
  })
  .meta({ id: 'PolicySwitch' });

const Rule = z
  .strictObject({
    id: z.string(),
    title: z.string(),
    severity: Severity,
    defaultSeverity: Severity,
    source: z.string(),
    rationale: z.string().optional(),
    reason: z.string().optional().meta({ description: "The model's reason for a severity other than the default" }),
  })
  .meta({ id: 'RuleInForce' });

const Acceptance = z.strictObject({ by: z.string(), date: z.string(), reason: z.string() }).meta({ id: 'Acceptance' });

const Finding = z
  .strictObject({
    key: z.string().meta({ description: 'Stable key: a justification names it to accept the finding' }),
    rule: z.string(),
    title: z.string(),
    severity: Severity,
    scenario: z.string().optional(),
    parties: z.array(z.strictObject({ role: z.enum(['cause', 'layer']), tag: z.string().optional() })),
    element: z.string().optional().meta({ description: 'The shared element, when there is one' }),
    paths: z.array(Tags).meta({ description: 'For each party, the tags from it to the shared element' }),
    message: z.string(),
    rationale: z.string(),
    source: z.string(),
    accepted: Acceptance.optional(),
  })
  .meta({ id: 'Finding' });

const TracedElement = z
  .strictObject({
    tag: z.string(),
    kind: z.string(),
    group: z.string(),
    title: z.string().optional(),
    path: Tags.meta({ description: 'From the function (first) to this element (last)' }),
    links: Tags.meta({ description: 'The link taken at each step of the path' }),
  })
  .meta({ id: 'TracedElement' });

const LayerElement = TracedElement.extend({
  inCause: z.boolean().meta({ description: "The element is also in the initiating cause's element set" }),
  findings: Tags.meta({ description: 'Keys of findings about this layer that name this element as shared' }),
}).meta({ id: 'LayerElement' });

const LayerReason = z
  .strictObject({
    key: z.string(),
    rule: z.string(),
    severity: Severity,
    effect: z.enum(['voids', 'caps', 'unverified', 'conflict', 'note']).meta({
      description:
        'voids: no credit; caps: PFD limited to cap; unverified: incomplete trace; conflict: with the layer in `with`; note: none',
    }),
    accepted: z.boolean().optional(),
    element: z.string().optional(),
    with: z.string().optional().meta({ description: "The other party: 'cause' or another layer's tag" }),
    cap: z.number().optional(),
  })
  .meta({ id: 'LayerReason' });

export const LAYER_VERDICTS = ['independent', 'voided', 'unverified', 'open', 'accepted', 'not-selected'] as const;

const Layer = z
  .strictObject({
    function: z.string(),
    kind: z.string(),
    title: z.string().optional(),
    claimedPfd: Sourced,
    allowedPfd: z.number().meta({ description: 'The PFD the rules allow (a BPCS layer capped at 0.1, for one)' }),
    verdict: z.enum(LAYER_VERDICTS),
    credited: z.boolean().meta({ description: 'Credited in the headline figure, after independence' }),
    creditedIfAccepted: z.boolean(),
    elements: z.array(LayerElement),
    missing: Tags.meta({ description: 'Parts the layer needs but the model does not give (unverified)' }),
    findings: Tags.meta({ description: 'Keys of the findings that decide the verdict' }),
    allowedPfdIfAccepted: z
      .number()
      .optional()
      .meta({ description: 'The PFD allowed in the "if accepted" figure, when it differs' }),
    solver: z.string().optional().meta({ description: 'The controller or logic solver the layer runs in' }),
    system: z.enum(['bpcs', 'sis', 'machine', 'relay']).optional(),
    reasons: z
      .array(LayerReason)
      .optional()
      .meta({ description: 'What each finding that bears on the layer does to its credit' }),
    acts: z.enum(['before', 'after', 'unknown']).optional().meta({
      description:
        "Whether it acts before or after the scenario's SIF; unknown is taken the conservative way in each figure",
    }),
    actsStated: z
      .boolean()
      .optional()
      .meta({ description: 'The layer line states the order (acts=); otherwise the default for its kind' }),
    claimedPfh: Sourced.optional().meta({
      description: "High demand only: the SIF's PFH (per hour) as claimed or from its SIL band",
    }),
    allowedPfh: z.number().optional().meta({ description: 'High demand only: the PFH (per hour) the rules allow' }),
  })
  .meta({ id: 'LayerReport' });

const LopaLine = z
  .strictObject({
    figure: z.enum(['claimed', 'after-independence', 'if-accepted']),
    layers: Tags.meta({ description: 'The layers credited in this figure' }),
    mitigated: z.number().meta({ description: 'Mitigated frequency, per year' }),
    meets: z.boolean(),
  })
  .meta({ id: 'LopaLine' });

const SifRequirement = z
  .strictObject({
    function: z.string().optional(),
    requiredPfd: z.number(),
    requiredRrf: z.number(),
    sil: z.number().meta({ description: '0: no SIL needed; 1 to 4; 5: beyond SIL 4' }),
    demandRate: z.number(),
    mode: z.enum(['low-demand', 'high-demand']),
    pfhBand: z.strictObject({ sil: z.number(), low: z.number(), high: z.number() }).optional(),
    note: z.string(),
    requiredPfh: z.number().optional().meta({ description: 'High demand only: the PFH (per hour) the SIF must reach' }),
    lowDemandSil: z.number().optional(),
    noReductionNeeded: z
      .boolean()
      .optional()
      .meta({ description: 'The other credited layers already meet the criterion' }),
    otherReading: z
      .string()
      .optional()
      .meta({ description: 'At an exact decade edge, the SIL under the other edge convention' }),
    order: z.string().optional().meta({ description: 'Which credited layers act before and after the SIF' }),
    formula: z
      .string()
      .optional()
      .meta({ description: 'High demand only: how the hazard frequency is worked out, and its source' }),
  })
  .meta({ id: 'SifRequirement' });

const Scenario = z
  .strictObject({
    id: z.string(),
    title: z.string().optional(),
    category: z.string(),
    harm: z.enum(['people', 'containment', 'asset']),
    tolerable: z.number(),
    edge: z.enum(['below', 'at-most']),
    study: z
      .strictObject({
        document: z.string().optional(),
        node: z.string().optional(),
        deviation: z.string().optional(),
        recommendations: Tags.optional(),
      })
      .optional()
      .meta({ description: 'Where the scenario comes from in the hazard study, as the model gives it' }),
    cause: z.strictObject({
      label: z.string(),
      function: z.string().optional(),
      only: z.string().optional(),
      element: z.string().optional(),
      external: z.string().optional(),
      frequency: Sourced,
      frequencyAfter: z
        .number()
        .optional()
        .meta({ description: 'The frequency used after independence, when a limit rule replaces the claimed one' }),
      frequencyIfAccepted: z.number().optional(),
      elements: Tags.nullable().meta({
        description: "The cause's element set, sorted; null when the analysis did not give it",
      }),
    }),
    enablers: z.array(
      z.strictObject({
        title: z.string(),
        probability: z.number(),
        basis: z.string().optional(),
        allowed: z.boolean().meta({ description: 'Applied in the headline figure' }),
        allowedIfAccepted: z.boolean().optional(),
        finding: z.string().optional().meta({ description: 'The key of the finding that bars it' }),
      }),
    ),
    modifiers: z.array(
      z.strictObject({
        kind: z.string(),
        title: z.string().optional(),
        probability: z.number(),
        basis: z.string().optional(),
        allowed: z.boolean(),
        allowedIfAccepted: z.boolean().optional(),
        finding: z.string().optional().meta({ description: 'The key of the finding that bars the modifier' }),
      }),
    ),
    layers: z.array(Layer),
    lopa: z.array(LopaLine),
    gap: z.number().meta({ description: 'Mitigated frequency after independence over tolerable' }),
    sif: SifRequirement.optional(),
    alternatives: z.array(z.strictObject({ layers: Tags, pfdProduct: z.number(), mitigated: z.number().optional() })),
    findings: Tags,
  })
  .meta({ id: 'ScenarioReport' });

const FunctionTrace = z
  .strictObject({
    function: z.string(),
    kind: z.string(),
    title: z.string().optional(),
    elements: z.array(TracedElement),
    channels: z.array(z.strictObject({ role: z.enum(['sensor', 'final']), head: z.string(), elements: Tags })),
    missing: Tags,
  })
  .meta({ id: 'FunctionTraceReport' });

const CutSets = z
  .strictObject({
    method: z.string(),
    maxOrder: z.number(),
    scenarios: z.array(
      z.strictObject({
        scenario: z.string(),
        maxOrder: z.number(),
        layers: Tags,
        noStartingElement: z.boolean(),
        cutSets: z.array(
          z.strictObject({
            elements: Tags,
            paths: z.array(z.strictObject({ element: z.string(), party: z.string(), path: Tags })),
            findings: Tags,
          }),
        ),
        incompleteLayers: Tags,
        unknownLayers: Tags,
      }),
    ),
  })
  .meta({ id: 'CutSetsReport', description: 'Minimal cut sets per scenario up to maxOrder (MOCUS), by scenario id' });

const CommonCauses = z
  .strictObject({
    order: z.string().meta({ description: 'How the ranking is ordered, in words' }),
    elements: z.array(
      z.strictObject({
        rank: z.number(),
        element: z.string(),
        kind: z.string(),
        title: z.string().optional(),
        layers: z.number(),
        scenarios: Tags,
        findings: z.number(),
        openFindings: z.number(),
        frequencyCost: z.number(),
        frequencyAtStake: z.number(),
        gapReduction: z.number(),
        wouldMeet: Tags,
      }),
    ),
  })
  .meta({ id: 'CommonCausesReport', description: 'Elements that take part in findings, ranked across the site' });

export const ReportDocument = z
  .strictObject({
    formatVersion: z.literal(REPORT_FORMAT_VERSION),
    tool: z.strictObject({ name: z.literal('bulkhead'), version: z.string() }),
    model: z.strictObject({
      file: z.string(),
      sha256: z
        .string()
        .regex(/^[0-9a-f]{64}$/)
        .meta({
          description:
            "SHA-256 of the model: of the file's bytes, or for a model with part files, of the list `sha256sum` prints for the model file and then each part in code-point order of its path",
        }),
      parts: z
        .array(z.strictObject({ file: z.string(), sha256: z.string().regex(/^[0-9a-f]{64}$/) }))
        .optional()
        .meta({ description: 'The part files the model names, each with the SHA-256 of its own bytes' }),
    }),
    site: z.strictObject({ name: z.string(), description: z.string().optional() }),
    control: z
      .strictObject({
        document: z.string().optional(),
        revision: z.string().optional(),
        status: z.string().optional(),
        basedOn: Tags.meta({ description: 'Source documents and revisions the model was built from' }),
        preparedBy: z.string().optional(),
        checkedBy: z.string().optional(),
        approvedBy: z.string().optional(),
      })
      .optional()
      .meta({
        id: 'DocumentControl',
        description: 'Document number, revision and status from the model or the command line',
      }),
    assumptions: Tags.optional().meta({ description: 'The conventions and policy in force that the figures rest on' }),
    sources: z
      .array(
        z.strictObject({
          id: z.string().meta({ description: 'Reference used by the rules table: R1, R2, ...' }),
          work: z.string(),
          edition: z.string().optional(),
          clauses: Tags,
          checked: z.enum(['yes', 'partly', 'from-memory', 'no-source']).meta({
            description:
              'yes: no clause cited from it is marked from memory; partly: some are (marked on the clause); from-memory: all are; no-source: common practice or policy',
          }),
          rules: Tags,
        }),
      )
      .optional()
      .meta({ description: 'Every source the rules cite, once' }),
    date: z
      .string()
      .optional()
      .meta({ description: 'Only when given on the command line, so output stays reproducible' }),
    cautions: Tags,
    conventions: Tags,
    policy: z.array(PolicySwitch),
    rules: z.array(Rule),
    summary: z.strictObject({
      scenarios: z.number(),
      scenariosMeetingAfter: z.number(),
      findings: z.strictObject({ 'voids-credit': z.number(), 'needs-justification': z.number(), note: z.number() }),
      accepted: z.number(),
    }),
    scenarios: z.array(Scenario),
    functions: z.array(FunctionTrace),
    findings: z.array(Finding),
    cutSets: CutSets.optional().meta({ description: 'Always present in the JSON report' }),
    commonCauses: CommonCauses.optional().meta({ description: 'Always present in the JSON report' }),
  })
  .meta({
    id: 'BulkheadReport',
    title: 'Bulkhead report',
    description: `The JSON report of a Bulkhead assessment, format version ${REPORT_FORMAT_VERSION}`,
  });

export type ReportDocument = z.infer<typeof ReportDocument>;
export type ScenarioReport = ReportDocument['scenarios'][number];
export type LayerReport = ScenarioReport['layers'][number];
export type ReportFinding = ReportDocument['findings'][number];
export type FunctionTraceReport = ReportDocument['functions'][number];

export function reportJsonSchema(): Record<string, unknown> {
  return z.toJSONSchema(ReportDocument, { target: 'draft-2020-12' }) as Record<string, unknown>;
}
