// The DEXPI 1.3 reference P&ID (fixtures/external/dexpi/C01V04-VER.EX01.xml, © DEXPI e.V., CC BY 4.0,
// unmodified; see the README beside it) imports with every object the file holds. The counts are checked
// against an independent reading of the same file with another XML library (@xmldom/xmldom, a W3C DOM),
// and against the counts the research note gives for this file (fixtures NOTES on DEXPI, section 0 and 4).
import { readFileSync } from 'node:fs';
import { DOMParser, type Element as DomElement } from '@xmldom/xmldom';
import { describe, expect, it } from 'vitest';
import { analyze, loadModelText } from '@bulkhead/core';
import {
  defaultHeaderMap,
  describePlace,
  importTables,
  readCsvTable,
  readDexpi,
  type ImportIssue,
} from '@bulkhead/import';
import { memoryReader } from './helpers.ts';

const FILE = 'fixtures/external/dexpi/C01V04-VER.EX01.xml';
const TEXT = readFileSync(FILE, 'utf8');

/** The file read as a DOM, shape catalogue (drawing templates) left out. */
function domCounts() {
  const doc = new DOMParser().parseFromString(TEXT, 'text/xml');
  const inCatalogue = (e: DomElement) => {
    for (let p = e.parentNode; p; p = p.parentNode) if ((p as DomElement).nodeName === 'ShapeCatalogue') return true;
    return false;
  };
  const elements = (name: string) => Array.from(doc.getElementsByTagName(name)).filter((e) => !inCatalogue(e));
  const generic = (e: DomElement, name: string) =>
    Array.from(e.getElementsByTagName('GenericAttribute'))
      .find((g) => g.getAttribute('Name') === name)
      ?.getAttribute('Value') ?? undefined;
  const psgfs = elements('ProcessSignalGeneratingFunction');
  const locations = new Set(
    psgfs.flatMap((p) =>
      Array.from(p.getElementsByTagName('Association'))
        .filter((a) => a.getAttribute('Type') === 'is located in')
        .map((a) => a.getAttribute('ItemID')),
    ),
  );
  const systems = elements('ActuatingSystem');
  const flows = elements('InformationFlow');
  const sensorIds = new Set(psgfs.map((p) => p.getAttribute('ID')));
  const startsAtSensor = (f: DomElement) =>
    Array.from(f.getElementsByTagName('Association')).some(
      (a) => a.getAttribute('Type') === 'has logical start' && sensorIds.has(a.getAttribute('ItemID')),
    );
  const components = elements('ActuatingSystemComponent');
  const valves = new Set(
    components
      .filter((c) => c.getAttribute('ComponentClass') === 'OperatedValveReference')
      .flatMap((c) => Array.from(c.getElementsByTagName('Association')).map((a) => a.getAttribute('ItemID'))),
  );
  return {
    instrumentFunctions: elements('ProcessInstrumentationFunction').length,
    sensors: psgfs.length,
    sensorTags: psgfs.map((p) => generic(p, 'ProcessSignalGeneratingFunctionNumberAssignmentClass')),
    sensingLocations: locations.size,
    actuatingSystemsWithFailAction: systems.filter((s) =>
      components.some(
        (c) =>
          c.parentNode === s &&
          c.getAttribute('ComponentClass') === 'ControlledActuator' &&
          generic(c, 'FailActionSpecialization'),
      ),
    ).length,
    actuatingSystemTags: systems.map((s) => generic(s, 'ActuatingSystemNumberAssignmentClass')),
    valves: valves.size,
    safetyValves: elements('PipingComponent').filter((c) => /SafetyValve/.test(c.getAttribute('ComponentClass') ?? ''))
      .length,
    equipment: elements('Equipment').filter((e) => (e.parentNode as DomElement).nodeName !== 'Equipment').length,
    nozzles: elements('Nozzle').length,
    lines: elements('PipingNetworkSystem').length,
    // DEXPI 1.3 names measuring lines by class; a 1.2 file's sensor-to-function line starts at a sensor.
    measuringLines: flows.filter(
      (f) => f.getAttribute('ComponentClass') === 'MeasuringLineFunction' || startsAtSensor(f),
    ).length,
    signalLines: flows.filter((f) => f.getAttribute('ComponentClass') !== 'MeasuringLineFunction' && !startsAtSensor(f))
      .length,
  };
}

