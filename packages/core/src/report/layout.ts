// The evidence list's layout, shared by the Markdown and HTML reports: header, summary, one section per
// scenario (cause, layers with their traced elements and verdicts, LOPA lines), then the appendices.
import { justifiedKeyOf } from '../justify/apply.ts';
import { alikeDevices } from './alike.ts';
import { compareTags } from './order.ts';
import { scenarioCutSetBlocks, siteWideSection } from './site-wide-layout.ts';
import { studyText } from './worksheet.ts';
import { assumptionsBlocks, issueBlock, referencesOf, signOff, sourcesAppendix } from './control-layout.ts';
import type { LayerReport, ReportDocument, ReportFinding, ScenarioReport } from './document.ts';
import { code, codeList, richFromMessage, status, strong, type Block, type Rich } from './blocks.ts';
import {
  FIGURE_LABELS,
  MISSING_LABELS,
  SEVERITY_LABELS,
  VERDICT_LABELS,
  criterionText,
  formatFrequency,
  formatProbability,
  gapText,
  pathText,
  policyText,
  sifText,
  silText,
  sourcedFrequency,
  sourcedProbability,
  yesNo,
} from './text.ts';

export function anchorOf(kind: 'scenario' | 'finding' | 'function', tag: string): string {
  return `${kind}-${tag.replace(/[^A-Za-z0-9_-]/g, (c) => `_${c.charCodeAt(0).toString(16)}`)}`;
}

function verdictCell(layer: LayerReport): Rich {
  return [status(layer.verdict, VERDICT_LABELS[layer.verdict])];
}

function header(doc: ReportDocument): Block[] {
  const rows: Rich[][] = [
    [['Site'], [doc.site.name]],
    ...(doc.site.description ? [[['Description'], [doc.site.description]]] : []),
    [['Tool'], [`bulkhead ${doc.tool.version}`]],
    [['Report format version'], [String(doc.formatVersion)]],
    ...(doc.date ? [[['Date'], [doc.date]]] : []),
    [['Policy switches in force'], codeList(policyText(doc))],
  ];
  return [
    { type: 'heading', level: 1, text: [`Independence evidence list: ${doc.site.name}`] },
    issueBlock(doc),
    { type: 'table', caption: 'What this report covers', head: ['Item', 'Value'], rows, rowHeaders: true },
    { type: 'caution', title: 'Caution', items: doc.cautions.map((c) => [c]) },
    ...signOff(doc),
  ];
}

function summary(doc: ReportDocument): Block[] {
  const f = doc.summary.findings;
  return [
    { type: 'heading', level: 2, text: ['Summary'] },
    {
      type: 'paragraph',
      text: [
        `${doc.summary.scenarios} scenario${doc.summary.scenarios === 1 ? '' : 's'}, ${doc.summary.scenariosMeetingAfter} meeting the criterion after independence. ` +
          `Findings: ${f['voids-credit']} void credit, ${f['needs-justification']} need a justification, ${f.note} note${f.note === 1 ? '' : 's'}; ${doc.summary.accepted} accepted.`,
      ],
    },
    {
      type: 'table',
      caption: 'Scenarios at a glance',
      head: [
        'Scenario',
        'Tolerable',
        'As claimed',
        'After independence',
        'If accepted',
        'Meets after independence',
        'Required SIL',
      ],
      rows: doc.scenarios.map((s) => [
        [code(s.id)],
        [formatFrequency(s.tolerable)],
        [formatFrequency(s.lopa[0]!.mitigated)],
        [formatFrequency(s.lopa[1]!.mitigated)],
        [formatFrequency(s.lopa[2]!.mitigated)],
        [s.lopa[1]!.meets ? 'yes' : 'NO'],
        [s.sif ? silText(s.sif.sil) : 'none asked'],
      ]),
      rowHeaders: true,
    },
  ];
}

