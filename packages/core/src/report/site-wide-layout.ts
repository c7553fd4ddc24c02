// The site-wide picture in the evidence list (Markdown and HTML): in each scenario its minimal cut sets
// (single points of failure in full, with the path from each side; larger sets grouped in one compact
// table), and one site-wide section with the cut-set counts and the common-cause ranking, its order in words.
import type { ReportDocument, ReportFinding } from './document.ts';
import { code, codeList, strong, type Block, type Rich } from './blocks.ts';
import { countByOrder } from './site-wide.ts';
import { formatFrequency, pathText } from './text.ts';

type CutSetsReport = NonNullable<ReportDocument['cutSets']>;
type ScenarioCutSetsReport = CutSetsReport['scenarios'][number];
type CutSetReport = ScenarioCutSetsReport['cutSets'][number];

const plural = (n: number, word: string, many = `${word}s`) => `${n} ${n === 1 ? word : many}`;
const orderHead = (order: number) => (order === 1 ? 'Single points' : order === 2 ? 'Pairs' : `Order ${order}`);

function setsOfOrder(s: ScenarioCutSetsReport, order: number): CutSetReport[] {
  return s.cutSets.filter((c) => c.elements.length === order);
}

const partyText = (party: string): Rich =>
  party === 'cause' ? ['From the cause: '] : ['From layer ', code(party), ': '];

/** A single point of failure in full: the element, the path from the cause and from each layer, the findings. */
function singlePoint(c: CutSetReport): Block {
  const element = c.elements[0]!;
  return {
    type: 'list',
    items: [
      [
        strong('Single point of failure:'),
        ' ',
        code(element),
        ' alone starts the scenario and defeats every claimed layer.',
      ],
      ...c.paths.map((p) => [...partyText(p.party), ...pathText(p.path)]),
      c.findings.length
        ? ['Findings about it: ', ...codeList(c.findings)]
        : ['No finding names it: the rules in force did not flag this dependency; review it.'],
    ],
  };
}

interface SetGroup {
  element: string;
  sets: CutSetReport[];
}

/**
 * Groups the sets by a member they share, most sets first (ties by tag), each set in exactly one group:
 * a common element shows once with all its partners instead of once per set.
 */
export function groupBySharedMember(
  sets: readonly CutSetReport[],
  compare: (a: string, b: string) => number,
): SetGroup[] {
  const groups: SetGroup[] = [];
  let left = [...sets];
  while (left.length > 0) {
    const count = new Map<string, number>();
    for (const c of left) for (const e of c.elements) count.set(e, (count.get(e) ?? 0) + 1);
    const [element] = [...count].sort((a, b) => b[1] - a[1] || compare(a[0], b[0]))[0]!;
    groups.push({ element, sets: left.filter((c) => c.elements.includes(element)) });
    left = left.filter((c) => !c.elements.includes(element));
  }
  return groups;
}

function groupRow(group: SetGroup, findings: ReadonlyMap<string, ReportFinding>): Rich[] {
  const paths = group.sets[0]!.paths.filter((p) => p.element === group.element);
  const partners: Rich = [];
  group.sets.forEach((c, i) => {
    if (i > 0) partners.push(', ');
    partners.push(
      ...codeList(
        c.elements.filter((e) => e !== group.element),
        ' + ',
      ),
    );
  });
  const about = [...new Set(group.sets.flatMap((c) => c.findings))].filter(
    (k) => findings.get(k)?.element === group.element,
  );
  return [
    [code(group.element)],
    // Each path starts at the side's function (the cause's loop, or the layer itself), as `bulkhead cut-sets` prints it.
    paths.flatMap((p, i) => [...(i > 0 ? ['; '] : []), p.party === 'cause' ? 'cause ' : 'layer ', ...pathText(p.path)]),
    partners,
    [String(group.sets.length)],
    about.length ? codeList(about) : ['none'],
  ];
}

/** The cut-set subsection of one scenario's section; nothing when the report carries no cut sets. */
export function scenarioCutSetBlocks(
  doc: ReportDocument,
  scenario: string,
  findings: ReadonlyMap<string, ReportFinding>,
  compare: (a: string, b: string) => number,
): Block[] {
  const s = doc.cutSets?.scenarios.find((x) => x.scenario === scenario);
  if (!s) return [];
  const blocks: Block[] = [{ type: 'heading', level: 3, text: [`Minimal cut sets up to order ${s.maxOrder}`] }];
  if (s.noStartingElement) {
    blocks.push({
      type: 'paragraph',
      text: ['No cut set: no element of the model starts the scenario (an external cause).'],
    });
    return blocks;
  }
  const layers: Rich = s.layers.length
    ? ['every claimed layer (', ...codeList(s.layers), ')']
    : ['no claimed layer, so any element of the cause alone is a cut set'];
  blocks.push({
    type: 'paragraph',
    text: [
      `${countByOrder(s)}. A cut set is a smallest set of elements whose joint failure starts the scenario and defeats `,
      ...layers,
      '; the method is stated in the site-wide section.',
    ],
  });
  const caution = [...s.incompleteLayers, ...s.unknownLayers];
  if (caution.length)
    blocks.push({
      type: 'paragraph',
      text: [
        strong('Caution:'),
        ' ',
        ...codeList(caution),
        ' has an incomplete or missing trace; the cut sets are only as complete as the model.',
      ],
    });
  blocks.push(...setsOfOrder(s, 1).map(singlePoint));
  const larger = s.cutSets.filter((c) => c.elements.length > 1);
  if (larger.length > 0) {
    blocks.push(
      {
        type: 'table',
        caption: `Cut sets of ${s.scenario} with more than one element, grouped by a shared member (${plural(larger.length, 'set')})`,
        head: ['Shared member', 'Path from each side', 'Together with any one of', 'Sets', 'Findings about it'],
        rows: groupBySharedMember(larger, compare).map((g) => groupRow(g, findings)),
        rowHeaders: true,
      },
      {
        type: 'paragraph',
        text: [
          'The path from each side to every other member is in the element tables of the layers above. ',
          code('bulkhead cut-sets'),
          ' lists each set on its own with its paths and findings; the JSON report carries them all.',
        ],
      },
    );
  }
  return blocks;
}

