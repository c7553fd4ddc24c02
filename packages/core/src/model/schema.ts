// The model schema: the single source of truth for the shape of a Bulkhead model.
// Types are inferred from it, the JSON Schema is exported from it, and the .bulk language maps onto it.
import { z } from 'zod';
import { ELEMENT_GROUPS, FUNCTION_KINDS } from './kinds.ts';

/** ISA-5.1-style tags and our own ids: letters, digits and a few joiners; never a bare `__proto__`. */
export const TAG_PATTERN = /^[A-Za-z0-9][A-Za-z0-9_.\-/+:]*$/;
export const TAG_MAX_LENGTH = 64;

export const Tag = z
  .string()
  .meta({ id: 'Tag', description: 'A tag such as LT-101 or a scenario id: letters, digits and _ . - / + :' });
export const Text = z.string().meta({ id: 'Text', description: 'Free text, quoted in .bulk files' });
// Lists are never empty: the .bulk language has no way to write an empty list, so JSON may not hold one
// either (one-to-one mapping); an empty list is written by leaving the field out.
export const TagList = z.array(Tag).min(1);
/** A list of statements nested in another (a scenario's layers); empty is written by leaving it out. */
function nonEmpty<T extends z.ZodType>(item: T) {
  return z.array(item).min(1);
}
/** A probability, checked to lie in (0, 1] by the loader so the error carries a span. */
export const Probability = z.number().meta({ id: 'Probability', description: 'A probability in (0, 1]' });
export const PerYear = z.number().meta({ id: 'PerYear', description: 'A frequency in events per year' });
export const Voting = z.string().meta({ id: 'Voting', description: 'MooN voting such as 1oo1, 1oo2, 2oo3' });

/**
 * One comment line without its `#`. A .bulk comment runs to the end of its line, so it may hold no
 * line break or other control character (tabs aside); otherwise .bulk and JSON could not map one-to-one.
 */
export const CommentLine = z
  .string()
  // eslint-disable-next-line no-control-regex -- matching control characters is the point of this pattern
  .regex(/^[^\u0000-\u0008\u000a-\u001f\u007f]*$/)
  .meta({ id: 'CommentLine', description: 'One comment line, without the #: no line breaks or control characters' });

/** Comments kept from a .bulk file so that conversion and formatting lose nothing the user wrote. */
const commentFields = {
  comments: nonEmpty(CommentLine).optional(),
  trailingComment: CommentLine.optional(),
};

export const Site = z
  .strictObject({
    name: Text,
    description: Text.optional(),
    document: Text.optional().meta({ description: 'Document number of the evidence list, printed on every page' }),
    revision: Text.optional().meta({ description: 'Revision of the evidence list, such as A or 2' }),
    status: Text.optional().meta({ description: 'Issue status, such as "for review" or "approved for construction"' }),
    basedOn: z.array(Text).min(1).optional().meta({
      description:
        'The source documents and their revisions the model was built from, such as "P&ID 100-PID-001 rev C"',
    }),
    preparedBy: Text.optional(),
    checkedBy: Text.optional(),
    approvedBy: Text.optional(),
    ...commentFields,
  })
  .meta({ id: 'Site' });

export const HARMS = ['people', 'containment', 'asset'] as const;
export const EDGES = ['below', 'at-most'] as const;

export const Category = z
  .strictObject({
    id: Tag,
    title: Text.optional(),
    tolerable: PerYear.meta({ description: 'Tolerable frequency, per year' }),
    harm: z.enum(HARMS).meta({
      description: 'people: conditional modifiers allowed; containment or asset: they are not',
    }),
    edge: z.enum(EDGES).optional().meta({
      description: 'below (default): mitigated frequency must be strictly below tolerable; at-most: may equal it',
    }),
    basis: Text.optional(),
    ...commentFields,
  })
  .meta({ id: 'Category' });

