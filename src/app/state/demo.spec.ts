import { describe, expect, it } from 'vitest';
import { bundledDemo, demoDoc } from './demo.ts';

describe('the bundled demo', () => {
  it('is one of the committed demo circuits and reads cleanly', () => {
    const demo = bundledDemo();
    expect(['twin-lfo', 'bench-buffer']).toContain(demo.name);
    const r = demoDoc(demo);
    expect(r.problems).toEqual([]);
    expect(r.doc?.circuit.parts.length).toBeGreaterThan(3);
    if (demo.layoutText !== undefined) expect(r.doc?.layout?.parts.length).toBeGreaterThan(3);
  });

  it('reports an unreadable layout instead of opening it', () => {
    const r = demoDoc({ ...bundledDemo(), layoutText: '{"format":"kerfline.layout"}' });
    expect(r.doc?.layout).toBeUndefined();
    expect(r.problems.length).toBeGreaterThan(0);
  });
});
