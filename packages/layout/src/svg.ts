// toSvg: a standalone SVG document for a drawing (the viewer's "export SVG" and the CLI), with its
// own stylesheet, a legend of the sides and the caution, and every piece of model text escaped.
import type { Drawing } from './drawing.ts';
import { renderPlan, type ViewState } from './render-plan.ts';
import { ARROW_MARKER, DRAWING_CSS } from './style.ts';

export const CAUTION =
  'Decision support only: it does not replace a competent LOPA team, IEC 61511, local codes or licensed practice.';

export function escapeXml(text: string): string {
  return text
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&apos;');
}

/** Corner radius: functions are drawn rounder than elements. */
export function cornerRadius(role: string): number {
  return role === 'function' ? 12 : 4;
}

const LEGEND_ROW = 20;

/** The arrowhead marker the stylesheet's lanes refer to, as SVG text. */
export function arrowDefs(): string {
  const m = ARROW_MARKER;
  return `<defs><marker id="${m.id}" viewBox="0 0 ${m.width} ${m.height}" refX="${m.refX}" refY="${m.refY}" markerWidth="${m.width}" markerHeight="${m.height}" markerUnits="userSpaceOnUse" orient="auto"><path class="arrowhead" d="${m.path}"/></marker></defs>`;
}

/** One row of a title block: "file" and "marrow-fen.bulk". */
export interface TitleRow {
  label: string;
  value: string;
}

const TITLE_ROW = 17;
const TITLE_LABEL_WIDTH = 110;

/** A drawing's title block: a ruled table of what the sheet shows and where it came from. */
function titleBlock(rows: readonly TitleRow[], x: number, y: number, width: number): string[] {
  const out = [
    `<g class="title-block"><rect class="title-frame" x="${x}" y="${y}" width="${width}" height="${rows.length * TITLE_ROW + 8}"/>`,
  ];
  rows.forEach((row, i) => {
    const top = y + 4 + i * TITLE_ROW;
    if (i > 0) out.push(`<line class="title-rule" x1="${x}" y1="${top}" x2="${x + width}" y2="${top}"/>`);
    out.push(`<text class="kind" x="${x + 8}" y="${top + 13}">${escapeXml(row.label)}</text>`);
    out.push(`<text class="title-value" x="${x + TITLE_LABEL_WIDTH}" y="${top + 13}">${escapeXml(row.value)}</text>`);
  });
  out.push('</g>');
  return out;
}

/**
 * A standalone SVG of the drawing in a view state; with `title`, a title block under the drawing
 * (site, file, content hash, revision, date, the finding shown, the LOPA figures).
 */
