// shared-io: one I/O card, cable or network segment carries the signals of every function wired through it.
import { defineSharedRule, sharedData } from '../define.ts';
import { sharedIo as entry } from '../../catalogue/independence/shared-io.ts';
import { say } from '../../catalogue/catalogue.ts';

export const sharedIo = defineSharedRule(entry, {
  groups: ['signal'],
  message: (element, pair, severity, beneath) => say('shared-io/shared', sharedData(element, pair, severity, beneath)),
});
