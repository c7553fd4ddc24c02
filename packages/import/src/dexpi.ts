// DEXPI 1.3 (and 1.2) Proteus XML: what a P&ID says about the instrumentation, as records merged by tag
// with the tables. Equipment and nozzles, lines, sensing locations, sensors (process signal generating
// functions), final elements (actuating systems with their fail action and the valve they drive),
// safety valves, and control functions. What a P&ID does not hold (cards, cabinets, supplies, solvers)
// comes from the tables; nothing is taken as independent for being absent (see NOTES on DEXPI, 2.11).
// Measuring and signal lines are counted and listed as skipped, with the reason (countSignalLines).
import { issue, type ImportIssue, type Place } from './issues.ts';
import type { CellValue, TagRecord } from './records.ts';
import { descendants, readXml, type XmlElement } from './xml.ts';

/** What the file held, object by object, as the importer counted it (compared in the tests with an independent count). */
export interface DexpiCounts {
  instrumentFunctions: number;
  sensors: number;
  sensingLocations: number;
  actuatingSystemsWithFailAction: number;
  valves: number;
  safetyValves: number;
  equipment: number;
  nozzles: number;
  lines: number;
  /** Sensor to instrument function (MeasuringLineFunction in 1.3; in 1.2 a signal line that starts at a sensor). */
  measuringLines: number;
  /** Instrument function to final element or to another function. */
  signalLines: number;
}

export interface DexpiResult {
  records: TagRecord[];
  counts: DexpiCounts;
  /** Objects read but not imported, with the reason: counted, never dropped unseen. */
  skipped: { what: string; reason: string; place: Place }[];
}

function generic(node: XmlElement, name: string): string | undefined {
  for (const set of node.children) {
    if (set.name !== 'GenericAttributes') continue;
    for (const a of set.children)
      if (a.name === 'GenericAttribute' && a.attributes.Name === name && a.attributes.Value)
        return a.attributes.Value.trim();
  }
  return undefined;
}

function associated(node: XmlElement, type: string): string[] {
  return node.children
    .filter((c) => c.name === 'Association' && c.attributes.Type === type)
    .map((c) => c.attributes.ItemID ?? '');
}

const EQUIPMENT_KINDS: [RegExp, string][] = [
  [/Tank|Silo/i, 'tank'],
  [/Column/i, 'column'],
  [/Pump/i, 'pump'],
  [/Compressor|Blower|Fan/i, 'compressor'],
  [/Exchanger|Cooler|Heater|Condenser|Reboiler/i, 'exchanger'],
  [/Vessel|Drum|Separator/i, 'vessel'],
];
const SAFETY_VALVE = /SafetyValve|ReliefValve|SafetyRelief|RuptureDisc|BreatherValve/;
/** DEXPI fail actions (FailActionSpecialization) in the model's words. */
const FAIL_ACTIONS: Record<string, string> = {
  FailClose: 'closed',
  FailOpen: 'open',
  FailLock: 'in-place',
  FailSteady: 'in-place',
  FailLastPosition: 'in-place',
};
/** The measured-variable letter (PIF category) in the model's words; other letters: other. */
const VARIABLES: Record<string, string> = {
  L: 'level',
  P: 'pressure',
  T: 'temperature',
  F: 'flow',
  A: 'analysis',
  Q: 'analysis',
  Z: 'position',
  G: 'position',
  S: 'speed',
};

function ancestor(node: XmlElement, test: (n: XmlElement) => boolean): XmlElement | undefined {
  for (let n = node.parent; n; n = n.parent) if (test(n)) return n;
  return undefined;
}

/** Why a measuring or signal line is not an element: what it links is already the loop's sensors and finals. */
const LOGICAL_LINE_REASON = 'a logical line that names no cable or I/O channel (those come from the tables)';

/**
 * Measuring and signal lines (`InformationFlow`): counted and listed as skipped. The model's signal kinds
 * (card, cable, network) are physical things a P&ID line does not identify, and the link it draws is
 * already in the loop's sensors and final elements; inventing a cable per line would be a guess.
 */
function countSignalLines(
  all: XmlElement[],
  byId: Map<string, XmlElement>,
  counts: DexpiCounts,
  skip: (what: string, reason: string, n: XmlElement) => void,
): void {
  for (const flow of all.filter((n) => n.name === 'InformationFlow')) {
    const start = byId.get(associated(flow, 'has logical start')[0] ?? '');
    const measuring =
      flow.attributes.ComponentClass === 'MeasuringLineFunction' || start?.name === 'ProcessSignalGeneratingFunction';
    if (measuring) counts.measuringLines++;
    else counts.signalLines++;
    skip(
      `${measuring ? 'measuring line' : 'signal line'} ${flow.attributes.ID ?? `at line ${flow.line}`}`,
      LOGICAL_LINE_REASON,
      flow,
    );
  }
}

