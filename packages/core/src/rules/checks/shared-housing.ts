// Shared housings (cabinet, junction box, cable route): a fire, flood or impact there can take out
// everything inside, but whether it must void credit is a judgement, so it asks for a justification.
import { defineSharedRule, sharedData } from '../define.ts';
import { sharedHousing as entry } from '../../catalogue/independence/shared-housing.ts';
import { say } from '../../catalogue/catalogue.ts';

export const sharedHousing = defineSharedRule(entry, {
  groups: ['housing'],
  message: (element, pair, severity, beneath) =>
    say('shared-housing/shared', sharedData(element, pair, severity, beneath)),
});
