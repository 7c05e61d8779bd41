/**
 * Exactness on small strip boards, against references that share no code with the router:
 * - cuts: the fewest cuts that part every two leads of different nets (an unconnected pin
 *   counts as a net of its own), found by trying every set of cut sites, smallest first;
 *   plus exactly one for each relay island (a piece of copper without pins, on a strip that
 *   carries leads, that a link or wire uses): none where no net needs one;
 * - links: every link and wire joins two pieces of copper not yet joined (a spanning forest),
 *   so a net on k islands gets k − 1 joins, plus one per free strip used as a relay; with no
 *   relay, links = Σ(islands − 1).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { makeBoard } from '../board/index.ts';
import type { Layout } from '../model/index.ts';
import type { Design } from '../netlist/index.ts';
import { routeLayout } from './index.ts';
import { randomCase } from './testing/random-placement.ts';

/** Net of every lead hole (unconnected pins get a name of their own). */
function leadNets(design: Design, layout: Layout): Map<number, string> {
  const cols = layout.board.cols;
  const out = new Map<number, string>();
  for (const lp of layout.parts) {
    const dp = design.parts.find((p) => p.ref === lp.ref)!;
    for (const pp of lp.pins) out.set(pp.at[0] + pp.at[1] * cols, dp.nets[pp.pin] ?? `${lp.ref}.${pp.pin}?`);
  }
  return out;
}

/** Whether cutting at these sites parts all leads of different nets along every row. */
function parts(cols: number, rows: number, leads: Map<number, string>, between: Set<number>, holes: Set<number>): boolean {
  for (let y = 0; y < rows; y++) {
    let net: string | undefined;
    for (let x = 0; x < cols; x++) {
      const h = x + y * cols;
      if (holes.has(h)) net = undefined;
      else {
        const n = leads.get(h);
        if (n !== undefined) {
          if (net !== undefined && net !== n) return false;
          net = n;
        }
      }
      if (between.has(h)) net = undefined; // a scored cut right of hole h
    }
  }
  return true;
}

/**
 * Relay islands of a routed layout, read off it: pieces of strip copper (rows split by its
 * cuts; a drilled hole is a piece of its own) with no pin, on a row with a pin, that a link
 * end or a copper-side wire touches.
 */
function relayIslands(layout: Layout, leads: Map<number, string>): number {
  const { cols, rows } = layout.board;
  const piece = new Int32Array(cols * rows);
  const after = new Set<number>();
  const drilled = new Set<number>();
  for (const cut of layout.cuts) {
    if ('at' in cut) drilled.add(cut.at[0] + cut.at[1] * cols);
    else after.add(Math.min(cut.between[0][0], cut.between[1][0]) + cut.between[0][1] * cols);
  }
  let id = 0;
  for (let y = 0; y < rows; y++) {
    id++;
    for (let x = 0; x < cols; x++) {
      const h = x + y * cols;
      if (drilled.has(h)) {
        piece[h] = ++id;
        id++;
        continue;
      }
      piece[h] = id;
      if (after.has(h)) id++;
    }
  }
  const pinned = new Set([...leads.keys()].map((h) => piece[h]!));
  const rowsWithPins = new Set([...leads.keys()].map((h) => Math.floor(h / cols)));
  const used = new Set<number>();
  const touch = (x: number, y: number) => {
    const h = x + y * cols;
    if (!pinned.has(piece[h]!) && rowsWithPins.has(y)) used.add(piece[h]!);
  };
  for (const l of layout.links) [l.from, l.to].forEach(([x, y]) => touch(x, y));
  for (const w of layout.wires) {
    const n = Math.abs(w.to[0] - w.from[0]) + Math.abs(w.to[1] - w.from[1]);
    for (let k = 0; k <= n; k++) touch(w.from[0] + Math.sign(w.to[0] - w.from[0]) * k, w.from[1] + Math.sign(w.to[1] - w.from[1]) * k);
  }
  return used.size;
}

/** Smallest k for which some k of the sites part every row, or undefined (none up to max). */
function bruteMinimum(sites: number[], max: number, ok: (chosen: number[]) => boolean): number | undefined {
  const chosen: number[] = [];
  const pick = (from: number, left: number): boolean => {
    if (left === 0) return ok(chosen);
    for (let i = from; i <= sites.length - left; i++) {
      chosen.push(sites[i]!);
      if (pick(i + 1, left - 1)) return true;
      chosen.pop();
    }
    return false;
  };
  for (let k = 0; k <= Math.min(max, sites.length); k++) if (pick(0, k)) return k;
  return undefined;
}

const smallCase = fc.record({
  seed: fc.integer({ min: 0, max: 2 ** 31 - 1 }),
  cols: fc.integer({ min: 5, max: 7 }),
  rows: fc.integer({ min: 3, max: 4 }),
  parts: fc.integer({ min: 2, max: 3 }),
  nets: fc.integer({ min: 2, max: 4 }),
});

