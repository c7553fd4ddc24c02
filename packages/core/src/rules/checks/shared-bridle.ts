// shared-bridle: two level instruments on one bridle, chamber or manifold both read wrong when it
// plugs or is valved out.
import { defineSharedRule, sharedData } from '../define.ts';
import { sharedBridle as entry } from '../../catalogue/independence/shared-bridle.ts';
import { say } from '../../catalogue/catalogue.ts';

export const sharedBridle = defineSharedRule(entry, {
  groups: ['connection'],
  claims: (element) => element.kind === 'bridle' || element.kind === 'manifold',
  message: (element, pair, severity, beneath) =>
    say('shared-bridle/shared', sharedData(element, pair, severity, beneath)),
});
