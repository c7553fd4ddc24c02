// Small invented sites in .bulk, one per seed: a BPCS loop that fails, a 1oo2 or 2oo2 SIF and sometimes
// a second trip, with supports, cabinets, cards and nozzles shared at random. Test data only.
import { Random } from './random.ts';

export function generatedSite(seed: number): string {
  const r = new Random(seed);
  const pick = <T>(items: readonly T[]) => r.pick(items);
  const lines = [
    'site "Generated test site"',
    'category loss title="Loss" tolerable=1e-4 harm=asset',
    'ups UPS-1',
    'ups UPS-2',
    'air-header IA-1',
  ];
  const circuits = ['CKT-1', 'CKT-2'];
  for (const c of circuits) lines.push(`circuit ${c} powered-by=${pick(['UPS-1', 'UPS-2'])}`);
  lines.push('cabinet CAB-1', 'cabinet CAB-2');
  lines.push(`controller BPCS-1 system=bpcs powered-by=${pick(circuits)} housed-in=${pick(['CAB-1', 'CAB-2'])}`);
  lines.push(`logic-solver SIS-1 system=sis powered-by=${pick(circuits)} housed-in=${pick(['CAB-1', 'CAB-2'])}`);
  const cards = ['AI-1', 'AI-2', 'AI-S1', 'AI-S2'];
  for (const card of cards)
    lines.push(`io-card ${card} signal-via=${card.includes('S') ? 'SIS-1' : 'BPCS-1'} powered-by=${pick(circuits)}`);
  lines.push(
    'io-card DO-1 signal-via=BPCS-1 powered-by=' + pick(circuits),
    'io-card DO-S1 signal-via=SIS-1 powered-by=' + pick(circuits),
  );
  lines.push('vessel V-1', 'line L-1');
  const nozzles = ['N-1', 'N-2', 'N-3'];
  for (const n of nozzles) lines.push(`nozzle ${n} mounted-on=V-1`);
  const transmitters = ['T-1', 'T-2', 'T-3', 'T-4'];
  for (const t of transmitters)
    lines.push(
      `transmitter ${t} variable=level supply=from-signal mounted-on=${pick(nozzles)} signal-via=${pick(cards)}`,
    );
  lines.push(`control-valve CV-1 fails-to=in-place mounted-on=L-1 signal-via=DO-1 air-from=IA-1`);
  const valves = ['XV-1', 'XV-2'];
  for (const v of valves)
    lines.push(
      `shutdown-valve ${v} fails-to=in-place mounted-on=L-1 signal-via=${pick(['DO-S1', 'DO-1'])} air-from=IA-1`,
    );
  const [a, b, c] = r.shuffle(transmitters);
  lines.push(`loop LIC-1 sensors=${a} solver=BPCS-1 finals=CV-1`);
  const sifVoting = pick(['1oo2', '2oo2']);
  const finals = r.next() < 0.5 ? `finals=XV-1` : `finals=XV-1,XV-2 final-voting=${pick(['1oo2', '2oo2'])}`;
  lines.push(
    `sif SIF-1 sensors=${b},${c} sensor-voting=${sifVoting} solver=SIS-1 ${finals} trip=close trip-mode=energise sil=1 pfd=0.05`,
  );
  lines.push(
    `trip TR-1 sensors=${pick(transmitters)} solver=${pick(['SIS-1', 'BPCS-1'])} finals=${pick(valves)} trip=close trip-mode=energise pfd=0.1`,
  );
  lines.push(
    'scenario S-1 title="Generated" category=loss',
    '  cause function=LIC-1 frequency=0.1 basis="generated"',
    '  layer SIF-1 pfd=0.05 basis="generated"',
  );
  if (r.next() < 0.7) lines.push('  layer TR-1 pfd=0.1 basis="generated"');
  return lines.join('\n') + '\n';
}
