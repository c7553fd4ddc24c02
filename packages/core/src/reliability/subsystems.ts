// Splits a SIF's trace into the three subsystems of a verification (sensors, logic solver, final elements)
// and computes each: the channels of a voted group, the elements they share (a single point in series with
// the group), and the elements the calculation cannot count.
import type { ElementGroup } from '../model/kinds.ts';
import type { FunctionKindOf, Subsystem } from '../model/schema.ts';
import type { Tracer } from '../trace/trace.ts';
import { ANNEX_B, equationFor, groupPfd, groupPfh, type Architecture, type Equation } from './annex-b.ts';
import {
  FailureDataIndex,
  groupFigures,
  inSeries,
  sameChannels,
  worstChannel,
  type ElementFigures,
} from './figures.ts';

/** Which element groups each subsystem counts. Signal paths (I/O cards) belong to the logic solver (issue 16, item 6). */
const MEMBERS: Record<Subsystem, ReadonlySet<ElementGroup>> = {
  sensors: new Set(['sensor', 'connection', 'impulse']),
  solver: new Set(['solver', 'signal']),
  finals: new Set(['final', 'actuation']),
};

/**
 * Common-cause factors used where a voted group has none in the model: the top of the ranges of IEC 61508-6
 * Annex D (field devices 1% to 10%; from memory), with betaD at half of beta as Annex B's tables take it.
 */
export const DEFAULT_BETA = 0.1;
export const BETA_D_SHARE = 0.5;

export interface Contribution {
  tag: string;
  pfd: number;
  pfh: number;
}

export interface SubsystemResult {
  subsystem: Subsystem;
  architecture: string;
  /** Each channel's head and the elements with figures that only it relies on. */
  channels: { head: string; elements: string[] }[];
  /** Elements with figures that two or more channels rely on: in series with the group. */
  shared: Contribution[];
  /** Elements every channel relies on that have no failure data: the figure leaves them out. */
  sharedWithoutData: string[];
  /** Elements of this subsystem in the trace with no failure data (not shared). */
  withoutData: string[];
  /** What stops the subsystem being computed: a channel head with no figures, a rate with no proof-test interval. */
  missing: { tag: string; why: string }[];
  equation?: Equation;
  /** The voted group alone, and the total with the shared elements in series. */
  groupPfd?: number;
  groupPfh?: number;
  pfd?: number;
  pfh?: number;
  beta?: { beta: number; betaD: number; basis?: string; fromDefault: boolean };
  hft: number;
  inputs: ElementFigures[];
  notes: string[];
}

type Sif = FunctionKindOf<'sif'>;

function parseVoting(voting: string | undefined, channels: number): Architecture | undefined {
  if (voting === undefined) return channels === 1 ? { m: 1, n: 1 } : undefined;
  const match = /^(\d+)oo(\d+)(D?)$/.exec(voting);
  return match ? { m: Number(match[1]), n: Number(match[2]), ...(match[3] ? { diagnostic: true } : {}) } : undefined;
}

/** A dangerous undetected rate with no proof-test interval cannot be averaged: the element is not computable. */
function untested(figures: ElementFigures): boolean {
  return figures.lambdaDu > 0 && figures.t1Effective === undefined;
}

const NO_INTERVAL = 'gives a dangerous undetected rate but no proof-test interval';

function pfdOf(figures: ElementFigures): Contribution {
  const f = groupFigures(inSeries([figures]), 0, 0);
  return { tag: figures.tag, pfd: groupPfd({ m: 1, n: 1 }, f)!, pfh: groupPfh({ m: 1, n: 1 }, f)! };
}

export class SubsystemCalculator {
  constructor(
    private readonly tracer: Tracer,
    private readonly data: FailureDataIndex,
  ) {}

  private members(elements: readonly string[], subsystem: Subsystem): string[] {
    return elements.filter((t) => MEMBERS[subsystem].has(this.tracer.group(t)!));
  }

