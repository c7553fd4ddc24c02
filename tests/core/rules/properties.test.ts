// Properties of the independence analysis over generated sites (invented test data): sharing never adds
// credit, a site with nothing shared has no findings, and tags are only names.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyze, loadModelText } from '@bulkhead/core';
import { modelText, type Case } from './harness.ts';

function assess(text: string) {
  const loaded = loadModelText('p.bulk', text);
  if (!loaded.model) throw new Error(loaded.diagnostics.map((d) => d.message).join('; '));
  return analyze(loaded.model);
}

/**
 * Ways of making the SIF share something with the failing loop, each on its own base line. Feeding the SIS
 * solver from the loop's circuit is left out: with a de-energise-to-trip SIF it makes the circuit's loss a
 * trip, which can rightly restore credit another sharing of that circuit had voided.
 */
const SHARINGS: Record<string, string> = {
  'T-2': 'transmitter T-2 make="Brill" model="B2" mounted-on=N-1 signal-via=IO-2',
  'XV-1': 'shutdown-valve XV-1 fails-to=open mounted-on=L-1 signal-via=IO-4 air-from=IA-A',
  'IO-4': 'io-card IO-4 signal-via=S-1,C-1 powered-by=CK-B',
  'SF-1': 'sif SF-1 sensors=T-2 solver=S-1 finals=XV-1 trip=close trip-mode=energise sil=2 pfd=0.01',
  'IO-2': 'io-card IO-2 signal-via=S-1 powered-by=CK-A',
};
const withAlarm: Case['lines'] = {
  'OP-1': 'operator OP-1',
  'N-3': 'nozzle N-3 mounted-on=V-1',
  'T-3': 'transmitter T-3 mounted-on=N-3 signal-via=IO-5',
  'C-2': 'controller C-2 system=bpcs powered-by=CK-B',
  'IO-5': 'io-card IO-5 signal-via=C-2 powered-by=CK-B',
  'AL-1': 'alarm AL-1 sensors=T-3 raised-in=C-2 operator=OP-1 finals=XV-1 minutes=20',
};
const scenario = ['scenario SC-1 category=c', '  cause function=LC-1 frequency=0.1', '  layer SF-1', '  layer AL-1 pfd=0.1'];

function creditOf(keys: string[]) {
  const lines = { ...withAlarm, ...Object.fromEntries(keys.map((k) => [k, SHARINGS[k]!])) };
  const a = assess(modelText({ name: 'p', lines, scenario })).assessments[0]!;
  return { credited: a.layers.filter((l) => l.credited).length, after: a.mitigatedAfter };
}

describe('independence properties', () => {
  it('adding a shared dependency never increases the credit the layers get', () => {
    fc.assert(
      fc.property(fc.subarray(Object.keys(SHARINGS)), fc.constantFrom(...Object.keys(SHARINGS)), (keys, added) => {
        fc.pre(!keys.includes(added));
        const before = creditOf(keys);
        const after = creditOf([...keys, added]);
        expect(after.credited).toBeLessThanOrEqual(before.credited);
        expect(after.after).toBeGreaterThanOrEqual(before.after);
      }),
      { numRuns: 60 },
    );
  });

  it('a site in which cause and layers share no element gives no finding', () => {
    // Every SIF has its own nozzle (or bridle or impulse line), transmitter, card, solver, valve, power and air.
    const train = (i: number, connection: number, make: number) => {
      const tap = connection === 0 ? `NZ-${i}` : connection === 1 ? `BR-${i}` : `IL-${i}`;
      return [
        `nozzle NZ-${i} mounted-on=V-1`,
        ...(connection === 1 ? [`bridle BR-${i} mounted-on=NZ-${i}`] : connection === 2 ? [`impulse-line IL-${i} mounted-on=NZ-${i}`] : []),
        `ups U-${i}`,
        `circuit K-${i} powered-by=U-${i}`,
        `air-header A-${i}`,
        `logic-solver LS-${i} system=sis powered-by=K-${i}`,
        `io-card AI-${i} signal-via=LS-${i} powered-by=K-${i}`,
        `io-card DO-${i} signal-via=LS-${i} powered-by=K-${i}`,
        `transmitter TX-${i} make="Make${make}" model="M${i}" mounted-on=${tap} signal-via=AI-${i}`,
        `shutdown-valve SV-${i} fails-to=closed mounted-on=L-1 signal-via=DO-${i} air-from=A-${i}`,
        `sif F-${i} sensors=TX-${i} solver=LS-${i} finals=SV-${i} trip=close trip-mode=de-energise sil=1 pfd=0.1`,
      ];
    };
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.integer({ min: 0, max: 2 }), fc.integer({ min: 0, max: 9 })), { minLength: 1, maxLength: 5 }), (trains) => {
        const lines = [
          'site "Property site (invented)"',
          'category c tolerable=1e-6 harm=people',
          'vessel V-1',
          'line L-1',
          ...trains.flatMap(([connection, make], i) => train(i, connection, make)),
          'scenario SC-1 category=c',
          '  cause external="Feed upset" frequency=0.1',
          ...trains.map((_, i) => `  layer F-${i}`),
        ];
        expect(assess(lines.join('\n') + '\n').findings.filter((f) => f.rule !== 'sif-pfd-outside-sil')).toEqual([]);
      }),
      { numRuns: 40 },
    );
  });

  it('renaming every tag changes no verdict', () => {
    const text = modelText({ name: 'r', lines: { ...withAlarm, 'T-2': SHARINGS['T-2']!, 'IO-2': SHARINGS['IO-2']! }, scenario });
    const tags = [...new Set([...text.matchAll(/^\S+ ([A-Z][A-Za-z0-9-]*)/gm)].map((m) => m[1]!))].filter((t) => t !== 'c');
    const verdicts = (t: string) =>
      assess(t).assessments.map((a) => ({ layers: a.layers.map((l) => [l.verdict, l.credited]), after: a.mitigatedAfter, sil: a.sif?.sil }));
    const original = verdicts(text);
    fc.assert(
      fc.property(fc.uniqueArray(fc.stringMatching(/^[A-Z][A-Z0-9]{1,6}$/), { minLength: tags.length, maxLength: tags.length }), (names) => {
        const rename = new Map(tags.map((t, i) => [t, `Q${names[i]}`]));
        const renamed = text.replace(/(?<![A-Za-z0-9_.\-/+:])[A-Z][A-Za-z0-9-]*(?![A-Za-z0-9_.\-/+:])/g, (w) => rename.get(w) ?? w);
        expect(verdicts(renamed)).toEqual(original);
      }),
      { numRuns: 30 },
    );
  });
});
