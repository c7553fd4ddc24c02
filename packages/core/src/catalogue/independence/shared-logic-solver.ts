// shared-logic-solver: a controller or logic solver that fails in the cause cannot act against it, and
// two BPCS layers in one controller earn at most one credit.
import { ruleEntry } from '../define.ts';
import { beneathWords, sharedElementHead, type SharedVerdictData } from '../words.ts';

export const sharedLogicSolver = ruleEntry({
  id: 'shared-logic-solver',
  kind: 'independence',
  title: 'Shared controller or logic solver',
  rationale:
    'A controller that fails in the cause cannot be relied on to act against it, and two BPCS layers in one controller earn at most one credit. Older CCPS practice allowed a shared BPCS controller under conditions; set policy shared-solver=allow or same-controller-layers=both to follow it.',
  source:
    'IEC 61511-1:2016 9.3 (BPCS layers, one controller); CCPS, Layer of Protection Analysis (2001), ch. 6 (older allowance)',
  defaultSeverity: 'voids-credit',
  messages: {
    shared: (d: SharedVerdictData & { bpcsLayers: 'no' | 'both-credited' | 'limited' }) =>
      sharedElementHead('controller or logic solver', d) +
      (d.bpcsLayers === 'both-credited'
        ? '; as two BPCS layers in one controller both may be credited under policy same-controller-layers=both'
        : d.bpcsLayers === 'limited'
          ? '; as two BPCS layers in one controller their credit is limited by rule bpcs-same-controller'
          : '') +
      beneathWords(d.beneath),
  },
});
