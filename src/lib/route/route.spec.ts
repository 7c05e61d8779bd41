import { describe, expect, it } from 'vitest';
import { makeBoard } from '../board/index.ts';
import type { Layout } from '../model/index.ts';
import { verifyLayout } from '../verify/index.ts';
import { routeLayout } from './index.ts';
import { checkRouted } from './testing/check.ts';
import { handCase, resistor, type HandCase } from './testing/hand.ts';
import { randomCase } from './testing/random-placement.ts';

/** Route and require a clean result: verifier and the independent test check agree. */
function routeClean(c: HandCase, options: Parameters<typeof routeLayout>[2] = {}) {
  const r = routeLayout(c.design, c.placement, options);
  if (!r.ok) throw new Error(r.problems.map((p) => p.message).join('\n'));
  expect(verifyLayout(c.circuit, r.value.layout).faults).toEqual([]);
  expect(checkRouted(c.design, r.value.layout, { linksOverBodies: options.linksOverBodies ?? false })).toEqual([]);
  return r.value;
}

describe('routeLayout on strip boards', () => {
  it('needs nothing when every net already shares a strip', () => {
    const c = handCase(makeBoard('strip', 8, 6), [resistor('R1', 1, 0, 'A', 4, 'B'), resistor('R2', 4, 0, 'A', 4, 'B')]);
    const r = routeClean(c);
    expect(r.stats).toEqual({ cuts: 0, links: 0, linkLengthMm: 0, wires: 0, wireLengthMm: 0 });
  });

  it('joins a net on two strips with one straight column link and reports its length in mm', () => {
    // A on row 0 (R1) and row 5 (R2): one link, 5 holes long → 5 × 2.54 mm (the board pitch)
    const c = handCase(makeBoard('strip', 8, 7), [resistor('R1', 1, 0, 'A', 4, 'B'), resistor('R2', 5, 1, 'C', 5, 'A')]);
    const r = routeClean(c);
    expect(r.layout.links).toHaveLength(1);
    const [link] = r.layout.links;
    expect(link!.from[0]).toBe(link!.to[0]);
    expect([link!.from[1], link!.to[1]].sort()).toEqual([0, 5]);
    expect(r.stats.linkLengthMm).toBeCloseTo(5 * 2.54, 6);
  });

  it('cuts once between neighbouring leads of different nets, in the style asked for', () => {
    // row 0 carries A (col 1) and C (col 5): one cut; row 4 carries B twice: none
    const c = handCase(makeBoard('strip', 8, 6), [resistor('R1', 1, 0, 'A', 4, 'B'), resistor('R2', 5, 0, 'C', 4, 'B')]);
    const drilled = routeClean(c, { cutStyle: 'hole' });
    expect(drilled.layout.cuts).toHaveLength(1);
    const at = (drilled.layout.cuts[0] as { at: [number, number] }).at;
    expect(at[1]).toBe(0);
    expect(at[0]).toBeGreaterThan(1);
    expect(at[0]).toBeLessThan(5);
    const scored = routeClean(c, { cutStyle: 'between' });
    expect(scored.layout.cuts).toHaveLength(1);
    expect('between' in scored.layout.cuts[0]!).toBe(true);
    expect('at' in routeClean(c, { cutStyle: 'either' }).layout.cuts[0]!).toBe(true);
  });

  it('fails a drilled cut between neighbouring holes, and scores it under "either"', () => {
    const c = handCase(makeBoard('strip', 8, 6), [resistor('R1', 1, 0, 'A', 4, 'B'), resistor('R2', 2, 0, 'C', 4, 'B')]);
    const r = routeLayout(c.design, c.placement, { cutStyle: 'hole' });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.problems.map((p) => p.code)).toEqual(['route.unroutable']);
    expect(r.problems[0]!.data?.reason).toBe('drilled-cut');
    expect(r.problems[0]!.nets).toEqual(['A', 'C']);
    expect(r.problems[0]!.message).toContain('R1.1');
    const either = routeClean(c, { cutStyle: 'either' });
    expect(either.layout.cuts).toEqual([{ between: [[1, 0], [2, 0]] }]);
  });

  it('takes the board cutting style when the options name none', () => {
    const c = handCase({ ...makeBoard('strip', 8, 6), cutStyle: 'between' }, [resistor('R1', 1, 0, 'A', 4, 'B'), resistor('R2', 5, 0, 'C', 4, 'B')]);
    expect('between' in routeClean(c).layout.cuts[0]!).toBe(true);
  });

  it('cuts under a DIP only where its two pins on a strip differ, and isolates an unconnected pin', () => {
    // DIP-8 straddling rows 1–4: pins 1/8 share net P, 2/7 differ, 3 is unconnected beside X
    const c = handCase(makeBoard('strip', 10, 6), [
      {
        ref: 'U1',
        kind: 'ic',
        package: 'DIP-8',
        pins: { '1': ['P', 2, 1], '2': ['Q', 2, 2], '3': [null, 2, 3], '4': ['G', 2, 4], '5': ['G', 5, 4], '6': ['X', 5, 3], '7': ['R', 5, 2], '8': ['P', 5, 1] },
      },
      resistor('R1', 8, 0, 'Z', 3, 'X'),
      resistor('R2', 0, 0, 'Z', 4, 'G'),
    ]);
    const r = routeClean(c, { cutStyle: 'hole' });
    const rowsCut = r.layout.cuts.map((cut) => ('at' in cut ? cut.at[1] : -1)).sort();
    // row 2 (Q|R) and row 3 (unconnected|X) are cut under the DIP; rows 1 and 4 are not
    expect(rowsCut).toEqual([2, 3]);
    for (const cut of r.layout.cuts) if ('at' in cut) expect(cut.at[0] === 3 || cut.at[0] === 4).toBe(true);
  });

  it('keeps links off part bodies unless allowed', () => {
    // A on rows 0 and 4; a resistor lies along row 2 across the whole board
    const c = handCase(makeBoard('strip', 5, 5), [
      { ref: 'J1', kind: 'pads', count: 1, pins: { '1': ['A', 0, 0] } },
      { ref: 'J2', kind: 'pads', count: 1, pins: { '1': ['A', 0, 4] } },
      resistor('R1', 0, 2, 'X', 2, 'Y'),
    ]);
    c.placement.parts[2]!.pins = [
      { pin: '1', at: [0, 2] },
      { pin: '2', at: [4, 2] },
    ];
    // No link crosses the body (routeClean checks): A goes under it on the copper side,
    // through a relay island cut out of the X–Y gap (two cuts in row 2 instead of one).
    const under = routeClean(c, { cutStyle: 'hole' });
    expect(under.layout.cuts.filter((cut) => 'at' in cut && cut.at[1] === 2)).toHaveLength(2);
    expect(under.layout.wires.some((w) => w.from[0] === w.to[0] && Math.min(w.from[1], w.to[1]) < 2 && Math.max(w.from[1], w.to[1]) > 2)).toBe(true);
    const over = routeClean(c, { cutStyle: 'hole', linksOverBodies: true });
    expect([over.stats.links, over.stats.cuts]).toEqual([1, 1]);
    // With X and Y three holes apart there is no room for a drilled island: blocked.
    c.placement.board = makeBoard('strip', 4, 5);
    c.placement.parts[2]!.pins[1]!.at = [3, 2];
    const blocked = routeLayout(c.design, c.placement, { cutStyle: 'hole' });
    expect(blocked.ok).toBe(false);
    if (!blocked.ok) {
      expect(blocked.problems.map((p) => [p.code, p.nets])).toEqual([['route.unroutable', ['A']]]);
      expect(blocked.problems[0]!.data?.reason).toBe('blocked');
    }
    expect(routeClean(c, { cutStyle: 'hole', linksOverBodies: true }).stats.links).toBe(1);
  });

  it('uses a free strip as a relay when two islands share no free column', () => {
    // A on row 0 (columns 0–2) and row 4 (columns 6–8): no column in common; row 2 is free
    const c = handCase(makeBoard('strip', 9, 5), [
      resistor('R1', 0, 0, 'A', 3, 'B'),
      resistor('R2', 3, 0, 'C', 3, 'D'),
      resistor('R3', 8, 4, 'A', 1, 'E'),
      resistor('R4', 5, 4, 'F', 1, 'G'),
    ]);
    const r = routeClean(c, { cutStyle: 'between' });
    expect(r.stats.links).toBe(2);
    expect(r.layout.links.every((l) => l.from[1] === 2 || l.to[1] === 2)).toBe(true);
  });
});

