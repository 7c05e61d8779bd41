import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import type { Board, Cut } from '../model/layout.ts';
import type { Hole } from '../model/problem.ts';
import { breadboardBoard } from '../board/breadboard.ts';
import { copperRuns, corners } from './copper.ts';

const strip = (cols: number, rows: number): Board => ({ kind: 'strip', cols, rows, pitchMm: 2.54 });

describe('copperRuns', () => {
  it('splits a strip at a drilled hole and between two holes', () => {
    const runs = copperRuns(strip(10, 1), [{ at: [3, 0] }, { between: [[6, 0], [7, 0]] }]);
    expect(runs.map((r) => r.map((h) => h[0]))).toEqual([[0, 1, 2], [4, 5, 6], [7, 8, 9]]);
  });

  it('gives one pad per hole on a pad board and keeps bus-board groups whole', () => {
    expect(copperRuns({ kind: 'pads', cols: 4, rows: 3, pitchMm: 2.54 }, [])).toHaveLength(12);
    // breadboard pattern: four rails plus two groups of five per column (board/breadboard.ts)
    const runs = copperRuns(breadboardBoard(10), []);
    expect(runs).toHaveLength(4 + 2 * 10);
    expect(runs.filter((r) => r.length === 5)).toHaveLength(20);
  });

  it('joins neighbours on a strip exactly when no cut lies between them (property)', () => {
    const cols = 12;
    const rows = 4;
    const cutArb = fc.oneof(
      fc.record({ at: fc.tuple(fc.integer({ min: 0, max: cols - 1 }), fc.integer({ min: 0, max: rows - 1 })) }),
      fc.tuple(fc.integer({ min: 0, max: cols - 2 }), fc.integer({ min: 0, max: rows - 1 })).map(([c, r]) => ({ between: [[c, r], [c + 1, r]] as [Hole, Hole] })),
    );
    fc.assert(
      fc.property(fc.array(cutArb, { maxLength: 20 }), (cuts: Cut[]) => {
        const runs = copperRuns(strip(cols, rows), cuts);
        const runOf = new Map<string, number>();
        runs.forEach((run, k) => run.forEach((h) => runOf.set(`${h[0]},${h[1]}`, k)));
        const drilled = new Set(cuts.flatMap((c) => ('at' in c ? [`${c.at[0]},${c.at[1]}`] : [])));
        const scored = new Set(cuts.flatMap((c) => ('between' in c ? [`${c.between[0][0]},${c.between[0][1]}`] : [])));
        for (let r = 0; r < rows; r++)
          for (let c = 0; c < cols; c++) {
            const k = `${c},${r}`;
            expect(runOf.has(k)).toBe(!drilled.has(k));
            if (c + 1 < cols && !drilled.has(k) && !drilled.has(`${c + 1},${r}`))
              expect(runOf.get(k) === runOf.get(`${c + 1},${r}`)).toBe(!scored.has(k));
          }
      }),
    );
  });
});

describe('corners', () => {
  it('keeps the ends and the turns of a run only', () => {
    const run: Hole[] = [[0, 0], [1, 0], [2, 0], [2, 1], [2, 2]];
    expect(corners(run)).toEqual([[0, 0], [2, 0], [2, 2]]);
  });
});
