import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { makeBoard } from '../board/grid.ts';
import { breadboardBoard } from '../board/breadboard.ts';
import { copperMap } from './copper-map.ts';
import { CopperTally } from './copper-tally.ts';

function tallyFor(cols: number, rows: number, nets = 8) {
  const map = copperMap(makeBoard('strip', cols, rows));
  const owner = new Int32Array(cols * rows).fill(-1);
  return { map, t: new CopperTally(map, nets, owner, new Uint8Array(cols * rows)), owner };
}

/** Cuts and links counted from scratch: net changes along each row, runs per net − 1. */
function recount(leads: { hole: number; net: number }[], cols: number) {
  const rows = new Map<number, { x: number; net: number }[]>();
  for (const l of leads) {
    const y = Math.floor(l.hole / cols);
    rows.set(y, [...(rows.get(y) ?? []), { x: l.hole % cols, net: l.net }]);
  }
  let cuts = 0;
  const runs = new Map<number, number>();
  for (const list of rows.values()) {
    list.sort((a, b) => a.x - b.x || a.net - b.net);
    let last = -1;
    for (const l of list) {
      if (l.net !== last) {
        if (last !== -1) cuts++;
        runs.set(l.net, (runs.get(l.net) ?? 0) + 1);
      }
      last = l.net;
    }
  }
  let links = 0;
  for (const r of runs.values()) links += r - 1;
  return { cuts, links };
}

describe('CopperTally', () => {
  it('counts one cut per net change along a strip and a link per extra segment', () => {
    const { t } = tallyFor(10, 3);
    // row 0: A A B A → cuts 2, net A on two segments; row 2: B → B on two segments.
    for (const [hole, net] of [[0, 0], [1, 0], [4, 1], [7, 0], [25, 1]] as const) t.add(hole, net);
    t.flush(() => {});
    expect(t.cuts).toBe(2);
    expect(t.links).toBe(2);
    t.remove(4, 1);
    t.flush(() => {});
    expect(t.cuts).toBe(0);
    expect(t.links).toBe(0);
  });

  it('sees a segment with no free hole for a link as stranded', () => {
    const { t, owner } = tallyFor(3, 2);
    // row 0 full of leads: net 0 | net 1 | net 0; net 1 also on row 1.
    [0, 1, 2].forEach((h) => {
      owner[h] = h;
      t.touchHole(h);
    });
    t.add(0, 0);
    t.add(1, 1);
    t.add(2, 0);
    t.add(4, 1);
    t.flush(() => {});
    expect(t.links).toBe(2);
    expect(t.stranded).toBe(3);
  });

  it('follows the copper of a breadboard pattern: columns of five are conductors', () => {
    const map = copperMap(breadboardBoard(10));
    expect(map.alongRows).toBe(false);
    expect(map.padLike).toBe(false);
    const t = new CopperTally(map, 4, new Int32Array(10 * 17).fill(-1), new Uint8Array(10 * 17));
    t.add(2 + 3 * 10, 0); // column 2, row 3 (upper group)
    t.add(2 + 7 * 10, 1); // same group of five, another net
    t.add(3 + 3 * 10, 0); // next column: another conductor
    t.flush(() => {});
    expect(t.cuts).toBe(1);
    expect(t.links).toBe(1);
  });

  it('stays equal to a recount from scratch through any sequence of adds and removes', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.integer({ min: 0, max: 47 }), fc.integer({ min: 0, max: 3 }), fc.boolean()), { maxLength: 60 }), (ops) => {
        const { t } = tallyFor(8, 6, 4);
        const leads: { hole: number; net: number }[] = [];
        for (const [hole, net, add] of ops) {
          const i = leads.findIndex((l) => l.hole === hole);
          if (i >= 0 && !add) {
            t.remove(hole, leads[i]!.net);
            leads.splice(i, 1);
          } else if (i < 0) {
            t.add(hole, net);
            leads.push({ hole, net });
          }
          if (hole % 3 === 0) t.flush(() => {});
        }
        t.flush(() => {});
        expect({ cuts: t.cuts, links: t.links }).toEqual(recount(leads, 8));
      }),
      { numRuns: 150 },
    );
  });

  it('matches a tally built afresh, bodies and all, and flushBack undoes a flush exactly', () => {
    type Op = [hole: number, net: number, body: boolean];
    // Short strips, so that bodies often fill a run's whole reach (a stranded segment).
    const op = fc.tuple(fc.integer({ min: 0, max: 17 }), fc.integer({ min: 0, max: 3 }), fc.boolean());
    const figures = (t: CopperTally) =>
      JSON.parse(JSON.stringify({ cuts: t.cuts, links: t.links, stranded: t.stranded, cramped: t.cramped, linksW: t.linksW, strandedW: t.strandedW, segs: [...t.segs], runs: t.runs, lo: t.runLo, hi: t.runHi })) as unknown;
    fc.assert(
      fc.property(fc.array(op, { minLength: 20, maxLength: 60 }), fc.array(op, { minLength: 1, maxLength: 6 }), (ops: Op[], last: Op[]) => {
        const { t, owner } = tallyFor(3, 6, 4);
        const leads = new Map<number, number>();
        // A body cell or a lead comes where there is none and goes where there is one; the
        // returned function puts it back.
        const apply = ([hole, net, body]: Op): (() => void) => {
          if (body) {
            owner[hole] = owner[hole] === -1 ? 7 : -1;
            t.touchHole(hole);
            return () => apply([hole, net, true]);
          }
          const had = leads.get(hole);
          if (had === undefined) {
            t.add(hole, net);
            leads.set(hole, net);
          } else {
            t.remove(hole, had);
            leads.delete(hole);
          }
          return () => apply([hole, had ?? net, false]);
        };
        ops.forEach((o, i) => {
          apply(o);
          if (i % 3 === 0) t.flush(() => {});
        });
        t.flush(() => {});
        const fresh = tallyFor(3, 6, 4);
        owner.forEach((o, h) => {
          fresh.owner[h] = o;
          fresh.t.touchHole(h);
        });
        leads.forEach((net, hole) => fresh.t.add(hole, net));
        fresh.t.flush(() => {});
        const before = figures(t);
        expect(before).toEqual(figures(fresh.t));
        // One more batch, flushed, then undone in reverse and put back with flushBack.
        const undo = last.map(apply);
        t.flush(() => {});
        undo.reverse().forEach((f) => f());
        t.flushBack(() => {});
        expect(figures(t)).toEqual(before);
      }),
      { numRuns: 200 },
    );
  });
});
