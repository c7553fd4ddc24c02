// The element kinds a model may use, grouped by the role they play in a protection layer.
// The groups drive link checking, tracing and the independence rules, so they live in one table.

export const ELEMENT_GROUPS = {
  equipment: ['vessel', 'column', 'tank', 'pump', 'compressor', 'exchanger', 'line'],
  connection: ['nozzle', 'tapping', 'bridle', 'manifold', 'root-valve'],
  impulse: ['impulse-line', 'capillary'],
  sensor: ['transmitter', 'switch', 'detector'],
  signal: ['io-card', 'cable', 'network'],
  housing: ['cabinet', 'junction-box', 'cable-route'],
  solver: ['controller', 'logic-solver'],
  final: ['control-valve', 'shutdown-valve', 'motor-starter'],
  actuation: ['actuator', 'solenoid', 'positioner'],
  support: ['power-supply', 'ups', 'circuit', 'air-header', 'hydraulic-supply'],
  mechanical: ['relief-valve', 'rupture-disc', 'check-valve'],
  people: ['operator', 'console'],
} as const;

export type ElementGroup = keyof typeof ELEMENT_GROUPS;
export type ElementKind = (typeof ELEMENT_GROUPS)[ElementGroup][number];

export const ELEMENT_KINDS: readonly ElementKind[] = Object.values(ELEMENT_GROUPS).flat();

const groupOfKind = new Map<string, ElementGroup>();
for (const [group, kinds] of Object.entries(ELEMENT_GROUPS)) {
  for (const kind of kinds) groupOfKind.set(kind, group as ElementGroup);
}

export function groupOf(kind: ElementKind): ElementGroup {
  const group = groupOfKind.get(kind);
  if (group === undefined) throw new Error(`unknown element kind ${kind}`);
  return group;
}

export function isElementKind(word: string): word is ElementKind {
  return groupOfKind.has(word);
}

export const FUNCTION_KINDS = ['loop', 'sif', 'trip', 'alarm', 'device'] as const;
export type FunctionKind = (typeof FUNCTION_KINDS)[number];

/** The typed dependency links an element may declare, with the JSON field that holds each. */
export const LINK_FIELDS = [
  'mountedOn',
  'connectedThrough',
  'signalVia',
  'housedIn',
  'poweredBy',
  'airFrom',
  'hydraulicFrom',
] as const;
export type LinkField = (typeof LINK_FIELDS)[number];

const PROCESS_SIDE: ElementGroup[] = ['equipment', 'connection', 'impulse'];

/**
 * Which groups a link may point at, by the group of the element that declares it. A link outside
 * this table is a modelling mistake (a transmitter mounted on a shutdown valve), reported by the loader.
 */
export const LINK_TARGETS: Record<LinkField, Partial<Record<ElementGroup, ElementGroup[]>>> = {
  mountedOn: {
    connection: ['equipment', 'connection'],
    impulse: ['connection'],
    sensor: PROCESS_SIDE,
    final: ['equipment', 'connection'],
    actuation: ['final', 'actuation'],
    mechanical: ['equipment', 'connection'],
    signal: ['housing'],
    solver: ['housing'],
    people: ['people'],
  },
  connectedThrough: {
    connection: ['connection'],
    impulse: ['connection', 'impulse'],
    sensor: ['connection', 'impulse'],
    final: ['connection'],
    mechanical: ['connection'],
  },
  signalVia: {
    sensor: ['signal', 'solver'],
    signal: ['signal', 'solver'],
    final: ['signal', 'solver', 'actuation'],
    actuation: ['signal', 'solver', 'actuation'],
    solver: ['signal'],
    people: ['signal', 'solver', 'people'],
  },
  housedIn: {
    sensor: ['housing'],
    signal: ['housing'],
    solver: ['housing'],
    final: ['housing'],
    actuation: ['housing'],
    support: ['housing'],
    housing: ['housing'],
    people: ['housing'],
  },
  poweredBy: {
    sensor: ['support'],
    signal: ['support'],
    solver: ['support'],
    final: ['support'],
    actuation: ['support'],
    support: ['support'],
    people: ['support'],
    housing: ['support'],
  },
  airFrom: { final: ['support'], actuation: ['support'], support: ['support'] },
  hydraulicFrom: { final: ['support'], actuation: ['support'], support: ['support'] },
};

/** Support kinds each support-typed link accepts, narrower than the group. */
export const SUPPORT_LINK_KINDS: Partial<Record<LinkField, readonly ElementKind[]>> = {
  poweredBy: ['power-supply', 'ups', 'circuit'],
  airFrom: ['air-header'],
  hydraulicFrom: ['hydraulic-supply'],
};

/**
 * Element kinds that need energy to do their part: each declares a supply link (powered by, air from,
 * hydraulics from) or says with `supply=` why it needs none. Passive parts (cables, housings, process
 * connections, relief devices, people) and the supports themselves do not.
 */
export const ACTIVE_KINDS: ReadonlySet<ElementKind> = new Set<ElementKind>([
  'transmitter',
  'switch',
  'detector',
  'io-card',
  'controller',
  'logic-solver',
  'console',
  'solenoid',
  'positioner',
  'actuator',
  'motor-starter',
  'control-valve',
  'shutdown-valve',
]);

/** The links that carry a supply to an element. */
export const SUPPLY_LINKS: ReadonlySet<LinkField> = new Set<LinkField>(['poweredBy', 'airFrom', 'hydraulicFrom']);
