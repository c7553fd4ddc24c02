// The Tracer: each function's closure of elements with the path that explains each one, per channel,
// stopping at process equipment, and the parts an instrumented layer needs but the model does not give.
// Models here are invented test data.
import { describe, expect, it } from 'vitest';
import { buildPlantGraph, loadModelText, Tracer, type Model, type PlantGraph } from '@bulkhead/core';

const SITE = `site "Trace test site (invented)"
category c tolerable=1e-4 harm=people
ups UPS-1
circuit CK-1 powered-by=UPS-1
air-header IA-1
cabinet CAB-1
controller C-1 system=bpcs powered-by=CK-1 housed-in=CAB-1
logic-solver S-1 system=sis powered-by=CK-1
vessel V-1
line L-1
nozzle N-1 mounted-on=V-1
nozzle N-2 mounted-on=V-1
bridle BR-1 mounted-on=N-1,N-2
impulse-line IL-1 mounted-on=N-2
io-card AI-1 signal-via=C-1 powered-by=CK-1 housed-in=CAB-1
io-card AI-2 signal-via=S-1
io-card DO-2 signal-via=S-1
transmitter LT-1 mounted-on=BR-1 signal-via=AI-1
transmitter LT-2 mounted-on=IL-1 signal-via=AI-2
transmitter LT-3 mounted-on=N-1 signal-via=AI-2
transmitter LT-9 signal-via=AI-2
control-valve LV-1 fails-to=closed mounted-on=L-1 signal-via=AI-1 air-from=IA-1
solenoid XY-1 fails-to=closed signal-via=DO-2
shutdown-valve XV-1 fails-to=closed mounted-on=L-1 signal-via=XY-1 air-from=IA-1
operator OP-1
console CON-1 signal-via=C-1
relief-valve PSV-1 mounted-on=N-2
relief-valve PSV-9
loop LC-1 sensors=LT-1 solver=C-1 finals=LV-1
sif SF-1 sensors=LT-2,LT-3 sensor-voting=1oo2 solver=S-1 finals=XV-1 trip=close trip-mode=de-energise
sif SF-9 sensors=LT-9 solver=S-1 finals=XV-1 trip=close trip-mode=de-energise
alarm AL-1 sensors=LT-3 raised-in=C-1 console=CON-1 operator=OP-1 finals=XV-1 minutes=20
alarm AL-9 sensors=LT-3 raised-in=C-1 operator=OP-1 minutes=20
device D-1 device=PSV-1
device D-9 device=PSV-9
`;

function load(text: string): Model {
  const loaded = loadModelText('trace.bulk', text);
  if (!loaded.model || loaded.diagnostics.length > 0)
    throw new Error(loaded.diagnostics.map((d) => `${d.code} ${d.message}`).join('; '));
  return loaded.model;
}

const tracer = new Tracer(buildPlantGraph(load(SITE)));
const sorted = (set: Iterable<string>) => [...set].sort();
const pathOf = (fn: string, tag: string) => tracer.traceFunction(fn).elements.find((e) => e.tag === tag);

describe('Tracer.closure', () => {
  it('is the element itself and everything it relies on, by every link', () => {
    expect(sorted(tracer.closure('LT-1'))).toEqual([
      'AI-1',
      'BR-1',
      'C-1',
      'CAB-1',
      'CK-1',
      'LT-1',
      'N-1',
      'N-2',
      'UPS-1',
      'V-1',
    ]);
  });

  it('of an element that relies on nothing is the element alone', () => {
    expect(sorted(tracer.closure('UPS-1'))).toEqual(['UPS-1']);
    expect(sorted(tracer.closure('PSV-9'))).toEqual(['PSV-9']);
  });

  it('includes process equipment but goes no further than it', () => {
    // A loaded model cannot link equipment to anything, so build the one graph that does by hand.
    const graph: PlantGraph = buildPlantGraph(load(SITE));
    graph.addEdge('V-1', 'UPS-1', { role: 'poweredBy' });
    const hand = new Tracer(graph);
    expect(hand.closure('N-1').has('V-1')).toBe(true);
    expect(hand.closure('N-1').has('UPS-1')).toBe(false);
    expect(hand.paths('N-1').map((e) => e.tag)).toEqual(['N-1', 'V-1']);
    // Traced from the equipment itself, it is expanded: it is the start, not a stop on the way.
    expect(hand.paths('V-1').map((e) => e.tag)).toEqual(['UPS-1', 'V-1']);
  });
});

