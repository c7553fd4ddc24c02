// The independence rule set: each rule's check (checks/<id>.ts), in the catalogue's order, which is the
// order shared-element rules are asked to claim a shared element (most specific first) and the order
// findings of equal severity are listed.
import type { Rule } from './define.ts';
import { INDEPENDENCE_ENTRIES, type IndependenceRuleId } from '../catalogue/catalogue.ts';
import { alarmOnFailedBpcs } from './checks/alarm-on-failed-bpcs.ts';
import { causeNarrowed } from './checks/cause-narrowed.ts';
import { incompleteTrace } from './checks/incomplete-trace.ts';
import { sameMakeModel } from './checks/same-make-model.ts';
import { sharedActuation } from './checks/shared-actuation.ts';
import { sharedBridle } from './checks/shared-bridle.ts';
import { sharedConsole } from './checks/shared-console.ts';
import { sharedFinalElement } from './checks/shared-final-element.ts';
import { sharedHousing } from './checks/shared-housing.ts';
import { sharedImpulseLine } from './checks/shared-impulse-line.ts';
import { sharedIo } from './checks/shared-io.ts';
import { sharedLogicSolver } from './checks/shared-logic-solver.ts';
import { sharedOperator } from './checks/shared-operator.ts';
import { sharedProcessConnection } from './checks/shared-process-connection.ts';
import { sharedSensor } from './checks/shared-sensor.ts';
import { sharedSisSolver } from './checks/shared-sis-solver.ts';
import { sharedSupport } from './checks/shared-support.ts';
import { undeclaredSupply } from './checks/undeclared-supply.ts';
import { utilityLossCause } from './checks/utility-loss-cause.ts';
import { votedGroupCommonCause } from './checks/voted-group-common-cause.ts';

/** Each rule's check by its id: the type asks for one check for every independence rule in the catalogue. */
const CHECKS: Record<IndependenceRuleId, Rule> = {
  'alarm-on-failed-bpcs': alarmOnFailedBpcs,
  'cause-narrowed': causeNarrowed,
  'incomplete-trace': incompleteTrace,
  'same-make-model': sameMakeModel,
  'shared-actuation': sharedActuation,
  'shared-bridle': sharedBridle,
  'shared-console': sharedConsole,
  'shared-final-element': sharedFinalElement,
  'shared-housing': sharedHousing,
  'shared-impulse-line': sharedImpulseLine,
  'shared-io': sharedIo,
  'shared-logic-solver': sharedLogicSolver,
  'shared-operator': sharedOperator,
  'shared-process-connection': sharedProcessConnection,
  'shared-sensor': sharedSensor,
  'shared-sis-solver': sharedSisSolver,
  'shared-support': sharedSupport,
  'undeclared-supply': undeclaredSupply,
  'utility-loss-cause': utilityLossCause,
  'voted-group-common-cause': votedGroupCommonCause,
};

/** In the catalogue's order (catalogue/catalogue.ts INDEPENDENCE_ENTRIES). */
export const RULES: readonly Rule[] = INDEPENDENCE_ENTRIES.map((entry) => CHECKS[entry.id]);

export const RULE_IDS: ReadonlySet<string> = new Set(RULES.map((r) => r.id));

export function ruleById(id: string): Rule | undefined {
  return RULES.find((r) => r.id === id);
}
