// The simplified equations of IEC 61508-6:2010 Annex B for the average probability of failure on demand
// (B.3.2.2, low demand) and the average frequency of dangerous failure (B.3.3, high demand) of one voted
// group of identical channels. Rates are per hour, times are hours. The equations were written from the
// standard as remembered and checked against the values of its Tables B.2 to B.5 (tests/standards).

/** The figures of one channel of a voted group, with those of the group's common cause. */
export interface GroupFigures {
  lambdaDu: number;
  lambdaDd: number;
  /** Safe detected failure rate: used by 1oo2D only. */
  lambdaSd: number;
  /** Proof-test interval T1 (already extended for a proof test that misses some failures). */
  t1: number;
  /** Mean time to restoration (detected failures). */
  mttr: number;
  /** Mean repair time (failures found by the proof test); Annex B's tables take it equal to MTTR. */
  mrt: number;
  beta: number;
  betaD: number;
}

export interface Architecture {
  m: number;
  n: number;
  /** 1oo2D: a pair whose diagnostics act on the other channel. */
  diagnostic?: boolean;
}

/** Fraction of detected failures the 1oo2D diagnostics act on, Annex B's K; its tables take 0.98 (from memory). */
export const ONE_OO_TWO_D_K = 0.98;

export const ANNEX_B = 'IEC 61508-6:2010 Annex B';

/** The equation and the clause it comes from, as printed in the output. */
export interface Equation {
  architecture: string;
  pfd: string;
  pfh: string;
  clause: string;
}

export function architectureName(a: Architecture): string {
  return `${a.m}oo${a.n}${a.diagnostic ? 'D' : ''}`;
}

const EQUATIONS: Record<string, Omit<Equation, 'architecture'>> = {
  '1oo1': { pfd: 'lambdaD x tCE', pfh: 'lambdaDU', clause: 'B.3.2.2.1, B.3.3.2.1' },
  '1oo2': {
    pfd: '2((1-betaD)lambdaDD + (1-beta)lambdaDU)^2 tCE tGE + betaD lambdaDD MTTR + beta lambdaDU (T1/2 + MRT)',
    pfh: '2((1-betaD)lambdaDD + (1-beta)lambdaDU)(1-beta)lambdaDU tCE + beta lambdaDU',
    clause: 'B.3.2.2.2, B.3.3.2.2',
  },
  '2oo2': { pfd: '2 lambdaD tCE', pfh: '2 lambdaDU', clause: 'B.3.2.2.3, B.3.3.2.3' },
  '1oo2D': {
    pfd: "2(1-beta)lambdaDU((1-beta)lambdaDU + (1-betaD)lambdaDD + lambdaSD) t'CE t'GE + 2(1-K)lambdaDD t'CE + beta lambdaDU (T1/2 + MRT)",
    pfh: "2(1-beta)lambdaDU((1-beta)lambdaDU + (1-betaD)lambdaDD + lambdaSD) t'CE + 2(1-K)lambdaDD + beta lambdaDU",
    clause: 'B.3.2.2.4, B.3.3.2.4',
  },
  '2oo3': {
    pfd: '6((1-betaD)lambdaDD + (1-beta)lambdaDU)^2 tCE tGE + betaD lambdaDD MTTR + beta lambdaDU (T1/2 + MRT)',
    pfh: '6((1-betaD)lambdaDD + (1-beta)lambdaDU)(1-beta)lambdaDU tCE + beta lambdaDU',
    clause: 'B.3.2.2.5, B.3.3.2.5',
  },
  '1oo3': {
    pfd: '6((1-betaD)lambdaDD + (1-beta)lambdaDU)^3 tCE tGE tG2E + betaD lambdaDD MTTR + beta lambdaDU (T1/2 + MRT)',
    pfh: '6((1-betaD)lambdaDD + (1-beta)lambdaDU)^2 (1-beta)lambdaDU tCE tGE + beta lambdaDU',
    clause: 'B.3.2.2.6, B.3.3.2.6',
  },
};

/**
 * The equation for an architecture, or undefined where Annex B gives none. NooN (all channels needed) is
 * N channels in series, the 2oo2 form extended: any one dangerous failure defeats the group.
 */
export function equationFor(a: Architecture): Equation | undefined {
  const name = architectureName(a);
  const known = EQUATIONS[name];
  if (known) return { architecture: name, ...known };
  if (!a.diagnostic && a.m === a.n) {
    return {
      architecture: name,
      pfd: `${a.n} lambdaD tCE`,
      pfh: `${a.n} lambdaDU`,
      clause: 'B.3.2.2.3 extended to N channels in series',
    };
  }
  return undefined;
}

function lambdaD(f: GroupFigures): number {
  return f.lambdaDu + f.lambdaDd;
}

/** Channel equivalent mean down time, tCE (B.3.2.2.1). */
export function tCE(f: GroupFigures): number {
  const d = lambdaD(f);
  return d === 0 ? 0 : (f.lambdaDu / d) * (f.t1 / 2 + f.mrt) + (f.lambdaDd / d) * f.mttr;
}

