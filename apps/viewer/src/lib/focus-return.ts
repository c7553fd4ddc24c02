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

/**
 * After an action that removes the control that had focus: once that control is gone, focuses the
 * first element matching one of `targets`, in order, waiting up to `patienceMs` for the control to
 * go and a target to appear (a box in a scenario still being laid out). Focus the user moved
 * elsewhere meanwhile is left alone.
 */
export async function focusFirst(targets: readonly string[], patienceMs = 2000): Promise<void> {
  const from = document.activeElement;
  await tick();
  const started = performance.now();
  for (;;) {
    const now = document.activeElement;
    if (now && now !== from && now !== document.body) return;
    // The action may take a moment (a worker's answer) to take the pressed control away.
    const gone = !from || !from.isConnected;
    if (gone)
      for (const t of targets) {
        const el = document.querySelector<HTMLElement | SVGElement>(t);
        if (el) {
          el.focus();
          return;
        }
      }
    if (performance.now() - started > patienceMs) return;
    await new Promise((resolve) => requestAnimationFrame(resolve));
  }
}
