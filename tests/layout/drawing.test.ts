// Layout through ELK in process and the drawing it gives: every box placed without overlap, one lane
// per side on each edge, deterministic output, and the finding focus used to centre the view.
import { describe, expect, it } from 'vitest';
import { offsetPolyline, renderPlan, scenarioScene, type Drawing } from '@bulkhead/layout';
import { layoutScene } from '@bulkhead/layout/elk';
import { demo } from './fixtures.ts';

describe('offsetPolyline', () => {
  it('should move a straight segment sideways by the offset', () => {
    expect(
      offsetPolyline(
        [
          { x: 0, y: 0 },
          { x: 10, y: 0 },
        ],
        4,
      ),
    ).toEqual([
      { x: 0, y: 4 },
      { x: 10, y: 4 },
    ]);
  });

  it('should keep a right-angle corner square', () => {
    const out = offsetPolyline(
      [
        { x: 0, y: 0 },
        { x: 10, y: 0 },
        { x: 10, y: 10 },
      ],
      2,
    );
    expect(out).toEqual([
      { x: 0, y: 2 },
      { x: 8, y: 2 },
      { x: 8, y: 10 },
    ]);
  });

  it('should leave the line alone for a zero offset', () => {
    const line = [
      { x: 1, y: 2 },
      { x: 3, y: 4 },
    ];
    expect(offsetPolyline(line, 0)).toEqual(line);
  });
});

describe('layoutScene on the demo', async () => {
  const { model, analysis } = demo();
  const drawings: Record<string, Drawing> = {};
  for (const s of model.scenarios) drawings[s.id] = await layoutScene(scenarioScene(model, analysis, s.id));

  it('should place every node of the scene as a box inside the drawing', () => {
    for (const s of model.scenarios) {
      const d = drawings[s.id]!;
      expect(d.boxes.length).toBe(scenarioScene(model, analysis, s.id).nodes.length);
      for (const b of d.boxes) {
        expect(b.x).toBeGreaterThanOrEqual(0);
        expect(b.y).toBeGreaterThanOrEqual(0);
        expect(b.x + b.width).toBeLessThanOrEqual(d.width);
        expect(b.y + b.height).toBeLessThanOrEqual(d.height);
      }
    }
  });

  it('should not let two boxes overlap', () => {
    for (const d of Object.values(drawings)) {
      for (const a of d.boxes)
        for (const b of d.boxes) {
          if (a === b) continue;
          const apart = a.x + a.width <= b.x || b.x + b.width <= a.x || a.y + a.height <= b.y || b.y + b.height <= a.y;
          expect(apart, `${a.id} and ${b.id}`).toBe(true);
        }
    }
  });

  it('should draw one lane per side that relies on an edge, each apart from the others', () => {
    const scene = scenarioScene(model, analysis, 'S-101');
    const d = drawings['S-101']!;
    for (const e of scene.edges) {
      const drawn = d.edges.find((x) => x.id === e.id)!;
      expect(drawn.lanes.map((l) => l.side)).toEqual(e.sides);
      const starts = drawn.lanes.map((l) => `${l.points[0]!.x},${l.points[0]!.y}`);
      expect(new Set(starts).size).toBe(starts.length);
      for (const l of drawn.lanes) expect(l.classes).toContain(`side-${l.side}`);
    }
  });

  it('should give the shared element a banner in words and a mark per side', () => {
    const bridle = drawings['S-101']!.boxes.find((b) => b.id === 'BR-101')!;
    expect(bridle.banner?.text).toBe('SHARED C+1 \u00b7 voids credit');
    expect(bridle.marks.map((m) => m.letter)).toEqual(['C', '1']);
    expect(bridle.classes).toEqual(expect.arrayContaining(['shared', 'severity-voids-credit']));
  });

  it('should lay out the same scene the same way twice', async () => {
    const again = await layoutScene(scenarioScene(model, analysis, 'S-102'));
    expect(again).toEqual(drawings['S-102']);
  });

  it("should focus a clicked finding's element and path lanes, with bounds to centre on", () => {
    const d = drawings['S-101']!;
    const finding = analysis.findings.find((f) => f.scenario === 'S-101' && f.element === 'BR-101')!;
    const plan = renderPlan(d, { finding: finding.key });
    expect(plan.className).toContain('focusing');
    const focused = plan.edges.flatMap((e) => e.planned.filter((l) => l.className.includes('in-focus')));
    // The path of each side, and what the bridle carries with it: the message names those elements
    // ("and through it `N-101A`, `N-101B`"), and their edges below the bridle are lit for both sides.
    const through = d.findings.find((p) => p.key === finding.key)!.through!;
    expect(through.nodes).toEqual(
      [...finding.message.matchAll(/through it (.*)\)/g)].flatMap((m) =>
        [...m[1]!.matchAll(/`([^`]+)`/g)].map((t) => t[1]),
      ),
    );
    expect(through.nodes).toEqual(['N-101A', 'N-101B']);
    const throughLanes = d.edges
      .filter((e) => through.edges.includes(e.id))
      .reduce((n, e) => n + e.lanes.filter((l) => l.side !== undefined && [0, 1].includes(l.side)).length, 0);
    expect(throughLanes).toBe(4);
    expect(focused.length).toBe(finding.paths.reduce((n, p) => n + p.length - 1, 0) + throughLanes);
    expect(plan.boxes.filter((b) => b.className.split(' ').includes('through')).map((b) => b.id)).toEqual([
      'N-101A',
      'N-101B',
    ]);
    const box = d.boxes.find((b) => b.id === 'BR-101')!;
    const f = plan.focusBounds!;
    expect(box.x).toBeGreaterThanOrEqual(f.x);
    expect(box.x + box.width).toBeLessThanOrEqual(f.x + f.width);
    expect(renderPlan(d).focusBounds).toBeUndefined();
  });
});
