// The defaults offered when a model gives no number: typical initiating-event frequencies and typical IPL PFDs,
// each row with its source. Output marks every value taken from here as a default (Sourced.origin 'default').
import type { TYPICAL_CAUSES } from '../model/schema.ts';
import { conservativePfd } from './bands.ts';

export type TypicalCause = (typeof TYPICAL_CAUSES)[number];

export interface TypicalCauseRow {
  title: string;
  /** Events per year. */
  frequency: number;
  source: string;
}

const TABLE_5_1 = 'CCPS, Layer of Protection Analysis (2001), Table 5.1, company value (row label from memory)';

/** Typical initiating-event frequencies, per year (CCPS 2001 Table 5.1 as docs/rule-basis.md section 3 quotes it). */
export const TYPICAL_CAUSE_FREQUENCIES: Readonly<Record<TypicalCause, TypicalCauseRow>> = {
  'bpcs-loop-failure': { title: 'BPCS instrument loop failure', frequency: 0.1, source: TABLE_5_1 },
  'regulator-failure': { title: 'Pressure regulator failure', frequency: 0.1, source: TABLE_5_1 },
  'pump-seal-failure': { title: 'Pump seal failure', frequency: 0.1, source: TABLE_5_1 },
  'cooling-water-failure': { title: 'Cooling water failure', frequency: 0.1, source: TABLE_5_1 },
  'hose-failure': { title: 'Loading or unloading hose failure', frequency: 0.1, source: TABLE_5_1 },
  'relief-spurious-open': { title: 'Safety valve opens spuriously', frequency: 0.01, source: TABLE_5_1 },
  'external-fire': { title: 'Large external fire', frequency: 0.01, source: TABLE_5_1 },
  'third-party-impact': { title: 'Third-party impact', frequency: 0.01, source: TABLE_5_1 },
  lightning: { title: 'Lightning strike', frequency: 0.001, source: TABLE_5_1 },
  'atmospheric-tank-failure': { title: 'Atmospheric tank failure', frequency: 0.001, source: TABLE_5_1 },
  'piping-leak': { title: 'Piping leak, per 100 m', frequency: 0.001, source: TABLE_5_1 },
  'piping-breach': { title: 'Piping full breach, per 100 m', frequency: 1e-5, source: TABLE_5_1 },
  'vessel-failure': { title: 'Pressure vessel residual failure', frequency: 1e-6, source: TABLE_5_1 },
};

export { PER_100_M_ROWS } from '../model/schema.ts';
export const PER_ROW_METRES = 100;

/**
 * Operator failure to execute a routine procedure, per opportunity (CCPS 2001 Table 5.1 as docs/rule-basis.md section 3
 * quotes it). Not a frequency: the annual figure is opportunities per year times this, so the model states it
 * as a frequency with its basis; the row is here for that arithmetic and for the tests.
 */
export const OPERATOR_ERROR_PER_OPPORTUNITY = {
  title: 'Operator failure to execute a routine procedure',
  probability: 0.01,
  source: TABLE_5_1,
} as const;

export type LayerDefaultKey = 'bpcs-layer' | 'human-response' | 'relief-valve' | 'rupture-disc' | 'check-valve';

export interface LayerDefaultRow {
  title: string;
  /** Undefined: no default credit at all (the model must say why and give a number). */
  pfd: number | undefined;
  source: string;
}

const TABLES_6 =
  'CCPS, Layer of Protection Analysis (2001), Tables 6.3 to 6.5 (from memory, as docs/rule-basis.md section 3 lists it)';

/** Typical IPL PFDs by kind of layer. A SIF's default comes from its SIL band (sifDefaultPfd). */
export const TYPICAL_LAYER_PFDS: Readonly<Record<LayerDefaultKey, LayerDefaultRow>> = {
  'bpcs-layer': { title: 'BPCS function not part of the cause', pfd: 0.1, source: TABLES_6 },
  'human-response': {
    title: 'Operator response to an alarm, at least 10 minutes available',
    pfd: 0.1,
    source: TABLES_6,
  },
  'relief-valve': { title: 'Relief valve', pfd: 0.01, source: TABLES_6 },
  'rupture-disc': { title: 'Rupture disc', pfd: 0.01, source: TABLES_6 },
  'check-valve': { title: 'Single check valve: little or no credit', pfd: undefined, source: TABLES_6 },
};

export const SIF_BAND_SOURCE =
  'IEC 61511-1:2016 Table 4, conservative edge of the claimed SIL band (CCPS 2001 uses the same values)';

/** The PFD credited to a SIF that claims a SIL but no PFD: the conservative edge of the band. */
export function sifDefaultPfd(sil: number): number | undefined {
  return conservativePfd(sil);
}
