import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Layout } from '../model/index.ts';
import { plantLayout } from './planted.ts';
import { probeChecklist } from './probe.ts';
import { circuit, divider, layout } from './spec-kit.ts';
import { UnionFind } from './union-find.ts';

describe('probeChecklist', () => {
  it('a net on one piece of copper needs no beep; no cut, no silent pair', () => {
    const { circuit: c, layout: l } = divider();
    expect(probeChecklist(c, l)).toEqual({ beep: [], silent: [] });
  });

  it('one silent pair per cut between two nets, at the leads nearest the cut, labelled both sides', () => {
    const c = circuit([
      { ref: 'R1', kind: 'resistor', footprint: 'upright', pins: { '1': 'A', '2': 'B' } },
      { ref: 'R2', kind: 'resistor', footprint: 'upright', pins: { '1': 'C', '2': 'B' } },
    ]);
    const parts = [
      { ref: 'R1', footprint: 'upright', pins: { '1': [1, 0] as [number, number], '2': [1, 1] as [number, number] } },
      { ref: 'R2', footprint: 'upright', pins: { '1': [5, 0] as [number, number], '2': [5, 1] as [number, number] } },
    ];
    for (const cut of [{ between: [[3, 0], [4, 0]] as [[number, number], [number, number]] }, { at: [3, 0] as [number, number] }]) {
      const got = probeChecklist(c, layout({ kind: 'strip', cols: 8, rows: 2 }, parts, { cuts: [cut] }));
      expect(got.beep).toEqual([]);
      expect(got.silent).toEqual([{ a: [1, 0], b: [5, 0], labels: ['A2 (copper A7)', 'A6 (copper A3)'], nets: ['A', 'C'], note: 'A and C either side of cut 1: no beep' }]);
    }
  });

  it('a net on two strips joined by a link is proven by one beep across the link', () => {
    const c = circuit([
      { ref: 'R1', kind: 'resistor', footprint: 'upright', pins: { '1': 'A', '2': 'B' } },
      { ref: 'R2', kind: 'resistor', footprint: 'upright', pins: { '1': 'C', '2': 'A' } },
    ]);
    const l = layout({ kind: 'strip', cols: 6, rows: 4 }, [
      { ref: 'R1', footprint: 'upright', pins: { '1': [1, 0], '2': [1, 1] } },
      { ref: 'R2', footprint: 'upright', pins: { '1': [1, 2], '2': [1, 3] } },
    ], { links: [{ from: [4, 3], to: [4, 0] }] });
    const got = probeChecklist(c, l);
    expect(got.beep.map((p) => [p.a, p.b, p.nets])).toEqual([[[4, 0], [4, 3], ['A']]]);
  });

  it('planted boards: per net (pieces − 1) beeps forming a spanning tree, and one silent pair per cut between nets', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 1e6 }), fc.integer({ min: 1, max: 30 }), (seed, count) => {
        const { circuit: c, layout: l } = plantLayout({ parts: count, seed });
        const { beep, silent } = probeChecklist(c, l);
        const seg = segments(l);
        // pieces of each class that holds pins, counted here from the cuts and links alone
        const withPins = new Set(l.parts.flatMap((p) => p.pins.map((q) => seg.cls(q.at))));
        let want = 0;
        for (const k of withPins) want += seg.members(k).length - 1;
        expect(beep).toHaveLength(want);
        const tree = new UnionFind(seg.count);
        for (const p of beep) {
          expect(seg.cls(p.a)).toBe(seg.cls(p.b));
          expect(seg.isLead(p.a) && seg.isLead(p.b)).toBe(true);
          expect(tree.union(seg.of(p.a), seg.of(p.b))).toBe(true); // no pair is redundant
        }
        for (const k of withPins) expect(new Set(seg.members(k).map((s) => tree.find(s))).size).toBe(1);
        const apart = new Set<string>();
        for (const cut of l.cuts) {
          if (!('between' in cut)) continue;
          const [a, b] = cut.between.map((h) => seg.of(h)) as [number, number];
          if (withPins.has(seg.cls(cut.between[0])) && withPins.has(seg.cls(cut.between[1])) && seg.cls(cut.between[0]) !== seg.cls(cut.between[1])) apart.add(`${Math.min(a, b)}|${Math.max(a, b)}`);
        }
        expect(silent).toHaveLength(apart.size);
        for (const p of silent) expect(seg.cls(p.a)).not.toBe(seg.cls(p.b));
      }),
      { numRuns: 60 },
    );
  });
});

/** Strip segments of a planted board (cuts between holes only), joined by its links. */
function segments(l: Layout) {
  const { cols, rows } = l.board;
  const cut = new Set(l.cuts.flatMap((c) => ('between' in c ? [`${Math.min(c.between[0][0], c.between[1][0])},${c.between[0][1]}`] : [])));
  const segOf = new Int32Array(cols * rows);
  let count = 0;
  for (let r = 0; r < rows; r++)
    for (let c = 0; c < cols; c++) {
      if (c === 0 || cut.has(`${c - 1},${r}`)) count++;
      segOf[c + r * cols] = count - 1;
    }
  const uf = new UnionFind(count);
  const of = (h: [number, number]) => segOf[h[0] + h[1] * cols]!;
  for (const k of l.links) uf.union(of(k.from), of(k.to));
  const leads = new Set([...l.parts.flatMap((p) => p.pins.map((q) => `${q.at}`)), ...l.links.flatMap((k) => [`${k.from}`, `${k.to}`])]);
  return {
    count,
    of,
    cls: (h: [number, number]) => uf.find(of(h)),
    members: (k: number) => Array.from({ length: count }, (_, s) => s).filter((s) => uf.find(s) === k),
    isLead: (h: [number, number]) => leads.has(`${h}`),
  };
}
