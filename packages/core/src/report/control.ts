// Document control of the evidence list: the number, revision and status it is issued under (from the
// command line, else the model), the documents the model was built from, who prepares, checks and approves
// it, and the assumptions the figures rest on, written out so a signatory knows what they sign.
import type { Model } from '../model/schema.ts';
import type { ReportDocument } from './document.ts';
import { compareTags } from './order.ts';

type Control = NonNullable<ReportDocument['control']>;

function present<T extends object>(entries: T): { [K in keyof T]: Exclude<T[K], undefined> } {
  return Object.fromEntries(Object.entries(entries).filter(([, v]) => v !== undefined)) as never;
}

export function documentControl(
  model: Model,
  given: { document?: string; revision?: string; status?: string } = {},
): Control {
  const site = model.site;
  return present({
    document: given.document ?? site.document,
    revision: given.revision ?? site.revision,
    status: given.status ?? site.status,
    basedOn: [...(site.basedOn ?? [])],
    preparedBy: site.preparedBy,
    checkedBy: site.checkedBy,
    approvedBy: site.approvedBy,
  });
}

/** The edge convention of each category the scenarios use, in words. */
function edgeAssumption(model: Model): string {
  const used = new Set(model.scenarios.map((s) => s.category));
  // Sorted, so the text does not follow the order the categories were written in.
  const below = model.categories
    .filter((c) => used.has(c.id) && (c.edge ?? 'below') === 'below')
    .map((c) => c.id)
    .sort(compareTags);
  const atMost = model.categories
    .filter((c) => used.has(c.id) && c.edge === 'at-most')
    .map((c) => c.id)
    .sort(compareTags);
  const parts = [
    below.length ? `strictly below the tolerable frequency for ${below.join(', ')}` : '',
    atMost.length ? `at most equal to it for ${atMost.join(', ')}` : '',
  ].filter(Boolean);
  return `Edge convention: a scenario meets its criterion when its mitigated frequency is ${parts.join('; ') || 'strictly below the tolerable frequency'}. At an exact decade edge the other reading of the SIL is shown beside the figure.`;
}

export function assumptions(model: Model, policy: ReportDocument['policy']): string[] {
  return [
    edgeAssumption(model),
    'Order of action used for the demand on the SIF: a layer acts before or after the SIF as its layer line states (acts=); otherwise an alarm, BPCS loop or BPCS trip acts before it, a relief valve or rupture disc after it (common practice, no source), and any other layer is taken the conservative way in each figure. Only credited layers acting before the SIF lower its demand.',
    'An unstated fail action counts as unsafe: a supply whose loss is not said to drive a layer to its safe state, or a cause with no stated dangerous direction, is taken as a dangerous common cause.',
    'What the model does not say is never taken as independence: a layer with an untraced part is unverified and earns no credit.',
    `Policy switches in force: ${policy.map((p) => `${p.name}=${p.value}${p.origin === 'default' ? ' (default)' : ' (set in the model)'}`).join(', ')}.`,
  ];
}
