// shared-console: a console shared by two functions can mislead or blind both.
import { defineSharedRule, sharedData } from '../define.ts';
import { sharedConsole as entry } from '../../catalogue/independence/shared-console.ts';
import { say } from '../../catalogue/catalogue.ts';

export const sharedConsole = defineSharedRule(entry, {
  groups: ['people'],
  claims: (element) => element.kind === 'console',
  message: (element, pair, severity, beneath) =>
    say('shared-console/shared', sharedData(element, pair, severity, beneath)),
});
