// `bulkhead check` answers first: every scenario's verdict within the first screen, then the detail; each
// rule's rationale once; notes counted and listed only with --verbose; no colour under a pipe; and the
// exit-code rule shared with `report`. The figures are worked by hand from the demo's own inputs.
import { describe, expect, it } from 'vitest';
import { runCli } from '../helpers/cli.ts';
import { wantsColour } from '../../packages/cli/src/colour.ts';

const DEMO = 'fixtures/demo/marrow-fen.bulk';
const DEMO_REV_B = 'fixtures/demo/marrow-fen-rev-b.bulk';
const SCREEN = 25;

describe('check on the demo, answer first', () => {
  it('fits every scenario verdict in the first 25 lines', async () => {
    const r = await runCli(['check', DEMO]);
    const screen = r.stdout.split('\n').slice(0, SCREEN);
    // Demo revision A: S-101 loses both layers (0.1 /yr BPCS loop failure x 0.5 ignition = 0.05 /yr; CCPS
    // 2001 Table 5.1 gives 0.1 /yr for a BPCS loop failure), S-102 meets with both layers (0.1 x 4e-3 x 0.01
    // = 4e-6 /yr < 1e-5), S-103 credits the alarm and SIF-301, whose shared thermowell is counted in its computed PFD, at its SIL 1
    // edge (0.1 x 0.1 x 0.1 = 1e-3 /yr, not strictly below 1e-3), S-104 3 /yr external cause.
    const answers = [
      ['S-101', 'FALLS SHORT after independence: 0.05 /yr against 1.0e-4 /yr tolerable, gap 500 x tolerable'],
      ['S-102', 'MEETS after independence: 4.0e-6 /yr against 1.0e-5 /yr tolerable, margin 0.4 x tolerable'],
      ['S-103', 'FALLS SHORT after independence: 1.0e-3 /yr against 1.0e-3 /yr tolerable, gap 1 x tolerable'],
      ['S-104', 'FALLS SHORT after independence: 3.5e-5 /yr against 1.0e-5 /yr tolerable, gap 3.5 x tolerable'],
    ] as const;
    for (const [scenario, answer] of answers) {
      const at = screen.findIndex((l) => l.startsWith(`${scenario}  `));
      expect(at, scenario).toBeGreaterThanOrEqual(0);
      expect(screen[at + 1], scenario).toBe(`  answer       ${answer}`);
    }
    // The element that voided each lost layer is named on the first screen.
    expect(screen).toContain('  lost credit  SIF-101 voided by BR-101 (shared-bridle); 2 open findings too');
    expect(screen.join('\n')).toMatch(
      /LAH-101 voided by BPCS-C1 \(alarm-on-failed-bpcs\), AI-1-03 \(shared-io\), CKT-11 \(shared-support\)/,
    );
    // No finding comes before the summary ends.
    expect(screen.some((l) => /^(Credit voided|Needs a justification|Note):/.test(l))).toBe(false);
  });

  it('prints each rule rationale once, in the legend at the end', async () => {
    const r = await runCli(['check', DEMO, '--verbose']);
    const rationale = 'A shared supply is a dangerous common cause only if its loss both contributes';
    expect(r.stdout.split(rationale).length - 1).toBe(1);
    expect(r.stdout.indexOf('== rules ==')).toBeGreaterThan(r.stdout.lastIndexOf('key      '));
  });

  it('counts notes and lists them only with --verbose', async () => {
    const plain = await runCli(['check', DEMO]);
    const verbose = await runCli(['check', DEMO, '--verbose']);
    const notes = (text: string) => text.split('\n').filter((l) => l.startsWith('Note: ')).length;
    expect(notes(plain.stdout)).toBe(0);
    expect(plain.stdout).toContain('9 notes (--verbose lists them)');
    expect(notes(verbose.stdout)).toBe(9);
  });

  it('writes no colour codes to a pipe, even without NO_COLOR', async () => {
    const r = await runCli(['check', DEMO], { env: { NO_COLOR: '', FORCE_COLOR: '' } });
    expect(r.stdout).not.toContain('\u001b[');
  });
});

describe('colour only on a terminal', () => {
  it.each([
    [{ isTTY: true }, {}, true],
    [{ isTTY: true }, { NO_COLOR: '1' }, false],
    [{ isTTY: true }, { NO_COLOR: '' }, true], // no-color.org: only a non-empty value disables colour
    [{ isTTY: true }, { TERM: 'dumb' }, false],
    [{ isTTY: false }, {}, false],
    [{}, {}, false],
  ])('stream %o with env %o: %s', (stream, env, expected) => expect(wantsColour(stream, env)).toBe(expected));
});

describe('check and report share one exit-code rule', () => {
  it.each([
    [DEMO, [], 1],
    [DEMO, ['--fail-on', 'none'], 0],
    [DEMO, ['--fail-on', 'note'], 1],
    [DEMO_REV_B, [], 0],
  ] as const)('%s %j', async (file, extra, code) => {
    const check = await runCli(['check', file, ...extra]);
    const report = await runCli(['report', file, '--format', 'json', ...extra]);
    expect(check.code).toBe(code);
    expect(report.code).toBe(code);
  });
});
