// The rule catalogue: every rule of every kind as data, one file per rule named by its id under
// catalogue/<kind>/. At the bottom of the flow, so the loader checks `rule ID severity=...` statements
// against it without importing the stages that run the rules. Also the one renderer of finding messages.
import type { MessageWords, RuleEntry } from './define.ts';
import { alarmOnFailedBpcs } from './independence/alarm-on-failed-bpcs.ts';
import { causeNarrowed } from './independence/cause-narrowed.ts';
import { incompleteTrace } from './independence/incomplete-trace.ts';
import { sameMakeModel } from './independence/same-make-model.ts';
import { sharedActuation } from './independence/shared-actuation.ts';
import { sharedBridle } from './independence/shared-bridle.ts';
import { sharedConsole } from './independence/shared-console.ts';
import { sharedFinalElement } from './independence/shared-final-element.ts';
import { sharedHousing } from './independence/shared-housing.ts';
import { sharedImpulseLine } from './independence/shared-impulse-line.ts';
import { sharedIo } from './independence/shared-io.ts';
import { sharedLogicSolver } from './independence/shared-logic-solver.ts';
import { sharedOperator } from './independence/shared-operator.ts';
import { sharedProcessConnection } from './independence/shared-process-connection.ts';
import { sharedSensor } from './independence/shared-sensor.ts';
import { sharedSisSolver } from './independence/shared-sis-solver.ts';
import { sharedSupport } from './independence/shared-support.ts';
import { undeclaredSupply } from './independence/undeclared-supply.ts';
import { utilityLossCause } from './independence/utility-loss-cause.ts';
import { votedGroupCommonCause } from './independence/voted-group-common-cause.ts';
import { alarmResponseTime } from './assessment/alarm-response-time.ts';
import { bpcsCauseFrequencyLow } from './assessment/bpcs-cause-frequency-low.ts';
import { bpcsLayerCap } from './assessment/bpcs-layer-cap.ts';
import { bpcsLayerCount } from './assessment/bpcs-layer-count.ts';
import { bpcsLayerWithBpcsCause } from './assessment/bpcs-layer-with-bpcs-cause.ts';
import { bpcsSameController } from './assessment/bpcs-same-controller.ts';
import { causeNoBasis } from './assessment/cause-no-basis.ts';
import { checkValveNoCredit } from './assessment/check-valve-no-credit.ts';
import { conditionCreditLimit } from './assessment/condition-credit-limit.ts';
import { conditionNoBasis } from './assessment/condition-no-basis.ts';
import { humanResponseFloor } from './assessment/human-response-floor.ts';
import { layerNoPfd } from './assessment/layer-no-pfd.ts';
import { modifierNotAllowed } from './assessment/modifier-not-allowed.ts';
import { presenceAboveLimit } from './assessment/presence-above-limit.ts';
import { sifClaimNoBasis } from './assessment/sif-claim-no-basis.ts';
import { sifHighDemandNoPfh } from './assessment/sif-high-demand-no-pfh.ts';
import { sifPfdOutsideSil } from './assessment/sif-pfd-outside-sil.ts';
import { sifPfhOutsideSil } from './assessment/sif-pfh-outside-sil.ts';
import { duplicateJustification } from './justification/duplicate-justification.ts';
import { staleJustification } from './justification/stale-justification.ts';

/** In the order shared-element rules are asked to claim a shared element (most specific first), and findings of equal severity are listed. */
export const INDEPENDENCE_ENTRIES = [
  utilityLossCause,
  alarmOnFailedBpcs,
  sharedProcessConnection,
  sharedBridle,
  sharedImpulseLine,
  sharedSensor,
  sharedIo,
  sharedSisSolver,
  sharedLogicSolver,
  sharedFinalElement,
  sharedActuation,
  sharedSupport,
  sharedHousing,
  sharedOperator,
  sharedConsole,
  sameMakeModel,
  votedGroupCommonCause,
  incompleteTrace,
  undeclaredSupply,
  causeNarrowed,
] as const;

/** In the order the rule set in force lists them. */
export const ASSESSMENT_ENTRIES = [
  sifPfdOutsideSil,
  sifPfhOutsideSil,
  sifHighDemandNoPfh,
  bpcsLayerCap,
  bpcsLayerCount,
  bpcsSameController,
  bpcsLayerWithBpcsCause,
  humanResponseFloor,
  alarmResponseTime,
  checkValveNoCredit,
  layerNoPfd,
  modifierNotAllowed,
  presenceAboveLimit,
  conditionNoBasis,
  conditionCreditLimit,
  causeNoBasis,
  sifClaimNoBasis,
  bpcsCauseFrequencyLow,
] as const;

export const JUSTIFICATION_ENTRIES = [duplicateJustification, staleJustification] as const;

export const CATALOGUE = [...INDEPENDENCE_ENTRIES, ...ASSESSMENT_ENTRIES, ...JUSTIFICATION_ENTRIES] as const;

type Entry = (typeof CATALOGUE)[number];
export type RuleId = Entry['id'];
export type IndependenceRuleId = (typeof INDEPENDENCE_ENTRIES)[number]['id'];
export type AssessmentRuleId = (typeof ASSESSMENT_ENTRIES)[number]['id'];
export type JustificationRuleId = (typeof JUSTIFICATION_ENTRIES)[number]['id'];

export const ALL_RULE_IDS: ReadonlySet<string> = new Set<string>(CATALOGUE.map((e) => e.id));

type MessagesOf<E> =
  E extends RuleEntry<infer Id, infer Messages>
    ? {
        [Name in keyof Messages & string as `${Id}/${Name}`]: Messages[Name] extends MessageWords<infer Data>
          ? Data
          : never;
      }
    : never;
type Intersection<U> = (U extends unknown ? (x: U) => void : never) extends (x: infer I) => void ? I : never;

/** Every message any rule can say, by id (`<rule id>/<name>`), to the type of its data. */
export type FindingMessages = Intersection<MessagesOf<Entry>>;
export type MessageId = keyof FindingMessages & string;

/** One message with its data. */
export interface MessageOf<Id extends MessageId> {
  messageId: Id;
  data: FindingMessages[Id];
}

/** What a finding says, as data: a message id and the data of that message (a wrong pair does not compile). */
export type FindingMessage = { [Id in MessageId]: MessageOf<Id> }[MessageId];

/** A finding message from its id and data, checked against each other. */
export function say<Id extends MessageId>(messageId: Id, data: FindingMessages[Id]): MessageOf<Id> {
  return { messageId, data };
}

/** The rule a message belongs to: its id up to the last `/`. */
export function ruleIdOf(message: FindingMessage): RuleId {
  return message.messageId.slice(0, message.messageId.lastIndexOf('/')) as RuleId;
}

const ENTRY_BY_ID = new Map<string, RuleEntry>(CATALOGUE.map((e) => [e.id, e]));

export function catalogueEntry(id: string): RuleEntry | undefined {
  return ENTRY_BY_ID.get(id);
}

/** The words of a finding message: the one place a message id and its data become text. */
export function renderMessage(message: FindingMessage): string {
  const name = message.messageId.slice(message.messageId.lastIndexOf('/') + 1);
  const words = ENTRY_BY_ID.get(ruleIdOf(message))?.messages[name] as MessageWords<unknown> | undefined;
  // Unreachable while message ids are typed: only a finding built by hand around the types gets here.
  if (!words) throw new Error(`message ${message.messageId} is not in the rule catalogue`);
  return words(message.data);
}
