// `bulkhead verify` as a user runs it (issue 16): the subsystem table with equations and sources on the demo,
// the 1oo2 pair on one thermowell computed with the thermowell in series, JSON output, and exit codes.
import { describe, expect, it } from 'vitest';
import { runCli } from '../helpers/cli.ts';

describe('bulkhead verify', () => {
  it('prints the subsystem table with each equation and its source, and the thermowell in series (revision A)', async () => {
    const r = await runCli(['verify', 'fixtures/demo/marrow-fen.bulk', 'SIF-301']);
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/^ {2}sensors +1oo2 +4\.9e-4 .*IEC 61508-6:2010 Annex B B\.3\.2\.2\.2/m);
    expect(r.stdout).toMatch(/^ {2}logic solver +1oo1 /m);
    expect(r.stdout).toMatch(/^ {2}final elements +1oo1 /m);
    expect(r.stdout).toContain(
      'shared by the channels, in series with the group: TW-302 PFD 4.4e-4; group alone 5.5e-5',
    );
    expect(r.stdout).toContain(
      'TW-302 (sensors) in series with the voted group: with it the SIF still meets its requirement',
    );
    expect(r.stdout).toContain('basis: Thermowell fouling, Marrow Fen inspection records 2015-2025 (invented)');
    expect(r.stdout).toContain('supports, and does not replace, a SIL verification by a competent person');
  });

  it('exits 1 when a SIF falls short, and says by how much (revision B, SIF-201 in high demand)', async () => {
    const r = await runCli(['verify', 'fixtures/demo/marrow-fen-rev-b.bulk', 'SIF-201']);
    expect(r.code).toBe(1);
    expect(r.stdout).toMatch(
      /verdict: {2}computed \S+ \/h falls short of the requirement \(high-demand, S-104\) by a factor of \d/,
    );
    expect(r.stdout).toMatch(/verdict: {2}computed \S+ meets the requirement \(low-demand, S-102\), margin x/);
    expect(r.stdout).toContain('[hft-short] HFT of the final elements is 0; SIL 2 in high-demand needs 1');
  });

  it('writes every SIF as JSON with --format json', async () => {
    const r = await runCli(['verify', 'fixtures/demo/marrow-fen.json', '--format', 'json']);
    const out = JSON.parse(r.stdout) as { sifs: { sif: string; subsystems: { subsystem: string }[] }[] };
    expect(out.sifs.map((s) => s.sif)).toEqual(['SIF-101', 'SIF-201', 'SIF-301']);
    expect(out.sifs[0]!.subsystems.map((s) => s.subsystem)).toEqual(['sensors', 'solver', 'finals']);
  });

  it('exits 2 on a tag that is no SIF, and on an unknown format', async () => {
    const notSif = await runCli(['verify', 'fixtures/demo/marrow-fen.bulk', 'LIC-101']);
    expect(notSif.code).toBe(2);
    expect(notSif.stderr).toContain('`LIC-101` is a loop function, not a SIF');
    const format = await runCli(['verify', 'fixtures/demo/marrow-fen.bulk', '--format', 'xml']);
    expect(format.code).toBe(2);
    expect(format.stderr).toContain('is not one of text, json');
  });
});