function ruleSet(doc: ReportDocument): Block[] {
  return [
    { type: 'heading', level: 2, text: ['Rule set in force'] },
    {
      type: 'table',
      caption: 'Rules applied, with the severity in force and its sources (listed in Appendix C)',
      head: ['Rule', 'Title', 'Severity', 'Default', 'Sources'],
      rows: doc.rules.map((r) => [
        [code(r.id)],
        [r.title],
        [SEVERITY_LABELS[r.severity] + (r.reason ? ` (changed by the model: ${r.reason})` : '')],
        [SEVERITY_LABELS[r.defaultSeverity]],
        [referencesOf(doc, r.id)],
      ]),
      rowHeaders: true,
    },
    { type: 'heading', level: 2, text: ['Conventions'] },
    { type: 'list', items: doc.conventions.map((c) => [c]) },
    ...assumptionsBlocks(doc),
  ];
}

function findingLines(f: ReportFinding): Rich[] {
  const lines: Rich[] = [
    [strong(SEVERITY_LABELS[f.severity]), ' ', code(f.rule), ` (${f.title}): `, ...richFromMessage(f.message)],
  ];
  const alike = alikeDevices(f);
  if (alike) lines.push(['Devices of the same make and model (nothing is shared): ', ...codeList(alike)]);
  else if (f.element) lines.push(['Shared element: ', code(f.element)]);
  f.parties.forEach((p, i) => {
    const path = f.paths[i];
    const who = p.role === 'cause' ? 'From the cause' : 'From layer';
    if (path && path.length > 0)
      lines.push([
        `${who}${p.tag && p.role === 'layer' ? ' ' : ''}`,
        ...(p.role === 'layer' && p.tag ? [code(p.tag)] : []),
        ': ',
        ...pathText(path),
      ]);
  });
  lines.push([`Why: ${f.rationale} Sources: ${f.source}.`]);
  const justified = justifiedKeyOf(f);
  if (justified !== undefined)
    lines.push([
      'To resolve: remove or correct the ',
      code('accept'),
      ' statement for ',
      code(justified),
      '; no justification can accept this finding.',
    ]);
  else if (f.accepted)
    lines.push([strong('Accepted'), ` by ${f.accepted.by} on ${f.accepted.date}: ${f.accepted.reason}`]);
  else if (f.severity === 'note') lines.push(['A note changes no credit and needs no acceptance. Key: ', code(f.key)]);
  else lines.push(['Open: no justification accepts it yet. Key for a justification: ', code(f.key)]);
  return lines;
}

const SYSTEM_LABELS = { bpcs: 'BPCS', sis: 'SIS', machine: 'machine control panel', relay: 'relay logic' } as const;

type Reason = NonNullable<LayerReport['reasons']>[number];

/** What a finding does to this layer's credit, as the assessment applied it. */
function effectLine(r: Reason): Rich {
  const other: Rich =
    r.with === undefined
      ? []
      : r.with === 'cause'
        ? [' (shared with the cause)']
        : [' (shared with layer ', code(r.with), ')'];
  const withLayer: Rich = r.with === undefined || r.with === 'cause' ? [] : [' with layer ', code(r.with)];
  const effect: Record<Reason['effect'], Rich> = {
    voids: [
      r.severity === 'needs-justification' && !r.accepted ? 'no credit until a justification accepts it' : 'no credit',
    ],
    caps: [`PFD limited to ${r.cap === undefined ? 'a cap' : formatProbability(r.cap)}`],
    unverified: ['independence unverified, no credit'],
    conflict: ['conflict', ...withLayer, ': the two are not credited together'],
    note: ['none (listed for review)'],
  };
  return [
    'Effect on this layer: ',
    ...effect[r.effect],
    ...(r.effect === 'voids' || r.effect === 'caps' ? other : []),
    r.accepted ? '; lifted, because the finding is accepted.' : '.',
  ];
}