const frequency = (perYear: number) => formatFrequency(Math.max(0, perYear));

function cutSetSummary(cutSets: CutSetsReport): Block[] {
  const all = cutSets.scenarios;
  const singles = all.filter((s) => setsOfOrder(s, 1).length > 0).map((s) => s.scenario);
  const orders = Array.from({ length: cutSets.maxOrder }, (_, i) => i + 1);
  return [
    { type: 'heading', level: 3, text: ['Minimal cut sets'] },
    {
      type: 'paragraph',
      text: singles.length
        ? [
            strong(
              `${plural(singles.length, 'scenario')} of ${all.length} can be started and left unprotected by one element:`,
            ),
            ' ',
            ...codeList(singles),
            '.',
          ]
        : [
            `No scenario of ${all.length} can be started and left unprotected by one element (cut sets up to order ${cutSets.maxOrder}).`,
          ],
    },
    { type: 'paragraph', text: [cutSets.method] },
    {
      type: 'table',
      caption: `Minimal cut sets per scenario, up to order ${cutSets.maxOrder}`,
      head: ['Scenario', 'Layers claimed', ...orders.map(orderHead), 'Remark'],
      rows: all.map((s) => [
        [code(s.scenario)],
        s.layers.length ? codeList(s.layers) : ['none'],
        ...orders.map((order) => [s.noStartingElement ? '-' : String(setsOfOrder(s, order).length)]),
        [
          s.noStartingElement
            ? 'no element starts it (an external cause)'
            : s.incompleteLayers.length || s.unknownLayers.length
              ? 'a layer has an incomplete trace'
              : '',
        ],
      ]),
      rowHeaders: true,
    },
  ];
}

function rankingBlocks(commonCauses: NonNullable<ReportDocument['commonCauses']>): Block[] {
  const open = commonCauses.elements.filter((r) => r.openFindings > 0);
  const top = open[0];
  return [
    { type: 'heading', level: 3, text: ['Common causes across the site'] },
    {
      type: 'paragraph',
      text: top
        ? [
            `${plural(open.length, 'element')} take${open.length === 1 ? 's' : ''} part in open findings; first: `,
            code(top.element),
            `, ${plural(top.layers, 'layer')} in ${plural(top.scenarios.length, 'scenario')}, ${frequency(top.frequencyCost)} for it alone, ${frequency(top.frequencyAtStake)} at stake in its layers.`,
          ]
        : ['No element takes part in an open finding.'],
    },
    { type: 'paragraph', text: [strong('Order:'), ' ', commonCauses.order] },
    {
      type: 'table',
      caption: 'Common-cause ranking: elements that take part in findings, in the order stated above',
      head: [
        'Rank',
        'Element',
        'Kind and title',
        'Layers',
        'Scenarios',
        'Open of all findings',
        'Alone it costs',
        'Summed gap lower by',
        'At stake in its layers',
        'Would meet without it',
      ],
      rows: commonCauses.elements.map((r) => [
        [String(r.rank)],
        [code(r.element)],
        [r.title ? `${r.kind}: ${r.title}` : r.kind],
        [String(r.layers)],
        r.scenarios.length ? codeList(r.scenarios) : ['none'],
        [`${r.openFindings} of ${r.findings}`],
        [frequency(r.frequencyCost)],
        [frequency(r.gapReduction)],
        [frequency(r.frequencyAtStake)],
        r.wouldMeet.length ? codeList(r.wouldMeet) : ['none'],
      ]),
      rowHeaders: true,
      compact: true,
    },
  ];
}

/** The site-wide section, placed before the scenarios: answer first; nothing when the report has neither part. */
export function siteWideSection(doc: ReportDocument): Block[] {
  if (!doc.cutSets && !doc.commonCauses) return [];
  return [
    {
      type: 'section',
      kind: 'site-wide',
      id: 'site-wide',
      blocks: [
        { type: 'heading', level: 2, text: ['Site-wide: single points of failure and common causes'] },
        ...(doc.cutSets ? cutSetSummary(doc.cutSets) : []),
        ...(doc.commonCauses ? rankingBlocks(doc.commonCauses) : []),
      ],
    },
  ];
}
