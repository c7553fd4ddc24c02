// Every rule id the analysis can report, by kind, as plain data at the bottom of the flow: the loader
// checks `rule ID severity=...` statements against it without importing the stages that run the rules.
// tests/core/rules/rule-ids.test.ts keeps it equal to the rule lists of rules/, assess/ and justify/.

export const INDEPENDENCE_RULE_IDS = [
  'utility-loss-cause',
  'alarm-on-failed-bpcs',
  'shared-process-connection',
  'shared-bridle',
  'shared-impulse-line',
  'shared-sensor',
  'shared-io',
  'shared-sis-solver',
  'shared-logic-solver',
  'shared-final-element',
  'shared-actuation',
  'shared-support',
  'shared-housing',
  'shared-operator',
  'shared-console',
  'same-make-model',
  'voted-group-common-cause',
  'incomplete-trace',
  'undeclared-supply',
  'cause-narrowed',
] as const;

export const ASSESSMENT_RULE_IDS = [
  'sif-pfd-outside-sil',
  'sif-pfh-outside-sil',
  'sif-high-demand-no-pfh',
  'bpcs-layer-cap',
  'bpcs-layer-count',
  'bpcs-same-controller',
  'bpcs-layer-with-bpcs-cause',
  'human-response-floor',
  'alarm-response-time',
  'check-valve-no-credit',
  'layer-no-pfd',
  'modifier-not-allowed',
  'presence-above-limit',
  'condition-no-basis',
  'condition-credit-limit',
  'cause-no-basis',
  'sif-claim-no-basis',
  'bpcs-cause-frequency-low',
] as const;

export const JUSTIFICATION_RULE_IDS = ['duplicate-justification', 'stale-justification'] as const;

export const ALL_RULE_IDS: ReadonlySet<string> = new Set<string>([...INDEPENDENCE_RULE_IDS, ...ASSESSMENT_RULE_IDS, ...JUSTIFICATION_RULE_IDS]);
