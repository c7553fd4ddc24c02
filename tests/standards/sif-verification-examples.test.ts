// A published worked example of a one-channel PFDavg with imperfect proof tests, reproduced through the model:
// JUMO SIRAS P21 DP (type 403024) operating manual, chapter 7 "Safety Manual", page 49, "Beispiele Typ 403024"
// (read in a stored public copy of the manual). Inputs as printed: lambdaDD 1012.19 FIT, lambdaDU 78.07 FIT,
// MTTR = MRT = 72 h, T1 = 8,760 h, mission time 87,600 h; proof tests A, B and C with coverage 93.27%, 80.29%
// and 67.63%; printed results 6.27e-4, 1.03e-3 and 1.41e-3.
//
// The manual computes PTC lambdaDU (T1/2 + MRT) + (1 - PTC) lambdaDU TM/2 + lambdaDD MTTR. Bulkhead's effective
// interval also keeps the repair time on the failures found at the end of the mission, (1 - PTC) lambdaDU MRT
// more (conservative); the check adds that term to the printed figure and allows the printed rounding.
import { describe, expect, it } from 'vitest';
import { loadModelText, verifyModel } from '@bulkhead/core';

const MODEL = (coverage: number) => `
site "Worked example (invented plant around a published device example)"
category people tolerable=1e-4 harm=people
vessel V-1
nozzle N-1 mounted-on=V-1
transmitter PT-1 supply=self-contained mounted-on=N-1
logic-solver LS-1 system=sis supply=self-contained
line L-1
shutdown-valve XV-1 fails-to=closed mounted-on=L-1 signal-via=LS-1 supply=self-contained
sif SIF-1 sensors=PT-1 solver=LS-1 finals=XV-1
failure-data FD-PT element=PT-1 lambda-du=78.07e-9 lambda-dd=1012.19e-9 basis="JUMO 403024 safety manual" proof-test-hours=8760 proof-test-coverage=${coverage} mission-hours=87600 mttr-hours=72 test-basis="manual"
failure-data FD-LS element=LS-1 lambda-du=0 lambda-dd=0 basis="not part of the example"
failure-data FD-XV element=XV-1 lambda-du=0 lambda-dd=0 basis="not part of the example"
`;

function sensorPfd(coverage: number): number {
  const result = loadModelText('example.bulk', MODEL(coverage));
  if (!result.model) throw new Error(result.diagnostics.map((d) => d.message).join('\n'));
  return verifyModel(result.model, 'SIF-1')[0]!.subsystems[0]!.pfd!;
}

describe('JUMO SIRAS P21 DP safety manual, p. 49: PFDavg with proof tests A, B and C', () => {
  it.each([
    { test: 'A', coverage: 0.9327, printed: 6.27e-4 },
    { test: 'B', coverage: 0.8029, printed: 1.03e-3 },
    { test: 'C', coverage: 0.6763, printed: 1.41e-3 },
  ])('proof test $test (PTC $coverage): $printed', ({ coverage, printed }) => {
    const repairAtMissionEnd = (1 - coverage) * 78.07e-9 * 72;
    const halfUnit = 0.5 * 10 ** (Math.floor(Math.log10(printed)) - 2);
    expect(Math.abs(sensorPfd(coverage) - (printed + repairAtMissionEnd))).toBeLessThanOrEqual(halfUnit);
  });
});
