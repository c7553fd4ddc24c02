// The rule ids the loader knows (vocabulary/rule-ids.ts, data at the bottom of the flow) are exactly the
// rules the analysis runs: independence rules, assessment rules and justification rules, in that order.
import { describe, expect, it } from 'vitest';
import { ASSESS_RULES, JUSTIFICATION_RULES, RULES } from '@bulkhead/core';
import { ASSESSMENT_RULE_IDS, INDEPENDENCE_RULE_IDS, JUSTIFICATION_RULE_IDS } from '../../../packages/core/src/vocabulary/rule-ids.ts';

describe('the rule id lists', () => {
  it('name every independence rule, in the registry order', () => {
    expect([...INDEPENDENCE_RULE_IDS]).toEqual(RULES.map((r) => r.id));
  });
  it('name every assessment rule', () => {
    expect([...ASSESSMENT_RULE_IDS]).toEqual(ASSESS_RULES.map((r) => r.id));
  });
  it('name every justification rule', () => {
    expect([...JUSTIFICATION_RULE_IDS]).toEqual(JUSTIFICATION_RULES.map((r) => r.id));
  });
});
