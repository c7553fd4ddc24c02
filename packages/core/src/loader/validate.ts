// Checks beyond the schema: tags, references and their kinds, cycles, numbers in range, voting,
// and the shape of each scenario. Every problem is reported, each at the narrowest span we have.
import { error, type Diagnostic, type Span } from '../diagnostics/diagnostic.ts';
import {
  ELEMENT_GROUPS,
  groupOf,
  LINK_FIELDS,
  LINK_TARGETS,
  SUPPORT_LINK_KINDS,
  type ElementGroup,
} from '../model/kinds.ts';
import {
  PER_100_M_ROWS,
  TAG_MAX_LENGTH,
  TAG_PATTERN,
  type Element,
  type Model,
  type PlantFunction,
  type Scenario,
} from '../model/schema.ts';
import type { SpanMap } from '../bulk/to-model.ts';
import { didYouMean, Suggester } from '../util/suggest.ts';
import type { FieldNamer } from './schema-issues.ts';
import { spanAt } from './schema-issues.ts';
import { findCycles, longestChain, MAX_DEPENDENCY_DEPTH } from './cycles.ts';
import { ALL_RULE_IDS } from '../catalogue/catalogue.ts';
import { checkFailureData } from './failure-data.ts';

const KNOWN_RULE_IDS = ALL_RULE_IDS;

export interface Origins {
  elements: number[];
  functions: number[];
  scenarios: number[];
  categories: number[];
}

export interface ValidationInput {
  model: Model;
  spans: SpanMap;
  name: FieldNamer;
  origins: Origins;
  /** Tags of items that failed the schema, so references to them are not reported as unknown. */
  brokenTags: Set<string>;
  /** Ids of categories that failed the schema, so scenarios naming them are not reported too. */
  brokenCategories: Set<string>;
}

type Kindish = { kind: 'element'; element: Element } | { kind: 'function'; fn: PlantFunction };
/** A path, or how to make it: the hot loops pass a function, so a path string is built only for a diagnostic. */
type PathRef = string | (() => string);

class Validator {
  readonly diagnostics: Diagnostic[] = [];
  private readonly byTag = new Map<string, Kindish>();
  /** Built on the first unknown reference, once every tag is known. */
  private tagSuggester: Suggester | undefined;
  private categoryIds: Set<string> | undefined;
  private categorySuggester: Suggester | undefined;

  constructor(private readonly input: ValidationInput) {}

  private span(ref: PathRef): Span | undefined {
    const path = typeof ref === 'string' ? ref : ref();
    return spanAt(
      this.input.spans,
      path.split('.').map((p) => (/^\d+$/.test(p) ? Number(p) : p)),
    );
  }

  private push(code: Diagnostic['code'], message: string, path: PathRef, extra: Partial<Diagnostic> = {}): void {
    this.diagnostics.push(error(code, message, this.span(path), extra));
  }

  private path(collection: keyof Origins, index: number, ...rest: (string | number)[]): string {
    return [collection, this.input.origins[collection][index], ...rest].join('.');
  }

  run(): Diagnostic[] {
    this.checkTagsAndDuplicates();
    this.checkElementLinks();
    this.checkCycles();
    this.input.model.functions.forEach((fn, i) => this.checkFunction(fn, i));
    this.checkCategoriesAndPolicy();
    this.input.model.scenarios.forEach((_, i) => this.checkScenario(i));
    this.checkJustifications();
    this.checkRuleSettings();
    checkFailureData(this.input.model, (code, message, path, extra) => this.push(code, message, path, extra));
    return this.diagnostics;
  }

  private checkTag(tag: string, path: PathRef, what: string): void {
    if (tag.length > TAG_MAX_LENGTH) {
      this.push('BH312', `${what} is ${tag.length} characters long; the limit is ${TAG_MAX_LENGTH}`, path, {
        help: 'use a short plant tag such as LT-101 and put the description in title="..."',
      });
    } else if (!TAG_PATTERN.test(tag)) {
      this.push('BH313', `${what} \`${tag}\` has characters not allowed in a tag`, path, {
        help: 'a tag starts with a letter or digit and uses letters, digits and _ . - / + : only',
      });
    }
  }

