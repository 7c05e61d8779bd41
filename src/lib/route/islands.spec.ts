/**
 * Relay island rules on a small hand-built state: row 1 of a strip board carries B (column 0)
 * and C (column 9), rows 0, 2 and 3 belong to nets X, F and G (one pad each), which land
 * column links on row 1's gap.
 */
import { describe, expect, it } from 'vitest';
import { makeBoard } from '../board/index.ts';
import type { CutStyle } from '../model/index.ts';
import { buildCopper } from './copper.ts';
import { placeCuts } from './cuts.ts';
import { placeLink } from './landing.ts';
import { readPlacement } from './placement.ts';
import { replay, replayWire } from './replay.ts';
import { splitSegments } from './segments.ts';
import { cloneState, newState, type RouteState } from './state.ts';
import { handCase, type HandPart } from './testing/hand.ts';

const COLS = 10;
const pad = (ref: string, net: string, x: number, y: number): HandPart => ({ ref, kind: 'pads', count: 1, pins: { '1': [net, x, y] } });

function setup(style: CutStyle) {
  const c = handCase(makeBoard('strip', COLS, 4), [pad('J1', 'B', 0, 1), pad('J2', 'C', 9, 1), pad('J3', 'X', 0, 0), pad('J4', 'F', 0, 2), pad('J5', 'G', 0, 3)]);
  const copper = buildCopper(c.placement.board);
  const placed = readPlacement(c.design, c.placement);
  if (!copper.ok || !placed.ok) throw new Error('bad fixture');
  const st = newState(copper.value, splitSegments(copper.value, placed.value.leadNet), placed.value, { drilled: style === 'hole', overBodies: false });
  const net = (name: string) => placed.value.netNames.indexOf(name);
  const row = { X: 0, F: 2, G: 3 } as const;
  /** A column link from the net's own row onto row 1 at column x; whether it was placed. */
  const land = (s: RouteState, name: keyof typeof row, x: number) => placeLink(s, x + row[name] * COLS, x + COLS, net(name), true);
  const island = (s: RouteState, x: number) => s.claimSeg[x + COLS]!;
  const row1Cuts = (s: RouteState) => placeCuts(s, style).filter((cut) => ('at' in cut ? cut.at[1] : cut.between[0][1]) === 1).length;
  return { st, net, land, island, row1Cuts };
}

describe('relay islands in a gap', () => {
  it('keep a cut between neighbours: a boundary when scored, a free hole when drilled', () => {
    const scored = setup('between');
    expect(scored.land(scored.st, 'X', 1)).toBe(true); // one boundary from B at column 0
    expect(scored.land(scored.st, 'F', 2)).toBe(true); // one boundary from X's island
    expect(scored.row1Cuts(scored.st)).toBe(3); // B | X | F | C
    const drilled = setup('hole');
    expect(drilled.land(drilled.st, 'X', 1)).toBe(false); // no hole left to drill next to B
    expect(drilled.land(drilled.st, 'X', 2)).toBe(true);
    expect(drilled.land(drilled.st, 'F', 3)).toBe(false);
    expect(drilled.land(drilled.st, 'F', 4)).toBe(true);
    expect(drilled.row1Cuts(drilled.st)).toBe(3);
  });

  it('grow when a claim of the same net lands with nothing between, and keep other nets out', () => {
    const { st, net, land, island, row1Cuts } = setup('between');
    expect(land(st, 'X', 2)).toBe(true);
    expect(land(st, 'X', 5)).toBe(true);
    expect(island(st, 5)).toBe(island(st, 2));
    expect(st.owner[island(st, 2)]).toBe(net('X'));
    expect(land(st, 'F', 3)).toBe(false); // inside X's island
    expect(land(st, 'F', 7)).toBe(true);
    expect(row1Cuts(st)).toBe(3);
  });

  it('come back as they were after a rip-up, and a new island never takes a name in use', () => {
    const { st, net, land, island, row1Cuts } = setup('between');
    const base = cloneState(st);
    expect(land(st, 'X', 6)).toBe(true);
    expect(land(st, 'F', 4)).toBe(true);
    expect(land(st, 'X', 2)).toBe(true); // F lies between: a second island of X
    expect(island(st, 2)).not.toBe(island(st, 6));
    // Without F, X's two islands stay two (each joined to X by its own link), a cut between.
    const noF = replay(base, st, new Set([net('F')]));
    expect([island(noF, 2), island(noF, 6)]).toEqual([island(st, 2), island(st, 6)]);
    expect(noF.claimSeg[4 + COLS]).toBe(-1);
    expect(row1Cuts(noF)).toBe(3);

    // An island started at column 5 keeps only its wire at column 4 once X's links go.
    const { st: s2, land: land2, island: island2, net: net2 } = setup('between');
    const base2 = cloneState(s2);
    expect(land2(s2, 'X', 5)).toBe(true);
    replayWire(s2, 4, 4 + COLS, net2('X'));
    const started = island2(s2, 5);
    expect(island2(s2, 4)).toBe(started);
    const kept = replay(base2, s2, new Set([net2('X')]));
    expect(island2(kept, 4)).toBe(started);
    expect(land2(kept, 'G', 5)).toBe(true); // a boundary from X's island at column 4
    expect(island2(kept, 5)).not.toBe(started);
    expect(kept.owner[island2(kept, 5)]).toBe(net2('G'));
    expect(kept.owner[started]).toBe(net2('X'));
  });
});
