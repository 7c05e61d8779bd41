import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { CircuitSchema, LayoutSchema } from '../../lib/model/index.ts';
import { benchGuideFile } from './guide-view.ts';

const circuit = CircuitSchema.parse(JSON.parse(readFileSync('layouts/twin-lfo.circuit.json', 'utf8')));
const layout = LayoutSchema.parse(JSON.parse(readFileSync('layouts/twin-lfo.layout.json', 'utf8')));

describe('bench guide print view', () => {
  it('builds the guide for the demo layout, with every cut listed', () => {
    const f = benchGuideFile(circuit, layout, 'a4');
    expect(f.ok).toBe(true);
    if (!f.ok) return;
    expect(f.name).toMatch(/\.guide\.html$/);
    expect(f.html).toContain('@page');
    expect((f.html.match(/type="checkbox"|class="tick"/g) ?? []).length).toBeGreaterThanOrEqual(layout.cuts.length);
  });
  it('refuses a layout with faults and says which', () => {
    const broken = { ...layout, parts: layout.parts.slice(1) };
    const f = benchGuideFile(circuit, broken, 'letter');
    expect(f.ok).toBe(false);
    if (!f.ok) expect(f.problems.map((p) => p.code)).toContain('guide.layout-faults');
  });
});