  private checkTagsAndDuplicates(): void {
    const { model } = this.input;
    const firstPath = new Map<string, PathRef>();
    const claim = (tag: string, path: PathRef, entry: Kindish | undefined, what: string) => {
      this.checkTag(tag, path, what);
      const earlier = firstPath.get(tag);
      if (earlier !== undefined) {
        const related = this.span(earlier);
        this.push('BH301', `${what} \`${tag}\` is defined twice`, path, {
          ...(related ? { related: [{ message: 'first defined here', span: related }] } : {}),
          help: 'every element and function needs its own tag',
        });
        return;
      }
      firstPath.set(tag, path);
      if (entry) this.byTag.set(tag, entry);
    };
    model.elements.forEach((element, i) =>
      claim(element.tag, () => this.path('elements', i, 'tag'), { kind: 'element', element }, 'tag'),
    );
    model.functions.forEach((fn, i) =>
      claim(fn.tag, () => this.path('functions', i, 'tag'), { kind: 'function', fn }, 'tag'),
    );
    firstPath.clear();
    model.scenarios.forEach((s, i) => claim(s.id, this.path('scenarios', i, 'id'), undefined, 'scenario id'));
    firstPath.clear();
    model.categories.forEach((c, i) => claim(c.id, this.path('categories', i, 'id'), undefined, 'category id'));
  }

  private unknown(tag: string, path: PathRef, field: string): void {
    if (this.input.brokenTags.has(tag)) return;
    this.push('BH300', `unknown tag \`${tag}\` in \`${this.input.name(field)}\``, path, {
      help:
        (this.tagSuggester ??= new Suggester(this.byTag.keys())).didYouMean(tag) ??
        'define it as an element or function, or check the spelling',
    });
  }

  /** Resolves a reference to an element; reports unknown tags and functions named where an element is needed. */
  private element(tag: string, path: PathRef, field: string): Element | undefined {
    const entry = this.byTag.get(tag);
    if (!entry) {
      this.unknown(tag, path, field);
      return undefined;
    }
    if (entry.kind === 'function') {
      this.push(
        'BH302',
        `\`${tag}\` is a ${entry.fn.kind} function; \`${this.input.name(field)}\` needs an element`,
        path,
      );
      return undefined;
    }
    return entry.element;
  }

  private checkElementLinks(): void {
    this.input.model.elements.forEach((element, i) => {
      const group = groupOf(element.kind);
      for (const link of LINK_FIELDS) {
        // Most elements declare two or three of the seven links: skip the rest without allocating.
        const targets = element[link];
        if (targets === undefined) continue;
        targets.forEach((tag, j) => {
          const path = () => this.path('elements', i, link, j);
          const target = this.element(tag, path, link);
          if (!target) return;
          const allowed = LINK_TARGETS[link][group];
          const kinds = SUPPORT_LINK_KINDS[link];
          const ok = allowed?.includes(groupOf(target.kind)) && (!kinds || kinds.includes(target.kind));
          if (!ok) {
            this.push(
              'BH302',
              `\`${element.tag}\` (${element.kind}) cannot be linked by \`${this.input.name(link)}\` to \`${tag}\` (${target.kind})`,
              path,
              {
                help: allowed
                  ? `\`${this.input.name(link)}\` on a ${element.kind} takes ${(kinds ?? allowed).join(', ')}`
                  : `a ${element.kind} has no \`${this.input.name(link)}\` link`,
              },
            );
          }
        });
      }
    });
  }

