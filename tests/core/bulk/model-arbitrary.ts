// A fast-check generator of valid models: elements of every kind linked only to earlier elements (so
// no cycles) by the links the kind table allows, functions built from them, scenarios, and comments and
// strings full of quotes, backslashes, control characters and unicode. Used by the round-trip properties.
import fc from 'fast-check';
import {
  ACTS,
  ELEMENT_GROUPS,
  ELEMENT_KINDS,
  FAIL_POSITIONS,
  FUNCTION_KINDS,
  groupOf,
  HARMS,
  EDGES,
  LINK_FIELDS,
  LINK_TARGETS,
  MODIFIER_KINDS,
  PER_100_M_ROWS as PIPING_ROWS,
  RULE_IDS,
  SEVERITIES,
  SUPPORT_LINK_KINDS,
  SYSTEMS,
  TRIP_ACTIONS,
  TRIP_MODES,
  TYPICAL_CAUSES,
  VARIABLES,
  type Element,
  type ElementGroup,
  type Model,
  type PlantFunction,
  type Scenario,
} from '@bulkhead/core';

type Loose = Record<string, unknown>;
type Seed<A> = A extends fc.Arbitrary<infer T> ? T : never;

/** Drops keys whose value is undefined, so generated objects look like parsed ones. */
function compact<T extends Loose>(o: T): T {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as T;
}

const loneSurrogate = fc.integer({ min: 0xd800, max: 0xdfff }).map((c) => String.fromCharCode(c));
/** Free text: anything at all, including what the printer must escape. */
export const text = fc.oneof(
  fc.string({ unit: 'binary', maxLength: 16 }),
  fc.string({
    unit: fc.constantFrom('"', '\\', '#', ',', '=', ' ', '\t', '\n', '\r', '\u0000', 'é', '🚧', '日', 'a', '\u2028'),
    maxLength: 12,
  }),
  fc.constantFrom(
    '',
    '"',
    '\\',
    'a "quoted" \\ back\\slash',
    '#not a comment',
    'x=y, z',
    '\\n is not a line break',
    'ünïcödé 🚧 日本',
  ),
  loneSurrogate,
);
// eslint-disable-next-line no-control-regex -- matching control characters is the point of this pattern
const CONTROL = /[\u0000-\u0008\u000a-\u001f\u007f]/g;
/** One comment line: arbitrary text with no line break or control character (tabs allowed). */
export const comment = fc.oneof(
  fc.string({ unit: 'binary', maxLength: 24 }).map((s) => s.replace(CONTROL, '')),
  fc.constantFrom('', ' ', '#', ' # nested hash', '\tindented', ' "quotes" and \\ backslashes', '   '),
);
const comments = fc.option(fc.array(comment, { minLength: 1, maxLength: 3 }), { nil: undefined });
const trailing = fc.option(comment, { nil: undefined });

const probability = fc.oneof(
  fc.constantFrom(1e-9, 1e-4, 0.001, 0.01, 0.1, 0.5, 1),
  fc.double({ min: Number.MIN_VALUE, max: 1, noNaN: true }),
);
const positive = fc.oneof(
  fc.constantFrom(1e-9, 1e-5, 0.1, 1, 10, 1e21),
  fc.double({ min: Number.MIN_VALUE, max: 1e300, noNaN: true, noDefaultInfinity: true }),
);
const prefix = fc.stringMatching(/^[A-Za-z0-9][A-Za-z0-9_\-/+:]{0,12}$/);
const date = fc
  .record({
    y: fc.integer({ min: 1990, max: 2099 }),
    m: fc.integer({ min: 1, max: 12 }),
    d: fc.integer({ min: 1, max: 28 }),
  })
  .map(({ y, m, d }) => `${y}-${String(m).padStart(2, '0')}-${String(d).padStart(2, '0')}`);

const optional = <T>(arb: fc.Arbitrary<T>) => fc.option(arb, { nil: undefined });

// Kinds that functions need come up more often, so most models have loops, SIFs, alarms and devices.
const elementKind = fc.oneof(
  { arbitrary: fc.constantFrom(...ELEMENT_KINDS), weight: 3 },
  {
    arbitrary: fc.constantFrom(
      'transmitter',
      'controller',
      'logic-solver',
      'shutdown-valve',
      'solenoid',
      'operator',
      'console',
      'relief-valve',
    ),
    weight: 2,
  },
);

