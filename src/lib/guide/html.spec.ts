import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { CircuitSchema, type Circuit } from '../model/index.ts';
import { benchBufferLayout } from '../render/fixture.ts';
import { buildGuide } from './build-guide.ts';
import { guideHtml, guidePages } from './html.ts';

function nastyCircuit(): Circuit {
  const c = CircuitSchema.parse(JSON.parse(readFileSync(new URL('../../../layouts/bench-buffer.circuit.json', import.meta.url), 'utf8')));
  c.title = `<script>alert("t")</script> & 'co'`;
  const j1 = c.parts.find((p) => p.ref === 'J1')!;
  j1.value = '<b>panel</b> & "wires"';
  j1.labels = { ...j1.labels, '1': '<img src=x onerror=alert(1)>' };
  c.parts.find((p) => p.ref === 'Q1')!.value = 'BC549C</text><script>';
  return c;
}

function guide() {
  const g = buildGuide(nastyCircuit(), benchBufferLayout());
  if (!g.ok) throw new Error(g.problems.map((p) => p.message).join('\n'));
  return g.value;
}

describe('guideHtml', () => {
  it('escapes user text everywhere (title, values, labels, also inside the drawings)', () => {
    const html = guideHtml(guide(), { paper: 'a4' });
    expect(html).not.toMatch(/<script/i);
    expect(html).not.toContain('<img');
    expect(html).not.toContain('<b>panel');
    expect(html).toContain('&lt;script&gt;alert(&quot;t&quot;)&lt;/script&gt; &amp; &#39;co&#39;');
    expect(html).toContain('&lt;img src=x onerror=alert(1)&gt;');
    expect(html).toContain('BC549C&lt;/text&gt;&lt;script&gt;');
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
