// The demo's findings, pinned exactly and checked by hand against fixtures/demo/*.bulk (an invented site):
// revision A shows each designed-in conflict with the path from each side; revision B shows none of them.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyze, loadModelText } from '@bulkhead/core';

function analysed(file: string) {
  const loaded = loadModelText(file, readFileSync(file));
  if (!loaded.model || loaded.diagnostics.length > 0) throw new Error(`${file} does not load cleanly`);
  return analyze(loaded.model, { spans: loaded.spans });
}

function findings(file: string) {
  return analysed(file).findings.map((f) => ({
    key: f.key,
    severity: f.severity,
    element: f.element,
    paths: f.paths,
    accepted: f.accepted !== undefined,
  }));
}

type Row = ReturnType<typeof findings>[number];
const row = (key: string, severity: Row['severity'], element: string, paths: string[][], accepted = false): Row => ({
  key,
  severity,
  element,
  paths,
  accepted,
});

// Both revisions: every SIF closes a valve that fails closed on loss of IA-1 and is de-energise-to-trip
// in SIS-1, fed from UPS-1 through CKT-21 like the BPCS through CKT-11, so these supplies fail safe: notes.
const S101_SUPPLY_NOTES = [
  row('shared-support:S-101:LIC-101+SIF-101:IA-1', 'note', 'IA-1', [
    ['LIC-101', 'LV-101', 'IA-1'],
    ['SIF-101', 'XV-101', 'IA-1'],
  ]),
  row('shared-support:S-101:LIC-101+SIF-101:UPS-1', 'note', 'UPS-1', [
    ['LIC-101', 'BPCS-C1', 'CKT-11', 'UPS-1'],
    ['SIF-101', 'SIS-1', 'CKT-21', 'UPS-1'],
  ]),
];
const S102_SUPPLY_NOTES = [
  row('shared-support:S-102:PIC-201+SIF-201:IA-1', 'note', 'IA-1', [
    ['PIC-201', 'PV-201', 'IA-1'],
    ['SIF-201', 'XV-201', 'IA-1'],
  ]),
  row('shared-support:S-102:PIC-201+SIF-201:UPS-1', 'note', 'UPS-1', [
    ['PIC-201', 'BPCS-C1', 'CKT-11', 'UPS-1'],
    ['SIF-201', 'SIS-1', 'CKT-21', 'UPS-1'],
  ]),
];
const S103_SUPPLY_NOTES = [
  row('shared-support:S-103:TIC-301+SIF-301:IA-1', 'note', 'IA-1', [
    ['TIC-301', 'TV-301', 'IA-1'],
    ['SIF-301', 'XV-301', 'IA-1'],
  ]),
  row('shared-support:S-103:TIC-301+SIF-301:UPS-1', 'note', 'UPS-1', [
    ['TIC-301', 'BPCS-C1', 'CKT-11', 'UPS-1'],
    ['SIF-301', 'SIS-1', 'CKT-21', 'UPS-1'],
  ]),
];
// SIF-301 claims PFD 0.05 with no verification basis: credited at the SIL 1 edge, 0.1, until accepted (issue 9, item 10).
const SIF301_NO_BASIS = {
  key: 'sif-claim-no-basis:S-103:SIF-301',
  severity: 'needs-justification' as const,
  element: undefined,
  paths: [['SIF-301']],
  accepted: false,
};
// LT-102 (SIF-101) and LT-103 (LAH-101) are both Orrin GR-7: accepted in revision B only. The pair is
// named by tag (LAH-101 first); revision B accepts it under the key it had in list order, which still counts.
const diversity = (accepted: boolean) =>
  row(
    'same-make-model:S-101:LAH-101+SIF-101:LT-102:LT-103',
    'needs-justification',
    'LT-102',
    [
      ['LAH-101', 'LT-103'],
      ['SIF-101', 'LT-102'],
    ],
    accepted,
  );

