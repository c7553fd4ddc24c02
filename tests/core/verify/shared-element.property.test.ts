// Through whole models (issue 16): moving both channels of a 1oo2 pair onto one shared tapping with failure data
// never lowers the SIF's PFD or PFH, whatever the figures. Common practice, no source: a single point added in
// series can only add to the probability of failure.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { loadModelText, verifyModel } from '@bulkhead/core';

function model(shared: boolean, sensorRate: number, tappingRate: number, beta: number): string {
  const mount = (own: string) => (shared ? 'TW-S' : own);
  return `
site "Property model (invented)"
category people tolerable=1e-4 harm=people
vessel V-1
tapping TW-1 mounted-on=V-1
tapping TW-2 mounted-on=V-1
tapping TW-S mounted-on=V-1
transmitter TT-1 supply=self-contained mounted-on=${mount('TW-1')}
transmitter TT-2 supply=self-contained mounted-on=${mount('TW-2')}
logic-solver LS-1 system=sis supply=self-contained
line L-1
shutdown-valve XV-1 fails-to=closed mounted-on=L-1 signal-via=LS-1 supply=self-contained
sif SIF-1 sensors=TT-1,TT-2 sensor-voting=1oo2 solver=LS-1 finals=XV-1
failure-data FD-1 element=TT-1 lambda-du=${sensorRate} lambda-dd=${sensorRate} proof-test-hours=8760 basis="b" test-basis="t"
failure-data FD-2 element=TT-2 lambda-du=${sensorRate} lambda-dd=${sensorRate} proof-test-hours=8760 basis="b" test-basis="t"
failure-data FD-S element=TW-S lambda-du=${tappingRate} lambda-dd=0 proof-test-hours=8760 basis="b" test-basis="t"
failure-data FD-LS element=LS-1 lambda-du=1e-9 lambda-dd=0 proof-test-hours=87600 basis="b" test-basis="t"
failure-data FD-XV element=XV-1 lambda-du=1e-7 lambda-dd=0 proof-test-hours=8760 basis="b" test-basis="t"
common-cause SIF-1 group=sensors beta=${beta} basis="b"
`;
}

function figures(text: string): { pfd: number; pfh: number } {
  const result = loadModelText('p.bulk', text);
  if (!result.model) throw new Error(result.diagnostics.map((d) => d.message).join('\n'));
  const v = verifyModel(result.model, 'SIF-1')[0]!;
  return { pfd: v.pfd!, pfh: v.pfh! };
}

// Figures written as the .bulk language takes them: a number a double holds exactly as written.
const rate = fc.integer({ min: 1, max: 9999 }).map((n) => Number(`${n}e-10`));
const beta = fc.integer({ min: 0, max: 20 }).map((n) => n / 100);

describe('a shared element added to a voted group, through the model', () => {
  it('never lowers the PFD or the PFH', () => {
    fc.assert(
      fc.property(rate, rate, beta, (sensorRate, tappingRate, b) => {
        const apart = figures(model(false, sensorRate, tappingRate, b));
        const together = figures(model(true, sensorRate, tappingRate, b));
        expect(together.pfd).toBeGreaterThan(apart.pfd);
        expect(together.pfh).toBeGreaterThan(apart.pfh);
      }),
      { numRuns: 40 },
    );
  });
});