export function readDexpi(file: string, text: string, issues: ImportIssue[]): DexpiResult | undefined {
  const root = readXml(file, text, issues);
  if (!root) return undefined;
  const all = descendants(root);
  const byId = new Map<string, XmlElement>();
  for (const n of all) if (n.attributes.ID) byId.set(n.attributes.ID, n);
  const place = (n: XmlElement): Place => ({ file, line: n.line, lineColumn: n.column });
  const cell = (value: string, n: XmlElement): CellValue => ({ value, place: place(n) });
  const records: TagRecord[] = [];
  const skipped: DexpiResult['skipped'] = [];
  const record = (
    tag: string,
    kind: string,
    n: XmlElement,
    fields: [string, string][],
    noted: string[] = [],
  ): TagRecord => {
    const r: TagRecord = {
      tag: cell(tag, n),
      kind: cell(kind, n),
      fields: new Map(fields.map(([k, v]) => [k, cell(v, n)])),
      sources: [`${file} line ${n.line}`],
      noted,
    };
    records.push(r);
    return r;
  };
  const tagOf = (n: XmlElement) => generic(n, 'TagNameAssignmentClass') ?? (n.attributes.TagName?.trim() || undefined);

  // Lines: each piping network system, by its line number.
  const lineTag = new Map<XmlElement, string>();
  const systems = all.filter((n) => n.name === 'PipingNetworkSystem');
  for (const s of systems) {
    const tag = generic(s, 'LineNumberAssignmentClass') ?? tagOf(s) ?? s.attributes.ID ?? `line-${s.line}`;
    lineTag.set(s, tag);
    record(tag, 'line', s, []);
  }
  const lineOf = (n: XmlElement) => {
    const s = ancestor(n, (a) => a.name === 'PipingNetworkSystem');
    return s ? lineTag.get(s) : undefined;
  };

  // Equipment: the top-level items. Chambers, tube bundles, impellers and the like nested in one are its
  // parts, not plant items of their own. Nozzles are named after the item they are on.
  const isEquipment = (n: XmlElement) => n.name === 'Equipment' && n.parent?.name !== 'Equipment';
  for (const part of all.filter((n) => n.name === 'Equipment' && n.parent?.name === 'Equipment')) {
    skipped.push({
      what: `${part.attributes.ComponentClass ?? 'part'} ${part.attributes.ID ?? ''}`,
      reason: 'a part of the equipment around it',
      place: place(part),
    });
  }
  const equipmentTag = new Map<XmlElement, string>();
  const equipment = all.filter(isEquipment);
  for (const e of equipment) {
    const tag = tagOf(e);
    const cls = e.attributes.ComponentClass ?? '';
    const kind = EQUIPMENT_KINDS.find(([re]) => re.test(cls))?.[1];
    if (!tag) skipped.push({ what: `equipment ${e.attributes.ID ?? ''}`, reason: 'no tag', place: place(e) });
    else if (!kind)
      skipped.push({
        what: `equipment ${tag}`,
        reason: `class ${cls} has no equipment kind in the model`,
        place: place(e),
      });
    if (tag) equipmentTag.set(e, tag);
    if (tag && kind) record(tag, kind, e, [], [`DEXPI ${cls}`]);
  }
  const nozzleTag = new Map<string, string>();
  const nozzles = all.filter((n) => n.name === 'Nozzle');
  for (const z of nozzles) {
    const owner = ancestor(z, isEquipment);
    const ownerTag = owner ? equipmentTag.get(owner) : undefined;
    const name = generic(z, 'SubTagNameAssignmentClass') ?? tagOf(z) ?? z.attributes.ID ?? `nozzle-${z.line}`;
    if (!ownerTag) {
      skipped.push({ what: `nozzle ${name}`, reason: 'not inside tagged equipment', place: place(z) });
      continue;
    }
    const tag = `${ownerTag}-${name}`;
    nozzleTag.set(z.attributes.ID ?? '', tag);
    record(tag, 'nozzle', z, [['mounted-on', ownerTag]]);
  }

  // Safety valves: in-line piping components of a safety class.
  const safetyValves = all.filter(
    (n) => n.name === 'PipingComponent' && SAFETY_VALVE.test(n.attributes.ComponentClass ?? ''),
  );
  for (const v of safetyValves) {
    const tag = tagOf(v) ?? generic(v, 'PipingComponentNumberAssignmentClass') ?? v.attributes.ID!;
    const line = lineOf(v);
    record(tag, 'relief-valve', v, line ? [['mounted-on', line]] : [], [`DEXPI ${v.attributes.ComponentClass}`]);
  }

  // Instrument functions, their sensors and sensing locations, and the final elements they drive.
  const counts: DexpiCounts = {
    instrumentFunctions: 0,
    sensors: 0,
    sensingLocations: 0,
    actuatingSystemsWithFailAction: 0,
    valves: 0,
    safetyValves: safetyValves.length,
    equipment: equipment.length,
    nozzles: nozzles.length,
    lines: systems.length,
    measuringLines: 0,
    signalLines: 0,
  };
  const locations = new Set<string>();
  const valves = new Set<string>();
  for (const pif of all.filter((n) => n.name === 'ProcessInstrumentationFunction')) {
    counts.instrumentFunctions++;
    const category = generic(pif, 'ProcessInstrumentationFunctionCategoryAssignmentClass') ?? '';
    const letters =
      generic(pif, 'ProcessInstrumentationFunctionsAssignmentClass') ??
      generic(pif, 'ProcessInstrumentationFunctionModifierAssignmentClass') ??
      '';
    const number = generic(pif, 'ProcessInstrumentationFunctionNumberAssignmentClass') ?? '';
    const tag = `${category}${letters}${number}` || pif.attributes.TagName || pif.attributes.ID!;
    const sensors: string[] = [];
    for (const g of descendants(pif, 'ProcessSignalGeneratingFunction')) {
      counts.sensors++;
      const sensorTag =
        generic(g, 'ProcessSignalGeneratingFunctionNumberAssignmentClass') ?? g.attributes.TagName ?? g.attributes.ID!;
      const where = associated(g, 'is located in')[0];
      const location = where ? byId.get(where) : undefined;
      let mountedOn: string | undefined;
      if (location?.name === 'Nozzle') mountedOn = nozzleTag.get(where!);
      else if (location) {
        mountedOn = `TP-${where}`;
        if (!locations.has(where!)) {
          const line = lineOf(location);
          record(mountedOn, 'tapping', location, line ? [['mounted-on', line]] : [], [
            `DEXPI ${location.attributes.ComponentClass ?? location.name} ${where}`,
          ]);
        }
      }
      if (where && location) locations.add(where);
      if (!location)
        issues.push(
          issue('BH512', `the sensor ${sensorTag} has no sensing location the file resolves`, place(g), {
            severity: 'warning',
            help: 'the sensor is imported without `mounted-on`; its process connection stays untraced (unverified)',
          }),
        );
      sensors.push(sensorTag);
      record(sensorTag, 'transmitter', g, [
        ['variable', VARIABLES[category] ?? 'other'],
        ...(mountedOn ? [['mounted-on', mountedOn] as [string, string]] : []),
      ]);
    }
    const finals: string[] = [];
    for (const af of descendants(pif, 'ActuatingFunction')) {
      for (const systemId of associated(af, 'is fulfilled by')) {
        const system = byId.get(systemId);
        if (!system) continue;
        const systemTag =
          generic(system, 'ActuatingSystemNumberAssignmentClass') ?? system.attributes.TagName ?? systemId;
        const components = system.children.filter((c) => c.name === 'ActuatingSystemComponent');
        const actuator = components.find((c) => c.attributes.ComponentClass === 'ControlledActuator');
        const failAction = actuator ? generic(actuator, 'FailActionSpecialization') : undefined;
        if (failAction) counts.actuatingSystemsWithFailAction++;
        const valveRef = components.find((c) => /ValveReference$/.test(c.attributes.ComponentClass ?? ''));
        const valveId = valveRef ? associated(valveRef, 'refers to')[0] : undefined;
        const valve = valveId ? byId.get(valveId) : undefined;
        if (valve) valves.add(valveId!);
        const line = valve ? lineOf(valve) : undefined;
        const fails = failAction ? FAIL_ACTIONS[failAction] : undefined;
        if (failAction && !fails)
          issues.push(
            issue('BH512', `fail action ${failAction} of ${systemTag} has no word in the model`, place(actuator!), {
              severity: 'warning',
              help: 'give the fail position in the instrument index (fails-to)',
            }),
          );
        record(
          systemTag,
          letters.includes('C') ? 'control-valve' : 'shutdown-valve',
          system,
          [
            ...(fails ? [['fails-to', fails] as [string, string]] : []),
            ...(line ? [['mounted-on', line] as [string, string]] : []),
          ],
          [...(valve ? [`drives DEXPI ${valve.attributes.ComponentClass} ${valveId}`] : [])],
        );
        finals.push(systemTag);
      }
    }
    // One PIF may join control, switch and alarm letters (ICSA): it is one function on one sensor, so
    // only the control function is imported; its trip or alarm is never a separate, independent layer.
    if (letters.includes('C'))
      record(
        tag,
        'loop',
        pif,
        [
          ...(sensors.length ? [['sensors', sensors.join(',')] as [string, string]] : []),
          ...(finals.length ? [['finals', finals.join(',')] as [string, string]] : []),
        ],
        letters.length > 1
          ? [`DEXPI letters ${category}${letters}: its other letters are the same function, not separate layers`]
          : [],
      );
    else
      skipped.push({
        what: `instrument function ${tag}`,
        reason:
          letters === 'I'
            ? 'indication only: no control or protective action'
            : `letters ${category}${letters} name no control loop; model its protective use in the loop list`,
        place: place(pif),
      });
  }
  countSignalLines(all, byId, counts, (what, reason, n) => skipped.push({ what, reason, place: place(n) }));
  counts.sensingLocations = locations.size;
  counts.valves = valves.size;
  return { records, counts, skipped };
}