describe('Tracer.paths and traceFunction', () => {
  it('gives each element the shortest path from the function, with the link taken at each step', () => {
    expect(pathOf('LC-1', 'N-2')).toMatchObject({
      kind: 'nozzle',
      group: 'connection',
      path: ['LC-1', 'LT-1', 'BR-1', 'N-2'],
      links: ['sensor', 'mountedOn', 'mountedOn'],
    });
    expect(pathOf('LC-1', 'C-1')).toMatchObject({ path: ['LC-1', 'C-1'], links: ['solver'] });
    expect(pathOf('LC-1', 'UPS-1')).toMatchObject({
      path: ['LC-1', 'C-1', 'CK-1', 'UPS-1'],
      links: ['solver', 'poweredBy', 'poweredBy'],
    });
    expect(pathOf('LC-1', 'IA-1')).toMatchObject({ path: ['LC-1', 'LV-1', 'IA-1'], links: ['final', 'airFrom'] });
  });

  it('lists every element once, sorted by tag, and no functions', () => {
    const tags = tracer.traceFunction('SF-1').elements.map((e) => e.tag);
    expect(tags).toEqual([
      'AI-2',
      'CK-1',
      'DO-2',
      'IA-1',
      'IL-1',
      'L-1',
      'LT-2',
      'LT-3',
      'N-1',
      'N-2',
      'S-1',
      'UPS-1',
      'V-1',
      'XV-1',
      'XY-1',
    ]);
  });

  it('traces each voting channel on its own, head first', () => {
    const { channels } = tracer.traceFunction('SF-1');
    expect(channels).toEqual([
      { role: 'sensor', head: 'LT-2', elements: ['AI-2', 'CK-1', 'IL-1', 'LT-2', 'N-2', 'S-1', 'UPS-1', 'V-1'] },
      { role: 'sensor', head: 'LT-3', elements: ['AI-2', 'CK-1', 'LT-3', 'N-1', 'S-1', 'UPS-1', 'V-1'] },
      { role: 'final', head: 'XV-1', elements: ['CK-1', 'DO-2', 'IA-1', 'L-1', 'S-1', 'UPS-1', 'XV-1', 'XY-1'] },
    ]);
  });

  it('follows an alarm through where it is raised, its console and its operator', () => {
    expect(pathOf('AL-1', 'C-1')).toMatchObject({ path: ['AL-1', 'C-1'], links: ['raisedIn'] });
    expect(pathOf('AL-1', 'CON-1')).toMatchObject({ path: ['AL-1', 'CON-1'], links: ['console'] });
    expect(pathOf('AL-1', 'OP-1')).toMatchObject({ path: ['AL-1', 'OP-1'], links: ['operator'] });
  });

  it('traces from an element too (a cause that is one element), starting at it', () => {
    expect(tracer.paths('XY-1').map((e) => [e.tag, e.path.join(' ')])).toEqual([
      ['CK-1', 'XY-1 DO-2 S-1 CK-1'],
      ['DO-2', 'XY-1 DO-2'],
      ['S-1', 'XY-1 DO-2 S-1'],
      ['UPS-1', 'XY-1 DO-2 S-1 CK-1 UPS-1'],
      ['XY-1', 'XY-1'],
    ]);
  });

  it('traces a function once: a second call returns the same result', () => {
    expect(tracer.traceFunction('SF-1')).toBe(tracer.traceFunction('SF-1'));
    expect(() => tracer.traceFunction('LT-1')).toThrow(/LT-1 is not a function/);
  });
});

