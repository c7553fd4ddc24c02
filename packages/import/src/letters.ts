// ISA-5.1 tag letters suggest a kind when a row has none: the first letter is the measured variable,
// the letters after it the function (ANSI/ISA-5.1-2009, Table 4.1, identification letters). Only the
// few combinations that name one element kind are used; a suggestion is always marked as one.
import type { ElementKind } from '@bulkhead/core';

export interface KindSuggestion {
  kind: ElementKind;
  variable?: string;
  letters: string;
}

/** First letters as ISA-5.1 Table 4.1 reads them (column "first letter, measured variable"). */
const VARIABLE_LETTERS: Record<string, string> = {
  L: 'level',
  P: 'pressure',
  T: 'temperature',
  F: 'flow',
  A: 'analysis',
  Z: 'position',
  S: 'speed',
};

export function suggestKind(tag: string): KindSuggestion | undefined {
  const letters = /^([A-Z]{2,4})(?=[-_ ]?\d)/.exec(tag.toUpperCase())?.[1];
  if (!letters) return undefined;
  const first = letters[0]!;
  const rest = letters.slice(1);
  // PSV/PRV: pressure safety (relief) valve, ISA-5.1 Table 4.1 note on "safety" succeeding letters.
  if (letters === 'PSV' || letters === 'PRV') return { kind: 'relief-valve', letters };
  if (letters === 'XV' || letters === 'HV' || letters === 'SDV' || letters === 'ESV')
    return { kind: 'shutdown-valve', letters };
  if (letters === 'XY' || letters === 'SOV') return { kind: 'solenoid', letters };
  const variable = VARIABLE_LETTERS[first];
  if (!variable) return undefined;
  // T: transmit; V: valve (final control element); S after the first letter: switch.
  if (rest === 'T' || rest === 'IT') return { kind: 'transmitter', variable, letters };
  if (rest === 'V' || rest === 'CV') return { kind: 'control-valve', letters };
  if (rest === 'S' || rest === 'SH' || rest === 'SL' || rest === 'SHH' || rest === 'SLL')
    return { kind: 'switch', variable, letters };
  return undefined;
}
