// Failure figures per element, from the model's failure-data rows: a row for the element wins over a row
// for its make and model. Elements in series combine into one channel; channels of a voted group into the
// figures the Annex B equations take.
import type { CommonCause, Element, FailureData, Model, Subsystem } from '../model/schema.ts';
import { effectiveInterval, type GroupFigures } from './annex-b.ts';

/** Annex B's tables take MTTR = MRT = 8 h; a row that gives none is computed with it (and says so). */
export const DEFAULT_MTTR_HOURS = 8;

/** Where a figure came from, for the inputs table: the row, its basis, and figures filled by default. */
export interface ElementFigures {
  tag: string;
  row: string;
  lambdaDu: number;
  lambdaDd: number;
  lambdaSd: number;
  /** Proof-test interval as given, hours; undefined when the row gives none. */
  t1?: number;
  /** Interval used, extended for imperfect proof-test coverage. */
  t1Effective?: number;
  coverage: number;
  missionHours?: number;
  mttr: number;
  hft: number;
  basis?: string;
  testBasis?: string;
  /** Figures taken by default, in words (mttr 8 h, coverage 100%). */
  defaults: string[];
}

export class FailureDataIndex {
  private readonly byElement = new Map<string, FailureData>();
  private readonly byMakeModel = new Map<string, FailureData>();
  private readonly elements: Map<string, Element>;

  constructor(private readonly model: Model) {
    for (const row of model.failureData ?? []) {
      if (row.element !== undefined) this.byElement.set(row.element, row);
      else if (row.make !== undefined && row.model !== undefined)
        this.byMakeModel.set(`${row.make}\u0000${row.model}`, row);
    }
    this.elements = new Map(model.elements.map((e) => [e.tag, e]));
  }

  rowFor(tag: string): FailureData | undefined {
    const own = this.byElement.get(tag);
    if (own) return own;
    const e = this.elements.get(tag);
    if (e === undefined || !('make' in e) || e.make === undefined || !('model' in e) || e.model === undefined)
      return undefined;
    return this.byMakeModel.get(`${e.make}\u0000${e.model}`);
  }

  figuresFor(tag: string): ElementFigures | undefined {
    const row = this.rowFor(tag);
    if (row === undefined) return undefined;
    const lambdaD = row.lambdaD ?? 0;
    const dc = row.dc ?? 0;
    const defaults: string[] = [];
    const coverage = row.proofTestCoverage ?? 1;
    if (row.proofTestCoverage === undefined) defaults.push('proof-test coverage 100%');
    const mttr = row.mttrHours ?? DEFAULT_MTTR_HOURS;
    if (row.mttrHours === undefined) defaults.push(`MTTR ${DEFAULT_MTTR_HOURS} h`);
    return {
      tag,
      row: row.id,
      lambdaDu: row.lambdaDu ?? lambdaD * (1 - dc),
      lambdaDd: row.lambdaDd ?? lambdaD * dc,
      lambdaSd: row.lambdaSd ?? 0,
      ...(row.proofTestHours !== undefined
        ? { t1: row.proofTestHours, t1Effective: effectiveInterval(row.proofTestHours, coverage, row.missionHours) }
        : {}),
      coverage,
      ...(row.missionHours !== undefined ? { missionHours: row.missionHours } : {}),
      mttr,
      hft: row.hft ?? 0,
      ...(row.basis !== undefined ? { basis: row.basis } : {}),
      ...(row.testBasis !== undefined ? { testBasis: row.testBasis } : {}),
      defaults,
    };
  }

  commonCauseOf(fn: string, group: Subsystem): CommonCause | undefined {
    return (this.model.commonCauses ?? []).find((c) => c.function === fn && c.group === group);
  }
}

/** The figures of one channel: the elements in series that only it relies on. */
export interface ChannelFigures {
  lambdaDu: number;
  lambdaDd: number;
  lambdaSd: number;
  t1: number;
  mttr: number;
}

/**
 * Elements in series: rates add; the interval and repair time are rate-weighted means, which keeps the
 * one-channel PFD exact (sum of lambdaDU (T1/2 + MRT) + lambdaDD MTTR over the elements).
 */
export function inSeries(parts: readonly ElementFigures[]): ChannelFigures {
  const lambdaDu = parts.reduce((s, p) => s + p.lambdaDu, 0);
  const lambdaDd = parts.reduce((s, p) => s + p.lambdaDd, 0);
  const lambdaSd = parts.reduce((s, p) => s + p.lambdaSd, 0);
  const weighted = (weight: (p: ElementFigures) => number, value: (p: ElementFigures) => number, fallback: number) => {
    const total = parts.reduce((s, p) => s + weight(p), 0);
    return total === 0 ? fallback : parts.reduce((s, p) => s + weight(p) * value(p), 0) / total;
  };
  const longest = Math.max(0, ...parts.map((p) => p.t1Effective ?? 0));
  const t1 = weighted(
    (p) => p.lambdaDu,
    (p) => p.t1Effective ?? 0,
    longest,
  );
  const mttr = weighted(
    (p) => p.lambdaDd + p.lambdaDu,
    (p) => p.mttr,
    DEFAULT_MTTR_HOURS,
  );
  return { lambdaDu, lambdaDd, lambdaSd, t1, mttr };
}

/**
 * Annex B assumes identical channels. Channels that differ are computed with the largest of each figure
 * among them (conservative: every figure only raises the PFD).
 */
export function worstChannel(channels: readonly ChannelFigures[]): ChannelFigures {
  return {
    lambdaDu: Math.max(...channels.map((c) => c.lambdaDu)),
    lambdaDd: Math.max(...channels.map((c) => c.lambdaDd)),
    lambdaSd: Math.max(...channels.map((c) => c.lambdaSd)),
    t1: Math.max(...channels.map((c) => c.t1)),
    mttr: Math.max(...channels.map((c) => c.mttr)),
  };
}

export function groupFigures(channel: ChannelFigures, beta: number, betaD: number): GroupFigures {
  return { ...channel, mrt: channel.mttr, beta, betaD };
}

export function sameChannels(channels: readonly ChannelFigures[]): boolean {
  const [first, ...rest] = channels;
  return rest.every((c) => JSON.stringify(c) === JSON.stringify(first));
}