  private checkCycles(): void {
    const { elements } = this.input.model;
    const indexOf = new Map(elements.map((e, i) => [e.tag, i]));
    const edges = elements.map((e) => {
      const out: number[] = [];
      for (const link of LINK_FIELDS) {
        for (const t of e[link] ?? []) {
          const target = indexOf.get(t);
          if (target !== undefined) out.push(target);
        }
      }
      return out;
    });
    const cycles = findCycles(edges);
    if (cycles.length === 0) this.checkDepth(edges);
    for (const cycle of cycles) {
      const tags = cycle.map((i) => elements[i]!.tag);
      this.push(
        'BH303',
        `dependency cycle: ${[...tags, tags[0]].map((t) => `\`${t}\``).join(' -> ')}`,
        this.path('elements', cycle[0]!, 'tag'),
        {
          help: 'links point from an element to what it relies on; one of these links runs the wrong way',
        },
      );
    }
  }

  /** One diagnostic, at the element that starts the longest chain, when it is deeper than the limit. */
  private checkDepth(edges: readonly (readonly number[])[]): void {
    const { deepest, depth } = longestChain(edges);
    if (depth <= MAX_DEPENDENCY_DEPTH) return;
    const tag = this.input.model.elements[deepest]!.tag;
    this.push(
      'BH107',
      `\`${tag}\` relies on a chain of ${depth} links, one through the next; the limit is ${MAX_DEPENDENCY_DEPTH}`,
      this.path('elements', deepest, 'tag'),
      {
        help: 'a real chain (transmitter, cable, junction box, I/O card, controller, circuit, UPS) is a few links long; link each element to what it relies on directly',
      },
    );
  }

  private role(
    fnIndex: number,
    field: string,
    tags: readonly string[],
    groups: ElementGroup[],
    kinds?: readonly string[],
  ): void {
    tags.forEach((tag, j) => {
      const path = () => this.path('functions', fnIndex, field, ...(tags.length > 1 || field.endsWith('s') ? [j] : []));
      const element = this.element(tag, path, field);
      if (!element) return;
      if (!groups.includes(groupOf(element.kind)) || (kinds && !kinds.includes(element.kind))) {
        const wanted = kinds ?? groups.flatMap((g) => ELEMENT_GROUPS[g]);
        this.push(
          'BH315',
          `\`${tag}\` is a ${element.kind}; \`${this.input.name(field)}\` needs a ${wanted.join(' or ')}`,
          path,
        );
      }
    });
  }

  private voting(
    fnIndex: number,
    field: 'sensorVoting' | 'finalVoting',
    voting: string | undefined,
    channels: number,
  ): void {
    const list = field === 'sensorVoting' ? 'sensors' : 'finals';
    const path = this.path('functions', fnIndex, voting === undefined ? list : field);
    if (voting === undefined) {
      if (channels > 1) {
        this.push(
          'BH306',
          `${channels} channels in \`${this.input.name(list)}\` but no \`${this.input.name(field)}\``,
          path,
          {
            help: `say how they vote, e.g. ${this.input.name(field)}=1oo${channels}`,
          },
        );
      }
      return;
    }
    const match = /^(\d+)oo(\d+)(D?)$/.exec(voting);
    if (!match || (match[3] === 'D' && voting !== '1oo2D')) {
      this.push('BH306', `\`${voting}\` is not MooN voting`, path, {
        help: 'write M out of N as MooN, e.g. 1oo2 or 2oo3 (1oo2D for a pair with diagnostics)',
      });
      return;
    }
    const m = Number(match[1]);
    const n = Number(match[2]);
    if (m < 1 || m > n) {
      this.push('BH306', `voting ${voting} needs M between 1 and N`, path, {
        help: `MooN means M of the N channels must act; M=${m} cannot exceed N=${n}`,
      });
    } else if (n !== channels) {
      this.push(
        'BH306',
        `voting ${voting} names ${n} channels but \`${this.input.name(list)}\` has ${channels}`,
        path,
        {
          help: `list ${n} tags in \`${this.input.name(list)}\`, or vote ${m <= channels ? `${m}oo${channels}` : `1oo${channels}`}`,
        },
      );
    }
  }

  private probability(value: number | undefined, path: PathRef, what: string): void {
    if (value === undefined) return;
    if (!(Number.isFinite(value) && value > 0 && value <= 1)) {
      this.push('BH304', `${what} ${value} is outside (0, 1]`, path, {
        help: 'a probability is above 0 and at most 1',
      });
    }
  }

  private positive(value: number | undefined, path: PathRef, what: string): void {
    if (value === undefined) return;
    if (!(Number.isFinite(value) && value > 0)) {
      this.push('BH305', `${what} ${value} must be positive and finite`, path, {
        help: 'frequencies are events per year and times are minutes, both above 0; leave out what does not apply',
      });
    }
  }

  private checkFunction(fn: PlantFunction, i: number): void {
    this.probability(fn.pfd, () => this.path('functions', i, 'pfd'), 'PFD');
    switch (fn.kind) {
      case 'loop':
        this.role(i, 'sensors', fn.sensors, ['sensor']);
        this.role(i, 'solver', [fn.solver], ['solver']);
        this.role(i, 'finals', fn.finals, ['final', 'actuation']);
        return;
      case 'sif':
      case 'trip':
        this.role(i, 'sensors', fn.sensors, ['sensor']);
        this.role(i, 'solver', [fn.solver], ['solver']);
        this.role(i, 'finals', fn.finals, ['final', 'actuation']);
        this.voting(i, 'sensorVoting', fn.sensorVoting, fn.sensors.length);
        this.voting(i, 'finalVoting', fn.finalVoting, fn.finals.length);
        if (fn.kind === 'sif' && fn.sil !== undefined && !(Number.isInteger(fn.sil) && fn.sil >= 1 && fn.sil <= 4)) {
          this.push('BH316', `SIL ${fn.sil} is not one of 1, 2, 3, 4`, this.path('functions', i, 'sil'));
        }
        if (fn.kind === 'sif') this.positive(fn.pfh, this.path('functions', i, 'pfh'), 'PFH');
        return;
      case 'alarm':
        this.role(i, 'sensors', fn.sensors, ['sensor']);
        this.role(i, 'raisedIn', [fn.raisedIn], ['solver']);
        if (fn.console !== undefined) this.role(i, 'console', [fn.console], ['people'], ['console']);
        this.role(i, 'operator', [fn.operator], ['people'], ['operator']);
        this.role(i, 'finals', fn.finals ?? [], ['final', 'actuation']);
        this.positive(fn.minutes, this.path('functions', i, 'minutes'), 'time available');
        return;
      case 'device':
        this.role(i, 'device', [fn.device], ['mechanical']);
        return;
    }
  }

  private checkCategoriesAndPolicy(): void {
    const { model } = this.input;
    model.categories.forEach((c, i) =>
      this.positive(c.tolerable, this.path('categories', i, 'tolerable'), 'tolerable frequency'),
    );
    const policy = model.policy;
    if (policy?.minResponseMinutes !== undefined)
      this.positive(policy.minResponseMinutes, 'policy.minResponseMinutes', 'minimum response time');
    this.probability(policy?.presenceLimit, 'policy.presenceLimit', 'presence limit');
    const creditLimit = policy?.conditionCreditLimit;
    if (creditLimit !== undefined && !(Number.isFinite(creditLimit) && creditLimit >= 1)) {
      this.push('BH332', `condition credit limit ${creditLimit} is below 1`, 'policy.conditionCreditLimit', {
        help: 'the limit is a factor of risk reduction: 1 allows no credit, 100 allows two orders of magnitude',
      });
    }
  }

  private checkScenario(i: number): void {
    const { model, name } = this.input;
    const scenario = model.scenarios[i]!;
    const at = (...rest: (string | number)[]) => this.path('scenarios', i, ...rest);
    this.categoryIds ??= new Set(model.categories.map((c) => c.id));
    if (!this.categoryIds.has(scenario.category) && !this.input.brokenCategories.has(scenario.category)) {
      this.push('BH311', `unknown consequence category \`${scenario.category}\``, at('category'), {
        help:
          (this.categorySuggester ??= new Suggester(this.categoryIds)).didYouMean(scenario.category) ??
          'define it with a `category` statement',
      });
    }
    const cause = scenario.cause;
    const named = [cause.function, cause.element, cause.external].filter((v) => v !== undefined).length;
    if (named !== 1) {
      this.push(
        'BH314',
        named === 0
          ? 'the cause names no function, element or external event'
          : 'the cause names more than one of function, element and external',
        at('cause'),
        {
          help: 'write one of: cause function=LIC-101, cause element=P-101A, cause external="..."',
        },
      );
    }
    let causeFunction: PlantFunction | undefined;
    if (cause.function !== undefined) {
      const entry = this.byTag.get(cause.function);
      if (!entry) this.unknown(cause.function, at('cause', 'function'), 'function');
      else if (entry.kind === 'element') {
        this.push(
          'BH315',
          `\`${cause.function}\` is an element; \`${name('function')}\` names a function`,
          at('cause', 'function'),
          {
            help: `write cause element=${cause.function}`,
          },
        );
      } else causeFunction = entry.fn;
    }
    if (cause.element !== undefined) this.element(cause.element, at('cause', 'element'), 'element');
    if (cause.only !== undefined) {
      if (cause.function === undefined)
        this.push(
          'BH314',
          `\`${name('only')}\` narrows a function cause; this cause names no function`,
          at('cause', 'only'),
        );
      this.element(cause.only, at('cause', 'only'), 'only');
    }
    if (cause.frequency === undefined && cause.typical === undefined) {
      this.push('BH310', 'the cause has no frequency', at('cause'), {
        help: 'add frequency=0.1 (per year) with basis="...", or typical=bpcs-loop-failure to use the default table',
      });
    } else if (cause.frequency !== undefined && cause.typical !== undefined) {
      this.push('BH310', 'the cause gives both a frequency and a typical value', at('cause', 'typical'), {
        help: 'keep one of them',
      });
    }
    this.positive(cause.frequency, at('cause', 'frequency'), 'frequency');
    this.checkPipeLength(cause, at);
    (scenario.enablers ?? []).forEach((e, j) =>
      this.probability(e.probability, at('enablers', j, 'probability'), 'probability'),
    );
    (scenario.modifiers ?? []).forEach((m, j) =>
      this.probability(m.probability, at('modifiers', j, 'probability'), 'probability'),
    );
    const claimed = new Map<string, number>();
    (scenario.layers ?? []).forEach((layer, j) => {
      const path = at('layers', j, 'function');
      this.probability(layer.pfd, at('layers', j, 'pfd'), 'PFD');
      const entry = this.byTag.get(layer.function);
      if (!entry) return this.unknown(layer.function, path, 'function');
      if (entry.kind === 'element') {
        return this.push('BH307', `layer \`${layer.function}\` is a ${entry.element.kind}, not a function`, path, {
          help: 'claim a function (sif, trip, alarm, device or loop) that uses it, e.g. `device PSV-1-IPL device=...`',
        });
      }
      const first = claimed.get(layer.function);
      if (first !== undefined) {
        const related = this.span(at('layers', first, 'function'));
        return this.push('BH308', `\`${layer.function}\` is claimed twice in scenario \`${scenario.id}\``, path, {
          ...(related ? { related: [{ message: 'first claimed here', span: related }] } : {}),
        });
      }
      claimed.set(layer.function, j);
      if (causeFunction && causeFunction.tag === layer.function) {
        this.push('BH309', `\`${layer.function}\` fails in the cause and cannot also protect against it`, path);
      }
    });
  }

  /** The piping rows of the typical table are per 100 m of pipe (CCPS 2001 Table 5.1): without a length they mean nothing. */
  private checkPipeLength(cause: Scenario['cause'], at: (...rest: (string | number)[]) => PathRef): void {
    const { name } = this.input;
    const piping = cause.typical !== undefined && PER_100_M_ROWS.has(cause.typical);
    if (piping && cause.pipeMetres === undefined) {
      this.push(
        'BH330',
        `\`${name('typical')}=${cause.typical}\` is per 100 m of pipe; the cause gives no length`,
        at('cause', 'typical'),
        {
          help: `add ${name('pipeMetres')}=250 (the metres of pipe the scenario covers), or give frequency= with its basis`,
        },
      );
    } else if (!piping && cause.pipeMetres !== undefined) {
      this.push(
        'BH331',
        `\`${name('pipeMetres')}\` scales only the per-100 m piping rows of \`${name('typical')}\``,
        at('cause', 'pipeMetres'),
        {
          help: `use it with ${name('typical')}=piping-leak or piping-breach, or leave it out`,
        },
      );
    }
    this.positive(cause.pipeMetres, at('cause', 'pipeMetres'), 'pipe length');
  }

  private checkRuleSettings(): void {
    (this.input.model.rules ?? []).forEach((rule, i) => {
      if (!KNOWN_RULE_IDS.has(rule.id)) {
        this.push('BH319', `unknown rule \`${rule.id}\``, `rules.${i}.id`, {
          help: didYouMean(rule.id, KNOWN_RULE_IDS) ?? 'the rule set in force is listed in every report',
        });
      }
    });
  }

  private checkJustifications(): void {
    (this.input.model.justifications ?? []).forEach((j, i) => {
      if (!/^\d{4}-\d{2}-\d{2}$/.test(j.date))
        this.push('BH317', `date \`${j.date}\` is not YYYY-MM-DD`, `justifications.${i}.date`);
    });
  }
}

export function validateModel(input: ValidationInput): Diagnostic[] {
  return new Validator(input).run();
}
