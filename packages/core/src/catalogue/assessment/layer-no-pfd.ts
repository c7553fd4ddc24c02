// Assessment rule layer-no-pfd: a limit the LOPA figures obey; the check lives in assess/.
import { ruleEntry } from '../define.ts';

export const layerNoPfd = ruleEntry({
  id: 'layer-no-pfd',
  kind: 'assessment',
  title: 'Layer with no PFD and no default',
  rationale:
    'A layer with neither a claimed PFD nor a row in the defaults table earns no credit: no number is taken as given.',
  source: 'common practice, no source',
  defaultSeverity: 'voids-credit',
  messages: {
    'no-figure': (d: { function: string; kind: string }) =>
      `\`${d.function}\` has no PFD, and no default applies to a ${d.kind} of this kind: give pfd= with its basis`,
  },
});
