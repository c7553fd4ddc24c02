// Links a reviewer can paste into a comment: the page's URL fragment names what is in view (a
// scenario, a layer, an element, a finding, or the all-scenarios matrix), and opening the link shows it.
// Written as `#scenario=S-101&finding=KEY`; values are URI-encoded, unknown keys are ignored.

export interface ViewLink {
  scenario?: string;
  /** A claimed layer's function: its box is selected. */
  layer?: string;
  /** An element (or function) tag: its box is selected and its card shown. */
  element?: string;
  /** A finding's key: its proof is shown. */
  finding?: string;
  matrix?: boolean;
}

const KEYS = ['scenario', 'layer', 'element', 'finding'] as const;

export function parseLink(hash: string): ViewLink {
  const params = new URLSearchParams(hash.replace(/^#/, ''));
  const link: ViewLink = {};
  for (const key of KEYS) {
    const value = params.get(key);
    if (value) link[key] = value;
  }
  if (params.get('view') === 'matrix') link.matrix = true;
  return link;
}

export function formatLink(link: ViewLink): string {
  const params = new URLSearchParams();
  if (link.matrix) params.set('view', 'matrix');
  for (const key of KEYS) {
    const value = link[key];
    if (value) params.set(key, value);
  }
  const text = params.toString();
  return text === '' ? '' : `#${text}`;
}
