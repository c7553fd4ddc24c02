// toSvg writes a standalone document: its own stylesheet, the legend, the caution, and every piece
// of model text escaped (invented test data with markup in titles).
import { describe, expect, it } from 'vitest';
import { escapeXml, scenarioScene, toSvg } from '@bulkhead/layout';
import { layoutScene } from '@bulkhead/layout/elk';
import { SHARED_TAPPING, small } from './fixtures.ts';

describe('toSvg', async () => {
  const text = SHARED_TAPPING('function=LIC-1 frequency=0.1')
    .replace('site "Test site"', 'site "Site <b>&amp;</b>"')
    .replace('tapping T-1 mounted-on=V-1', 'tapping T-1 title="<img src=x onerror=alert(1)>" mounted-on=V-1')
    .replace('scenario S-1 category=c', 'scenario S-1 title="Overfill \\"A\\" & <script>" category=c');
  const { model, analysis } = small(text);
  const drawing = await layoutScene(scenarioScene(model, analysis, 'S-1'));
  const svg = toSvg(drawing);

  it('should escape the five XML special characters', () => {
    expect(escapeXml(`<a href="x">'&'</a>`)).toBe('&lt;a href=&quot;x&quot;&gt;&apos;&amp;&apos;&lt;/a&gt;');
  });

  it('should write a standalone SVG document with its stylesheet', () => {
    expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    expect(svg.trimEnd().endsWith('</svg>')).toBe(true);
    expect(svg).toContain('<style>');
    expect(svg).toContain('.bh-drawing .lane.side-1{stroke:#0072B2;stroke-dasharray:9 4}');
  });

  it('should hold every box and every lane of the drawing', () => {
    expect(svg.match(/<g class="box /g)?.length).toBe(drawing.boxes.length);
    expect(svg.match(/<polyline /g)?.length).toBe(drawing.edges.reduce((n, e) => n + e.lanes.length, 0));
  });

  it('should escape model text, so titles never become markup', () => {
    expect(svg).toContain('&lt;img src=x onerror=alert(1)&gt;');
    expect(svg).toContain('Overfill &quot;A&quot; &amp; &lt;script&gt;');
    expect(svg).not.toMatch(/<img|<script|<b>/);
  });

  it('should name each side with its line style and carry the caution', () => {
    expect(svg).toContain('Cause: LIC-1');
    expect(svg).toContain('Layer 1: SIF-1');
    expect(svg).toContain('dashed line');
    expect(svg).toContain('IEC 61511');
  });

  it('should draw an arrowhead marker that every lane refers to', () => {
    expect(svg).toContain('<marker id="bh-arrow"');
    expect(svg).toContain('marker-end:url(#bh-arrow)');
  });

  it('should add a title block with every row given, escaped, and none without rows', () => {
    const titled = toSvg(drawing, {}, [
      { label: 'site', value: 'Site <b>&amp;</b>' },
      { label: 'SHA-256', value: 'ab12' },
      { label: 'revision', value: 'C' },
    ]);
    expect(titled.match(/<g class="title-block">/g)?.length).toBe(1);
    expect(titled).toContain('>SHA-256</text>');
    expect(titled).toContain('>revision</text>');
    expect(titled).toContain('Site &lt;b&gt;&amp;amp;&lt;/b&gt;');
    expect(svg).not.toContain('title-block');
  });
});
