// The focused-scenario scene: which elements are drawn, which side relies on each, what is marked.
import { describe, expect, it } from 'vitest';
import { edgeId, scenarioScene } from '@bulkhead/layout';
import { demo, SHARED_TAPPING, small } from './fixtures.ts';

describe('scenarioScene', () => {
  const { model, analysis } = demo();

  it('should throw if given a scenario the model does not have', () => {
    expect(() => scenarioScene(model, analysis, 'S-999')).toThrow(/no scenario S-999/);
  });

  it('should give the cause side 0 and each claimed layer its place in the claim order', () => {
    const scene = scenarioScene(model, analysis, 'S-101');
    expect(scene.sides.map((s) => [s.index, s.role, s.tag, s.letter])).toEqual([
      [0, 'cause', 'LIC-101', 'C'],
      [1, 'layer', 'SIF-101', '1'],
      [2, 'layer', 'LAH-101', '2'],
    ]);
  });

  it("should draw exactly the cause's and each layer's traced elements and the functions themselves", () => {
    for (const s of model.scenarios) {
      const scene = scenarioScene(model, analysis, s.id);
      const fns = [
        ...(s.cause.function !== undefined ? [s.cause.function] : []),
        ...(s.layers ?? []).map((l) => l.function),
      ];
      const expected = new Set(fns);
      for (const fn of fns)
        for (const t of analysis.traces.find((x) => x.function === fn)!.elements) expected.add(t.tag);
      expect(new Set(scene.nodes.map((n) => n.id))).toEqual(expected);
    }
  });

  it('should record for each node every side that relies on it', () => {
    const scene = scenarioScene(model, analysis, 'S-101');
    const sidesOf = (tag: string) => scene.nodes.find((n) => n.id === tag)!.sides;
    expect(sidesOf('BR-101')).toEqual([0, 1]); // the bridle under LT-101 (loop) and LT-102 (SIF)
    expect(sidesOf('UPS-1')).toEqual([0, 1, 2]);
    expect(sidesOf('LT-103')).toEqual([2]);
  });

  it("should mark a finding's shared element with the sides of both parties and the worst severity", () => {
    const scene = scenarioScene(model, analysis, 'S-101');
    const bridle = scene.nodes.find((n) => n.id === 'BR-101')!;
    expect(bridle.shared).toMatchObject({
      relation: 'shared',
      severity: 'voids-credit',
      sides: [0, 1],
      accepted: false,
    });
    const air = scene.nodes.find((n) => n.id === 'IA-1')!;
    expect(air.shared?.severity).toBe('note'); // fails safe for the SIF: listed, not voiding
  });

  it('should mark both ends of a finding about two alike elements, not call them shared', () => {
    const scene = scenarioScene(model, analysis, 'S-101');
    const alike = analysis.findings.find(
      (f) => f.scenario === 'S-101' && f.paths.length === 2 && f.paths[0]!.at(-1) !== f.paths[1]!.at(-1),
    )!;
    expect(alike).toBeDefined();
    for (const path of alike.paths)
      expect(scene.nodes.find((n) => n.id === path.at(-1))!.shared?.relation).toBe('alike');
  });

  it('should put every step of each finding path on the path of its side', () => {
    const scene = scenarioScene(model, analysis, 'S-101');
    for (const f of analysis.findings.filter((x) => x.scenario === 'S-101')) {
      const fp = scene.findings.find((x) => x.key === f.key)!;
      expect(fp.steps.length).toBe(f.paths.length);
      for (const step of fp.steps) {
        expect(step.edges.length).toBe(step.nodes.length - 1);
        for (const id of step.edges) expect(scene.edges.find((e) => e.id === id)!.onPath).toContain(step.side);
      }
    }
  });

  it('should rank the process side before sensors, I/O, solvers and final elements', () => {
    const scene = scenarioScene(model, analysis, 'S-101');
    const rank = (tag: string) => scene.nodes.find((n) => n.id === tag)!.partition;
    expect(rank('V-101')).toBeLessThan(rank('BR-101'));
    expect(rank('BR-101')).toBeLessThan(rank('LT-101'));
    expect(rank('LT-101')).toBeLessThan(rank('AI-1-03'));
    expect(rank('AI-1-03')).toBeLessThan(rank('BPCS-C1'));
    expect(rank('BPCS-C1')).toBeLessThan(rank('AO-1-07'));
    expect(rank('XY-101')).toBeLessThan(rank('XV-101'));
  });

  it('should draw a narrowed cause (only=) as the narrowed part plus what the findings still count (invented test data)', () => {
    const { model: m, analysis: a } = small(SHARED_TAPPING('function=LIC-1 only=LV-1 frequency=0.1'));
    const scene = scenarioScene(m, a, 'S-1');
    const cause = scene.nodes.filter((n) => n.sides.includes(0)).map((n) => n.id);
    const narrowed = a.traces
      .find((t) => t.function === 'LIC-1')!
      .elements.filter((t) => t.path.includes('LV-1'))
      .map((t) => t.tag);
    const onCausePaths = a.findings.flatMap((f) => f.paths.filter((_, i) => f.parties[i]?.role === 'cause').flat());
    expect(cause).toEqual(expect.arrayContaining(['LIC-1', ...narrowed]));
    for (const tag of cause) expect([...narrowed, ...onCausePaths, 'LIC-1'], tag).toContain(tag);
    // The loop's transmitter is outside the narrowed part, so only a finding path can bring it in.
    expect(narrowed).not.toContain('LT-1');
  });

  it('should say that an external cause has nothing to draw (invented test data)', () => {
    const { model: m, analysis: a } = small(SHARED_TAPPING('external="Lightning strike" frequency=0.01'));
    const scene = scenarioScene(m, a, 'S-1');
    expect(scene.sides[0]!.label).toBe('Cause: Lightning strike');
    expect(scene.notes.join(' ')).toMatch(/external/);
    expect(scene.nodes.some((n) => n.sides.includes(0))).toBe(false);
  });

  it('should mark a shared tapping between a loop cause and a SIF (invented test data)', () => {
    const { model: m, analysis: a } = small(SHARED_TAPPING('function=LIC-1 frequency=0.1'));
    const scene = scenarioScene(m, a, 'S-1');
    const tapping = scene.nodes.find((n) => n.id === 'T-1')!;
    expect(tapping.sides).toEqual([0, 1]);
    expect(tapping.shared?.relation).toBe('shared');
    expect(tapping.shared?.severity).toBe('voids-credit');
    expect(scene.edges.find((e) => e.id === edgeId('LT-2', 'T-1'))!.onPath).toEqual([1]);
  });
});