function explanation(layer: LayerReport, byKey: Map<string, ReportFinding>): Block[] {
  const out: Block[] = [];
  const intro: Record<LayerReport['verdict'], string> = {
    independent:
      'No element the layer relies on is shared with the cause or another credited layer in a way that voids or withholds credit.',
    voided: 'Credit voided by the findings below.',
    unverified: 'Independence unverified: the model does not give every part the layer needs, so it earns no credit.',
    open: 'Credit withheld until the findings below are accepted by a justification.',
    accepted: 'Credited because the findings below are accepted by justifications in the model.',
    'not-selected':
      'Independent on its own, but a better set of mutually independent layers was credited (see alternatives).',
  };
  out.push({
    type: 'paragraph',
    text: [strong(`Verdict: ${VERDICT_LABELS[layer.verdict]}.`), ` ${intro[layer.verdict]}`],
  });
  if (layer.missing.length > 0) {
    out.push({
      type: 'paragraph',
      text: [`Missing from the model: ${layer.missing.map((m) => MISSING_LABELS[m] ?? m).join('; ')}.`],
    });
  }
  if (layer.solver)
    out.push({
      type: 'paragraph',
      text: ['Runs in ', code(layer.solver), layer.system ? ` (${SYSTEM_LABELS[layer.system]}).` : '.'],
    });
  const reasonOf = new Map((layer.reasons ?? []).map((r) => [r.key, r]));
  for (const key of layer.findings) {
    const f = byKey.get(key);
    if (!f) continue;
    const reason = reasonOf.get(key);
    out.push({ type: 'list', items: [...findingLines(f), ...(reason ? [effectLine(reason)] : [])] });
  }
  // Findings about the layer that did not decide its verdict (notes, fails-safe supports) stay in view.
  const deciding = new Set(layer.findings);
  const others = [
    ...new Set([...(layer.reasons ?? []).map((r) => r.key), ...layer.elements.flatMap((e) => e.findings)]),
  ].filter((k) => !deciding.has(k));
  if (others.length > 0) {
    out.push({ type: 'paragraph', text: ['Also reported about this layer, without effect on its verdict:'] });
    out.push({
      type: 'list',
      items: others
        .map((k) => byKey.get(k))
        .filter((f) => f !== undefined)
        .map((f) => [strong(SEVERITY_LABELS[f.severity]), ' ', code(f.key), ': ', ...richFromMessage(f.message)]),
    });
  }
  return out;
}

function layerBlocks(s: ScenarioReport, layer: LayerReport, byKey: Map<string, ReportFinding>): Block[] {
  return [
    {
      type: 'heading',
      level: 4,
      text: [code(layer.function), ` (${layer.kind})${layer.title ? `: ${layer.title}` : ''}`],
    },
    ...explanation(layer, byKey),
    {
      type: 'table',
      caption: `Elements ${layer.function} relies on, in scenario ${s.id}`,
      head: ['Element', 'Kind', 'Title', 'In the cause', 'Path from the layer', 'Findings'],
      rows: layer.elements.map((e) => [
        [code(e.tag)],
        [e.kind],
        [e.title ?? ''],
        [e.inCause ? (e.group === 'equipment' ? 'yes (process equipment, shared by nature)' : 'YES') : 'no'],
        pathText(e.path),
        codeList(e.findings),
      ]),
      rowHeaders: true,
    },
  ];
}

/** When a limit rule replaces the claimed cause frequency, the figures actually used. */
function causeFigures(s: ScenarioReport): string {
  const { frequencyAfter, frequencyIfAccepted } = s.cause;
  if (frequencyAfter === undefined && frequencyIfAccepted === undefined) return '';
  const after = frequencyAfter !== undefined ? ` Used after independence: ${formatFrequency(frequencyAfter)}.` : '';
  const accepted =
    frequencyIfAccepted !== undefined
      ? ` Used if the open findings are accepted: ${formatFrequency(frequencyIfAccepted)}.`
      : '';
  return `${after}${accepted}`;
}

/** Before or after the SIF, and whether the model says so or the default for the kind of layer was used. */
function actsText(s: ScenarioReport, l: ScenarioReport['layers'][number]): string {
  const pfh = l.claimedPfh
    ? `; high demand, judged by PFH ${formatProbability(l.allowedPfh ?? l.claimedPfh.value)} /h`
    : '';
  if (l.function === s.sif?.function) return `the SIF${pfh}`;
  const acts = l.acts === 'unknown' || l.acts === undefined ? 'order unknown' : `acts ${l.acts}`;
  return `${acts} (${l.actsStated ? 'stated' : 'default'})${pfh}`;
}