const elementSeed = fc.record({
  kind: elementKind,
  prefix,
  title: optional(text),
  linkMask: fc.nat({ max: 127 }),
  picks: fc.array(fc.nat(), { minLength: 1, maxLength: 3 }),
  variable: optional(fc.constantFrom(...VARIABLES)),
  system: fc.constantFrom(...SYSTEMS),
  failsTo: optional(fc.constantFrom(...FAIL_POSITIONS)),
  make: optional(text),
  model: optional(text),
  technology: optional(text),
  comments,
  trailing,
});

const functionSeed = fc.record({
  kind: fc.constantFrom(...FUNCTION_KINDS),
  prefix,
  title: optional(text),
  sensorPicks: fc.array(fc.nat(), { minLength: 1, maxLength: 3 }),
  finalPicks: fc.array(fc.nat(), { minLength: 1, maxLength: 2 }),
  pick: fc.nat(),
  m: fc.nat(),
  writeVoting: fc.boolean(),
  trip: optional(fc.constantFrom(...TRIP_ACTIONS)),
  tripMode: optional(fc.constantFrom(...TRIP_MODES)),
  sil: optional(fc.integer({ min: 1, max: 4 })),
  pfd: optional(probability),
  pfdBasis: optional(text),
  minutes: positive,
  withConsole: fc.boolean(),
  withFinals: fc.boolean(),
  creditBasis: optional(text),
  comments,
  trailing,
});

const claim = fc.record({
  pick: fc.nat(),
  pfd: optional(probability),
  basis: optional(text),
  acts: optional(fc.constantFrom(...ACTS)),
  comments,
  trailing,
});
const scenarioSeed = fc.record({
  prefix,
  title: optional(text),
  categoryPick: fc.nat(),
  causeKind: fc.constantFrom('function', 'element', 'external'),
  causePick: fc.nat(),
  narrow: fc.boolean(),
  external: text,
  frequency: fc.oneof(
    positive.map((f) => ({ frequency: f })),
    fc
      .constantFrom(...TYPICAL_CAUSES)
      .map((t) => (PIPING_ROWS.has(t) ? { typical: t, pipeMetres: 150 } : { typical: t })),
  ),
  causeBasis: optional(text),
  causeComments: comments,
  causeTrailing: trailing,
  enablers: optional(
    fc.array(fc.record({ title: text, probability, basis: optional(text), comments, trailing }), {
      minLength: 1,
      maxLength: 2,
    }),
  ),
  modifiers: optional(
    fc.array(
      fc.record({
        kind: fc.constantFrom(...MODIFIER_KINDS),
        title: optional(text),
        probability,
        basis: optional(text),
        comments,
        trailing,
      }),
      { minLength: 1, maxLength: 2 },
    ),
  ),
  layers: fc.array(claim, { maxLength: 3 }),
  comments,
  trailing,
});

const categorySeed = fc.record({
  prefix,
  title: optional(text),
  tolerable: positive,
  harm: fc.constantFrom(...HARMS),
  edge: optional(fc.constantFrom(...EDGES)),
  basis: optional(text),
  comments,
  trailing,
});

const pick = <T>(list: readonly T[], n: number): T | undefined => (list.length ? list[n % list.length] : undefined);
const pickMany = <T>(list: readonly T[], picks: readonly number[]): T[] => [
  ...new Set(picks.map((p) => list[p % list.length]!)),
];