export const Policy = z
  .strictObject({
    sameControllerLayers: z.enum(['one-credit', 'both', 'none']).optional().meta({
      description:
        'BPCS layers in one controller: one-credit (IEC 61511-1:2016 9.3, default), both (older CCPS practice), none',
    }),
    sharedSolver: z.enum(['void', 'allow']).optional().meta({
      description: 'A logic solver shared by cause and layer: void (IEC 61511 reading, default) or allow',
    }),
    minResponseMinutes: z.number().optional().meta({ description: 'Least time available for operator response' }),
    presenceLimit: Probability.optional().meta({ description: 'Highest presence probability creditable' }),
    conditionCreditLimit: z.number().optional().meta({
      description:
        'Most combined credit (a factor, 100 = two orders of magnitude) taken for enablers and modifiers together',
    }),
    basis: Text.optional(),
    ...commentFields,
  })
  .meta({ id: 'Policy' });

export const SEVERITIES = ['voids-credit', 'needs-justification', 'note'] as const;
export const Severity = z.enum(SEVERITIES).meta({ id: 'Severity' });

export const RuleSetting = z
  .strictObject({ id: Tag, severity: Severity, reason: Text.optional(), ...commentFields })
  .meta({ id: 'RuleSetting' });

const linkFields = {
  mountedOn: TagList.optional(),
  connectedThrough: TagList.optional(),
  signalVia: TagList.optional(),
  housedIn: TagList.optional(),
  poweredBy: TagList.optional(),
  airFrom: TagList.optional(),
  hydraulicFrom: TagList.optional(),
};
const identityFields = { make: Text.optional(), model: Text.optional(), technology: Text.optional() };

export const VARIABLES = [
  'level',
  'pressure',
  'flow',
  'temperature',
  'analysis',
  'position',
  'speed',
  'other',
] as const;
export const SYSTEMS = ['bpcs', 'sis', 'machine', 'relay'] as const;
export const FAIL_POSITIONS = ['closed', 'open', 'in-place', 'off', 'on'] as const;
/** How an active element that declares no supply link gets its energy (see rules/supply-route.ts). */
export const SUPPLY_EXEMPTIONS = ['from-signal', 'mechanical', 'self-contained'] as const;
const supplyField = {
  supply: z.enum(SUPPLY_EXEMPTIONS).optional().meta({
    description:
      'Said instead of a supply link: from-signal (powered over its signal link, a 2-wire transmitter or a solenoid fed by its output card), mechanical, self-contained',
  }),
};

function elementOf<const K extends readonly [string, ...string[]], X extends z.ZodRawShape>(kinds: K, extra: X) {
  return z.strictObject({
    kind: z.enum(kinds),
    tag: Tag,
    title: Text.optional(),
    ...extra,
    ...linkFields,
    ...commentFields,
  });
}

export const Element = z
  .discriminatedUnion('kind', [
    elementOf(ELEMENT_GROUPS.equipment, {}),
    elementOf(ELEMENT_GROUPS.connection, {}),
    elementOf(ELEMENT_GROUPS.impulse, {}),
    elementOf(ELEMENT_GROUPS.sensor, { variable: z.enum(VARIABLES).optional(), ...identityFields, ...supplyField }),
    elementOf(ELEMENT_GROUPS.signal, { ...identityFields, ...supplyField }),
    elementOf(ELEMENT_GROUPS.housing, {}),
    elementOf(ELEMENT_GROUPS.solver, { system: z.enum(SYSTEMS), ...identityFields, ...supplyField }),
    elementOf(ELEMENT_GROUPS.final, {
      failsTo: z.enum(FAIL_POSITIONS).optional().meta({
        description: 'Position taken on loss of power, signal or air; absent means unknown (worst case)',
      }),
      ...identityFields,
      ...supplyField,
    }),
    elementOf(ELEMENT_GROUPS.actuation, {
      failsTo: z.enum(FAIL_POSITIONS).optional(),
      ...identityFields,
      ...supplyField,
    }),
    elementOf(ELEMENT_GROUPS.support, identityFields),
    elementOf(ELEMENT_GROUPS.mechanical, identityFields),
    elementOf(ELEMENT_GROUPS.people, supplyField),
  ])
  .meta({ id: 'Element' });

