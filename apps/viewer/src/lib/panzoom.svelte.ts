// Pan and zoom of the graph: a translate and a scale, changed by the wheel, by dragging, by the
// buttons, and by "centre on this finding". The SVG applies `transform`.

export interface Bounds {
  x: number;
  y: number;
  width: number;
  height: number;
}

const MIN_SCALE = 0.08;
const MAX_SCALE = 4;
/**
 * The reading scale: below it a box's 11 px lines fall under about 9 px on screen, too small to read
 * at a glance. The first view and "show this finding" never go below it; Fit and the buttons may.
 */
export const READABLE_SCALE = 0.85;

function clamp(k: number): number {
  return Math.min(MAX_SCALE, Math.max(MIN_SCALE, k));
}

export class PanZoom {
  x = $state(0);
  y = $state(0);
  k = $state(1);
  /** Size of the viewport, bound from the element. */
  width = $state(0);
  height = $state(0);
  private drag: { px: number; py: number; x: number; y: number; id: number } | undefined;

  transform = $derived(`translate(${this.x} ${this.y}) scale(${this.k})`);
  percent = $derived(Math.round(this.k * 100));

  fit(content: Bounds, margin = 24): void {
    if (this.width === 0 || this.height === 0 || content.width === 0) return;
    const k = clamp(
      Math.min((this.width - 2 * margin) / content.width, (this.height - 2 * margin) / content.height, 1.2),
    );
    this.k = k;
    this.x = (this.width - content.width * k) / 2 - content.x * k;
    this.y = Math.max(margin, (this.height - content.height * k) / 2) - content.y * k;
  }

  /**
   * The first view of a drawing: all of it when it fits at a readable scale; otherwise a readable
   * scale centred on `focus` (the shared elements) or else at the top left; Fit shows the whole.
   */
  open(content: Bounds, focus: Bounds | undefined, margin = 24): void {
    this.fit(content);
    if (this.k >= READABLE_SCALE) return;
    this.k = READABLE_SCALE;
    if (!focus) {
      this.x = margin - content.x * this.k;
      this.y = margin - content.y * this.k;
      return;
    }
    this.x = this.width / 2 - (focus.x + focus.width / 2) * this.k;
    this.y = this.height / 2 - (focus.y + focus.height / 2) * this.k;
    this.keepPaperInView(content, margin);
  }

  /**
   * Centres the view on `b` at a scale that shows it whole if it can, never below the reading scale
   * (nor above 110%); when `b` is too large for that, the view centres on `keep` (the shared element,
   * where the chains meet) instead, so the part of the proof that matters is in the middle.
   */
  centre(b: Bounds, keep?: Bounds, content?: Bounds): void {
    if (this.width === 0) return;
    const fit = Math.min((this.width * 0.85) / Math.max(b.width, 1), (this.height * 0.85) / Math.max(b.height, 1), 1.1);
    const k = clamp(Math.max(READABLE_SCALE, fit));
    const on = keep && fit < READABLE_SCALE ? keep : b;
    this.k = k;
    this.x = this.width / 2 - (on.x + on.width / 2) * k;
    this.y = this.height / 2 - (on.y + on.height / 2) * k;
    if (content) this.keepPaperInView(content);
  }

  /**
   * Pans so no blank paper shows inside the view where the sheet could fill it: the stage headings
   * stay at the top and no column is cut off for an empty margin. Zoom is left as it is.
   */
  private keepPaperInView(content: Bounds, margin = 24): void {
    const within = (v: number, low: number, high: number) => Math.min(Math.max(v, Math.min(low, high)), high);
    this.x = within(this.x, this.width - margin - (content.x + content.width) * this.k, margin - content.x * this.k);
    this.y = within(this.y, this.height - margin - (content.y + content.height) * this.k, margin - content.y * this.k);
  }

  /**
   * Pans (never zooms) just enough that `b` is inside the view with a margin: keyboard focus on an
   * off-screen box. `coveredRight` is how much of the view's right side a card covers; the box is
   * brought out from under it when the rest of the view is wide enough to hold it.
   */
  reveal(b: Bounds, margin = 40, coveredRight = 0): void {
    if (this.width === 0) return;
    const left = this.x + b.x * this.k;
    const top = this.y + b.y * this.k;
    const right = left + b.width * this.k;
    const bottom = top + b.height * this.k;
    const open = this.width - coveredRight >= b.width * this.k + 2 * margin ? this.width - coveredRight : this.width;
    if (left < margin) this.x += margin - left;
    else if (right > open - margin) this.x -= Math.min(right - (open - margin), left - margin);
    if (top < margin) this.y += margin - top;
    else if (bottom > this.height - margin) this.y -= Math.min(bottom - (this.height - margin), top - margin);
  }

  /**
   * After a new layout of the same scene: shifts the view so the box that was nearest the middle of
   * the view is at the same place on screen as before. Boxes are matched by id.
   */
  keepAnchored(before: readonly (Bounds & { id: string })[], after: readonly (Bounds & { id: string })[]): void {
    const cx = (this.width / 2 - this.x) / this.k;
    const cy = (this.height / 2 - this.y) / this.k;
    // eslint-disable-next-line svelte/prefer-svelte-reactivity -- a lookup local to this call, never read reactively
    const now = new Map(after.map((b) => [b.id, b]));
    let anchor: { was: Bounds; is: Bounds; distance: number } | undefined;
    for (const was of before) {
      const is = now.get(was.id);
      if (!is) continue;
      const distance = Math.hypot(was.x + was.width / 2 - cx, was.y + was.height / 2 - cy);
      if (!anchor || distance < anchor.distance) anchor = { was, is, distance };
    }
    if (!anchor) return;
    this.x += (anchor.was.x - anchor.is.x) * this.k;
    this.y += (anchor.was.y - anchor.is.y) * this.k;
  }

  zoomAt(factor: number, px = this.width / 2, py = this.height / 2): void {
    const k = clamp(this.k * factor);
    this.x = px - ((px - this.x) * k) / this.k;
    this.y = py - ((py - this.y) * k) / this.k;
    this.k = k;
  }

  wheel(e: WheelEvent, target: Element): void {
    e.preventDefault();
    const r = target.getBoundingClientRect();
    this.zoomAt(Math.exp(-e.deltaY * 0.0015), e.clientX - r.left, e.clientY - r.top);
  }

  pointerDown(e: PointerEvent): void {
    if (e.button !== 0) return;
    this.drag = { px: e.clientX, py: e.clientY, x: this.x, y: this.y, id: e.pointerId };
  }

  pointerMove(e: PointerEvent, target: Element): void {
    const d = this.drag;
    if (!d || d.id !== e.pointerId) return;
    const dx = e.clientX - d.px;
    const dy = e.clientY - d.py;
    // Only a real drag captures the pointer, so a plain click still reaches the box under it.
    if (Math.abs(dx) + Math.abs(dy) > 3 && !target.hasPointerCapture(e.pointerId))
      target.setPointerCapture(e.pointerId);
    this.x = d.x + dx;
    this.y = d.y + dy;
  }

  pointerUp(e: PointerEvent, target: Element): void {
    if (this.drag?.id === e.pointerId) this.drag = undefined;
    if (target.hasPointerCapture(e.pointerId)) target.releasePointerCapture(e.pointerId);
  }

  pan(dx: number, dy: number): void {
    this.x += dx;
    this.y += dy;
  }
}
