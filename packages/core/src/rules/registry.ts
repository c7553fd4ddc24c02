// The rule set, in the order shared-element rules are asked to claim a shared element (most specific
// first) and the order findings of equal severity are listed.
import type { Rule } from './define.ts';
import { alarmOnFailedBpcs } from './catalogue/alarm-on-failed-bpcs.ts';
import { causeNarrowed } from './catalogue/cause-narrowed.ts';
import { incompleteTrace } from './catalogue/incomplete-trace.ts';
import { sameMakeModel } from './catalogue/same-make-model.ts';
import { sharedActuation } from './catalogue/shared-actuation.ts';
import { sharedBridle } from './catalogue/shared-bridle.ts';
import { sharedConsole } from './catalogue/shared-console.ts';
import { sharedFinalElement } from './catalogue/shared-final-element.ts';
import { sharedHousing } from './catalogue/shared-housing.ts';
import { sharedImpulseLine } from './catalogue/shared-impulse-line.ts';
import { sharedIo } from './catalogue/shared-io.ts';
import { sharedLogicSolver } from './catalogue/shared-logic-solver.ts';
import { sharedOperator } from './catalogue/shared-operator.ts';
import { sharedProcessConnection } from './catalogue/shared-process-connection.ts';
import { sharedSensor } from './catalogue/shared-sensor.ts';
import { sharedSisSolver } from './catalogue/shared-sis-solver.ts';
import { sharedSupport } from './catalogue/shared-support.ts';
import { undeclaredSupply } from './catalogue/undeclared-supply.ts';
import { utilityLossCause } from './catalogue/utility-loss-cause.ts';
import { votedGroupCommonCause } from './catalogue/voted-group-common-cause.ts';

export const RULES: readonly Rule[] = [
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
];

export const RULE_IDS: ReadonlySet<string> = new Set(RULES.map((r) => r.id));

export function ruleById(id: string): Rule | undefined {
  return RULES.find((r) => r.id === id);
}
