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
    // row 0: net 0 at 1 and 3, net 1 at 6, net 0 at 8 → runs 0 | 1 | 0 → two gaps
    const { cut } = cutOf(makeBoard('strip', 10, 1), [
      [1, 0, 0],
      [3, 0, 0],
      [6, 0, 1],
      [8, 0, 0],
    ]);
    expect(cut.gapCount).toBe(2);
    expect([cut.gapI[0], cut.gapJ[0], cut.gapI[1], cut.gapJ[1]]).toEqual([3, 6, 6, 8]);
    // end stretches belong to the end segments; holes between same-net leads are firm
    expect(cut.segOf[0]).toBe(cut.segOf[2]);
    expect(cut.segOf[9]).toBe(cut.segOf[8]);
    expect(cut.gapOf[4]).toBe(0);
    expect(cut.gapOf[7]).toBe(1);
    expect(cut.segCount).toBe(3);
  });

  it('makes a strip without leads one unowned segment (a relay) and splits nothing under a DIP row of one net', () => {
    const { cut } = cutOf(makeBoard('strip', 6, 2), [
      [1, 1, 4],
      [4, 1, 4],
    ]);
    expect(cut.gapCount).toBe(0);
    expect(cut.segNet[cut.segOf[0]!]).toBe(-1);
    expect(cut.segNet[cut.segOf[6]!]).toBe(4);
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
