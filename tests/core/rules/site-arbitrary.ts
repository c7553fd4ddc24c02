// A fast-check generator of small random but valid sites (invented test data) for the independence
// properties: a cause and up to four layers, each on its own train of elements, and shared dependencies
// that can be added between any two sides. Rendered to .bulk text under any naming of the tags.
import fc from 'fast-check';

export type LayerKind = 'sif' | 'trip' | 'alarm' | 'device';

export interface LayerSpec {
  kind: LayerKind;
  /** Sensor channels of a SIF or trip (voted 1oo2 when two). */
  channels: 1 | 2;
  connection: 'nozzle' | 'bridle' | 'impulse-line';
  tripMode: 'de-energise' | 'energise';
  /** How the SIF or trip valve (and its solenoid) fails; undefined: not stated. */
  failsTo: 'closed' | 'open' | undefined;
  pfd: number;
}

export interface SiteSpec {
  cause: 'loop' | 'external';
  layers: LayerSpec[];
}

/** The parts of a side a sharing can hang on; each names a canonical tag. */
type Part = 'sensor' | 'card' | 'solver' | 'final' | 'connectionUser';

export const SHARING_KINDS = [
  'tapping',
  'sensor-circuit',
  'junction-box',
  'network',
  'cabinet',
  'solver-circuit',
  'air',
] as const;
export type SharingKind = (typeof SHARING_KINDS)[number];

export interface Sharing {
  kind: SharingKind;
  /** Indices into the sides (the cause, when a loop, is side 0). */
  between: [number, number];
}

interface ElementLine {
  keyword: string;
  tag: string;
  attrs: Record<string, string[]>;
}

interface SideModel {
  /** The function tag; for the cause loop, the loop. */
  fn: string;
  parts: Partial<Record<Part, string>>;
}

const layerArb: fc.Arbitrary<LayerSpec> = fc.record({
  kind: fc.constantFrom<LayerKind>('sif', 'sif', 'trip', 'alarm', 'device'),
  channels: fc.constantFrom<1 | 2>(1, 2),
  connection: fc.constantFrom('nozzle', 'bridle', 'impulse-line'),
  tripMode: fc.constantFrom('de-energise', 'energise'),
  failsTo: fc.constantFrom('closed', 'open', undefined),
  // Decades and 0.005 only: two sets of as many layers then have equal products only if they have the same
  // PFDs, so a tie between them is always a tie between layers of equal PFD (see the renaming property).
  pfd: fc.constantFrom(0.1, 0.01, 0.005),
});

export const siteArb: fc.Arbitrary<SiteSpec> = fc.record({
  cause: fc.constantFrom('loop', 'external'),
  layers: fc.array(layerArb, { minLength: 1, maxLength: 4 }),
});

/** The sides of a site, in order: the cause loop (if any), then the layers. */
export function sideCount(site: SiteSpec): number {
  return site.layers.length + (site.cause === 'loop' ? 1 : 0);
}

export const sharingArb = (site: SiteSpec): fc.Arbitrary<Sharing> =>
  fc.record({
    kind: fc.constantFrom(...SHARING_KINDS),
    between: fc.uniqueArray(fc.integer({ min: 0, max: sideCount(site) - 1 }), {
      minLength: 2,
      maxLength: 2,
    }) as fc.Arbitrary<[number, number]>,
  });

const PART_OF: Record<SharingKind, { part: Part; link: string; keyword: string }> = {
  tapping: { part: 'connectionUser', link: 'mounted-on', keyword: 'tapping' },
  'sensor-circuit': { part: 'sensor', link: 'powered-by', keyword: 'circuit' },
  'junction-box': { part: 'sensor', link: 'housed-in', keyword: 'junction-box' },
  network: { part: 'card', link: 'signal-via', keyword: 'network' },
  cabinet: { part: 'solver', link: 'housed-in', keyword: 'cabinet' },
  'solver-circuit': { part: 'solver', link: 'powered-by', keyword: 'circuit' },
  air: { part: 'final', link: 'air-from', keyword: 'air-header' },
};

