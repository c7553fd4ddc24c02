// Synthetic sites for the benchmark: an invented plant of units, loops, SIFs and scenarios in realistic
// ratios, built from a seed so every run measures the same model. Written to fixtures/generated/.
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import {
  analyze,
  printBulk,
  printJson,
  type Element,
  type Model,
  type PlantFunction,
  type Scenario,
} from '@bulkhead/core';

/** Bump when the generated model changes, so stale files are rebuilt. */
export const GENERATOR_VERSION = 2;
export const GENERATED_DIR = join(dirname(fileURLToPath(import.meta.url)), '..', 'fixtures', 'generated');

const LOOPS_PER_UNIT = 40;
const LOOPS_PER_SIF = 5;
const UNITS_PER_PANEL = 3;
const PANELS_PER_SUBSTATION = 2;
const CHANNELS_PER_CARD = 8;
const LOOPS_PER_JUNCTION_BOX = 8;

/** Invented makes and models; a small catalogue so the diversity rule has something to find. */
const CATALOGUE = [
  ['Calder', 'DP-40'],
  ['Calder', 'PX-3'],
  ['Orrin', 'GR-7'],
  ['Orrin', 'S-9'],
  ['Vessek', 'T-11'],
  ['Vessek', 'M-2'],
] as const;

type Variable = 'level' | 'pressure' | 'flow' | 'temperature';
const LETTER: Record<Variable, string> = { level: 'L', pressure: 'P', flow: 'F', temperature: 'T' };