export const TRIP_ACTIONS = ['close', 'open', 'stop', 'start'] as const;
export const TRIP_MODES = ['de-energise', 'energise'] as const;

const functionCommon = { tag: Tag, title: Text.optional() };
const claimedPfd = { pfd: Probability.optional(), pfdBasis: Text.optional() };
const instrumentedFields = {
  sensors: TagList,
  sensorVoting: Voting.optional(),
  solver: Tag,
  finals: TagList,
  finalVoting: Voting.optional(),
  trip: z
    .enum(TRIP_ACTIONS)
    .optional()
    .meta({ description: 'What the final elements must do to reach the safe state' }),
  tripMode: z.enum(TRIP_MODES).optional(),
};

export const ControlLoop = z
  .strictObject({
    kind: z.literal('loop'),
    ...functionCommon,
    sensors: TagList,
    solver: Tag,
    finals: TagList,
    ...claimedPfd,
    ...commentFields,
  })
  .meta({ id: 'ControlLoop', description: 'A BPCS control loop' });

export const Sif = z
  .strictObject({
    kind: z.literal('sif'),
    ...functionCommon,
    ...instrumentedFields,
    sil: z.number().optional().meta({ description: 'SIL claimed, 1 to 4' }),
    ...claimedPfd,
    pfh: z
      .number()
      .optional()
      .meta({ description: 'Dangerous failure rate, per hour (PFH), used in high-demand mode' }),
    pfhBasis: Text.optional(),
    ...commentFields,
  })
  .meta({ id: 'Sif', description: 'A safety instrumented function' });

export const InstrumentedTrip = z
  .strictObject({ kind: z.literal('trip'), ...functionCommon, ...instrumentedFields, ...claimedPfd, ...commentFields })
  .meta({
    id: 'InstrumentedTrip',
    description: 'Another instrumented safeguard: a BPCS interlock, a machine panel trip',
  });

export const AlarmResponse = z
  .strictObject({
    kind: z.literal('alarm'),
    ...functionCommon,
    sensors: TagList,
    raisedIn: Tag.meta({ description: 'The controller or logic solver that raises the alarm' }),
    console: Tag.optional(),
    operator: Tag,
    finals: TagList.optional(),
    minutes: z.number().meta({ description: 'Time available for the response, minutes' }),
    ...claimedPfd,
    hraBasis: Text.optional().meta({
      description: 'Documented human-reliability analysis that supports a PFD below 0.1',
    }),
    ...commentFields,
  })
  .meta({ id: 'AlarmResponse', description: 'An alarm with operator response' });

export const MechanicalDevice = z
  .strictObject({
    kind: z.literal('device'),
    ...functionCommon,
    device: Tag,
    creditBasis: Text.optional().meta({ description: 'Why a check valve deserves credit' }),
    ...claimedPfd,
    ...commentFields,
  })
  .meta({ id: 'MechanicalDevice', description: 'A relief valve, rupture disc or check valve as a layer' });

export const PlantFunction = z
  .discriminatedUnion('kind', [ControlLoop, Sif, InstrumentedTrip, AlarmResponse, MechanicalDevice])
  .meta({ id: 'Function' });

/** Rows of the typical-frequency table (see assess/defaults), usable instead of a number. */
export const TYPICAL_CAUSES = [
  'bpcs-loop-failure',
  'regulator-failure',
  'pump-seal-failure',
  'cooling-water-failure',
  'hose-failure',
  'relief-spurious-open',
  'external-fire',
  'third-party-impact',
  'lightning',
  'atmospheric-tank-failure',
  'piping-leak',
  'piping-breach',
  'vessel-failure',
] as const;

export const CAUSE_DIRECTIONS = ['open', 'closed', 'on', 'off', 'high', 'low'] as const;

/** Rows given per 100 m of pipe: the cause must say how many metres (pipe-metres), and the figure scales with it. */
export const PER_100_M_ROWS: ReadonlySet<(typeof TYPICAL_CAUSES)[number]> = new Set([
  'piping-leak',
  'piping-breach',
] as const);