/** Voted-group equivalent mean down time, tGE (B.3.2.2.2). */
export function tGE(f: GroupFigures): number {
  const d = lambdaD(f);
  return d === 0 ? 0 : (f.lambdaDu / d) * (f.t1 / 3 + f.mrt) + (f.lambdaDd / d) * f.mttr;
}

/** Second voted-group equivalent mean down time, tG2E (B.3.2.2.6). */
export function tG2E(f: GroupFigures): number {
  const d = lambdaD(f);
  return d === 0 ? 0 : (f.lambdaDu / d) * (f.t1 / 4 + f.mrt) + (f.lambdaDd / d) * f.mttr;
}

/** The common-cause terms shared by the redundant architectures. */
function commonCausePfd(f: GroupFigures): number {
  return f.betaD * f.lambdaDd * f.mttr + f.beta * f.lambdaDu * (f.t1 / 2 + f.mrt);
}

/** Independent dangerous rate of one channel: failures not counted in the common cause. */
function independentRate(f: GroupFigures): number {
  return (1 - f.betaD) * f.lambdaDd + (1 - f.beta) * f.lambdaDu;
}

function primed(f: GroupFigures): { tce: number; tge: number } {
  const all = f.lambdaDu + f.lambdaDd + f.lambdaSd;
  const tce = all === 0 ? 0 : (f.lambdaDu * (f.t1 / 2 + f.mrt) + (f.lambdaDd + f.lambdaSd) * f.mttr) / all;
  return { tce, tge: f.t1 / 3 + f.mrt };
}

/** PFDavg of a voted group, or undefined where Annex B gives no equation for the architecture. */
export function groupPfd(a: Architecture, f: GroupFigures): number | undefined {
  switch (architectureName(a)) {
    case '1oo1':
      return lambdaD(f) * tCE(f);
    case '1oo2':
      return 2 * independentRate(f) ** 2 * tCE(f) * tGE(f) + commonCausePfd(f);
    case '2oo3':
      return 6 * independentRate(f) ** 2 * tCE(f) * tGE(f) + commonCausePfd(f);
    case '1oo3':
      return 6 * independentRate(f) ** 3 * tCE(f) * tGE(f) * tG2E(f) + commonCausePfd(f);
    case '1oo2D': {
      const { tce, tge } = primed(f);
      const pair = (1 - f.beta) * f.lambdaDu + (1 - f.betaD) * f.lambdaDd + f.lambdaSd;
      return (
        2 * (1 - f.beta) * f.lambdaDu * pair * tce * tge +
        2 * (1 - ONE_OO_TWO_D_K) * f.lambdaDd * tce +
        f.beta * f.lambdaDu * (f.t1 / 2 + f.mrt)
      );
    }
    default:
      return !a.diagnostic && a.m === a.n ? a.n * lambdaD(f) * tCE(f) : undefined;
  }
}

/** Average frequency of dangerous failure (PFH, per hour) of a voted group, or undefined as for groupPfd. */
export function groupPfh(a: Architecture, f: GroupFigures): number | undefined {
  const common = f.beta * f.lambdaDu;
  switch (architectureName(a)) {
    case '1oo1':
      return f.lambdaDu;
    case '1oo2':
      return 2 * independentRate(f) * (1 - f.beta) * f.lambdaDu * tCE(f) + common;
    case '2oo3':
      return 6 * independentRate(f) * (1 - f.beta) * f.lambdaDu * tCE(f) + common;
    case '1oo3':
      return 6 * independentRate(f) ** 2 * (1 - f.beta) * f.lambdaDu * tCE(f) * tGE(f) + common;
    case '1oo2D': {
      const { tce } = primed(f);
      const pair = (1 - f.beta) * f.lambdaDu + (1 - f.betaD) * f.lambdaDd + f.lambdaSd;
      return 2 * (1 - f.beta) * f.lambdaDu * pair * tce + 2 * (1 - ONE_OO_TWO_D_K) * f.lambdaDd + common;
    }
    default:
      return !a.diagnostic && a.m === a.n ? a.n * f.lambdaDu : undefined;
  }
}

/**
 * A proof test that reveals only a share (PTC) of the dangerous undetected failures: the rest stay hidden
 * until the end of the mission time. For one channel the usual extension is
 * PFD = PTC x lambdaDU x T1/2 + (1 - PTC) x lambdaDU x MT/2 (+ repair terms), as in ISA-TR84.00.02-2015 and
 * IEC 61508-6:2010 B.3.2.5 (from memory); it equals an effective interval PTC x T1 + (1 - PTC) x MT, which
 * the voted-group equations then use (an approximation there, stated in the output).
 */
export function effectiveInterval(t1: number, coverage: number, missionHours: number | undefined): number {
  if (coverage >= 1 || missionHours === undefined) return t1;
  return coverage * t1 + (1 - coverage) * Math.max(missionHours, t1);
}

export const PROOF_TEST_EXTENSION =
  'imperfect proof test: effective interval PTC x T1 + (1 - PTC) x mission time (ISA-TR84.00.02-2015; IEC 61508-6:2010 B.3.2.5, from memory)';
