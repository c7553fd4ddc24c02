// Walks a page with the Tab key alone, as a keyboard user would, and reports what it could not reach.
// The checks follow WCAG 2.2: 2.1.1 Keyboard (every function operable from the keyboard), 2.1.2 No
// Keyboard Trap (Tab moves focus on and away again) and 2.4.7 Focus Visible (the focused control shows
// a focus indicator). "Control" is what the HTML standard makes focusable and interactive (a button, a
// link with href, a form field, a <summary>) plus anything the page gives tabindex >= 0 (the graph's
// boxes, a scrolling table).
import type { Page } from 'playwright-core';

/** One control as the walk saw it: a short description, and whether focus on it was visible. */
export interface ControlSeen {
  mark: string;
  html: string;
  /** For a covered control: what was on top of its middle. */
  under?: string;
}

export interface TabWalk {
  /** Every visible, enabled control on the page before the walk. */
  controls: ControlSeen[];
  /** The controls Tab never reached. */
  missed: ControlSeen[];
  /** Controls that had focus without a visible focus indicator (outline or box-shadow). */
  unmarked: ControlSeen[];
  /** Controls that, once focused, were covered at every sample point (WCAG 2.2 SC 2.4.11 Focus Not Obscured). */
  covered: ControlSeen[];
  /** Focus came back to the first control it reached after all the others: Tab leaves no trap. */
  wrapped: boolean;
  /** The elements on which a Tab press left focus where it was (a trap, or a control eating Tab). */
  stuck: string[];
}

const CONTROL = 'button, a[href], input, select, textarea, summary, [tabindex]';

/**
 * Marks every visible, enabled control (data-reach="N"), starts from the top of the page (a click on
 * the page's heading, which is no control, sets where sequential focus starts), then presses Tab until
 * focus has gone round once, and reports what was missed.
 */
export async function walkWithTab(page: Page, extraPresses = 30): Promise<TabWalk> {
  const controls = await page.evaluate((selector) => {
    const seen: { mark: string; html: string }[] = [];
    (window as unknown as { __lastFocus?: Element | undefined }).__lastFocus = undefined;
    for (const el of document.querySelectorAll<HTMLElement | SVGElement>(selector)) {
      el.removeAttribute('data-reach');
      const native = el.matches('button, a[href], input, select, textarea, summary');
      // A generic element is a control only when the page put it in the tab order itself.
      if (!native && !(el.tabIndex >= 0 && el.getAttribute('tabindex') !== '-1')) continue;
      if ((el as HTMLButtonElement).disabled) continue;
      if (el.closest('[inert]')) continue;
      const box = el.getBoundingClientRect();
      if (box.width === 0 || box.height === 0 || !el.checkVisibility({ checkVisibilityCSS: true })) continue;
      const mark = String(seen.length);
      el.setAttribute('data-reach', mark);
      seen.push({ mark, html: el.outerHTML.replace(/\s+/g, ' ').slice(0, 120) });
    }
    return seen;
  }, CONTROL);
  await page.mouse.click(...(await topLeftOfHeading(page)));
  const order: string[] = [];
  const unmarked = new Map<string, ControlSeen>();
  const covered = new Map<string, ControlSeen>();
  const stuck: string[] = [];
  for (let i = 0; i < controls.length + extraPresses; i++) {
    await page.keyboard.press('Tab');
    const now = await page.evaluate(() => {
      const el = document.activeElement;
      // Focus gone to the browser's own controls (after the last control) or to nothing.
      const w = window as unknown as { __lastFocus?: Element | undefined };
      if (!el || el === document.body || !document.hasFocus()) {
        w.__lastFocus = undefined;
        return { mark: null, same: '', shown: true, onTop: true, under: '' };
      }
      const style = getComputedStyle(el);
      const outline = style.outlineStyle !== 'none' && parseFloat(style.outlineWidth) > 0;
      const shadow = style.boxShadow !== 'none';
      const same = w.__lastFocus === el ? el.outerHTML.replace(/\s+/g, ' ').slice(0, 120) : '';
      w.__lastFocus = el;
      // Not covered: some point of the control (its middle, or one near a corner) is the control on top.
      const r = el.getBoundingClientRect();
      const onTop = [
        [0.5, 0.5],
        [0.2, 0.2],
        [0.8, 0.2],
        [0.2, 0.8],
        [0.8, 0.8],
      ].some(([fx, fy]) => {
        const hit = document.elementFromPoint(r.left + r.width * fx!, r.top + r.height * fy!);
        return hit !== null && (hit === el || el.contains(hit));
      });
      const shown = el.matches(':focus-visible') && (outline || shadow);
      const middle = document.elementFromPoint(r.left + r.width / 2, r.top + r.height / 2);
      const under = onTop ? '' : (middle?.outerHTML.replace(/\s+/g, ' ').slice(0, 80) ?? 'off the page');
      return { mark: el.getAttribute('data-reach'), same, shown, onTop, under };
    });
    if (now.same) stuck.push(now.same);
    if (now.mark === null) continue;
    if (!now.shown) unmarked.set(now.mark, controls[Number(now.mark)]!);
    if (!now.onTop) covered.set(now.mark, { ...controls[Number(now.mark)]!, under: now.under });
    order.push(now.mark);
    const reachedAll = new Set(order).size === controls.length;
    // Round once and back to the first control: the walk is done.
    if (reachedAll && order.length > controls.length && now.mark === order[0]) break;
  }
  const reached = new Set(order);
  const first = order[0];
  const wrapped = first !== undefined && order.indexOf(first, 1) > 0;
  return {
    controls,
    missed: controls.filter((c) => !reached.has(c.mark)),
    unmarked: [...unmarked.values()],
    covered: [...covered.values()],
    wrapped,
    stuck,
  };
}

