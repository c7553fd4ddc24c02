// Invented large models for the layout benchmark: a site made of many copies of the demo unit (every
// tag suffixed per copy), and one scenario whose functions have so many channels that its focused
// graph reaches a given node count. Benchmark data only: no real plant.
import { readFileSync } from 'node:fs';
import {
  LINK_FIELDS,
  loadModelText,
  type Element,
  type Model,
  type PlantFunction,
  type Scenario,
} from '@bulkhead/core';

const DEMO = new URL('../fixtures/demo/marrow-fen.bulk', import.meta.url);

export function demoModel(): Model {
  const loaded = loadModelText('marrow-fen.bulk', readFileSync(DEMO));
  if (!loaded.model) throw new Error('the demo model does not load');
  return loaded.model;
}

function renameElement(e: Element, rename: (t: string) => string): Element {
  const copy = { ...e, tag: rename(e.tag) } as Record<string, unknown>;
  for (const field of LINK_FIELDS) {
    const targets = e[field];
    if (targets) copy[field] = targets.map(rename);
  }
  return copy as Element;
}

function renameFunction(f: PlantFunction, rename: (t: string) => string): PlantFunction {
  const copy = { ...f, tag: rename(f.tag) } as Record<string, unknown>;
  for (const field of ['sensors', 'finals'] as const)
    if (field in f && f[field as keyof PlantFunction])
      copy[field] = (f[field as keyof PlantFunction] as string[]).map(rename);
  for (const field of ['solver', 'raisedIn', 'console', 'operator', 'device'] as const) {
    const value = (f as Record<string, unknown>)[field];
    if (typeof value === 'string') copy[field] = rename(value);
  }
  return copy as PlantFunction;
}

function renameScenario(s: Scenario, rename: (t: string) => string): Scenario {
  return {
    ...s,
    id: rename(s.id),
    cause: {
      ...s.cause,
      ...(s.cause.function ? { function: rename(s.cause.function) } : {}),
      ...(s.cause.element ? { element: rename(s.cause.element) } : {}),
      ...(s.cause.only ? { only: rename(s.cause.only) } : {}),
    },
    ...(s.layers ? { layers: s.layers.map((l) => ({ ...l, function: rename(l.function) })) } : {}),
  };
}

/** A site of at least `elements` elements: copies of the demo unit, tags suffixed `.U1`, `.U2`... */
export function generateSite(elements: number): Model {
  const demo = demoModel();
  const copies = Math.ceil(elements / demo.elements.length);
  const model: Model = {
    ...demo,
    site: { name: `Invented site of ${copies} demo units` },
    elements: [],
    functions: [],
    scenarios: [],
    justifications: [],
  };
  for (let i = 1; i <= copies; i++) {
    const rename = (t: string) => `${t}.U${i}`;
    model.elements.push(...demo.elements.map((e) => renameElement(e, rename)));
    model.functions.push(...demo.functions.map((f) => renameFunction(f, rename)));
    model.scenarios.push(...demo.scenarios.map((s) => renameScenario(s, rename)));
  }
  return model;
}

/**
 * One scenario whose focused graph has about `nodes` nodes: a cause loop and two layers, each with
 * many transmitters (each on its own tapping and impulse line, through an I/O card), the layers
 * sharing one card with the cause so there are findings to mark.
 */
export function generateWideScenario(nodes: number): Model {
  const demo = demoModel();
  const elements: Element[] = [...demo.elements];
  const functions: PlantFunction[] = [];
  // Each sensor channel brings a transmitter, a tapping and an impulse line (3 channels a side: 9
  // nodes); the cards, functions, solvers, final elements and supports add about 33 more.
  const channels = Math.max(3, Math.ceil((nodes - 33) / 9));
  const sides = ['CAUSE', 'SIFA', 'SIFB'] as const;
  const sensorsOf: Record<string, string[]> = {};
  for (const side of sides) {
    sensorsOf[side] = [];
    for (let c = 0; c < channels; c++) {
      const card =
        side === 'CAUSE' || c === 0
          ? `AI-W-${side === 'CAUSE' ? 'C' : side}-${Math.floor(c / 8)}`
          : `AI-W-${side}-${Math.floor(c / 8)}`;
      if (!elements.some((e) => e.tag === card)) {
        elements.push({
          kind: 'io-card',
          tag: card,
          signalVia: [side === 'CAUSE' ? 'BPCS-C1' : 'SIS-1'],
          housedIn: [side === 'CAUSE' ? 'CAB-1' : 'CAB-2'],
          poweredBy: [side === 'CAUSE' ? 'CKT-11' : 'CKT-21'],
        });
      }
      const n = `${side}-${c}`;
      elements.push({ kind: 'tapping', tag: `TP-W-${n}`, mountedOn: ['V-101'] });
      elements.push({ kind: 'impulse-line', tag: `IL-W-${n}`, mountedOn: [`TP-W-${n}`] });
      // The first channel of each layer shares the cause's first card: a shared I/O card to mark.
      const via = side !== 'CAUSE' && c === 0 ? 'AI-W-C-0' : card;
      elements.push({
        kind: 'transmitter',
        tag: `PT-W-${n}`,
        variable: 'pressure',
        mountedOn: [`IL-W-${n}`],
        signalVia: [via],
      });
      sensorsOf[side]!.push(`PT-W-${n}`);
    }
  }
  functions.push({ kind: 'loop', tag: 'PIC-W', sensors: sensorsOf.CAUSE!, solver: 'BPCS-C1', finals: ['PV-201'] });
  functions.push({
    kind: 'sif',
    tag: 'SIF-WA',
    sensors: sensorsOf.SIFA!,
    sensorVoting: `1oo${channels}`,
    solver: 'SIS-1',
    finals: ['XV-201'],
    trip: 'close',
    tripMode: 'de-energise',
    pfd: 0.01,
  });
  functions.push({
    kind: 'sif',
    tag: 'SIF-WB',
    sensors: sensorsOf.SIFB!,
    sensorVoting: `1oo${channels}`,
    solver: 'SIS-1',
    finals: ['XV-101'],
    trip: 'close',
    tripMode: 'de-energise',
    pfd: 0.01,
  });
  return {
    ...demo,
    site: { name: 'Invented wide scenario' },
    elements,
    functions,
    scenarios: [
      {
        id: 'S-WIDE',
        category: demo.categories[0]!.id,
        cause: { function: 'PIC-W', frequency: 0.1 },
        layers: [
          { function: 'SIF-WA', pfd: 0.01 },
          { function: 'SIF-WB', pfd: 0.01 },
        ],
      },
    ],
    justifications: [],
  };
}
