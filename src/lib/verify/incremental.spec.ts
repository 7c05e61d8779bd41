/**
 * The incremental verifier must answer exactly what a full check answers, whatever the
 * edit: random sequences of part moves (named or not), pin swaps, cut and link changes,
 * parts removed and put back, on planted layouts that start clean and soon are not.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Layout } from '../model/index.ts';
import { plantLayout, shiftPart } from './planted.ts';
import { verifyLayout } from './verify.ts';
import { createVerifier } from './verifier.ts';

type Edit =
  | { op: 'move'; part: number; dx: number; dy: number; named: boolean }
  | { op: 'swap'; part: number }
  | { op: 'cut'; x: number; y: number }
  | { op: 'uncut'; k: number }
  | { op: 'link'; x: number; y: number; len: number }
  | { op: 'unlink'; k: number }
  | { op: 'remove'; part: number };

const arbEdit: fc.Arbitrary<Edit> = fc.oneof(
  { weight: 6, arbitrary: fc.record({ op: fc.constant('move' as const), part: fc.nat(), dx: fc.integer({ min: -2, max: 2 }), dy: fc.integer({ min: -2, max: 2 }), named: fc.boolean() }) },
  { weight: 1, arbitrary: fc.record({ op: fc.constant('swap' as const), part: fc.nat() }) },
  { weight: 1, arbitrary: fc.record({ op: fc.constant('cut' as const), x: fc.nat(), y: fc.nat() }) },
  { weight: 1, arbitrary: fc.record({ op: fc.constant('uncut' as const), k: fc.nat() }) },
  { weight: 1, arbitrary: fc.record({ op: fc.constant('link' as const), x: fc.nat(), y: fc.nat(), len: fc.integer({ min: 1, max: 5 }) }) },
  { weight: 1, arbitrary: fc.record({ op: fc.constant('unlink' as const), k: fc.nat() }) },
  { weight: 1, arbitrary: fc.record({ op: fc.constant('remove' as const), part: fc.nat() }) },
);

/** Apply an edit; answer the new layout and the refs to name as changed. */
function apply(l: Layout, e: Edit): { layout: Layout; changed: string[] } {
  const { cols, rows } = l.board;
  const n = l.parts.length;
  switch (e.op) {
    case 'move': {
      if (!n) return { layout: l, changed: [] };
      const i = e.part % n;
      return { layout: shiftPart(l, i, e.dx, e.dy), changed: e.named ? [l.parts[i]!.ref] : [] };
    }
    case 'swap': {
      if (!n) return { layout: l, changed: [] };
      const i = e.part % n;
      const parts = l.parts.slice();
      const p = parts[i]!;
      const ats = p.pins.map((q) => q.at);
      parts[i] = { ...p, pins: p.pins.map((q, j) => ({ pin: q.pin, at: ats[(j + 1) % ats.length]! })) };
      return { layout: { ...l, parts }, changed: [p.ref] };
    }
    case 'cut': {
      const x = e.x % Math.max(1, cols - 1);
      const y = e.y % rows;
      return { layout: { ...l, cuts: [...l.cuts, { between: [[x, y], [x + 1, y]] }] }, changed: [] };
    }
    case 'uncut':
      return { layout: { ...l, cuts: l.cuts.filter((_, k) => k !== e.k % Math.max(1, l.cuts.length)) }, changed: [] };
    case 'link': {
      const x = e.x % cols;
      const y = e.y % rows;
      return { layout: { ...l, links: [...l.links, { from: [x, y], to: [x, Math.min(rows - 1, y + e.len)] }] }, changed: [] };
    }
    case 'unlink':
      return { layout: { ...l, links: l.links.filter((_, k) => k !== e.k % Math.max(1, l.links.length)) }, changed: [] };
    case 'remove': {
      if (!n) return { layout: l, changed: [] };
      const i = e.part % n;
      // take the part off and put it back at the end: the refs' order changes
      const parts = [...l.parts.slice(0, i), ...l.parts.slice(i + 1), l.parts[i]!];
      return { layout: { ...l, parts }, changed: [l.parts[i]!.ref] };
    }
  }
}

describe('createVerifier().recheck', () => {
  it('equals a full check after every edit of random edit sequences', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 1e6 }), fc.integer({ min: 4, max: 24 }), fc.array(arbEdit, { minLength: 1, maxLength: 12 }), (seed, count, edits) => {
        const { circuit, layout } = plantLayout({ parts: count, seed });
        const v = createVerifier(circuit);
        expect(v.check(layout)).toEqual(verifyLayout(circuit, layout));
        let cur = layout;
        for (const e of edits) {
          const next = apply(cur, e);
          cur = next.layout;
          expect(v.recheck(cur, next.changed)).toEqual(verifyLayout(circuit, cur));
        }
      }),
      { numRuns: 200 },
    );
  });

  it('a planted layout verifies clean, and one part moved sideways along its strips stays clean', () => {
    const { circuit, layout } = plantLayout({ parts: 40, seed: 11 });
    const v = createVerifier(circuit);
    expect(v.check(layout).faults).toEqual([]);
    const i = layout.parts.findIndex((p) => p.footprint === 'axial-small');
    expect(v.recheck(shiftPart(layout, i, 1, 0), [layout.parts[i]!.ref]).faults).toEqual([]);
    const down = v.recheck(shiftPart(layout, i, 0, 1), [layout.parts[i]!.ref]);
    expect(down.clean).toBe(false);
  });
});

describe('a layout edited in place', () => {
  it('is still checked against what it now says, not what it said', () => {
    const { circuit, layout } = plantLayout({ parts: 12, seed: 5 });
    const v = createVerifier(circuit);
    expect(v.check(layout).clean).toBe(true);
    layout.links.length = 0; // the caller edits its own arrays
    layout.parts[0]!.pins[0]!.at[0] += 1;
    expect(v.recheck(layout, [])).toEqual(verifyLayout(circuit, layout));
    expect(v.recheck(layout, []).clean).toBe(false);
  });
});
