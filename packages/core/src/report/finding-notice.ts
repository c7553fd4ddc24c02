// An independence finding in the notice look (see diagnostics/notice.ts): the verdict and what is shared
// first, then the claim it concerns in the model file, the path from each side to the shared element, the
// element's definition, why the rule holds (with its source), and the key an `accept` statement names.
import type { Finding } from '../vocabulary/types.ts';
import type { Span } from '../diagnostics/diagnostic.ts';
import { place, renderNotice, type Notice, type NoticeFact, type SourceText } from '../diagnostics/notice.ts';
import { FACTOR_RULES, findingSpans, type ModelLocator } from '../loader/locate.ts';
import { alikeDevices } from './alike.ts';

const KINDS: Record<Finding['severity'], string> = {
  'voids-credit': 'Credit voided',
  'needs-justification': 'Needs a justification',
  note: 'Note',
};

/** Where the finding points (loader/locate.ts, the same place SARIF gives), with what that place is. */
function primarySpan(finding: Finding, locate: ModelLocator): { span?: Span | undefined; role?: string } {
  const { span } = findingSpans(finding, locate);
  if (!span) return {};
  const layer = [...finding.parties].reverse().find((p) => p.role === 'layer' && p.tag !== undefined);
  if (layer?.tag) return { span, role: `the claim of layer ${layer.tag}` };
  if (finding.scenario && FACTOR_RULES.has(finding.rule))
    return { span, role: `the enabler or modifier of ${finding.scenario}` };
  return { span, role: finding.scenario ? `the cause of ${finding.scenario}` : 'the accept statement' };
}

export function findingNotice(finding: Finding, locate: ModelLocator): Notice {
  const { span, role } = primarySpan(finding, locate);
  const facts: NoticeFact[] = [];
  finding.parties.forEach((party, i) => {
    const path = finding.paths[i];
    if (path && path.length > 1)
      facts.push({ label: party.role === 'cause' ? 'cause' : 'layer', text: path.join(' -> ') });
  });
  const alike = alikeDevices(finding);
  const elementSpan = finding.element ? locate.element(finding.element) : undefined;
  if (alike) facts.push({ label: 'devices', text: `${alike.join(', ')}: the same make and model; nothing is shared` });
  else if (finding.element && elementSpan)
    facts.push({ label: 'element', text: `${finding.element}, defined at ${place(elementSpan)}` });
  if (finding.accepted)
    facts.push({
      label: 'accepted',
      text: `by ${finding.accepted.by} on ${finding.accepted.date}: ${finding.accepted.reason}`,
    });
  facts.push({ label: 'why', text: `${finding.rationale} (${finding.source})` });
  return {
    kind: finding.accepted ? `Accepted (${KINDS[finding.severity].toLowerCase()})` : KINDS[finding.severity],
    headline: finding.message,
    ...(span ? { span } : {}),
    ...(role && span ? { spanRole: role } : {}),
    facts,
    reference: { label: 'key', text: `${finding.key} (rule ${finding.rule})` },
  };
}

export function renderFindingText(finding: Finding, source: SourceText, locate: ModelLocator): string {
  return renderNotice(findingNotice(finding, locate), source);
}