/** `cutSets`: the scenario's minimal cut sets, laid out by site-wide-layout.ts, placed after its LOPA. */
function scenarioSection(s: ScenarioReport, byKey: Map<string, ReportFinding>, cutSets: readonly Block[]): Block {
  const blocks: Block[] = [
    { type: 'heading', level: 2, text: [`Scenario `, code(s.id), s.title ? `: ${s.title}` : ''] },
    { type: 'paragraph', text: [`Criterion: ${criterionText(s)}.`] },
    ...(s.study ? [{ type: 'paragraph' as const, text: [`From the hazard study: ${studyText(s)}.`] }] : []),
    { type: 'heading', level: 3, text: ['Initiating cause'] },
    {
      type: 'paragraph',
      text: [`${s.cause.label}. Frequency ${sourcedFrequency(s.cause.frequency)}.${causeFigures(s)}`],
    },
    {
      type: 'paragraph',
      text:
        s.cause.elements === null
          ? ['Element set: not given by the analysis.']
          : s.cause.elements.length === 0
            ? ['Element set: none (an external cause).']
            : ['Element set: ', ...codeList(s.cause.elements), '.'],
    },
  ];
  if (s.enablers.length > 0 || s.modifiers.length > 0) {
    blocks.push({
      type: 'table',
      caption: `Enabling conditions and conditional modifiers of ${s.id}`,
      head: ['Factor', 'Probability', 'Applied', 'Basis'],
      rows: [
        ...s.enablers.map((e) => [
          [`enabling condition: ${e.title}`],
          [formatProbability(e.probability)],
          [
            e.allowed ? 'yes' : `no${e.allowedIfAccepted ? ', yes if accepted' : ''}`,
            ...(e.finding ? [' (', code(e.finding), ')'] : []),
          ],
          [e.basis ?? ''],
        ]),
        ...s.modifiers.map((m) => [
          [`${m.kind} modifier${m.title ? `: ${m.title}` : ''}`],
          [formatProbability(m.probability)],
          [
            m.allowed ? 'yes' : `no${m.allowedIfAccepted ? ', yes if accepted' : ''}`,
            ...(m.finding ? [' (', code(m.finding), ')'] : []),
          ],
          [m.basis ?? ''],
        ]),
      ],
      rowHeaders: true,
    });
  }
  blocks.push(
    { type: 'heading', level: 3, text: ['Claimed layers'] },
    {
      type: 'table',
      caption: `Layers claimed in ${s.id} and their verdicts`,
      head: [
        'Layer',
        'Kind and order',
        'Claimed PFD',
        'Allowed PFD',
        'Verdict',
        'Credited after independence',
        'Credited if accepted',
      ],
      rows: s.layers.map((l) => [
        [code(l.function)],
        [`${l.kind}; ${actsText(s, l)}`],
        [sourcedProbability(l.claimedPfd)],
        [
          formatProbability(l.allowedPfd) +
            (l.allowedPfdIfAccepted !== undefined ? ` (${formatProbability(l.allowedPfdIfAccepted)} if accepted)` : ''),
        ],
        verdictCell(l),
        [yesNo(l.credited)],
        [yesNo(l.creditedIfAccepted)],
      ]),
      rowHeaders: true,
    },
    ...s.layers.flatMap((l) => layerBlocks(s, l, byKey)),
    { type: 'heading', level: 3, text: ['LOPA'] },
    {
      type: 'table',
      caption: `Mitigated frequency of ${s.id} before and after independence`,
      head: ['Figure', 'Layers credited', 'Mitigated frequency', 'Tolerable', 'Meets'],
      rows: s.lopa.map((line) => [
        [FIGURE_LABELS[line.figure]],
        line.layers.length ? codeList(line.layers) : ['none'],
        [formatFrequency(line.mitigated)],
        [formatFrequency(s.tolerable)],
        [line.meets ? 'yes' : 'NO'],
      ]),
      rowHeaders: true,
    },
    { type: 'paragraph', text: [`After independence, ${gapText(s.gap)}.`] },
  );
  const sif = sifText(s);
  if (sif) blocks.push({ type: 'paragraph', text: sif });
  if (s.alternatives.length > 0) {
    blocks.push({
      type: 'list',
      items: s.alternatives.map((a) => [
        'Alternative credit set: ',
        ...(a.layers.length ? codeList(a.layers) : ['none']),
        `, PFD product ${formatProbability(a.pfdProduct)}${a.mitigated !== undefined ? `, mitigated ${formatFrequency(a.mitigated)}` : ''}`,
      ]),
    });
  }
  blocks.push(...cutSets);
  return { type: 'section', kind: 'scenario', id: anchorOf('scenario', s.id), blocks };
}