describe('routeLayout on pad boards', () => {
  it('joins pins with maximal straight copper-side runs, one net per hole', () => {
    const c = handCase(makeBoard('pads', 10, 8), [
      resistor('R1', 1, 1, 'A', 5, 'B'),
      resistor('R2', 4, 1, 'B', 5, 'C'),
      resistor('R3', 7, 1, 'A', 5, 'C'),
    ]);
    const r = routeClean(c);
    expect(r.stats.links).toBe(0);
    expect(r.stats.wires).toBe(r.layout.wires.length);
    expect(r.stats.wires).toBeGreaterThan(0);
    const len = r.layout.wires.reduce((t, w) => t + Math.abs(w.from[0] - w.to[0]) + Math.abs(w.from[1] - w.to[1]), 0);
    expect(r.stats.wireLengthMm).toBeCloseTo(len * 2.54, 6);
    // maximal: no two runs in one line share a hole
    const cells = new Set<string>();
    for (const w of r.layout.wires) {
      const dir = w.from[1] === w.to[1] ? 'h' : 'v';
      const n = Math.abs(w.from[0] - w.to[0]) + Math.abs(w.from[1] - w.to[1]);
      for (let k = 0; k <= n; k++) {
        const x = w.from[0] + Math.sign(w.to[0] - w.from[0]) * k;
        const y = w.from[1] + Math.sign(w.to[1] - w.from[1]) * k;
        const key = `${dir}${x},${y}`;
        expect(cells.has(key)).toBe(false);
        cells.add(key);
      }
    }
  });

  it('rips up and re-routes, and crosses a wall of copper-side wire with a component-side link', () => {
    // B runs down column 5 from top to bottom; A must get from the left edge to the right
    const c = handCase(makeBoard('pads', 11, 7), [
      { ref: 'J1', kind: 'pads', count: 1, pins: { '1': ['B', 5, 0] } },
      { ref: 'J2', kind: 'pads', count: 1, pins: { '1': ['B', 5, 6] } },
      { ref: 'J3', kind: 'pads', count: 1, pins: { '1': ['A', 0, 3] } },
      { ref: 'J4', kind: 'pads', count: 1, pins: { '1': ['A', 10, 3] } },
    ]);
    const r = routeClean(c);
    expect(r.stats.links).toBe(1);
  });
});

