import { describe, expect, it } from 'vitest';
import { makeBoard, breadboardBoard } from '../board/index.ts';
import { buildCopper } from './copper.ts';
import { splitSegments } from './segments.ts';

function cutOf(board: ReturnType<typeof makeBoard>, leads: [number, number, number][]) {
  const copper = buildCopper(board);
  if (!copper.ok) throw new Error('bad board');
  const leadNet = new Int32Array(board.cols * board.rows).fill(-1);
  for (const [x, y, net] of leads) leadNet[x + y * board.cols] = net;
  return { copper: copper.value, cut: splitSegments(copper.value, leadNet) };
}

describe('splitSegments', () => {
  it('puts one gap between neighbouring leads of different nets, none between leads of one net', () => {
    // row 0: net 0 at 1 and 3, net 1 at 6, net 0 at 8 → runs 0 | 1 | 0 → two gaps, two tails
    const { cut } = cutOf(makeBoard('strip', 10, 1), [
      [1, 0, 0],
      [3, 0, 0],
      [6, 0, 1],
      [8, 0, 0],
    ]);
    const between = [...Array(cut.gapCount).keys()].filter((g) => cut.gapLow[g]! >= 0 && cut.gapHigh[g]! >= 0);
    expect(between.flatMap((g) => [cut.gapI[g], cut.gapJ[g]])).toEqual([3, 6, 6, 8]);
    // holes between same-net leads are firm; gap holes belong to no segment
    expect(cut.segOf[2]).toBe(cut.segOf[1]);
    expect(cut.segOf[4]).toBe(-1);
    expect(cut.gapOf[4]).toBe(between[0]);
    expect(cut.gapOf[7]).toBe(between[1]);
    expect([cut.segNet[cut.segOf[1]!], cut.segNet[cut.segOf[6]!], cut.segNet[cut.segOf[8]!]]).toEqual([0, 1, 0]);
  });

  it('makes the holes beyond the first and last lead tails: gaps with one side, the strip end on the other', () => {
    const { cut } = cutOf(makeBoard('strip', 10, 1), [
      [2, 0, 0],
      [6, 0, 1],
    ]);
    const low = cut.gapOf[0]!;
    const high = cut.gapOf[9]!;
    expect(low).toBe(cut.gapOf[1]);
    expect([cut.gapI[low], cut.gapJ[low], cut.gapLow[low], cut.gapHigh[low]]).toEqual([-1, 2, -1, cut.segOf[2]]);
    expect([cut.gapI[high], cut.gapJ[high], cut.gapLow[high], cut.gapHigh[high]]).toEqual([6, 10, cut.segOf[6], -1]);
    expect(cut.gapCount).toBe(3);
  });

  it('gives every gap hole a relay segment of its own, owned by nobody, after the ordinary segments', () => {
    const { copper, cut } = cutOf(makeBoard('strip', 10, 1), [
      [1, 0, 0],
      [3, 0, 0],
      [6, 0, 1],
      [8, 0, 0],
    ]);
    const gapHoles = [0, 4, 5, 7, 9];
    const relays = gapHoles.map((h) => cut.holeRelay[h]!);
    expect(new Set(relays).size).toBe(gapHoles.length);
    expect(cut.segCount).toBe(3 + gapHoles.length);
    gapHoles.forEach((h, i) => {
      const s = relays[i]!;
      expect(s).toBeGreaterThanOrEqual(3);
      expect(cut.segGap[s]).toBe(cut.gapOf[h]);
      expect([cut.segNet[s], cut.segHole[s], cut.segFrom[s]]).toEqual([-1, -1, copper.posOf[h]]);
    });
    for (const h of [1, 2, 3, 6, 8]) expect(cut.holeRelay[h]).toBe(-1);
    for (let s = 0; s < 3; s++) expect(cut.segGap[s]).toBe(-1);
  });

  it('makes a strip without leads one unowned segment (a relay) and splits nothing under a DIP row of one net', () => {
    const { cut } = cutOf(makeBoard('strip', 6, 2), [
      [1, 1, 4],
      [4, 1, 4],
    ]);
    // row 1: one run of net 4 from column 1 to 4, tails at columns 0 and 5, no gap to cut
    expect([...Array(cut.gapCount).keys()].every((g) => cut.gapLow[g]! < 0 || cut.gapHigh[g]! < 0)).toBe(true);
    expect(cut.segNet[cut.segOf[0]!]).toBe(-1);
    expect(cut.segOf[5]).toBe(cut.segOf[0]);
    expect(cut.segNet[cut.segOf[7]!]).toBe(4);
    expect(cut.segOf[10]).toBe(cut.segOf[7]);
  });

  it('treats pads and copperless holes as single-hole segments', () => {
    const pads = cutOf(makeBoard('pads', 3, 2), [[1, 1, 2]]);
    expect(pads.cut.segCount).toBe(6);
    expect(pads.cut.segHole[pads.cut.segOf[4]!]).toBe(4);
    const bus = cutOf(breadboardBoard(4), []);
    // row 2 of the breadboard pattern has no copper: each hole its own segment
    const h = 1 + 2 * 4;
    expect(bus.copper.condOf[h]).toBe(-1);
    expect(bus.cut.segHole[bus.cut.segOf[h]!]).toBe(h);
  });
});