describe('the demo findings', () => {
  it('revision A lists every designed-in conflict with the path from each side', () => {
    expect(findings('fixtures/demo/marrow-fen.bulk')).toEqual([
      // LAH-101 is raised in BPCS-C1, the controller of the failing loop LIC-101.
      row('alarm-on-failed-bpcs:S-101:LIC-101+LAH-101:BPCS-C1', 'voids-credit', 'BPCS-C1', [
        ['LIC-101', 'BPCS-C1'],
        ['LAH-101', 'BPCS-C1'],
      ]),
      // LT-101 (BPCS) and LT-102 (SIS) both sit on bridle BR-101 (its nozzles N-101A/B are listed under it).
      row('shared-bridle:S-101:LIC-101+SIF-101:BR-101', 'voids-credit', 'BR-101', [
        ['LIC-101', 'LT-101', 'BR-101'],
        ['SIF-101', 'LT-102', 'BR-101'],
      ]),
      // LT-103 of the alarm is wired to AI-1-03, the loop's own input card.
      row('shared-io:S-101:LIC-101+LAH-101:AI-1-03', 'voids-credit', 'AI-1-03', [
        ['LIC-101', 'LT-101', 'AI-1-03'],
        ['LAH-101', 'LT-103', 'AI-1-03'],
      ]),
      // Apart from BPCS-C1: the loop's output card AO-1-07 and the alarm's console CON-1 are both fed from CKT-11 ...
      row('shared-support:S-101:LIC-101+LAH-101:CKT-11', 'voids-credit', 'CKT-11', [
        ['LIC-101', 'LV-101', 'AO-1-07', 'CKT-11'],
        ['LAH-101', 'CON-1', 'CKT-11'],
      ]),
      // ... and AO-1-07 and the alarm's output card DO-1-02 (to MS-100) are both housed in CAB-1.
      row('shared-housing:S-101:LIC-101+LAH-101:CAB-1', 'needs-justification', 'CAB-1', [
        ['LIC-101', 'LV-101', 'AO-1-07', 'CAB-1'],
        ['LAH-101', 'MS-100', 'DO-1-02', 'CAB-1'],
      ]),
      // LT-101 and LT-102 are both housed in junction box JB-101.
      row('shared-housing:S-101:LIC-101+SIF-101:JB-101', 'needs-justification', 'JB-101', [
        ['LIC-101', 'LT-101', 'JB-101'],
        ['SIF-101', 'LT-102', 'JB-101'],
      ]),
      diversity(false),
      // SIF-101 trips on loss of UPS-1, so the alarm sharing UPS-1 with it cannot be defeated together with it.
      row('shared-support:S-101:LAH-101+SIF-101:UPS-1', 'note', 'UPS-1', [
        ['LAH-101', 'BPCS-C1', 'CKT-11', 'UPS-1'],
        ['SIF-101', 'SIS-1', 'CKT-21', 'UPS-1'],
      ]),
      ...S101_SUPPLY_NOTES,
      ...S102_SUPPLY_NOTES,
      // TT-302A and TT-302B (1oo2) share thermowell TW-302 and input card AI-S-02. The finding has one party
      // (the SIF) and so one path, through the first channel; its message names both channels. AI-S-02 is a
      // card of SIF-301's own solver: part of the logic-solver subsystem, a note (issue 16, item 6). TW-302 is a note
      // too: SIF-301's failure data are complete, and its computed PFD counts TW-302 in series (issue 16, item 3).
      SIF301_NO_BASIS,
      row('voted-group-common-cause:S-103:SIF-301:TW-302', 'note', 'TW-302', [['SIF-301', 'TT-302A', 'TW-302']]),
      ...S103_SUPPLY_NOTES,
      row('voted-group-common-cause:S-103:SIF-301:AI-S-02', 'note', 'AI-S-02', [['SIF-301', 'TT-302A', 'AI-S-02']]),
    ]);
  });

  it('revision A voids both layers of S-101 and credits SIF-301 by its computed PFD', () => {
    const verdicts = analysed('fixtures/demo/marrow-fen.bulk').assessments.map((a) => [
      a.scenario,
      a.layers.map((l) => `${l.function} ${l.verdict}`),
    ]);
    expect(verdicts).toEqual([
      ['S-101', ['SIF-101 voided', 'LAH-101 voided']],
      ['S-102', ['SIF-201 independent', 'IPL-PSV-201 independent']],
      ['S-103', ['SIF-301 independent', 'TAH-304 independent']],
      // High demand (3 /yr, the relief valve acts after): SIF-201 judged by its PFH, independent of the external cause.
      ['S-104', ['SIF-201 independent', 'IPL-PSV-201 independent']],
    ]);
  });

  it('revision B lists none of them: only the fail-safe supply notes and its one accepted diversity finding', () => {
    // Revision B also gives SIF-301's PFD its verification basis (pfd-basis=), so sif-claim-no-basis is gone too.
    expect(findings('fixtures/demo/marrow-fen-rev-b.bulk')).toEqual([
      diversity(true),
      ...S101_SUPPLY_NOTES,
      ...S102_SUPPLY_NOTES,
      ...S103_SUPPLY_NOTES,
    ]);
    const verdicts = analysed('fixtures/demo/marrow-fen-rev-b.bulk').assessments.flatMap((a) =>
      a.layers.map((l) => [l.function, l.credited]),
    );
    expect(verdicts.every(([, credited]) => credited === true)).toBe(true);
  });
});