describe('routeLayout input checks', () => {
  const base = () => handCase(makeBoard('strip', 8, 6), [resistor('R1', 1, 0, 'A', 4, 'B'), resistor('R2', 4, 0, 'A', 4, 'B')]);
  const codes = (placement: Layout) => {
    const c = base();
    const r = routeLayout(c.design, placement);
    return r.ok ? [] : r.problems.map((p) => p.code);
  };

  it('names a missing part, an extra part, a missing pin, an off-board pin, a shared hole and broken geometry', () => {
    const c = base();
    expect(codes({ ...c.placement, parts: c.placement.parts.slice(1) })).toEqual(['route.missing-part']);
    expect(codes({ ...c.placement, parts: [...c.placement.parts, { ...c.placement.parts[0]!, ref: 'R9' }] })).toEqual(['route.extra-part']);
    const noPin = structuredClone(c.placement);
    noPin.parts[0]!.pins.pop();
    expect(codes(noPin)).toEqual(['route.missing-pin']);
    const off = structuredClone(c.placement);
    off.parts[0]!.pins[1]!.at = [1, 9];
    expect(codes(off)).toContain('route.off-board');
    const shared = structuredClone(c.placement);
    shared.parts[1]!.pins[0]!.at = [1, 0];
    expect(codes(shared)).toContain('route.shared-hole');
    const bent = structuredClone(c.placement);
    bent.parts[0]!.pins[1]!.at = [2, 4];
    expect(codes(bent)).toEqual(['route.geometry']);
  });

  it('rejects bad options and a board whose conductors overlap', () => {
    const c = base();
    const r = routeLayout(c.design, c.placement, { cutStyle: 'saw' as never });
    expect(!r.ok && r.problems[0]!.code).toBe('route.bad-options');
    const board = { ...c.placement.board, kind: 'bus' as const, conductors: [[[0, 0], [1, 0]], [[1, 0], [2, 0]]] as [number, number][][] };
    const b = routeLayout(c.design, { ...c.placement, board });
    expect(!b.ok && b.problems.map((p) => p.code)).toEqual(['route.bad-board']);
  });
});

describe('routeLayout output', () => {
  it('is the same for the same input, and leaves its input alone', () => {
    const c = randomCase(12345, makeBoard('strip', 24, 16), 12, 6);
    const before = structuredClone(c.placement);
    const a = routeLayout(c.design, c.placement);
    const b = routeLayout(c.design, c.placement);
    expect(b).toEqual(a);
    expect(c.placement).toEqual(before);
  });

  it('recomputes cuts, links and wires the placement brings along', () => {
    const c = handCase(makeBoard('strip', 8, 6), [resistor('R1', 1, 0, 'A', 4, 'B'), resistor('R2', 4, 0, 'A', 4, 'B')]);
    const stale: Layout = { ...c.placement, cuts: [{ at: [2, 0] }], links: [{ from: [6, 0], to: [6, 4] }], wires: [{ from: [0, 1], to: [0, 2] }] };
    const r = routeLayout(c.design, stale);
    expect(r.ok && [r.value.layout.cuts, r.value.layout.links, r.value.layout.wires]).toEqual([[], [], []]);
  });
});
