// The rule set, in the order shared-element rules are asked to claim a shared element (most specific
// first) and the order findings of equal severity are listed.
import type { Rule } from './define.ts';
import { causeNarrowed } from './catalogue/cause-narrowed.ts';
import { incompleteTrace } from './catalogue/incomplete-trace.ts';
import { sameMakeModel } from './catalogue/same-make-model.ts';
import { sharedBridle, sharedImpulseLine, sharedProcessConnection } from './catalogue/shared-process.ts';
import { sharedActuation, sharedFinalElement, sharedIo, sharedLogicSolver, sharedSensor } from './catalogue/shared-instrument.ts';
import { sharedHousing } from './catalogue/shared-housing.ts';
import { sharedSisSolver } from './catalogue/shared-sis-solver.ts';
import { alarmOnFailedBpcs, sharedConsole, sharedOperator } from './catalogue/shared-people.ts';
import { sharedSupport, utilityLossCause } from './catalogue/shared-support.ts';
import { votedGroupCommonCause } from './catalogue/voted-group.ts';
import { undeclaredSupply } from './catalogue/undeclared-supply.ts';

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