describe('the DEXPI reference P&ID', () => {
  const issues: ImportIssue[] = [];
  const result = readDexpi(FILE, TEXT, issues)!;
  const dom = domCounts();

  it('reads every object the file holds, as an independent DOM reading counts them', () => {
    expect(issues).toEqual([]);
    const { sensorTags, actuatingSystemTags, ...counts } = dom;
    expect(result.counts).toEqual(counts);
    const tags = new Set(result.records.map((r) => r.tag.value));
    for (const t of [...sensorTags, ...actuatingSystemTags]) expect(tags).toContain(t);
  });

  it('matches the counts the research note gives for this file', () => {
    // NOTES on DEXPI, section 0: 4 instrument functions, 3 sensors with their sensing locations, 3 actuating
    // systems with fail actions driving 3 globe valves, a safety valve, 5 equipment items with 19 nozzles, 11 piping
    // systems, 3 measuring lines and 3 signal lines.
    expect(result.counts).toEqual({
      instrumentFunctions: 4,
      sensors: 3,
      sensingLocations: 3,
      actuatingSystemsWithFailAction: 3,
      valves: 3,
      safetyValves: 1,
      equipment: 5,
      nozzles: 19,
      lines: 11,
      measuringLines: 3,
      signalLines: 3,
    });
  });

  it('imports sensors where they sense and final elements with their fail action, each with its XML line', () => {
    const byTag = new Map(result.records.map((r) => [r.tag.value, r]));
    // TT4750.03 senses at nozzle N7 of tank T4750; PT4712.01 and .02 at two blind flanges on line 47126 (NOTES 2.6).
    expect(byTag.get('TT4750.03')!.fields.get('mounted-on')!.value).toBe('T4750-N7');
    expect(byTag.get('PT4712.02')!.fields.get('mounted-on')!.value).toBe('TP-BlindFlange-2');
    expect(byTag.get('TP-BlindFlange-2')!.fields.get('mounted-on')!.value).toBe('47126');
    // Fail actions: PV4712.02 fails closed, TV4750.03 fails open (NOTES 2.8).
    expect(byTag.get('PV4712.02')!.fields.get('fails-to')!.value).toBe('closed');
    expect(byTag.get('TV4750.03')!.fields.get('fails-to')!.value).toBe('open');
    expect(describePlace(byTag.get('PT4712.02')!.tag.place)).toBe(`${FILE}:2398:5`);
    expect(byTag.get('PICSA4712.02')!.fields.get('sensors')!.value).toBe('PT4712.02');
  });

  it('counts what it does not import, with the reason', () => {
    const reasons = result.skipped.map((s) => s.reason);
    expect(reasons.filter((r) => r === 'a part of the equipment around it')).toHaveLength(11);
    expect(result.skipped.find((s) => s.what === 'instrument function PI4712.01')?.reason).toMatch(/indication only/);
    // Measuring and signal lines name no cable: each is listed, with its own reason, never dropped unseen.
    expect(result.skipped.filter((s) => s.what.startsWith('measuring line ')).map((s) => s.what)).toEqual([
      'measuring line MeasuringLineFunction-1',
      'measuring line MeasuringLineFunction-2',
      'measuring line MeasuringLineFunction-3',
    ]);
    expect(result.skipped.filter((s) => s.what.startsWith('signal line ')).map((s) => s.what)).toEqual([
      'signal line SignalConveyingFunction-1',
      'signal line SignalConveyingFunction-2',
      'signal line SignalConveyingFunction-3',
    ]);
    expect(describePlace(result.skipped.find((s) => s.what === 'measuring line MeasuringLineFunction-2')!.place)).toBe(
      `${FILE}:2370:5`,
    );
    expect(reasons.filter((r) => /^a logical line that names no cable/.test(r))).toHaveLength(6);
    // Read = imported + skipped: every object the importer looked at is accounted for.
    expect(result.records.length + result.skipped.length).toBe(59 + 6);
  });

  it('loads clean with the control-system tables, lists tags found in one source only, and check runs', () => {
    const tableIssues: ImportIssue[] = [];
    const table = readCsvTable(
      'control-system.csv',
      readFileSync('fixtures/external/dexpi/tables/control-system.csv', 'utf8'),
      tableIssues,
    )!;
    const main =
      'site "DEXPI reference P&ID with invented control system"\ncategory harm title="Harm" tolerable=1e-4 harm=people\npart "pid.bulk"\n';
    const imported = importTables(
      [table],
      defaultHeaderMap(),
      {
        generatedPath: 'pid.bulk',
        model: { file: 'main.bulk', text: main, readPart: memoryReader({}) },
        pids: [{ file: FILE, result }],
      },
      tableIssues,
    );
    expect(imported.issues.filter((i) => i.severity === 'error')).toEqual([]);
    // The hand-operated HV4750.01 and the relief valve are on the P&ID only; the tables name nothing the P&ID lacks.
    expect(imported.onlyIn).toEqual({ pid: ['SpringLoadedGlobeSafetyValve-1', 'HV4750.01'], tables: [] });
    const loaded = loadModelText('main.bulk', main, { readPart: memoryReader({ 'pid.bulk': imported.text! }) });
    expect(loaded.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    const analysis = analyze(loaded.model!);
    expect(analysis.traces.map((t) => t.function).sort()).toEqual(['PICSA4712.02', 'TICSA4750.03']);
  });

  it('lists an instrument the tables hold and the P&ID does not', () => {
    const tableIssues: ImportIssue[] = [];
    const csv = `${readFileSync('fixtures/external/dexpi/tables/control-system.csv', 'utf8')}LT4750.09,transmitter,,,,,AI-A1,,from-signal\n`;
    const table = readCsvTable('control-system.csv', csv, tableIssues)!;
    const imported = importTables(
      [table],
      defaultHeaderMap(),
      { generatedPath: 'pid.bulk', pids: [{ file: FILE, result }] },
      tableIssues,
    );
    expect(imported.onlyIn?.tables).toEqual(['LT4750.09']);
  });

  it('reports malformed XML at its line and column', () => {
    const bad: ImportIssue[] = [];
    expect(readDexpi('broken.xml', '<PlantModel>\n  <Equipment ID="a">\n</PlantModel>\n', bad)).toBeUndefined();
    expect(bad[0]!.code).toBe('BH511');
    expect(describePlace(bad[0]!.place)).toMatch(/^broken\.xml:3:\d+$/);
  });
});