export function toSvg(drawing: Drawing, view: ViewState = {}, title: readonly TitleRow[] = []): string {
  const plan = renderPlan(drawing, view);
  const header =
    40 + drawing.sides.length * LEGEND_ROW + (drawing.notes.length > 0 ? drawing.notes.length * 16 + 6 : 0);
  const titleHeight = title.length > 0 ? title.length * TITLE_ROW + 8 + 16 : 0;
  const footer = 34 + titleHeight;
  const longest = Math.max(0, ...title.map((r) => r.value.length));
  const titleWidth = Math.min(Math.max(360, TITLE_LABEL_WIDTH + longest * 6.8 + 16), 1200);
  const width = Math.max(drawing.width, 640, title.length > 0 ? titleWidth + 48 : 0);
  const height = header + drawing.height + footer;
  const out: string[] = [];
  out.push(
    `<svg xmlns="http://www.w3.org/2000/svg" class="${plan.className}" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" role="img">`,
  );
  out.push(`<title>${escapeXml(drawing.title)}</title>`);
  out.push(`<style>${DRAWING_CSS}</style>`);
  out.push(arrowDefs());
  out.push(`<rect class="paper" x="0" y="0" width="${width}" height="${height}"/>`);
  out.push(`<text class="tag" x="24" y="26">${escapeXml(drawing.title)}</text>`);
  drawing.sides.forEach((side, i) => {
    const y = 44 + i * LEGEND_ROW;
    out.push(
      `<g class="bh-legend"><line class="lane on-path side-${side.index}" x1="24" y1="${y}" x2="84" y2="${y}"/>`,
    );
    out.push(
      `<g class="mark side-${side.index}"><rect x="92" y="${y - 7}" width="14" height="14" rx="2"/><text x="99" y="${y + 3.5}">${escapeXml(side.letter)}</text></g>`,
    );
    const words = `${side.label}${side.title ? ' (' + side.title + ')' : ''} \u2014 ${side.style.lineName} line${side.verdict ? ', ' + side.verdict : ''}`;
    out.push(`<text class="kind" x="114" y="${y + 4}">${escapeXml(words)}</text></g>`);
  });
  drawing.notes.forEach((note, i) => {
    out.push(
      `<text class="title" x="24" y="${44 + drawing.sides.length * LEGEND_ROW + i * 16 + 4}">${escapeXml(note)}</text>`,
    );
  });
  out.push(`<g transform="translate(0 ${header})">`);
  for (const st of drawing.stages ?? []) {
    out.push(
      `<g class="stage"><rect class="stage-band" x="${st.x}" y="${st.y}" width="${st.width}" height="${st.height}" rx="6"/><text class="stage-label" x="${st.x + st.width / 2}" y="${st.y + 18}">${escapeXml(st.label)}</text></g>`,
    );
  }
  for (const c of drawing.clusters) {
    out.push(`<rect class="cluster" x="${c.x}" y="${c.y}" width="${c.width}" height="${c.height}" rx="8"/>`);
    out.push(`<text class="cluster-label" x="${c.x + 10}" y="${c.y + 19}">${escapeXml(c.label)}</text>`);
  }
  for (const e of plan.edges) {
    out.push(`<g class="edge"><title>${escapeXml(e.title)}</title>`);
    for (const l of e.planned) out.push(`<polyline class="${l.className}" points="${l.pointsAttr}"/>`);
    out.push('</g>');
  }
  for (const b of plan.boxes) {
    out.push(
      `<g class="${escapeXml(b.className)}" data-tag="${escapeXml(b.tag)}"><title>${escapeXml(b.tooltip)}</title>`,
    );
    if (b.banner)
      out.push(
        `<rect class="halo" x="${b.x - 4}" y="${b.y - 4}" width="${b.width + 8}" height="${b.height + 8}" rx="7"/>`,
      );
    out.push(
      `<rect class="body" x="${b.x}" y="${b.y}" width="${b.width}" height="${b.height}" rx="${cornerRadius(b.role)}"/>`,
    );
    if (b.banner) {
      out.push(`<rect class="banner" x="${b.x}" y="${b.y}" width="${b.width}" height="${b.banner.height}" rx="3"/>`);
      out.push(`<text class="banner-text" x="${b.x + 8}" y="${b.y + 12.5}">${escapeXml(b.banner.text)}</text>`);
    }
    for (const t of b.texts) out.push(`<text class="${t.className}" x="${t.x}" y="${t.y}">${escapeXml(t.text)}</text>`);
    for (const m of b.marks) {
      out.push(
        `<g class="mark side-${m.side}"><rect x="${m.x}" y="${m.y}" width="${m.size}" height="${m.size}" rx="2"/><text x="${m.x + m.size / 2}" y="${m.y + m.size - 3.5}">${escapeXml(m.letter)}</text></g>`,
      );
    }
    out.push('</g>');
  }
  out.push('</g>');
  if (title.length > 0)
    out.push(...titleBlock(title, width - 24 - titleWidth, header + drawing.height + 12, titleWidth));
  out.push(`<text class="title" x="24" y="${height - 14}">${escapeXml(CAUTION)}</text>`);
  out.push('</svg>');
  return out.join('\n') + '\n';
}