describe('cut count is the exact minimum', () => {
  it('scored cuts: the router cuts exactly as often as the best set of cut sites, plus one per relay island (300 cases)', () => {
    let compared = 0;
    fc.assert(
      fc.property(smallCase, ({ seed, cols, rows, parts: n, nets }) => {
        const c = randomCase(seed, makeBoard('strip', cols, rows), n, nets);
        const r = routeLayout(c.design, c.placement, { cutStyle: 'between' });
        if (!r.ok) return;
        compared++;
        const leads = leadNets(c.design, c.placement);
        const sites: number[] = [];
        for (let y = 0; y < rows; y++) for (let x = 0; x < cols - 1; x++) sites.push(x + y * cols);
        const best = bruteMinimum(sites, r.value.stats.cuts, (chosen) => parts(cols, rows, leads, new Set(chosen), new Set()));
        expect(r.value.stats.cuts).toBe(best! + relayIslands(r.value.layout, leads));
      }),
      { numRuns: 300 },
    );
    expect(compared).toBeGreaterThan(100);
  });

  it('drilled cuts: the same minimum over free holes (plus relay islands), and "impossible" only when no set of free holes will do (300 cases)', () => {
    let compared = 0;
    let impossible = 0;
    fc.assert(
      fc.property(smallCase, ({ seed, cols, rows, parts: n, nets }) => {
        const c = randomCase(seed, makeBoard('strip', cols, rows), n, nets);
        const r = routeLayout(c.design, c.placement, { cutStyle: 'hole' });
        const leads = leadNets(c.design, c.placement);
        const free: number[] = [];
        for (let h = 0; h < cols * rows; h++) if (!leads.has(h)) free.push(h);
        if (r.ok) {
          compared++;
          const best = bruteMinimum(free, r.value.stats.cuts, (chosen) => parts(cols, rows, leads, new Set(), new Set(chosen)));
          expect(r.value.stats.cuts).toBe(best! + relayIslands(r.value.layout, leads));
        } else if (r.problems.some((p) => p.data?.reason === 'drilled-cut')) {
          impossible++;
          expect(parts(cols, rows, leads, new Set(), new Set(free))).toBe(false);
        }
      }),
      { numRuns: 300 },
    );
    expect(compared).toBeGreaterThan(50);
    expect(impossible).toBeGreaterThan(0);
  });
});

describe('links form a spanning forest over the islands', () => {
  it('each join merges two pieces of copper; without relays, links = Σ(islands − 1) (500 cases)', () => {
    let direct = 0;
    let routed = 0;
    fc.assert(
      fc.property(
        fc.record({ seed: fc.integer({ min: 0, max: 2 ** 31 - 1 }), cols: fc.integer({ min: 10, max: 22 }), rows: fc.integer({ min: 8, max: 14 }), parts: fc.integer({ min: 3, max: 8 }), nets: fc.integer({ min: 2, max: 6 }) }),
        ({ seed, cols, rows, parts: n, nets }) => {
          const c = randomCase(seed, makeBoard('strip', cols, rows), n, nets);
          const r = routeLayout(c.design, c.placement, { cutStyle: 'between' });
          if (!r.ok) return;
          routed++;
          const L = r.value.layout;
          // Pieces of copper after the cuts: a number per hole.
          const piece = new Int32Array(cols * rows);
          const cutRight = new Set(L.cuts.map((cut) => ('between' in cut ? Math.min(cut.between[0][0], cut.between[1][0]) + cut.between[0][1] * cols : -1)));
          let id = 0;
          for (let y = 0; y < rows; y++) {
            id++;
            for (let x = 0; x < cols; x++) {
              piece[x + y * cols] = id;
              if (cutRight.has(x + y * cols)) id++;
            }
          }
          const parent = Array.from({ length: id + 1 }, (_, i) => i);
          const find = (i: number): number => (parent[i] === i ? i : (parent[i] = find(parent[i]!)));
          const withPins = new Set<number>();
          const islands = new Map<string, Set<number>>();
          for (const [h, net] of leadNets(c.design, c.placement)) {
            withPins.add(piece[h]!);
            (islands.get(net) ?? islands.set(net, new Set()).get(net)!).add(piece[h]!);
          }
          const relays = new Set<number>();
          const join = (a: number, b: number) => {
            const [pa, pb] = [piece[a]!, piece[b]!];
            for (const p of [pa, pb]) if (!withPins.has(p)) relays.add(p);
            expect(find(pa)).not.toBe(find(pb)); // never a redundant join
            parent[find(pa)] = find(pb);
          };
          for (const l of L.links) join(l.from[0] + l.from[1] * cols, l.to[0] + l.to[1] * cols);
          for (const w of L.wires) {
            const steps = Math.abs(w.to[0] - w.from[0]) + Math.abs(w.to[1] - w.from[1]);
            for (let k = 0; k < steps; k++) {
              const x = w.from[0] + Math.sign(w.to[0] - w.from[0]) * k;
              const y = w.from[1] + Math.sign(w.to[1] - w.from[1]) * k;
              const h = x + y * cols;
              const h2 = h + Math.sign(w.to[0] - w.from[0]) + Math.sign(w.to[1] - w.from[1]) * cols;
              if (piece[h] !== piece[h2]) join(h, h2);
            }
          }
          let need = 0;
          for (const s of islands.values()) need += s.size - 1;
          if (relays.size === 0 && L.wires.length === 0) {
            direct++;
            expect(L.links.length).toBe(need);
          }
        },
      ),
      { numRuns: 500 },
    );
    expect(routed).toBeGreaterThan(150);
    // About a third of routed random placements need no relay (0.27–0.38 measured over
    // twelve fast-check seeds), so the exact count above is checked on many cases; the
    // floor sits well below that spread so the test does not flake.
    expect(direct / routed).toBeGreaterThan(0.2);
  });
});