  /** A voted group of sensors or final elements. */
  votedGroup(sif: Sif, subsystem: 'sensors' | 'finals'): SubsystemResult {
    const role = subsystem === 'sensors' ? 'sensor' : 'final';
    const channels = this.tracer.traceFunction(sif.tag).channels.filter((c) => c.role === role);
    const voting = subsystem === 'sensors' ? sif.sensorVoting : sif.finalVoting;
    const architecture = parseVoting(voting, channels.length);
    const counts = new Map<string, number>();
    const perChannel = channels.map((c) => this.members(c.elements, subsystem));
    for (const list of perChannel) for (const t of list) counts.set(t, (counts.get(t) ?? 0) + 1);
    const isShared = (t: string) => channels.length > 1 && (counts.get(t) ?? 0) > 1;
    const result: SubsystemResult = {
      subsystem,
      architecture: voting ?? '1oo1',
      channels: [],
      shared: [],
      sharedWithoutData: [],
      withoutData: [],
      missing: [],
      hft: architecture ? architecture.n - architecture.m : 0,
      inputs: [],
      notes: [],
    };
    const inputs = new Map<string, ElementFigures>();
    const channelFigures = channels.map((c, i) => {
      const own = perChannel[i]!.filter((t) => !isShared(t));
      const figures = own.map((t) => this.data.figuresFor(t)).filter((f): f is ElementFigures => f !== undefined);
      for (const f of figures) {
        inputs.set(f.tag, f);
        if (untested(f)) result.missing.push({ tag: f.tag, why: NO_INTERVAL });
      }
      if (this.data.figuresFor(c.head) === undefined) result.missing.push({ tag: c.head, why: 'has no failure data' });
      result.withoutData.push(...own.filter((t) => this.data.figuresFor(t) === undefined && t !== c.head));
      result.channels.push({ head: c.head, elements: figures.map((f) => f.tag) });
      return inSeries(figures);
    });
    for (const tag of [...counts.keys()].filter(isShared).sort()) {
      const figures = this.data.figuresFor(tag);
      if (figures === undefined) result.sharedWithoutData.push(tag);
      else {
        inputs.set(tag, figures);
        if (untested(figures)) result.missing.push({ tag, why: NO_INTERVAL });
        else result.shared.push(pfdOf(figures));
      }
    }
    result.inputs = [...inputs.values()].sort((a, b) => (a.tag < b.tag ? -1 : a.tag > b.tag ? 1 : 0));
    result.withoutData.sort();
    if (architecture === undefined) {
      result.notes.push(`no voting given for ${channels.length} channels: not computed`);
      return result;
    }
    const equation = equationFor(architecture);
    if (equation === undefined) {
      result.notes.push(
        `${ANNEX_B} gives no simplified equation for ${voting}: not computed (use a fault tree or Markov model)`,
      );
      return result;
    }
    result.equation = equation;
    if (result.missing.length) return result;
    if (channels.length > 1 && architecture.m < architecture.n) result.beta = this.betaOf(sif.tag, subsystem);
    const beta = result.beta ?? { beta: 0, betaD: 0 };
    if (!sameChannels(channelFigures))
      result.notes.push('channels differ: computed with the largest of each figure among them (conservative)');
    const group = groupFigures(worstChannel(channelFigures), beta.beta, beta.betaD);
    result.groupPfd = groupPfd(architecture, group)!;
    result.groupPfh = groupPfh(architecture, group)!;
    result.pfd = result.groupPfd + result.shared.reduce((s, c) => s + c.pfd, 0);
    result.pfh = result.groupPfh + result.shared.reduce((s, c) => s + c.pfh, 0);
    return result;
  }

  private betaOf(fn: string, subsystem: Subsystem): NonNullable<SubsystemResult['beta']> {
    const row = this.data.commonCauseOf(fn, subsystem);
    if (row === undefined) return { beta: DEFAULT_BETA, betaD: DEFAULT_BETA * BETA_D_SHARE, fromDefault: true };
    return {
      beta: row.beta,
      betaD: row.betaD ?? row.beta * BETA_D_SHARE,
      ...(row.basis !== undefined ? { basis: row.basis } : {}),
      fromDefault: false,
    };
  }

  /**
   * The logic solver and every signal element (I/O card, cable, network) the SIF's channels rely on, each
   * a single point in series: an I/O card two channels share is counted here once, not as a sensor common
   * cause. Cards of separate channels are counted in series too, which is conservative.
   */
  solver(sif: Sif): SubsystemResult {
    const trace = this.tracer.traceFunction(sif.tag);
    const tags = new Set<string>([sif.solver]);
    for (const c of trace.channels) for (const t of this.members(c.elements, 'solver')) tags.add(t);
    const sorted = [...tags].sort();
    const result: SubsystemResult = {
      subsystem: 'solver',
      architecture: '1oo1',
      channels: [],
      shared: [],
      sharedWithoutData: [],
      withoutData: [],
      missing: [],
      hft: this.data.figuresFor(sif.solver)?.hft ?? 0,
      inputs: [],
      notes: [],
      equation: equationFor({ m: 1, n: 1 })!,
    };
    const counted: Contribution[] = [];
    for (const tag of sorted) {
      const figures = this.data.figuresFor(tag);
      if (figures === undefined) {
        if (tag === sif.solver) result.missing.push({ tag, why: 'has no failure data' });
        else result.withoutData.push(tag);
        continue;
      }
      result.inputs.push(figures);
      if (untested(figures)) {
        result.missing.push({ tag, why: NO_INTERVAL });
        continue;
      }
      counted.push(pfdOf(figures));
      const users = trace.channels.filter((c) => c.elements.includes(tag)).map((c) => c.head);
      if (tag !== sif.solver && users.length > 1)
        result.notes.push(`${tag} serves ${users.join(', ')}: counted once here, in series with the logic solver`);
    }
    result.channels = counted.map((c) => ({ head: c.tag, elements: [c.tag] }));
    if (result.missing.length) return result;
    result.pfd = counted.reduce((s, c) => s + c.pfd, 0);
    result.pfh = counted.reduce((s, c) => s + c.pfh, 0);
    return result;
  }
}