/** mulberry32: small, fast and good enough to make a deterministic plant. */
function random(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

interface Card {
  tag: string;
  used: number;
}

interface Unit {
  code: string;
  controllers: [string, string];
  solver: string;
  air: string;
  console: string;
  operator: string;
  bpcsCabinet: string;
  sisCabinet: string;
  /** Open card per kind and owner (`AI:U01-C1`), and how many cards of each kind an owner has. */
  cards: Map<string, Card>;
  cardCount: Map<string, number>;
  /** The first SIF sensor's mount, for a voted pair that deliberately shares it. */
  lastSifMount: string;
  equipment: string[];
  pumps: string[];
  fieldBox: string;
  sisBox: string;
  sisBoxB: string;
  loops: number;
  serial: number;
}

/** What a loop's sensor is mounted on, so a deliberately careless SIF can reuse it. */
interface LoopRecord {
  tag: string;
  variable: Variable;
  controller: 0 | 1;
  transmitter: string;
  connection: string;
  equipment: string;
  line: string;
}

export interface GeneratedSite {
  model: Model;
  counts: { elements: number; functions: number; scenarios: number };
}

/** Builds a site of at least `targetElements` elements. The same target and seed give the same model. */
export function generateSite(targetElements: number, seed = 20261): GeneratedSite {
  const rnd = random(seed ^ targetElements);
  const chance = (p: number) => rnd() < p;
  const pick = <T>(list: readonly T[]): T => list[Math.floor(rnd() * list.length)]!;
  const elements: Element[] = [];
  const functions: PlantFunction[] = [];
  const scenarios: Scenario[] = [];
  /** Each controller's and solver's circuit, so its I/O cards can share it. */
  const circuitOf = new Map<string, string>();
  const add = (e: Element) => {
    elements.push(e);
    if (e.kind === 'controller' || e.kind === 'logic-solver') circuitOf.set(e.tag, e.poweredBy![0]!);
    return e.tag;
  };
  const pad = (n: number, width = 3) => String(n).padStart(width, '0');

  add({ kind: 'air-header', tag: 'IA-MAIN', title: 'Site instrument air main' });
  let panelBpcs = '';
  let panelSis = '';
  let upsA = '';
  let upsB = '';
  let unitCount = 0;
  let unit: Unit | undefined;
  const loops: LoopRecord[] = [];

  const newUnit = (): Unit => {
    const n = ++unitCount;
    const code = `U${pad(n, 2)}`;
    if ((n - 1) % (UNITS_PER_PANEL * PANELS_PER_SUBSTATION) === 0) {
      const sub = Math.ceil(n / (UNITS_PER_PANEL * PANELS_PER_SUBSTATION));
      upsA = add({ kind: 'ups', tag: `UPS-${pad(sub, 2)}A`, title: `Instrument UPS A, substation ${sub}` });
      upsB = add({ kind: 'ups', tag: `UPS-${pad(sub, 2)}B`, title: `Instrument UPS B, substation ${sub}` });
    }
    if ((n - 1) % UNITS_PER_PANEL === 0) {
      const p = Math.ceil(n / UNITS_PER_PANEL);
      panelBpcs = add({
        kind: 'power-supply',
        tag: `DB-${pad(p, 2)}B`,
        title: 'BPCS distribution board',
        poweredBy: [upsA],
      });
      // Most SIS boards hang off the other UPS; every fourth shares the BPCS UPS (a note for de-energise SIFs).
      panelSis = add({
        kind: 'power-supply',
        tag: `DB-${pad(p, 2)}S`,
        title: 'SIS distribution board',
        poweredBy: [p % 4 === 0 ? upsA : upsB],
      });
    }
    const ckt = (suffix: string, board: string) =>
      add({ kind: 'circuit', tag: `${code}-CKT-${suffix}`, poweredBy: [board] });
    const cktA = ckt('A', panelBpcs);
    // Controller B normally has its own board; one unit in five puts it on A's circuit (a deliberate shared support).
    const cktB = n % 5 === 0 ? cktA : ckt('B', panelSis);
    const cktS = ckt('S', panelSis);
    const bpcsCabinet = add({ kind: 'cabinet', tag: `${code}-CAB-B`, title: `Unit ${code} BPCS cabinet` });
    const sisCabinet = add({ kind: 'cabinet', tag: `${code}-CAB-S`, title: `Unit ${code} SIS cabinet` });
    const controllers: [string, string] = [
      add({ kind: 'controller', tag: `${code}-C1`, system: 'bpcs', housedIn: [bpcsCabinet], poweredBy: [cktA] }),
      add({ kind: 'controller', tag: `${code}-C2`, system: 'bpcs', housedIn: [bpcsCabinet], poweredBy: [cktB] }),
    ];
    const solver = add({
      kind: 'logic-solver',
      tag: `${code}-LS1`,
      system: 'sis',
      housedIn: [sisCabinet],
      poweredBy: [cktS],
      make: 'Trellan',
      model: 'SX-4',
    });
    const air = add({
      kind: 'air-header',
      tag: `${code}-IA`,
      title: `Unit ${code} instrument air`,
      airFrom: ['IA-MAIN'],
    });
    const consoleTag = add({ kind: 'console', tag: `${code}-CON`, signalVia: [...controllers], poweredBy: [cktA] });
    const operator = add({ kind: 'operator', tag: `${code}-OP`, title: `Unit ${code} board operator` });
    unit = {
      code,
      controllers,
      solver,
      air,
      console: consoleTag,
      operator,
      bpcsCabinet,
      sisCabinet,
      cards: new Map(),
      cardCount: new Map(),
      lastSifMount: '',
      equipment: [],
      pumps: [],
      fieldBox: '',
      sisBox: '',
      sisBoxB: '',
      loops: 0,
      serial: 0,
    };
    return unit;
  };

  /** The next free channel on a card of this kind, opening a new card when the last is full. */
  const channel = (u: Unit, kind: string, owner: string): string => {
    const key = `${kind}:${owner}`;
    let card = u.cards.get(key);
    if (!card || card.used === CHANNELS_PER_CARD) {
      const count = (u.cardCount.get(key) ?? 0) + 1;
      u.cardCount.set(key, count);
      const tag = `${owner}-${kind}${pad(count, 2)}`;
      const housing = owner === u.solver ? u.sisCabinet : u.bpcsCabinet;
      add({ kind: 'io-card', tag, signalVia: [owner], housedIn: [housing], poweredBy: [circuitOf.get(owner)!] });
      card = { tag, used: 0 };
      u.cards.set(key, card);
    }
    card.used++;
    return card.tag;
  };

  /** A process connection for one instrument, and what the transmitter is mounted on. */
  const connection = (number: string, variable: Variable, equipment: string): { mount: string } => {
    switch (variable) {
      case 'level': {
        const a = add({ kind: 'nozzle', tag: `N-${number}A`, mountedOn: [equipment] });
        const b = add({ kind: 'nozzle', tag: `N-${number}B`, mountedOn: [equipment] });
        return { mount: add({ kind: 'bridle', tag: `BR-${number}`, mountedOn: [a, b] }) };
      }
      case 'pressure':
      case 'flow': {
        const n = add({ kind: 'tapping', tag: `TP-${number}`, mountedOn: [equipment] });
        return { mount: add({ kind: 'impulse-line', tag: `IL-${number}`, mountedOn: [n] }) };
      }
      case 'temperature': {
        const n = add({ kind: 'tapping', tag: `TW-${number}`, title: 'Thermowell', mountedOn: [equipment] });
        return { mount: n };
      }
    }
  };

  /** Transmitter plus its field cable to an input channel (`cardKind` AIB keeps a voted pair's cards apart). */
  const transmitter = (
    u: Unit,
    tag: string,
    variable: Variable,
    mount: string,
    owner: string,
    box: string,
    cardKind = 'AI',
  ): string => {
    const card = channel(u, cardKind, owner);
    const cable = add({ kind: 'cable', tag: `${tag}-W`, signalVia: [card], housedIn: [box] });
    const [make, model] = pick(CATALOGUE);
    return add({
      kind: 'transmitter',
      tag,
      variable,
      make,
      model,
      mountedOn: [mount],
      signalVia: [cable],
      housedIn: [box],
    });
  };

  while (elements.length < targetElements) {
    const u = unit && unit.loops < LOOPS_PER_UNIT ? unit : newUnit();
    const k = u.loops++;
    if (k % 4 === 0)
      u.equipment.push(
        add({ kind: pick(['vessel', 'column', 'tank', 'exchanger'] as const), tag: `${u.code}-E${pad(k / 4 + 1)}` }),
      );
    if (k % 8 === 0) u.pumps.push(add({ kind: 'pump', tag: `${u.code}-P${pad(k / 8 + 1)}` }));
    if (k % LOOPS_PER_JUNCTION_BOX === 0)
      u.fieldBox = add({ kind: 'junction-box', tag: `${u.code}-JB${pad(k / LOOPS_PER_JUNCTION_BOX + 1)}` });
    if (k % (LOOPS_PER_JUNCTION_BOX * 2) === 0) {
      // SIS field wiring has its own boxes, one for each channel of a voted pair.
      u.sisBox = add({ kind: 'junction-box', tag: `${u.code}-JBS${pad(k / 16 + 1)}A` });
      u.sisBoxB = add({ kind: 'junction-box', tag: `${u.code}-JBS${pad(k / 16 + 1)}B` });
    }

    const equipment = u.equipment[u.equipment.length - 1]!;
    const variable = pick(['level', 'level', 'pressure', 'pressure', 'flow', 'temperature'] as const);
    const number = `${u.code}-${pad(++u.serial)}`;
    const controller = (k % 2) as 0 | 1;
    const conn = connection(number, variable, equipment);
    const tx = transmitter(
      u,
      `${LETTER[variable]}T-${number}`,
      variable,
      conn.mount,
      u.controllers[controller],
      u.fieldBox,
    );
    const line = add({ kind: 'line', tag: `L-${number}` });
    const positioner = add({
      kind: 'positioner',
      tag: `${LETTER[variable]}Y-${number}`,
      failsTo: 'closed',
      signalVia: [channel(u, 'AO', u.controllers[controller])],
      airFrom: [u.air],
    });
    const valve = add({
      kind: 'control-valve',
      tag: `${LETTER[variable]}V-${number}`,
      failsTo: pick(['closed', 'open'] as const),
      mountedOn: [line],
      signalVia: [positioner],
      airFrom: [u.air],
    });
    const loop = `${LETTER[variable]}IC-${number}`;
    functions.push({ kind: 'loop', tag: loop, sensors: [tx], solver: u.controllers[controller], finals: [valve] });
    loops.push({ tag: loop, variable, controller, transmitter: tx, connection: conn.mount, equipment, line });

    if (k % LOOPS_PER_SIF === LOOPS_PER_SIF - 1) addSif(u, loops[loops.length - 1]!);
  }

  function addSif(u: Unit, loop: LoopRecord): void {
    const number = `${u.code}-${pad(++u.serial)}`;
    const letter = LETTER[loop.variable];
    const voted = chance(0.35);
    const sensors: string[] = [];
    for (let s = 0; s < (voted ? 2 : 1); s++) {
      const suffix = voted ? String.fromCharCode(65 + s) : '';
      let mount: string;
      if (s === 0 && chance(0.08))
        mount = loop.connection; // deliberate: the SIF sensor on the loop's connection
      else if (s === 1 && chance(0.1))
        mount = u.lastSifMount; // deliberate: both channels on one connection
      else mount = connection(`${number}${suffix}`, loop.variable, loop.equipment).mount;
      u.lastSifMount = mount;
      sensors.push(
        transmitter(
          u,
          `${letter}T-${number}${suffix}`,
          loop.variable,
          mount,
          u.solver,
          s === 0 ? u.sisBox : u.sisBoxB,
          s === 0 ? 'AI' : 'AIB',
        ),
      );
    }
    const solenoid = add({
      kind: 'solenoid',
      tag: `XY-${number}`,
      failsTo: 'closed',
      signalVia: [channel(u, 'DO', u.solver)],
    });
    const valve = add({
      kind: 'shutdown-valve',
      tag: `XV-${number}`,
      failsTo: 'closed',
      mountedOn: [loop.line],
      signalVia: [solenoid],
      airFrom: [u.air],
    });
    const sif = `SIF-${number}`;
    const sil = chance(0.3) ? 2 : 1;
    const pfd = sil === 2 ? pick([0.005, 0.008, 0.004]) : pick([0.05, 0.02, 0.03]);
    functions.push({
      kind: 'sif',
      tag: sif,
      sensors,
      ...(voted ? { sensorVoting: '1oo2' } : {}),
      solver: u.solver,
      finals: [valve],
      trip: 'close',
      tripMode: 'de-energise',
      sil,
      pfd,
    });
    const layers: { function: string; pfd?: number; basis?: string }[] = [{ function: sif, pfd }];

    if (chance(0.3)) {
      const other = u.controllers[1 - loop.controller]!;
      const careless = rnd();
      // Mostly a separate transmitter in the other controller; sometimes the loop's own (deliberate mistakes).
      const raisedIn = careless < 0.1 ? u.controllers[loop.controller] : other;
      let sensor = loop.transmitter;
      if (careless >= 0.2) {
        const conn = connection(`${number}H`, loop.variable, loop.equipment);
        sensor = transmitter(u, `${letter}T-${number}H`, loop.variable, conn.mount, raisedIn, u.fieldBox);
      }
      const starter = add({
        kind: 'motor-starter',
        tag: `MS-${number}`,
        failsTo: 'off',
        mountedOn: [u.pumps[u.pumps.length - 1]!],
        signalVia: [channel(u, 'DO', raisedIn)],
      });
      const alarm = `${letter}AH-${number}`;
      functions.push({
        kind: 'alarm',
        tag: alarm,
        sensors: [sensor],
        raisedIn,
        console: u.console,
        operator: u.operator,
        finals: [starter],
        minutes: pick([15, 20, 30]),
      });
      layers.push({ function: alarm, pfd: 0.1, basis: 'Operator response (invented)' });
    }
    if (loop.variable === 'pressure' && chance(0.6)) {
      const nozzle = add({ kind: 'nozzle', tag: `N-${number}R`, title: 'Relief nozzle', mountedOn: [loop.equipment] });
      const psv = add({ kind: 'relief-valve', tag: `PSV-${number}`, mountedOn: [nozzle] });
      functions.push({ kind: 'device', tag: `IPL-${psv}`, device: psv });
      layers.push({ function: `IPL-${psv}`, pfd: 0.01, basis: 'Relief sized for the case (invented)' });
    }
    scenarios.push({
      id: `S-${number}`,
      title: `${loop.tag} fails and ${loop.variable} runs away`,
      category: pick(['people-serious', 'people-fatal', 'release-major'] as const),
      // Half the causes take the typical loop-failure row, half a site figure with its basis.
      cause: chance(0.5)
        ? { function: loop.tag, typical: 'bpcs-loop-failure' }
        : { function: loop.tag, frequency: 0.1, basis: 'Site failure records (invented)' },
      layers,
    });
  }

  const model: Model = {
    site: {
      name: `Synthetic site, ${targetElements} elements`,
      description: 'Invented site generated for the benchmark; no real plant is described.',
      comments: [
        ` Generated by bench/generate.ts version ${GENERATOR_VERSION}, seed ${seed}. Do not edit: regenerated on demand.`,
      ],
    },
    categories: [
      { id: 'people-serious', title: 'Serious injury', tolerable: 1e-4, harm: 'people' },
      { id: 'people-fatal', title: 'Single fatality', tolerable: 1e-5, harm: 'people' },
      { id: 'release-major', title: 'Major loss of containment', tolerable: 1e-3, harm: 'containment' },
    ],
    elements,
    functions,
    scenarios,
  };
  // A reviewed site has accepted some of its findings: accept every tenth one that asks for a justification.
  const open = analyze(model).findings.filter((f) => f.severity === 'needs-justification');
  const accepted = open.filter((_, i) => i % 10 === 0);
  if (accepted.length) {
    model.justifications = accepted.map((f) => ({
      finding: f.key,
      by: 'Benchmark reviewer (invented)',
      date: '2026-01-15',
      reason: 'Synthetic acceptance for the benchmark',
    }));
  }
  return { model, counts: { elements: elements.length, functions: functions.length, scenarios: scenarios.length } };
}

export interface GeneratedFiles {
  bulk: string;
  json: string;
}

/** The site's files, written again only when missing or made by another generator version or seed. */
export function ensureGenerated(targetElements: number, seed = 20261): GeneratedFiles {
  const base = join(GENERATED_DIR, `site-${targetElements}`);
  const files = { bulk: `${base}.bulk`, json: `${base}.json` };
  const stamp = `# Generated by bench/generate.ts version ${GENERATOR_VERSION}, seed ${seed}.`;
  const fresh = existsSync(files.json) && existsSync(files.bulk) && readFileSync(files.bulk, 'utf8').startsWith(stamp);
  if (fresh) return files;
  mkdirSync(GENERATED_DIR, { recursive: true });
  const { model } = generateSite(targetElements, seed);
  writeFileSync(files.json, printJson(model));
  writeFileSync(files.bulk, printBulk(model));
  return files;
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  for (const size of process.argv.slice(2).map(Number)) {
    const files = ensureGenerated(size);
    process.stdout.write(`${files.bulk}\n${files.json}\n`);
  }
}