describe('missing parts', () => {
  it('are none for a complete loop, SIF, alarm and device', () => {
    for (const fn of ['LC-1', 'SF-1', 'AL-1', 'D-1']) expect(tracer.traceFunction(fn).missing, fn).toEqual([]);
  });

  it('name a sensor with no process connection', () => {
    expect(tracer.traceFunction('SF-9').missing).toEqual(['process-connection']);
  });

  it('name an alarm with no final element for the operator to act on', () => {
    expect(tracer.traceFunction('AL-9').missing).toEqual(['final-element']);
  });

  it('name the sensor, solver and final element of a function that has none (only a hand-built graph can)', () => {
    const graph: PlantGraph = buildPlantGraph(load(SITE));
    graph.addNode('SF-X', { type: 'function', kind: 'sif' });
    expect(new Tracer(graph).traceFunction('SF-X').missing).toEqual(['sensor', 'solver', 'final-element']);
  });

  it('name a mechanical device mounted on nothing', () => {
    expect(tracer.traceFunction('D-9').missing).toEqual(['process-connection']);
  });
});

describe('Tracer.lacksSupplyRoute', () => {
  const lines = (extra: string) =>
    load(
      `${SITE}transmitter LT-7 supply=from-signal mounted-on=N-1 signal-via=AI-1\ntransmitter LT-8 supply=from-signal mounted-on=N-1\npositioner ZP-7 supply=mechanical signal-via=AI-1\n${extra}`,
    );
  const t = new Tracer(buildPlantGraph(lines('')));

  it('is false for an element with a supply link, and for passive elements and supports', () => {
    expect(['C-1', 'AI-1', 'LV-1', 'XV-1'].filter((tag) => t.lacksSupplyRoute(tag))).toEqual([]);
    expect(
      ['N-1', 'BR-1', 'CAB-1', 'UPS-1', 'CK-1', 'IA-1', 'OP-1', 'PSV-1', 'V-1'].filter((tag) =>
        t.lacksSupplyRoute(tag),
      ),
    ).toEqual([]);
  });

  it('is true for an active element that says nothing (a card, a solenoid, a console, a transmitter)', () => {
    expect(['AI-2', 'DO-2', 'XY-1', 'CON-1', 'LT-1'].filter((tag) => t.lacksSupplyRoute(tag))).toEqual([
      'AI-2',
      'DO-2',
      'XY-1',
      'CON-1',
      'LT-1',
    ]);
  });

  it('accepts supply=mechanical, and supply=from-signal only with a signal link to draw on', () => {
    expect(t.lacksSupplyRoute('ZP-7')).toBe(false);
    expect(t.lacksSupplyRoute('LT-7')).toBe(false);
    expect(t.lacksSupplyRoute('LT-8')).toBe(true);
  });
});

describe('reliance by role', () => {
  // LV-1 takes its signal from the BPCS card AI-1 and from a SIS solenoid XY-7 on card DO-2 (solver S-1).
  const model = load(
    SITE.replace(
      'control-valve LV-1 fails-to=closed mounted-on=L-1 signal-via=AI-1 air-from=IA-1',
      'control-valve LV-1 fails-to=closed mounted-on=L-1 signal-via=AI-1,XY-7 air-from=IA-1',
    ) +
      'solenoid XY-7 fails-to=closed signal-via=DO-2\nsif SF-7 sensors=LT-2 solver=S-1 finals=LV-1 trip=close trip-mode=de-energise\n',
  );
  const t = new Tracer(buildPlantGraph(model));

  it('a SIF acting on a BPCS valve through its own solenoid does not rely on the BPCS card or controller', () => {
    const channel = t.traceFunction('SF-7').channels.find((c) => c.role === 'final')!;
    expect(channel.elements).toEqual(['CK-1', 'DO-2', 'IA-1', 'L-1', 'LV-1', 'S-1', 'UPS-1', 'XY-7']);
    expect(t.traceFunction('SF-7').elements.map((e) => e.tag)).not.toContain('C-1');
  });

  it('the loop relies on its valve through its own card, not the SIS solenoid', () => {
    const tags = t.traceFunction('LC-1').elements.map((e) => e.tag);
    expect(tags).toContain('AI-1');
    expect(tags).not.toContain('XY-7');
  });

  it('an element traced on its own (an element cause) keeps every link', () => {
    expect(sorted(t.closure('LV-1'))).toEqual(expect.arrayContaining(['AI-1', 'C-1', 'XY-7', 'S-1']));
  });
});
