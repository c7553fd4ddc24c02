// shared-sensor: a transmitter or switch used by the failing loop, or by two layers, fails for both.
import { defineSharedRule, sharedData } from '../define.ts';
import { sharedSensor as entry } from '../../catalogue/independence/shared-sensor.ts';
import { say } from '../../catalogue/catalogue.ts';

export const sharedSensor = defineSharedRule(entry, {
  groups: ['sensor'],
  message: (element, pair, severity, beneath) =>
    say('shared-sensor/shared', sharedData(element, pair, severity, beneath)),
});