function buildElements(seeds: Seed<typeof elementSeed>[]): Element[] {
  const out: Element[] = [];
  seeds.forEach((s, i) => {
    const group = groupOf(s.kind);
    const item: Loose = { kind: s.kind, tag: `${s.prefix}.E${i}`, title: s.title };
    if (group === 'sensor') Object.assign(item, { variable: s.variable });
    if (group === 'solver') item.system = s.system;
    if (group === 'final' || group === 'actuation') item.failsTo = s.failsTo;
    if (['sensor', 'signal', 'solver', 'final', 'actuation', 'support', 'mechanical'].includes(group)) {
      Object.assign(item, { make: s.make, model: s.model, technology: s.technology });
    }
    LINK_FIELDS.forEach((link, k) => {
      const allowed = LINK_TARGETS[link][group];
      if (!allowed || !(s.linkMask & (1 << k))) return;
      const kinds = SUPPORT_LINK_KINDS[link];
      const candidates = out
        .filter((e) => allowed.includes(groupOf(e.kind)) && (!kinds || kinds.includes(e.kind)))
        .map((e) => e.tag);
      if (candidates.length) item[link] = pickMany(candidates, s.picks);
    });
    Object.assign(item, { comments: s.comments, trailingComment: s.trailing });
    out.push(compact(item) as Element);
  });
  return out;
}

function tagsOf(elements: Element[], ...groups: ElementGroup[]): string[] {
  return elements.filter((e) => groups.includes(groupOf(e.kind))).map((e) => e.tag);
}

function voting(m: number, n: number): string {
  return `${(m % n) + 1}oo${n}`;
}

function buildFunctions(seeds: Seed<typeof functionSeed>[], elements: Element[]): PlantFunction[] {
  const sensors = tagsOf(elements, 'sensor');
  const solvers = tagsOf(elements, 'solver');
  const finals = tagsOf(elements, 'final', 'actuation');
  const operators = elements.filter((e) => e.kind === 'operator').map((e) => e.tag);
  const consoles = elements.filter((e) => e.kind === 'console').map((e) => e.tag);
  const devices = tagsOf(elements, 'mechanical');
  const out: PlantFunction[] = [];
  seeds.forEach((s, i) => {
    const common = { tag: `${s.prefix}.F${i}`, title: s.title };
    const claimed = { pfd: s.pfd, pfdBasis: s.pfdBasis };
    const tail = { comments: s.comments, trailingComment: s.trailing };
    let item: Loose | undefined;
    if (
      (s.kind === 'loop' || s.kind === 'sif' || s.kind === 'trip') &&
      sensors.length &&
      solvers.length &&
      finals.length
    ) {
      const ss = pickMany(sensors, s.sensorPicks);
      const ff = pickMany(finals, s.finalPicks);
      item = { kind: s.kind, ...common, sensors: ss, solver: pick(solvers, s.pick), finals: ff };
      if (s.kind !== 'loop') {
        Object.assign(item, {
          sensorVoting: ss.length > 1 || s.writeVoting ? voting(s.m, ss.length) : undefined,
          finalVoting: ff.length > 1 || s.writeVoting ? voting(s.m, ff.length) : undefined,
          trip: s.trip,
          tripMode: s.tripMode,
        });
        if (s.kind === 'sif') item.sil = s.sil;
      }
      Object.assign(item, claimed, tail);
    } else if (s.kind === 'alarm' && sensors.length && solvers.length && operators.length) {
      item = {
        kind: 'alarm',
        ...common,
        sensors: pickMany(sensors, s.sensorPicks),
        raisedIn: pick(solvers, s.pick),
        console: s.withConsole ? pick(consoles, s.pick) : undefined,
        operator: pick(operators, s.m),
        finals: s.withFinals && finals.length ? pickMany(finals, s.finalPicks) : undefined,
        minutes: s.minutes,
        ...claimed,
        ...tail,
      };
    } else if (s.kind === 'device' && devices.length) {
      item = {
        kind: 'device',
        ...common,
        device: pick(devices, s.pick),
        creditBasis: s.creditBasis,
        ...claimed,
        ...tail,
      };
    }
    if (item) out.push(compact(item) as PlantFunction);
  });
  return out;
}

