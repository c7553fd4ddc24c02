// shared-process-connection: a nozzle, tapping or root valve that plugs, freezes or is left isolated
// blinds every instrument on it at once.
import { defineSharedRule, sharedData } from '../define.ts';
import { sharedProcessConnection as entry } from '../../catalogue/independence/shared-process-connection.ts';
import { say } from '../../catalogue/catalogue.ts';

export const sharedProcessConnection = defineSharedRule(entry, {
  groups: ['connection'],
  claims: (element) => element.kind === 'nozzle' || element.kind === 'tapping' || element.kind === 'root-valve',
  message: (element, pair, severity, beneath) =>
    say('shared-process-connection/shared', sharedData(element, pair, severity, beneath)),
});