function appendices(doc: ReportDocument): Block[] {
  const traces: Block = {
    type: 'section',
    kind: 'appendix',
    id: 'appendix-traces',
    blocks: [
      { type: 'heading', level: 2, text: ['Appendix A: what every function relies on'] },
      ...doc.functions.flatMap((fn): Block[] => [
        {
          type: 'heading',
          level: 3,
          text: [code(fn.function), ` (${fn.kind})${fn.title ? `: ${fn.title}` : ''}`],
          id: anchorOf('function', fn.function),
        },
        ...(fn.missing.length
          ? [
              {
                type: 'paragraph' as const,
                text: [`Missing from the model: ${fn.missing.map((m) => MISSING_LABELS[m] ?? m).join('; ')}.`],
              },
            ]
          : []),
        {
          type: 'table',
          caption: `Elements ${fn.function} relies on`,
          head: ['Element', 'Kind', 'Title', 'Path'],
          rows: fn.elements.map((e) => [[code(e.tag)], [e.kind], [e.title ?? ''], pathText(e.path)]),
          rowHeaders: true,
        },
      ]),
    ],
  };
  // A finding already written out in full under the layer it decides is listed here in one row; the
  // others (about a cause, a modifier, a note, the model) are written out here, once.
  const detailed = new Map<string, string>();
  for (const s of doc.scenarios)
    for (const l of s.layers)
      for (const key of l.findings) if (!detailed.has(key)) detailed.set(key, `${s.id}, layer ${l.function}`);
  const listed = doc.findings.filter((f) => detailed.has(f.key));
  const findings: Block = {
    type: 'section',
    kind: 'appendix',
    id: 'appendix-findings',
    blocks: [
      { type: 'heading', level: 2, text: ['Appendix B: every finding'] },
      ...(doc.findings.length === 0 ? [{ type: 'paragraph' as const, text: ['No findings.'] }] : []),
      {
        type: 'table',
        caption: 'Findings written out in full in their scenario, under the layer they decide',
        head: ['Finding', 'Severity', 'Written out under', 'State'],
        rows: listed.map((f) => [
          [code(f.key)],
          [SEVERITY_LABELS[f.severity]],
          [detailed.get(f.key)!],
          [f.accepted ? `accepted by ${f.accepted.by} on ${f.accepted.date}` : 'open'],
        ]),
        rowHeaders: true,
      },
      ...doc.findings
        .filter((f) => !detailed.has(f.key))
        .flatMap((f): Block[] => [
          { type: 'heading', level: 3, text: [code(f.key)], id: anchorOf('finding', f.key) },
          {
            type: 'paragraph',
            text: [f.scenario ? 'Scenario ' : 'Model-wide', ...(f.scenario ? [code(f.scenario)] : []), '.'],
          },
          { type: 'list', items: findingLines(f) },
        ]),
    ],
  };
  return [traces, findings];
}

export function layoutReport(doc: ReportDocument): Block[] {
  // Each finding cites its sources by their Appendix C references, so a source is written out once.
  const byKey = new Map(
    doc.findings.map((f) => [f.key, { ...f, source: `${referencesOf(doc, f.rule) || 'none'} (Appendix C)` }]),
  );
  const findings = doc.findings.map((f) => byKey.get(f.key)!);
  return [
    { type: 'section', kind: 'front', id: 'front', blocks: [...header(doc), ...summary(doc), ...ruleSet(doc)] },
    ...siteWideSection(doc),
    ...doc.scenarios.map((s) => scenarioSection(s, byKey, scenarioCutSetBlocks(doc, s.id, byKey, compareTags))),
    ...appendices({ ...doc, findings }),
    sourcesAppendix(doc),
  ];
}
