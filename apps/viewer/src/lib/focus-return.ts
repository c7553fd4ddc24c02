// When a panel closes with the keyboard's focus inside it, focus would fall to the page's body and a
// keyboard or screen-reader user would lose their place. It goes back to what the panel was about:
// the element's box in the graph for its card, the finding's line in the list for its proof.
import { tick } from 'svelte';

/** Where focus goes when the element card for `tag` closes: its box in the graph. */
export const cardOpener = (tag: string) => `svg[data-testid=graph] g.box[data-tag="${CSS.escape(tag)}"]`;
/** Where focus goes when the proof of finding `key` closes: its button in the findings list. */
export const proofOpener = (key: string) => `[data-testid=findings] button[data-finding="${CSS.escape(key)}"]`;

/**
 * Runs `close`; if focus was inside `panel` (a selector), moves it to the first element matching
 * `opener` once the page has updated. Focus elsewhere is left where it is.
 */
export async function closeReturningFocus(panel: string, opener: string, close: () => void): Promise<void> {
  const wasInside = document.activeElement?.closest(panel) != null;
  close();
  if (!wasInside) return;
  await tick();
  document.querySelector<HTMLElement | SVGElement>(opener)?.focus();
}
