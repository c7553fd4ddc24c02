// The document-control parts of the printed reports: the issue block (number, revision, status, the model
// file and its hash, the documents it was built from), the assumptions, the lines to sign, and the
// sources appendix that lists every work the rules cite once, with its edition and how it was checked.
import type { ReportDocument } from './document.ts';
import { code, codeList, type Block, type Rich } from './blocks.ts';
import { modelFilesWords } from '../util/content-hash.ts';

/** What the page shows where the model and the command line give nothing: a blank to fill, said so. */
const NOT_GIVEN = 'not given (set it in the model or on the command line)';

export function issueBlock(doc: ReportDocument): Block {
  const c = doc.control;
  const rows: Rich[][] = [
    [['Document number'], [c?.document ?? NOT_GIVEN]],
    [['Revision'], [c?.revision ?? NOT_GIVEN]],
    [['Status'], [c?.status ?? NOT_GIVEN]],
    [['Model file'], [code(doc.model.file)]],
    ...(doc.model.parts
      ? [
          [['SHA-256 of the model'], [code(doc.model.sha256), ` over ${modelFilesWords(doc.model.parts.length + 1)}`]],
          [
            ['Part files'],
            doc.model.parts.flatMap((p, i) => [...(i ? ['; '] : []), code(p.file), ' SHA-256 ', code(p.sha256)]),
          ],
        ]
      : [[['SHA-256 of the model file'], [code(doc.model.sha256)]]]),
    [['Built from'], c?.basedOn.length ? [c.basedOn.join('; ')] : ['no source documents named in the model']],
  ];
  return { type: 'table', caption: 'Document control', head: ['Item', 'Value'], rows, rowHeaders: true };
}

/** Prepared, checked and approved, each with a name (when the model gives one), a signature and a date. */
export function signOff(doc: ReportDocument): Block[] {
  const c = doc.control;
  const line = (role: string, name: string | undefined): Rich[] => [[role], [name ?? ''], [''], ['']];
  return [
    { type: 'heading', level: 2, text: ['Sign-off'] },
    {
      type: 'paragraph',
      text: [
        'Each signature needs its date (YYYY-MM-DD): an undated signature does not issue this revision. Sign only after reading the cautions and the assumptions.',
      ],
    },
    {
      type: 'table',
      caption: 'Prepared, checked and approved',
      head: ['Role', 'Name', 'Signature', 'Date (required)'],
      rows: [line('Prepared by', c?.preparedBy), line('Checked by', c?.checkedBy), line('Approved by', c?.approvedBy)],
      rowHeaders: true,
      sign: true,
    },
  ];
}

export function assumptionsBlocks(doc: ReportDocument): Block[] {
  return [
    { type: 'heading', level: 2, text: ['Assumptions'] },
    { type: 'list', items: (doc.assumptions ?? []).map((a) => [a]) },
  ];
}

const CHECKED_TEXT: Record<NonNullable<ReportDocument['sources']>[number]['checked'], string> = {
  yes: 'yes',
  partly: 'partly: the clauses marked [from memory] were not',
  'from-memory': 'no: cited from memory',
  'no-source': "not applicable: common practice or owner's policy",
};

/** The references a rule cites, as appendix ids: "R1, R3". */
export function referencesOf(doc: ReportDocument, rule: string): string {
  return (doc.sources ?? [])
    .filter((s) => s.rules.includes(rule))
    .map((s) => s.id)
    .join(', ');
}

export function sourcesAppendix(doc: ReportDocument): Block {
  return {
    type: 'section',
    kind: 'appendix',
    id: 'appendix-sources',
    blocks: [
      { type: 'heading', level: 2, text: ['Appendix C: sources'] },
      {
        type: 'paragraph',
        text: [
          'Every work the rules cite, once. A clause the rules do not mark from memory was read against the text when the rule was written; a clause marked [from memory] was not, and should be checked before it is relied on.',
        ],
      },
      {
        type: 'table',
        caption: 'Sources cited by the rules in force',
        head: ['Ref', 'Work', 'Edition', 'Clauses cited', 'Checked against the text', 'Cited by'],
        rows: (doc.sources ?? []).map((s) => [
          [s.id],
          [s.work],
          [s.edition ?? 'not stated'],
          [s.clauses.join('; ')],
          [CHECKED_TEXT[s.checked]],
          codeList(s.rules),
        ]),
        rowHeaders: true,
      },
    ],
  };
}

/** The text every printed page carries at its foot: which document, of which model file, at which hash. */
export function runningFooter(doc: ReportDocument): string {
  const c = doc.control;
  const issue = [c?.document, c?.revision !== undefined ? `rev ${c.revision}` : undefined, c?.status]
    .filter((x) => x !== undefined)
    .join(' ');
  const files = doc.model.parts ? ` (${modelFilesWords(doc.model.parts.length + 1).split(':')[0]})` : '';
  return `${issue ? `${issue} · ` : ''}${doc.model.file}${files} · SHA-256 ${doc.model.sha256}`;
}