/** Builds the site's statements on canonical tags; `sharings` add fresh shared elements and links. */
function build(site: SiteSpec, sharings: readonly Sharing[]) {
  const elements: ElementLine[] = [];
  const functions: string[][] = [];
  const add = (keyword: string, tag: string, attrs: Record<string, string[]> = {}) =>
    elements.push({ keyword, tag, attrs });
  add('vessel', 'V');
  add('line', 'L');
  add('pump', 'P');
  const sides: SideModel[] = [];
  if (site.cause === 'loop') {
    add('ups', 'U0');
    add('circuit', 'K0', { 'powered-by': ['U0'] });
    add('air-header', 'A0');
    add('controller', 'C0', { system: ['bpcs'], 'powered-by': ['K0'] });
    add('nozzle', 'N0', { 'mounted-on': ['V'] });
    add('io-card', 'I0', { 'signal-via': ['C0'], 'powered-by': ['K0'] });
    add('io-card', 'O0', { 'signal-via': ['C0'], 'powered-by': ['K0'] });
    add('transmitter', 'T0', {
      make: ['"Make-0"'],
      model: ['"M"'],
      supply: ['from-signal'],
      'mounted-on': ['N0'],
      'signal-via': ['I0'],
    });
    add('control-valve', 'CV0', {
      'fails-to': ['closed'],
      'mounted-on': ['L'],
      'signal-via': ['O0'],
      'air-from': ['A0'],
    });
    functions.push(['loop', 'LOOP0', 'sensors=T0', 'solver=C0', 'finals=CV0']);
    sides.push({ fn: 'LOOP0', parts: { sensor: 'T0', card: 'I0', solver: 'C0', final: 'CV0', connectionUser: 'T0' } });
  }
  site.layers.forEach((layer, n) => {
    const i = n + 1;
    const fn = `F${i}`;
    if (layer.kind === 'device') {
      add('nozzle', `N${i}`, { 'mounted-on': ['V'] });
      add('relief-valve', `R${i}`, { 'mounted-on': [`N${i}`] });
      functions.push(['device', fn, `device=R${i}`]);
      sides.push({ fn, parts: { connectionUser: `R${i}` } });
      return;
    }
    const solver = layer.kind === 'sif' ? `S${i}` : `C${i}`;
    add('ups', `U${i}`);
    add('circuit', `K${i}`, { 'powered-by': [`U${i}`] });
    add(layer.kind === 'sif' ? 'logic-solver' : 'controller', solver, {
      system: [layer.kind === 'sif' ? 'sis' : 'bpcs'],
      'powered-by': [`K${i}`],
    });
    add('io-card', `O${i}`, { 'signal-via': [solver], 'powered-by': [`K${i}`] });
    const channels = layer.kind === 'alarm' ? 1 : layer.channels;
    const sensors: string[] = [];
    for (let c = 0; c < channels; c++) {
      const nozzle = `N${i}-${c}`;
      add('nozzle', nozzle, { 'mounted-on': ['V'] });
      let mount = nozzle;
      if (layer.connection !== 'nozzle') {
        mount = `${layer.connection === 'bridle' ? 'B' : 'IL'}${i}-${c}`;
        add(layer.connection, mount, { 'mounted-on': [nozzle] });
      }
      add('io-card', `I${i}-${c}`, { 'signal-via': [solver], 'powered-by': [`K${i}`] });
      add('transmitter', `T${i}-${c}`, {
        make: [`"Make-${i}-${c}"`],
        model: ['"M"'],
        supply: ['from-signal'],
        'mounted-on': [mount],
        'signal-via': [`I${i}-${c}`],
      });
      sensors.push(`T${i}-${c}`);
    }
    const voting = channels === 2 ? ['sensor-voting=1oo2'] : [];
    if (layer.kind === 'alarm') {
      add('console', `CON${i}`, { 'signal-via': [solver], 'powered-by': [`K${i}`] });
      add('operator', `OP${i}`);
      add('motor-starter', `M${i}`, {
        'fails-to': ['off'],
        'mounted-on': ['P'],
        'signal-via': [`O${i}`],
        'powered-by': [`K${i}`],
      });
      functions.push([
        'alarm',
        fn,
        `sensors=${sensors[0]}`,
        `raised-in=${solver}`,
        `console=CON${i}`,
        `operator=OP${i}`,
        `finals=M${i}`,
        'minutes=20',
      ]);
      sides.push({
        fn,
        parts: { sensor: sensors[0]!, card: `I${i}-0`, solver, final: `M${i}`, connectionUser: sensors[0]! },
      });
      return;
    }
    const failsTo: Record<string, string[]> = layer.failsTo ? { 'fails-to': [layer.failsTo] } : {};
    add('air-header', `A${i}`);
    add('solenoid', `Y${i}`, { ...failsTo, supply: ['from-signal'], 'signal-via': [`O${i}`] });
    add('shutdown-valve', `X${i}`, { ...failsTo, 'mounted-on': ['L'], 'signal-via': [`Y${i}`], 'air-from': [`A${i}`] });
    functions.push([
      layer.kind,
      fn,
      `sensors=${sensors.join(',')}`,
      ...voting,
      `solver=${solver}`,
      `finals=X${i}`,
      'trip=close',
      `trip-mode=${layer.tripMode}`,
    ]);
    sides.push({
      fn,
      parts: { sensor: sensors[0]!, card: `I${i}-0`, solver, final: `X${i}`, connectionUser: sensors[0]! },
    });
  });
  sharings.forEach((sharing, k) => {
    const { part, link, keyword } = PART_OF[sharing.kind];
    const users = sharing.between.map((s) => sides[s]?.parts[part]).filter((t): t is string => t !== undefined);
    if (users.length < 2) return; // one of the sides has no such part (a relief valve has no card)
    const shared = `SH${k}`;
    add(keyword, shared, keyword === 'tapping' ? { 'mounted-on': ['V'] } : {});
    for (const user of users) {
      const line = elements.find((e) => e.tag === user)!;
      line.attrs[link] = [...(line.attrs[link] ?? []), shared];
    }
  });
  return { elements, functions, sides };
}

