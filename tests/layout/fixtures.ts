// Shared inputs for the layout tests: the demo model with its real analysis, and small hand-made
// models and analyses (invented test data, not from any plant) for the cases the demo lacks.
import { readFileSync } from 'node:fs';
import { analyze, loadModelText, type Analysis, type Model } from '@bulkhead/core';

export function demo(): { model: Model; analysis: Analysis } {
  const file = new URL('../../fixtures/demo/marrow-fen.bulk', import.meta.url);
  const loaded = loadModelText('marrow-fen.bulk', readFileSync(file));
  if (!loaded.model) throw new Error('demo does not load');
  return { model: loaded.model, analysis: analyze(loaded.model, { spans: loaded.spans }) };
}

/** Loads a small .bulk text (invented test data) and analyses it. */
export function small(text: string): { model: Model; analysis: Analysis } {
  const loaded = loadModelText('test.bulk', text);
  if (!loaded.model)
    throw new Error(`test model does not load: ${loaded.diagnostics.map((d) => d.message).join('; ')}`);
  return { model: loaded.model, analysis: analyze(loaded.model) };
}

/** Invented test data: one vessel, a loop and a SIF on one shared tapping, three ways to state the cause. */
export const SHARED_TAPPING = (cause: string) => `site "Test site"
category c tolerable=1e-4 harm=people
ups UPS-1
circuit CKT-1 powered-by=UPS-1
controller C-1 system=bpcs powered-by=CKT-1
logic-solver S-1 system=sis powered-by=CKT-1
io-card AI-1 signal-via=C-1
io-card AI-2 signal-via=S-1
io-card AO-1 signal-via=C-1
io-card DO-1 signal-via=S-1
vessel V-1
line L-1
tapping T-1 mounted-on=V-1
transmitter LT-1 variable=level mounted-on=T-1 signal-via=AI-1
transmitter LT-2 variable=level mounted-on=T-1 signal-via=AI-2
control-valve LV-1 fails-to=closed mounted-on=L-1 signal-via=AO-1
shutdown-valve XV-1 fails-to=closed mounted-on=L-1 signal-via=DO-1
loop LIC-1 sensors=LT-1 solver=C-1 finals=LV-1
sif SIF-1 sensors=LT-2 solver=S-1 finals=XV-1 trip=close trip-mode=de-energise pfd=0.01
scenario S-1 category=c
  cause ${cause}
  layer SIF-1 pfd=0.01
`;
