// What every rule is, whatever its kind, as plain data: id, kind, title, rationale, source, default
// severity, and the messages its findings say. A message is the words for one typed shape of data, so a
// finding carries a message id and its data, and one renderer (catalogue.ts) writes the words.
// The checks that raise the findings live with their stage (rules/checks/, assess/, justify/).
import type { SeverityLevel } from '../model/schema.ts';

export type RuleKind = 'independence' | 'assessment' | 'justification';

/** The words of one message, written from its data alone. */
export type MessageWords<Data> = (data: Data) => string;

// `never` accepts the words of any data shape (a parameter is read the other way round).
type AnyWords = MessageWords<never>;

export interface RuleEntry<
  Id extends string = string,
  Messages extends Record<string, AnyWords> = Record<string, AnyWords>,
> {
  id: Id;
  kind: RuleKind;
  title: string;
  rationale: string;
  source: string;
  defaultSeverity: SeverityLevel;
  /** By name; a finding names one as `<rule id>/<name>`. */
  messages: Messages;
}

/** Keeps the id and each message's data type exact, so the catalogue's message map is typed from the entries. */
export function ruleEntry<const Id extends string, const Messages extends Record<string, AnyWords>>(
  entry: RuleEntry<Id, Messages>,
): RuleEntry<Id, Messages> {
  return entry;
}

/** `a` for one tag, `` `a`, `b` `` for several: how every message lists tags. */
export function tagList(tags: readonly string[]): string {
  return tags.map((t) => `\`${t}\``).join(', ');
}