export const Cause = z
  .strictObject({
    function: Tag.optional(),
    only: Tag.optional().meta({ description: 'Narrow a loop-failure cause to one of its elements' }),
    element: Tag.optional(),
    external: Text.optional(),
    drivesTo: z.enum(CAUSE_DIRECTIONS).optional().meta({
      description:
        'The dangerous state the failure produces: where a loop drives its final elements (open, closed, on, off) or its output (high, low), or how a failing element fails; absent: any direction, taken as dangerous',
    }),
    frequency: PerYear.optional(),
    typical: z.enum(TYPICAL_CAUSES).optional(),
    pipeMetres: z
      .number()
      .optional()
      .meta({ description: 'Length of pipe, metres: scales the per-100 m piping rows of typical=' }),
    basis: Text.optional(),
    ...commentFields,
  })
  .meta({ id: 'Cause', description: 'Exactly one of function, element or external' });

export const Enabler = z
  .strictObject({ title: Text, probability: Probability, basis: Text.optional(), ...commentFields })
  .meta({ id: 'Enabler' });

export const MODIFIER_KINDS = ['ignition', 'presence', 'injury', 'other'] as const;
export const Modifier = z
  .strictObject({
    kind: z.enum(MODIFIER_KINDS),
    title: Text.optional(),
    probability: Probability,
    basis: Text.optional(),
    ...commentFields,
  })
  .meta({ id: 'Modifier' });

export const ACTS = ['before', 'after'] as const;
export const LayerClaim = z
  .strictObject({
    function: Tag,
    pfd: Probability.optional(),
    basis: Text.optional(),
    acts: z
      .enum(ACTS)
      .optional()
      .meta({ description: 'Whether the layer acts before or after the SIF; absent: the default for its kind' }),
    ...commentFields,
  })
  .meta({ id: 'LayerClaim' });

export const Scenario = z
  .strictObject({
    id: Tag,
    title: Text.optional(),
    category: Tag,
    study: Text.optional().meta({
      description: 'The hazard study the scenario comes from: its document number and revision',
    }),
    studyNode: Text.optional().meta({ description: 'The node of the hazard study' }),
    studyDeviation: Text.optional().meta({ description: 'The deviation of the hazard study, such as "high level"' }),
    studyRecommendations: TagList.optional().meta({
      description: 'Recommendation numbers of the hazard study this scenario answers',
    }),
    outcome: Tag.optional().meta({
      description:
        'The consequence this scenario leads to, shared by scenarios that lead to the same one: their frequencies sum against one tolerable frequency',
    }),
    cause: Cause,
    enablers: nonEmpty(Enabler).optional(),
    modifiers: nonEmpty(Modifier).optional(),
    layers: nonEmpty(LayerClaim).optional(),
    ...commentFields,
  })
  .meta({ id: 'Scenario' });

/**
 * Failure figures for one element, or for every element of one make and model (an element row wins).
 * Rates are per hour, times in hours. `basis` backs the rates, `testBasis` the proof test and repair
 * figures: a figure with no basis is reported by `bulkhead verify` (see docs/failure-data.md).
 */
