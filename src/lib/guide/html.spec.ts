import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { CircuitSchema, type Circuit } from '../model/index.ts';
import { benchBufferLayout } from '../render/fixture.ts';
import { buildGuide } from './build-guide.ts';
import { guideHtml, guidePages } from './html.ts';

/** A net name that is markup: it reaches the links list, the off-board list, the probes and the drawings. */
const NET = 'OUT</b><svg onload=alert(2)>"&';

function nastyCircuit(): Circuit {
  const c = CircuitSchema.parse(JSON.parse(readFileSync(new URL('../../../layouts/bench-buffer.circuit.json', import.meta.url), 'utf8')));
  c.title = `<script>alert("t")</script> & 'co'`;
  const j1 = c.parts.find((p) => p.ref === 'J1')!;
  j1.value = '<b>panel</b> & "wires"';
  j1.labels = { ...j1.labels, '1': '<img src=x onerror=alert(1)>' };
  c.parts.find((p) => p.ref === 'Q1')!.value = 'BC549C</text><script>';
  for (const p of c.parts) for (const [pin, net] of Object.entries(p.pins)) if (net === 'OUT') p.pins[pin] = NET;
  c.nets[NET] = c.nets['OUT']!;
  delete c.nets['OUT'];
  return c;
}

function guide() {
  const g = buildGuide(nastyCircuit(), benchBufferLayout());
  if (!g.ok) throw new Error(g.problems.map((p) => p.message).join('\n'));
  return g.value;
}

describe('guideHtml', () => {
  it('escapes user text everywhere (title, values, labels, net names, also inside the drawings)', () => {
    const html = guideHtml(guide(), { paper: 'a4' });
    expect(html).not.toMatch(/<script/i);
    expect(html).not.toContain('<img');
    expect(html).not.toContain('<b>panel');
    expect(html).not.toMatch(/<svg onload/i);
    const net = 'OUT&lt;/b&gt;&lt;svg onload=alert(2)&gt;&quot;&amp;';
    expect(html).toContain(` · net ${net}`); // links list
    expect(html).toContain(`net <b>${net}</b>`); // off-board wiring
    expect(html).toContain(`data-net="${net}"`); // drawings
    expect(html).toContain('&lt;script&gt;alert(&quot;t&quot;)&lt;/script&gt; &amp; &#39;co&#39;');
    expect(html).toContain('&lt;img src=x onerror=alert(1)&gt;');
    expect(html).toContain('BC549C&lt;/text&gt;&lt;script&gt;');
  });

  it('puts the bench cautions on the first page (check-values.md §12)', () => {
    const first = guidePages(guide(), { paper: 'a4' })[0]!;
    expect(first.section).toBe('prepare');
    for (const words of ['Low voltage only', 'Never connect mains', 'fume extraction', 'wash your hands', 'eye protection', 'clipping leads', 'local codes', 'licensed practice'])
      expect(first.body).toContain(words);
  });

  it('sets the paper size in @page and prints one section per planned sheet', () => {
    const g = guide();
    const a4 = guideHtml(g, { paper: 'a4' });
    const letter = guideHtml(g, { paper: 'letter' });
    expect(a4).toContain('@page { size: A4 portrait; margin: 12mm; }');
    expect(letter).toContain('@page { size: letter portrait; margin: 12mm; }');
    const plan = guidePages(g, { paper: 'a4' });
    expect(a4.match(/<section class="page/g)).toHaveLength(plan.length);
    expect(plan.map((p) => p.section)).toEqual(['prepare', 'cuts', 'copper', 'links', 'parts', 'build', 'component', 'offboard', 'probes']);
    expect(a4).toContain(`page ${plan.length} of ${plan.length}`);
  });

  it('draws the copper side at true scale: width and viewBox in mm, scale 1, with a 50 mm bar', () => {
    const g = guide();
    const html = guideHtml(g, { paper: 'a4' });
    const v = g.scenes.copper.view;
    expect(html).toContain(`<div class="drawing" data-scale="1"><svg xmlns="http://www.w3.org/2000/svg" viewBox="${v.x} ${v.y} ${v.width} ${v.height}" width="${v.width}mm" height="${v.height}mm" data-side="copper"`);
    expect(html).toContain('<rect x="0" y="0" width="50" height="1.2"');
    expect(html).toContain('data-side="component"');
  });

  it('splits a long list over more sheets and says so', () => {
    const g = guide();
    const many = { ...g, links: Array.from({ length: 120 }, (_, i) => ({ ...g.links[0]!, id: `L${i + 1}` })) };
    const plan = guidePages(many, { paper: 'letter' });
    const links = plan.filter((p) => p.section === 'links');
    expect(links.length).toBeGreaterThanOrEqual(3);
    expect(links.map((p) => p.part)).toEqual(links.map((_, i) => i + 1));
    expect(guideHtml(many, { paper: 'letter' })).toContain(`Links and wires (2 of ${links.length})`);
  });
});
