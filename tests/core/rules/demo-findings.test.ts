// The demo's findings, pinned exactly and checked by hand against fixtures/demo/*.bulk (invented site):
// revision A shows each designed-in conflict with both paths; revision B shows none of them.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyze, loadModelText } from '@bulkhead/core';

function findings(file: string) {
  const loaded = loadModelText(file, readFileSync(file));
  return analyze(loaded.model!).findings.map((f) => [f.key, f.severity, f.paths, f.accepted !== undefined]);
}

const SUPPORT_NOTES = [
  ['shared-support:S-102:PIC-201+SIF-201:IA-1', 'note', [['PIC-201', 'PV-201', 'IA-1'], ['SIF-201', 'XV-201', 'IA-1']], false],
  ['shared-support:S-102:PIC-201+SIF-201:UPS-1', 'note', [['PIC-201', 'BPCS-C1', 'CKT-11', 'UPS-1'], ['SIF-201', 'SIS-1', 'CKT-21', 'UPS-1']], false],
];
const S103_NOTES = [
  ['shared-support:S-103:TIC-301+SIF-301:IA-1', 'note', [['TIC-301', 'TV-301', 'IA-1'], ['SIF-301', 'XV-301', 'IA-1']], false],
  ['shared-support:S-103:TIC-301+SIF-301:UPS-1', 'note', [['TIC-301', 'BPCS-C1', 'CKT-11', 'UPS-1'], ['SIF-301', 'SIS-1', 'CKT-21', 'UPS-1']], false],
];
const S101_NOTES = [
  ['shared-support:S-101:LIC-101+SIF-101:IA-1', 'note', [['LIC-101', 'LV-101', 'IA-1'], ['SIF-101', 'XV-101', 'IA-1']], false],
  ['shared-support:S-101:LIC-101+SIF-101:UPS-1', 'note', [['LIC-101', 'BPCS-C1', 'CKT-11', 'UPS-1'], ['SIF-101', 'SIS-1', 'CKT-21', 'UPS-1']], false],
];

describe('the demo findings', () => {
  it('revision A lists every designed-in conflict with the path from each side', () => {
    expect(findings('fixtures/demo/marrow-fen.bulk')).toEqual([
      // LAH-101 is raised in BPCS-C1, the controller of the failing loop LIC-101.
      ['alarm-on-failed-bpcs:S-101:LIC-101+LAH-101:BPCS-C1', 'voids-credit', [['LIC-101', 'BPCS-C1'], ['LAH-101', 'BPCS-C1']], false],
      // LT-101 (BPCS) and LT-102 (SIS) both sit on bridle BR-101.
      ['shared-bridle:S-101:LIC-101+SIF-101:BR-101', 'voids-credit', [['LIC-101', 'LT-101', 'BR-101'], ['SIF-101', 'LT-102', 'BR-101']], false],
      // LT-103 of the alarm is wired to AI-1-03, the loop's own input card.
      ['shared-io:S-101:LIC-101+LAH-101:AI-1-03', 'voids-credit', [['LIC-101', 'LT-101', 'AI-1-03'], ['LAH-101', 'LT-103', 'AI-1-03']], false],
      // Beside BPCS-C1 itself, the alarm's console CON-1 and output card DO-1-02 share the BPCS panel feed
      // CKT-11 and cabinet CAB-1 with the loop's output card AO-1-07, by routes that avoid BPCS-C1.
      ['shared-support:S-101:LIC-101+LAH-101:CKT-11', 'voids-credit', [['LIC-101', 'LV-101', 'AO-1-07', 'CKT-11'], ['LAH-101', 'CON-1', 'CKT-11']], false],
      ['shared-housing:S-101:LIC-101+LAH-101:CAB-1', 'needs-justification', [['LIC-101', 'LV-101', 'AO-1-07', 'CAB-1'], ['LAH-101', 'MS-100', 'DO-1-02', 'CAB-1']], false],
      ['shared-housing:S-101:LIC-101+SIF-101:JB-101', 'needs-justification', [['LIC-101', 'LT-101', 'JB-101'], ['SIF-101', 'LT-102', 'JB-101']], false],
      ['same-make-model:S-101:SIF-101+LAH-101:LT-103:LT-102', 'needs-justification', [['SIF-101', 'LT-102'], ['LAH-101', 'LT-103']], false],
      ...S101_NOTES,
      // In revision A, LAH-101 is raised in BPCS-C1, which is fed from UPS-1 like the SIS: fails safe for SIF-101.
      ['shared-support:S-101:SIF-101+LAH-101:UPS-1', 'note', [['SIF-101', 'SIS-1', 'CKT-21', 'UPS-1'], ['LAH-101', 'BPCS-C1', 'CKT-11', 'UPS-1']], false],
      ...SUPPORT_NOTES,
      // TT-302A and TT-302B (1oo2) share thermowell TW-302 and input card AI-S-02.
      ['voted-group-common-cause:S-103:SIF-301:AI-S-02', 'needs-justification', [['SIF-301', 'TT-302A', 'AI-S-02']], false],
      ['voted-group-common-cause:S-103:SIF-301:TW-302', 'needs-justification', [['SIF-301', 'TT-302A', 'TW-302']], false],
      ...S103_NOTES,
    ]);
  });

  it('revision B lists none of them; its one diversity finding is accepted', () => {
    expect(findings('fixtures/demo/marrow-fen-rev-b.bulk')).toEqual([
      ['same-make-model:S-101:SIF-101+LAH-101:LT-103:LT-102', 'needs-justification', [['SIF-101', 'LT-102'], ['LAH-101', 'LT-103']], true],
      ...S101_NOTES,
      ...SUPPORT_NOTES,
      ...S103_NOTES,
    ]);
  });
});
