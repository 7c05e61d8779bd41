import { describe, expect, it } from 'vitest';
import type { Layout } from '../model/index.ts';
import type { Design } from '../netlist/design.ts';
import { drawScene } from './draw-scene.ts';
import { escapeXml, sceneSvgMarkup, svgMarkup } from './markup.ts';

const NASTY = `<script>alert("x")</script> & 'q'`;

function nastyScene() {
  const layout: Layout = {
    format: 'kerfline.layout',
    version: 1,
    board: { kind: 'strip', cols: 8, rows: 4, pitchMm: 2.54 },
    parts: [{ ref: `R<b>&"1'`, footprint: 'axial-small', pins: [{ pin: '1', at: [1, 1] }, { pin: '2', at: [5, 1] }] }],
    cuts: [],
    links: [],
    wires: [],
  };
  const design: Design = {
    title: NASTY,
    nets: [],
    parts: [{ ref: `R<b>&"1'`, kind: 'resistor', value: NASTY, footprint: 'axial-small', pinNames: ['1', '2'], nets: { '1': 'A&B', '2': '<n>' }, polarized: false, source: [0] }],
  };
  return drawScene(layout, design, { side: 'component' });
}

describe('svg markup', () => {
  it('escapes the five XML specials', () => {
    expect(escapeXml(`<a href="x">'&'</a>`)).toBe('&lt;a href=&quot;x&quot;&gt;&#39;&amp;&#39;&lt;/a&gt;');
  });

  it('writes user text in the title, ref and value escaped, never as markup', () => {
    const svg = sceneSvgMarkup(nastyScene());
    expect(svg).not.toContain('<script');
    expect(svg).not.toContain('<b>');
    expect(svg).toContain('&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt; &amp; &#39;q&#39;');
    expect(svg).toContain('R&lt;b&gt;&amp;&quot;1&#39;');
    expect(svg).toContain('data-net="A&amp;B"');
  });

  it('gives width and height in mm and a viewBox in board mm (true scale by default)', () => {
    const s = nastyScene();
    const svg = sceneSvgMarkup(s);
    expect(svg).toMatch(new RegExp(`^<svg xmlns="http://www.w3.org/2000/svg" viewBox="${s.view.x} ${s.view.y} ${s.view.width} ${s.view.height}" width="${s.view.width}mm" height="${s.view.height}mm"`));
    expect(sceneSvgMarkup(s, { scale: 2 })).toContain(`width="${Math.round(s.view.width * 2000) / 1000}mm"`);
  });

  it('refuses an element or attribute name that is not a plain name', () => {
    expect(() => svgMarkup({ tag: 'g onload=x', attrs: {} })).toThrow();
    expect(() => svgMarkup({ tag: 'g', attrs: { 'a b': 1 } })).toThrow();
  });
});
