import { describe, expect, it } from 'vitest';
import { drawScene, sceneSvgMarkup } from '../lib/render/index.ts';
import type { Layout } from '../lib/model/index.ts';
import type { Design } from '../lib/netlist/design.ts';
import { benchBufferLayout } from '../lib/render/fixture.ts';
import { sceneToSvgString } from './svg-node.ts';

const NASTY = `<script>alert("x")</script> & 'q'`;

function nasty() {
  const layout: Layout = {
    format: 'kerfline.layout',
    version: 1,
    board: { kind: 'strip', cols: 24, rows: 18, pitchMm: 2.54 },
    parts: [{ ref: `R<b>&"1`, footprint: 'axial-small', pins: [{ pin: '1', at: [1, 1] }, { pin: '2', at: [5, 1] }] }],
    cuts: [{ at: [2, 5] }],
    links: [],
    wires: [],
  };
  const design: Design = {
    title: NASTY,
    nets: [],
    parts: [{ ref: `R<b>&"1`, kind: 'resistor', value: NASTY, footprint: 'axial-small', pinNames: ['1', '2'], nets: { '1': 'A"<n>&', '2': 'B' }, polarized: false, source: [0] }],
  };
  return { layout, design };
}

const count = (svg: string, tag: string) => svg.split(`<${tag} `).length - 1;

describe('sceneToSvgString (svgdom + svg.js)', () => {
  it('escapes user text in title, ref, value and net, in text and in attribute values', () => {
    const { layout, design } = nasty();
    const svg = sceneToSvgString(drawScene(layout, design, { side: 'component' }));
    expect(svg).not.toContain('<script');
    expect(svg).not.toContain('<b>');
    expect(svg).toContain('&lt;script&gt;');
    expect(svg).toContain('&amp;');
    expect(svg).toMatch(/R&lt;b&gt;&amp;(&quot;|")1/);
    expect(svg).toContain('data-ref="R&lt;b&gt;&amp;&quot;1"');
    expect(svg).toContain('data-net="A&quot;&lt;n&gt;&amp;"');
  });

  it('draws cols × rows holes, and the copper-side cut under copper column 22', () => {
    const { layout, design } = nasty();
    const scene = drawScene(layout, design, { side: 'copper' });
    const svg = sceneToSvgString(scene);
    expect(svg.match(/data-hole="/g)).toHaveLength(24 * 18);
    const cut = scene.cuts[0]!;
    expect(cut.sideLabel).toBe('F22');
    expect(svg).toContain(`data-cut="F3"`);
    // the ring is drawn at the mirrored x: (24 − 2.5) pitches from the copper-side left edge
    expect(svg).toContain(`cx="${Math.round(21.5 * 2.54 * 1000) / 1000}"`);
  });

  it('draws the same picture as the pure string back end', () => {
    const scene = drawScene(benchBufferLayout(), undefined, { side: 'copper' });
    const a = sceneToSvgString(scene);
    const b = sceneSvgMarkup(scene);
    for (const tag of ['circle', 'line', 'polyline', 'rect', 'path', 'text', 'g']) expect([tag, count(a, tag)]).toEqual([tag, count(b, tag)]);
    expect(a).toContain('width="');
    expect(a).toMatch(/viewBox="-3\.302 -3\.302 /);
  });
});