function buildScenarios(
  seeds: Seed<typeof scenarioSeed>[],
  categories: string[],
  elements: Element[],
  functions: PlantFunction[],
): Scenario[] {
  return seeds.map((s, i) => {
    const cause: Loose = {
      ...s.frequency,
      basis: s.causeBasis,
      comments: s.causeComments,
      trailingComment: s.causeTrailing,
    };
    let causeFunction: string | undefined;
    if (s.causeKind === 'function' && functions.length) {
      causeFunction = pick(functions, s.causePick)!.tag;
      cause.function = causeFunction;
      if (s.narrow && elements.length) cause.only = pick(elements, s.causePick)!.tag;
    } else if (s.causeKind === 'element' && elements.length) {
      cause.element = pick(elements, s.causePick)!.tag;
    } else {
      cause.external = s.external;
    }
    const candidates = functions.map((f) => f.tag).filter((t) => t !== causeFunction);
    const layers = candidates.length
      ? [...new Map(s.layers.map((l) => [pick(candidates, l.pick)!, l])).entries()].map(([fn, l]) =>
          compact({
            function: fn,
            pfd: l.pfd,
            basis: l.basis,
            acts: l.acts,
            comments: l.comments,
            trailingComment: l.trailing,
          }),
        )
      : [];
    return compact({
      id: `${s.prefix}.S${i}`,
      title: s.title,
      category: pick(categories, s.categoryPick)!,
      cause: compact(cause),
      enablers: s.enablers?.map((e) =>
        compact({
          title: e.title,
          probability: e.probability,
          basis: e.basis,
          comments: e.comments,
          trailingComment: e.trailing,
        }),
      ),
      modifiers: s.modifiers?.map((m) =>
        compact({
          kind: m.kind,
          title: m.title,
          probability: m.probability,
          basis: m.basis,
          comments: m.comments,
          trailingComment: m.trailing,
        }),
      ),
      layers: layers.length ? layers : undefined,
      comments: s.comments,
      trailingComment: s.trailing,
    }) as Scenario;
  });
}

export const validModel: fc.Arbitrary<Model> = fc
  .record({
    site: fc.record({ name: text, description: optional(text), comments, trailing }),
    policy: optional(
      fc.record({
        sameControllerLayers: optional(
          fc.constantFrom('one-credit', 'both', 'none') as fc.Arbitrary<'one-credit' | 'both' | 'none'>,
        ),
        sharedSolver: optional(fc.constantFrom('void', 'allow') as fc.Arbitrary<'void' | 'allow'>),
        minResponseMinutes: optional(positive),
        presenceLimit: optional(probability),
        basis: optional(text),
        comments,
        trailing,
      }),
    ),
    categories: fc.array(categorySeed, { minLength: 1, maxLength: 3 }),
    rules: optional(
      fc.array(
        fc.record({
          id: fc.constantFrom(...RULE_IDS),
          severity: fc.constantFrom(...SEVERITIES),
          reason: optional(text),
          comments,
          trailing,
        }),
        { minLength: 1, maxLength: 2 },
      ),
    ),
    elements: fc.array(elementSeed, { minLength: 8, maxLength: 30 }),
    functions: fc.array(functionSeed, { minLength: 2, maxLength: 8 }),
    scenarios: fc.array(scenarioSeed, { maxLength: 4 }),
    justifications: optional(
      fc.array(fc.record({ finding: text, by: text, date, reason: text, comments, trailing }), {
        minLength: 1,
        maxLength: 2,
      }),
    ),
    endComments: comments,
  })
  .map((seed): Model => {
    const elements = buildElements(seed.elements);
    const functions = buildFunctions(seed.functions, elements);
    const categories = seed.categories.map((c, i) =>
      compact({
        id: `${c.prefix}.C${i}`,
        title: c.title,
        tolerable: c.tolerable,
        harm: c.harm,
        edge: c.edge,
        basis: c.basis,
        comments: c.comments,
        trailingComment: c.trailing,
      }),
    );
    const trailingAs = <T extends { trailing?: string | undefined }>({ trailing: t, ...rest }: T) =>
      compact({ ...rest, trailingComment: t });
    return compact({
      site: trailingAs(seed.site),
      policy: seed.policy && trailingAs(seed.policy),
      categories,
      rules: seed.rules?.map(trailingAs),
      elements,
      functions,
      scenarios: buildScenarios(
        seed.scenarios,
        categories.map((c) => c.id),
        elements,
        functions,
      ),
      justifications: seed.justifications?.map(trailingAs),
      endComments: seed.endComments,
    }) as unknown as Model;
  });

/** Kinds of element group, for a test that the generator reaches every group. */
export const ALL_GROUPS = Object.keys(ELEMENT_GROUPS) as ElementGroup[];