/** Every canonical tag the site uses (elements, functions, the category and the scenario). */
export function canonicalTags(site: SiteSpec, sharings: readonly Sharing[] = []): string[] {
  const { elements, functions } = build(site, sharings);
  return ['CAT', 'SCN', ...elements.map((e) => e.tag), ...functions.map((f) => f[1]!)];
}

/** The site as .bulk text, with each canonical tag written as `name(tag)`. */
export function siteText(
  site: SiteSpec,
  sharings: readonly Sharing[] = [],
  name: (tag: string) => string = (t) => t,
): string {
  const { elements, functions } = build(site, sharings);
  const rename = (word: string) =>
    word.replace(/^([a-z-]+=)(.*)$/, (_m, key: string, list: string) => key + list.split(',').map(name).join(','));
  const attr = (key: string, values: string[]) =>
    key === 'system' || key === 'fails-to' || key === 'supply' || key === 'make' || key === 'model'
      ? `${key}=${values.join(',')}`
      : `${key}=${values.map(name).join(',')}`;
  const lines = [
    'site "Property site (invented)"',
    `category ${name('CAT')} tolerable=1e-6 harm=containment`,
    ...elements.map((e) => [e.keyword, name(e.tag), ...Object.entries(e.attrs).map(([k, v]) => attr(k, v))].join(' ')),
    ...functions.map(([keyword, tag, ...attrs]) => [keyword, name(tag!), ...attrs.map(rename)].join(' ')),
    `scenario ${name('SCN')} category=${name('CAT')}`,
    site.cause === 'loop'
      ? `  cause function=${name('LOOP0')} frequency=0.1 basis="generated"`
      : '  cause external="Feed upset" frequency=0.1 basis="generated"',
    ...site.layers.map(
      (layer, n) =>
        `  layer ${name(`F${n + 1}`)} pfd=${layer.kind === 'trip' || layer.kind === 'alarm' ? 0.1 : layer.pfd} basis="generated"`,
    ),
  ];
  return lines.join('\n') + '\n';
}

/** Tags the loader accepts (TAG_PATTERN), starting with a letter so no tag reads as a number. */
export const tagArb: fc.Arbitrary<string> = fc.stringMatching(/^[A-Za-z][A-Za-z0-9_.\-/+:]{0,11}$/);
