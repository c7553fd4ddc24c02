// The drawing's stylesheet, shared by the viewer and the standalone SVG export. Our own look: warm
// paper background, ink outlines, side colours only on lanes, heads and marks.
import { SIDE_STYLES, sideStyle } from './sides.ts';

/** Side classes are generated for this many sides; beyond it styles repeat (with distinct letters). */
const STYLED_SIDES = 16;

function sideRules(): string {
  const rules: string[] = [];
  for (let i = 0; i < STYLED_SIDES; i++) {
    const s = sideStyle(i);
    const dash = s.dash === '' ? 'none' : s.dash;
    rules.push(
      `.bh-drawing .lane.side-${i}{stroke:${s.colour};stroke-dasharray:${dash}}`,
      `.bh-drawing .head.side-${i} .body{stroke:${s.colour};stroke-dasharray:${dash}}`,
      `.bh-drawing .mark.side-${i} rect{fill:${s.colour}}`,
      `.bh-drawing .mark.side-${i} text{fill:${s.ink}}`,
      `.bh-legend .swatch.side-${i}{stroke:${s.colour};stroke-dasharray:${dash}}`,
    );
  }
  return rules.join('\n');
}

/** The arrowhead every lane ends in, pointing at the box relied on; each renderer puts it in its defs. */
export const ARROW_MARKER = {
  id: 'bh-arrow',
  path: 'M0,0 L8,4 L0,8 z',
  width: 8,
  height: 8,
  refX: 7.5,
  refY: 4,
} as const;

export const DRAWING_CSS = `
.bh-drawing{font-family:system-ui,-apple-system,"Segoe UI",sans-serif}
.bh-drawing .paper{fill:#fbfaf6}
.bh-drawing .box .body{fill:#ffffff;stroke:#4a4f57;stroke-width:1.2}
.bh-drawing .group-equipment .body{fill:#e9eef3}
.bh-drawing .group-connection .body,.bh-drawing .group-impulse .body{fill:#f3ede1}
.bh-drawing .group-signal .body,.bh-drawing .group-housing .body{fill:#f2f2f0}
.bh-drawing .group-solver .body{fill:#eceaf4}
.bh-drawing .group-support .body{fill:#f5f3e8}
.bh-drawing .group-people .body{fill:#f6edef}
.bh-drawing .role-function .body{fill:#ffffff;stroke-width:3.2}
.bh-drawing .role-area.has-findings .body{stroke:#111;stroke-width:2.4}
.bh-drawing .tag{font-family:ui-monospace,"DejaVu Sans Mono","Liberation Mono",monospace;font-size:13px;font-weight:700;fill:#111}
.bh-drawing .kind,.bh-drawing .title,.bh-drawing .count,.bh-drawing .side-label{font-size:11px;fill:#3b3f45}
.bh-drawing .side-label{font-weight:700;letter-spacing:.04em;fill:#111}
.bh-drawing .title{fill:#5a5f66}
.bh-drawing .count{font-weight:700;fill:#111}
.bh-drawing .halo{fill:none;stroke:#111;stroke-width:2;stroke-dasharray:none}
.bh-drawing .shared .body{stroke:#111;stroke-width:2.6}
.bh-drawing .banner{fill:#111}
.bh-drawing .banner-text{font-size:10.5px;font-weight:700;letter-spacing:.05em;fill:#fff}
.bh-drawing .severity-needs-justification .banner{fill:#fff;stroke:#111;stroke-width:1.4}
.bh-drawing .severity-needs-justification .banner-text{fill:#111}
.bh-drawing .severity-note .banner,.bh-drawing .severity-accepted .banner{fill:#d8d6cf}
.bh-drawing .severity-note .banner-text,.bh-drawing .severity-accepted .banner-text{fill:#111}
.bh-drawing .mark text{font-size:10px;font-weight:700;text-anchor:middle}
.bh-drawing .lane{fill:none;stroke:#8a8f96;stroke-width:1.5;opacity:.5;marker-end:url(#bh-arrow)}
.bh-drawing .arrowhead{fill:#3b3f45}
.bh-drawing .title-frame{fill:#fff;stroke:#111;stroke-width:1.4}
.bh-drawing .title-rule{stroke:#8a8f96;stroke-width:.8}
.bh-drawing .title-value{font-family:ui-monospace,"DejaVu Sans Mono","Liberation Mono",monospace;font-size:11px;fill:#111}
.bh-drawing .through .body{stroke:#111;stroke-width:2.4;stroke-dasharray:5 2}
.bh-drawing .lane.on-path{stroke-width:3.2;opacity:1}
.bh-drawing .stage-band{fill:#ece9e1;opacity:.55}
.bh-drawing .stage-label{font-size:12px;font-weight:700;fill:#3b3f45;text-anchor:middle;letter-spacing:.04em}
.bh-drawing .cluster{fill:none;stroke:#8a8f96;stroke-width:1.2;stroke-dasharray:6 3}
.bh-drawing .cluster-label{font-size:12px;font-weight:700;fill:#3b3f45}
.bh-drawing.focusing .box:not(.in-focus){opacity:.3}
.bh-drawing.focusing .lane:not(.in-focus){opacity:.1}
.bh-drawing .lane.in-focus{stroke-width:4.2;opacity:1}
.bh-drawing .selected .body{stroke:#111;stroke-width:3.4}
.bh-drawing .selected .halo,.bh-drawing .selected .select-ring{stroke:#111;stroke-width:2;fill:none}
.bh-drawing .box{cursor:pointer}
${sideRules()}
`;

export { SIDE_STYLES };