/** A point on the page's level-one heading (never a control), where a click sets the focus start. */
async function topLeftOfHeading(page: Page): Promise<[number, number]> {
  await page.evaluate(() => window.scrollTo(0, 0));
  const box = await page.locator('h1').first().boundingBox();
  if (!box) throw new Error('the page has no visible level-one heading to start from');
  return [box.x + 2, box.y + box.height / 2];
}

/** Presses Tab until the element matching `selector` has focus (at most `limit` presses); false if never. */
export async function tabTo(page: Page, selector: string, limit = 400): Promise<boolean> {
  for (let i = 0; i < limit; i++) {
    if (await page.evaluate((s) => document.activeElement?.matches(s) ?? false, selector)) return true;
    await page.keyboard.press('Tab');
  }
  return false;
}

/**
 * What focus changes on screen around the control that has it: the pixels of its box and a 5 px band
 * around it, shot with focus and again with focus taken away, counted where they differ. A mark that
 * is computed but not painted (clipped by an ancestor, hidden under another element) changes nothing.
 * `ring` is the box's perimeter: a mark one pixel wide all round changes about that many pixels.
 */
export async function focusMarkPixels(page: Page): Promise<{ changed: number; ring: number }> {
  const rect = await page.evaluate(() => {
    const r = document.activeElement!.getBoundingClientRect();
    return { x: r.x, y: r.y, width: r.width, height: r.height, vw: innerWidth, vh: innerHeight };
  });
  const x = Math.max(0, Math.floor(rect.x - 5));
  const y = Math.max(0, Math.floor(rect.y - 5));
  const clip = {
    x,
    y,
    width: Math.min(rect.vw, Math.ceil(rect.x + rect.width + 5)) - x,
    height: Math.min(rect.vh, Math.ceil(rect.y + rect.height + 5)) - y,
  };
  const focusedShot = (await page.screenshot({ clip })).toString('base64');
  await page.evaluate(() => {
    const el = document.activeElement as HTMLElement;
    (window as unknown as { __markOf?: HTMLElement }).__markOf = el;
    el.blur();
  });
  const blurredShot = (await page.screenshot({ clip })).toString('base64');
  // Focus goes back where it was, so the keyboard carries on from the same control.
  await page.evaluate(() => (window as unknown as { __markOf: HTMLElement }).__markOf.focus({ preventScroll: true }));
  // Decoded and compared in the page itself (from bytes, so its content policy has no say).
  const changed = await page.evaluate(
    async ([a, b]) => {
      const pixels = async (png: string) => {
        const bytes = Uint8Array.from(atob(png), (c) => c.charCodeAt(0));
        const bitmap = await createImageBitmap(new Blob([bytes], { type: 'image/png' }));
        const canvas = new OffscreenCanvas(bitmap.width, bitmap.height);
        const draw = canvas.getContext('2d')!;
        draw.drawImage(bitmap, 0, 0);
        return draw.getImageData(0, 0, bitmap.width, bitmap.height).data;
      };
      const [one, two] = await Promise.all([pixels(a!), pixels(b!)]);
      let count = 0;
      for (let i = 0; i < one.length; i += 4)
        if (
          Math.abs(one[i]! - two[i]!) + Math.abs(one[i + 1]! - two[i + 1]!) + Math.abs(one[i + 2]! - two[i + 2]!) >
          60
        )
          count++;
      return count;
    },
    [focusedShot, blurredShot],
  );
  return { changed, ring: Math.round(2 * (rect.width + rect.height)) };
}
