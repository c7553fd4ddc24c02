// shared-operator: two responses by one person, or a response by the person whose error is the cause.
import { defineSharedRule, sharedData } from '../define.ts';
import { sharedOperator as entry } from '../../catalogue/independence/shared-operator.ts';
import { say } from '../../catalogue/catalogue.ts';

export const sharedOperator = defineSharedRule(entry, {
  groups: ['people'],
  claims: (element) => element.kind === 'operator',
  message: (element, pair, severity, beneath) =>
    say('shared-operator/shared', sharedData(element, pair, severity, beneath)),
});
