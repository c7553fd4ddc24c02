// The invented plant the credit tests share: a 1oo2 pair TT-1/TT-2 in one thermowell TW-1, logic solver LS-1,
// shutdown valve XV-1, and the failure-data rows written in full (no figure left to a default).

/** A failure-data row for one element, lambdaDD 0, T1 8,760 h; `extra` holds the coverage and MTTR it states. */
export const row = (tag: string, du: number, extra = 'proof-test-coverage=1 mttr-hours=8') =>
  `failure-data FD-${tag} element=${tag} lambda-du=${du} lambda-dd=0 proof-test-hours=8760 ${extra} basis="vendor data (invented)" test-basis="site procedure (invented)"\n`;

export const PLANT = `site "Credit works (invented)"
category people tolerable=1e-4 harm=people
vessel V-1
tapping TW-1 mounted-on=V-1
transmitter TT-1 supply=self-contained mounted-on=TW-1
transmitter TT-2 supply=self-contained mounted-on=TW-1
logic-solver LS-1 system=sis supply=self-contained
line L-1
shutdown-valve XV-1 fails-to=closed mounted-on=L-1 signal-via=LS-1 supply=self-contained
sif SIF-1 sensors=TT-1,TT-2 sensor-voting=1oo2 solver=LS-1 finals=XV-1 trip=close
`;

export const BETA = 'common-cause SIF-1 group=sensors beta=0.05 beta-d=0.025 basis="scoring (invented)"\n';

/** Every row but the shared thermowell's. */
export const ROWS = row('TT-1', 1e-7) + row('TT-2', 1e-7) + row('LS-1', 1e-9) + row('XV-1', 1e-7);

export const scenario = (claim: number) =>
  `scenario S-1 category=people\n  cause external="Feed upset" frequency=0.1 basis="site history (invented)"\n  layer SIF-1 pfd=${claim} basis="MF-SV-1 (invented)"\n`;

/**
 * SIF-1's PFDavg by hand, lambdaDU 1e-7 /h, lambdaDD 0, T1 8,760 h, MTTR = MRT = 8 h (tCE 4,388 h, tGE 2,928 h),
 * beta 5% (IEC 61508-6:2010 Annex B, from memory; checked against its tables in tests/standards/annex-b.test.ts):
 * 1oo2 pair: 2 x (0.95e-7)^2 x 4,388 x 2,928 + 0.05 x 1e-7 x 4,388 = 2.3191e-7 + 2.194e-5 = 2.2172e-5 (B.3.2.2.2);
 * TW-1, XV-1: 1e-7 x 4,388 = 4.388e-4 each; LS-1: 1e-9 x 4,388 = 4.388e-6 (B.3.2.2.1);
 * total 2.2172e-5 + 4.388e-4 + 4.388e-6 + 4.388e-4 = 9.0416e-4.
 */
export const COMPUTED = 9.0416e-4;