export const FailureData = z
  .strictObject({
    id: Tag,
    element: Tag.optional().meta({ description: 'The element these figures are for' }),
    make: Text.optional().meta({ description: 'With model: every element of this make and model' }),
    model: Text.optional(),
    lambdaDu: z.number().optional().meta({ description: 'Dangerous undetected failure rate, per hour' }),
    lambdaDd: z.number().optional().meta({ description: 'Dangerous detected failure rate, per hour' }),
    lambdaD: z
      .number()
      .optional()
      .meta({ description: 'Dangerous failure rate, per hour: give it with dc instead of lambda-du and lambda-dd' }),
    dc: z.number().optional().meta({ description: 'Diagnostic coverage, 0 to 1 (with lambda-d)' }),
    lambdaSd: z.number().optional().meta({ description: 'Safe detected failure rate, per hour (1oo2D groups)' }),
    hft: z
      .number()
      .optional()
      .meta({ description: 'Hardware fault tolerance inside the device (a redundant logic solver); absent: 0' }),
    basis: Text.optional().meta({ description: 'Where the failure rates come from' }),
    proofTestHours: z.number().optional().meta({ description: 'Proof-test interval T1, hours' }),
    proofTestCoverage: z
      .number()
      .optional()
      .meta({ description: 'Share of dangerous undetected failures a proof test reveals, 0 to 1; absent: 1' }),
    missionHours: z
      .number()
      .optional()
      .meta({ description: 'Mission time, hours: how long failures a proof test misses stay hidden' }),
    mttrHours: z.number().optional().meta({ description: 'Mean time to restoration (and mean repair time), hours' }),
    testBasis: Text.optional().meta({ description: 'Where the proof-test, coverage and repair figures come from' }),
    ...commentFields,
  })
  .meta({ id: 'FailureData' });

export const SUBSYSTEMS = ['sensors', 'solver', 'finals'] as const;
export const CommonCause = z
  .strictObject({
    function: Tag,
    group: z.enum(SUBSYSTEMS).meta({
      description:
        "The voted group: the SIF's sensors or final elements (solver is refused: a logic solver is one element, with its hft= on its failure data)",
    }),
    beta: z.number().meta({ description: 'Common-cause factor for dangerous undetected failures, 0 to 1' }),
    betaD: z
      .number()
      .optional()
      .meta({ description: 'Common-cause factor for dangerous detected failures; absent: beta / 2' }),
    basis: Text.optional(),
    ...commentFields,
  })
  .meta({ id: 'CommonCause', description: 'The common-cause factors of one voted group of a SIF' });

export const Justification = z
  .strictObject({
    finding: Text.meta({ description: 'The stable key of the finding accepted' }),
    by: Text,
    date: Text.meta({ description: 'YYYY-MM-DD' }),
    reason: Text,
    ...commentFields,
  })
  .meta({ id: 'Justification' });

export const Model = z
  .strictObject({
    $schema: z.string().optional(),
    site: Site,
    policy: Policy.optional(),
    categories: z.array(Category),
    rules: nonEmpty(RuleSetting).optional(),
    elements: z.array(Element),
    functions: z.array(PlantFunction),
    scenarios: z.array(Scenario),
    failureData: nonEmpty(FailureData).optional(),
    commonCauses: nonEmpty(CommonCause).optional(),
    justifications: nonEmpty(Justification).optional(),
    endComments: nonEmpty(CommentLine).optional(),
  })
  .meta({ id: 'BulkheadModel', title: 'Bulkhead model', description: 'A Bulkhead plant model' });

export type Model = z.infer<typeof Model>;
export type Site = z.infer<typeof Site>;
export type Category = z.infer<typeof Category>;
export type Policy = z.infer<typeof Policy>;
export type RuleSetting = z.infer<typeof RuleSetting>;
export type Element = z.infer<typeof Element>;
export type PlantFunction = z.infer<typeof PlantFunction>;
export type Scenario = z.infer<typeof Scenario>;
export type Cause = z.infer<typeof Cause>;
export type LayerClaim = z.infer<typeof LayerClaim>;
export type Justification = z.infer<typeof Justification>;
export type FailureData = z.infer<typeof FailureData>;
export type CommonCause = z.infer<typeof CommonCause>;
export type Subsystem = (typeof SUBSYSTEMS)[number];
export type SupplyExemption = (typeof SUPPLY_EXEMPTIONS)[number];
export type CauseDirection = (typeof CAUSE_DIRECTIONS)[number];
export type SeverityLevel = (typeof SEVERITIES)[number];
export type FunctionKindOf<K extends (typeof FUNCTION_KINDS)[number]> = Extract<PlantFunction, { kind: K }>;

export function modelJsonSchema(): Record<string, unknown> {
  return z.toJSONSchema(Model, { target: 'draft-2020-12' }) as Record<string, unknown>;
}
