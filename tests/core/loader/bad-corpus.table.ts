// The table of the bad-input corpus: for each file in fixtures/bad/, the code, line:column and a
// fragment of wording of its first diagnostic. Shared by the loader test and the CLI test.
import { readdirSync } from 'node:fs';
import type { DiagnosticCode } from '@bulkhead/core';

export const BAD_DIR = new URL('../../../fixtures/bad/', import.meta.url);

export interface CorpusRow {
  file: string;
  code: DiagnosticCode;
  line: number;
  column: number;
  /** A fragment of the message or help line that must appear (the "did you mean" for a misspelling). */
  says: string;
}

// One row per file, sorted by file name. Positions were checked by hand against each file.
export const CORPUS: readonly CorpusRow[] = [
  { file: 'attribute-twice.bulk', code: 'BH117', line: 16, column: 75, says: 'attribute `sil` given twice' },
  { file: 'bad-date.bulk', code: 'BH317', line: 22, column: 49, says: '`12/03/2024` is not YYYY-MM-DD' },
  { file: 'bad-enum.bulk', code: 'BH202', line: 9, column: 27, says: 'use one of: level, pressure' },
  { file: 'bad-number.bulk', code: 'BH112', line: 3, column: 35, says: 'malformed number `1e`' },
  { file: 'binary.bulk', code: 'BH102', line: 2, column: 1, says: 'NUL byte' },
  { file: 'byte-order-mark.bulk', code: 'BH101', line: 1, column: 1, says: 'byte-order mark' },
  { file: 'cause-also-layer.bulk', code: 'BH309', line: 21, column: 9, says: '`LIC-1` fails in the cause' },
  {
    file: 'cause-direction-unknown.bulk',
    code: 'BH202',
    line: 19,
    column: 34,
    says: 'use one of: open, closed, on, off, high, low',
  },
  { file: 'cause-twice.bulk', code: 'BH120', line: 20, column: 3, says: 'one `cause` line' },
  {
    file: 'cause-two-kinds.bulk',
    code: 'BH314',
    line: 19,
    column: 3,
    says: 'more than one of function, element and external',
  },
  { file: 'comment-line-break.json', code: 'BH201', line: 17, column: 9, says: 'line break' },
  {
    file: 'common-cause-no-group.bulk',
    code: 'BH345',
    line: 14,
    column: 26,
    says: 'no voted group to share a common cause',
  },
  {
    file: 'condition-credit-limit-below-one.bulk',
    code: 'BH332',
    line: 3,
    column: 31,
    says: 'condition credit limit 0.01 is below 1',
  },
  { file: 'constructor-key.json', code: 'BH203', line: 4, column: 5, says: 'unknown field `constructor`' },
  {
    file: 'constructor-reference.bulk',
    code: 'BH300',
    line: 16,
    column: 44,
    says: 'unknown tag `constructor` in `finals`',
  },
  {
    file: 'constructor-scenario-line.bulk',
    code: 'BH115',
    line: 20,
    column: 3,
    says: 'unknown scenario line `constructor`',
  },
  { file: 'dependency-chain-too-deep.bulk', code: 'BH107', line: 8, column: 13, says: 'chain of 102 links' },
  { file: 'dependency-cycle.bulk', code: 'BH303', line: 6, column: 8, says: '`N-1` -> `N-2` -> `N-1`' },
  { file: 'duplicate-key.json', code: 'BH117', line: 16, column: 7, says: 'field `tag` given twice' },
  { file: 'duplicate-tag.bulk', code: 'BH301', line: 14, column: 10, says: 'tag `XV-1` is defined twice' },
  { file: 'empty-list.json', code: 'BH201', line: 111, column: 17, says: '`layers` is an empty list' },
  { file: 'empty.bulk', code: 'BH100', line: 1, column: 1, says: 'the file is empty' },
  { file: 'failure-data-both-forms.bulk', code: 'BH341', line: 14, column: 14, says: 'gives its rates in both forms' },
  { file: 'failure-data-coverage-no-mission.bulk', code: 'BH344', line: 14, column: 104, says: 'give mission-hours=' },
  {
    file: 'failure-data-coverage-out-of-range.bulk',
    code: 'BH342',
    line: 14,
    column: 49,
    says: 'diagnostic coverage 60 is outside [0, 1]',
  },
  {
    file: 'failure-data-no-target.bulk',
    code: 'BH340',
    line: 14,
    column: 14,
    says: 'must name one element, or one make and model',
  },
  { file: 'failure-data-twice.bulk', code: 'BH343', line: 15, column: 14, says: '`FD-1` and `FD-2`' },
  {
    file: 'frequency-negative.bulk',
    code: 'BH305',
    line: 3,
    column: 35,
    says: 'tolerable frequency -0.0001 must be positive',
  },
  { file: 'frequency-not-positive.bulk', code: 'BH305', line: 19, column: 34, says: 'frequency 0 must be positive' },
  { file: 'indented-first-statement.bulk', code: 'BH114', line: 2, column: 3, says: 'no statement above it' },
  { file: 'infinite-number.json', code: 'BH305', line: 108, column: 22, says: '`frequency` is not a finite number' },
  { file: 'json-comment.json', code: 'BH119', line: 2, column: 3, says: 'comments are not allowed' },
  { file: 'kind-as-attribute.bulk', code: 'BH118', line: 5, column: 12, says: 'unknown attribute `kind`' },
  { file: 'layer-claimed-twice.bulk', code: 'BH308', line: 21, column: 9, says: '`SIF-1` is claimed twice' },
  { file: 'layer-not-function.bulk', code: 'BH307', line: 20, column: 9, says: 'is a shutdown-valve, not a function' },
  { file: 'line-too-long.bulk', code: 'BH105', line: 6, column: 10001, says: 'the limit is 10000' },
  { file: 'missing-frequency.bulk', code: 'BH310', line: 19, column: 3, says: 'no frequency' },
  { file: 'missing-kind.json', code: 'BH200', line: 13, column: 5, says: 'missing `kind` in element `V-1`' },
  { file: 'missing-required.bulk', code: 'BH200', line: 16, column: 5, says: 'missing `solver`' },
  { file: 'missing-value.bulk', code: 'BH116', line: 5, column: 17, says: 'missing value after `title=`' },
  { file: 'nesting-after-broken-string.json', code: 'BH106', line: 4, column: 315, says: 'nested more than 64 levels' },
  { file: 'nesting-too-deep.json', code: 'BH106', line: 3, column: 80, says: 'nested more than 64 levels' },
  { file: 'not-utf8.bulk', code: 'BH102', line: 18, column: 33, says: 'not UTF-8 text (byte 0xE9' },
  { file: 'number-too-precise.bulk', code: 'BH121', line: 20, column: 19, says: 'it would be read as 0.05' },
  {
    file: 'part-missing.bulk',
    code: 'BH123',
    line: 3,
    column: 6,
    says: 'the part file `units/no-such-part.bulk` cannot be read',
  },
  { file: 'part-not-bulk.bulk', code: 'BH124', line: 3, column: 6, says: 'is not a relative path to a .bulk file' },
  {
    file: 'pipe-length-not-piping.bulk',
    code: 'BH331',
    line: 10,
    column: 76,
    says: 'scales only the per-100 m piping rows',
  },
  {
    file: 'piping-no-length.bulk',
    code: 'BH330',
    line: 10,
    column: 56,
    says: 'per 100 m of pipe; the cause gives no length',
  },
  { file: 'probability-above-one.bulk', code: 'BH304', line: 20, column: 19, says: 'PFD 1.5 is outside (0, 1]' },
  { file: 'probability-zero.bulk', code: 'BH304', line: 16, column: 70, says: 'PFD 0 is outside (0, 1]' },
  { file: 'proto-key.json', code: 'BH203', line: 4, column: 5, says: 'unknown field `__proto__`' },
  { file: 'proto-keyword.bulk', code: 'BH115', line: 7, column: 1, says: 'unknown statement `__proto__`' },
  { file: 'proto-tag.bulk', code: 'BH313', line: 6, column: 6, says: 'tag `__proto__`' },
  { file: 'quoted-number.bulk', code: 'BH201', line: 20, column: 19, says: 'without quotes' },
  { file: 'role-wrong-kind.bulk', code: 'BH315', line: 16, column: 31, says: 'needs a controller or logic-solver' },
  { file: 'sil-out-of-range.bulk', code: 'BH316', line: 16, column: 64, says: 'SIL 5' },
  { file: 'site-twice.bulk', code: 'BH120', line: 3, column: 1, says: '`site` given twice' },
  { file: 'stray-token.bulk', code: 'BH111', line: 5, column: 12, says: 'unexpected character `;`' },
  {
    file: 'supply-on-passive.bulk',
    code: 'BH118',
    line: 5,
    column: 12,
    says: 'unknown attribute `supply` for `vessel`',
  },
  {
    file: 'supply-unknown-word.bulk',
    code: 'BH202',
    line: 9,
    column: 40,
    says: 'use one of: from-signal, mechanical, self-contained',
  },
  { file: 'tab-space-mix.bulk', code: 'BH113', line: 20, column: 1, says: 'mixes tabs and spaces' },
  { file: 'tag-too-long.bulk', code: 'BH312', line: 6, column: 8, says: 'tag is 2000 characters long' },
  { file: 'top-level-array.json', code: 'BH201', line: 1, column: 1, says: 'found a list' },
  { file: 'trailing-comma.json', code: 'BH119', line: 9, column: 23, says: 'trailing comma' },
  { file: 'truncated-line.bulk', code: 'BH116', line: 16, column: 24, says: 'found `and`' },
  { file: 'unknown-attribute.bulk', code: 'BH118', line: 9, column: 33, says: 'did you mean `mounted-on`?' },
  { file: 'unknown-category.bulk', code: 'BH311', line: 18, column: 40, says: 'did you mean `people-serious`?' },
  { file: 'unknown-escape.bulk', code: 'BH110', line: 19, column: 49, says: 'unknown escape `\\q`' },
  { file: 'unknown-field.json', code: 'BH203', line: 16, column: 7, says: 'unknown field `colour`' },
  { file: 'unknown-keyword.bulk', code: 'BH115', line: 5, column: 1, says: 'did you mean `vessel`?' },
  { file: 'unknown-kind.json', code: 'BH202', line: 14, column: 15, says: 'did you mean `vessel`?' },
  { file: 'unknown-reference.bulk', code: 'BH300', line: 16, column: 19, says: 'did you mean `LT-2`?' },
  { file: 'unknown-rule.bulk', code: 'BH319', line: 4, column: 6, says: 'did you mean `shared-bridle`?' },
  { file: 'unknown-scenario-line.bulk', code: 'BH115', line: 20, column: 3, says: 'did you mean `layer`?' },
  { file: 'unterminated-string.bulk', code: 'BH110', line: 18, column: 20, says: 'unterminated string' },
  { file: 'voting-m-over-n.bulk', code: 'BH306', line: 16, column: 38, says: 'voting 2oo1 needs M between 1 and N' },
  { file: 'voting-malformed.bulk', code: 'BH306', line: 16, column: 38, says: '`one-of-two` is not MooN voting' },
  { file: 'voting-n-mismatch.bulk', code: 'BH306', line: 16, column: 38, says: 'names 2 channels but `sensors` has 1' },
  { file: 'whitespace-only.bulk', code: 'BH100', line: 1, column: 1, says: 'the file is empty' },
  {
    file: 'wrong-kind-link.bulk',
    code: 'BH302',
    line: 9,
    column: 44,
    says: 'cannot be linked by `mounted-on` to `XV-1` (shutdown-valve)',
  },
  { file: 'wrong-type.json', code: 'BH201', line: 8, column: 20, says: '`tolerable` should be a number' },
];

/** Codes the loader can emit that no checked-in file shows, each with where it is tested instead. */
export const NOT_IN_CORPUS: Partial<Record<DiagnosticCode, string>> = {
  BH103: 'over 50 MB: generated in this file and in tests/cli/foundation-bad-corpus.test.ts',
  BH104: 'unreadable: a missing path in tests/cli/foundation-bad-corpus.test.ts',
  BH122: 'a cycle needs two files: tests/core/loader/parts.test.ts',
  BH318: 'not emitted by the loader: a narrowed cause needs the traced loop (analysis stage)',
};

export function corpusFiles(): string[] {
  return readdirSync(BAD_DIR).sort();
}
