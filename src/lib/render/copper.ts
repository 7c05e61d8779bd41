/**
 * Copper after cuts. `copperRuns(board, cuts)` walks each conductor of the board in copper
 * order and breaks it at every cut: a cut `at` a hole removes that hole from the copper, a
 * cut `between` two neighbours splits the run there. Each run is one piece of copper.
 */
import type { Board, Cut } from '../model/layout.ts';
import type { Hole } from '../model/problem.ts';
import { conductorsOf, holeIndex } from '../board/grid.ts';

function pairKey(a: number, b: number): string {
  return a < b ? `${a}:${b}` : `${b}:${a}`;
}

export function copperRuns(board: Board, cuts: readonly Cut[]): Hole[][] {
  const drilled = new Set<number>();
  const scored = new Set<string>();
  for (const c of cuts) {
    if ('at' in c) drilled.add(holeIndex(board, c.at));
    else scored.add(pairKey(holeIndex(board, c.between[0]), holeIndex(board, c.between[1])));
  }
  const runs: Hole[][] = [];
  for (const conductor of conductorsOf(board)) {
    let run: Hole[] = [];
    let prev: number | undefined;
    for (const h of conductor) {
      const i = holeIndex(board, h);
      if (drilled.has(i)) {
        if (run.length) runs.push(run);
        run = [];
        prev = undefined;
        continue;
      }
      if (prev !== undefined && scored.has(pairKey(prev, i))) {
        if (run.length) runs.push(run);
        run = [];
      }
      run.push([h[0], h[1]]);
      prev = i;
    }
    if (run.length) runs.push(run);
  }
  return runs;
}

/** Keep the corners of a run: drop holes that lie straight between their neighbours. */
export function corners(holes: readonly Hole[]): Hole[] {
  if (holes.length <= 2) return holes.map((h) => [h[0], h[1]]);
  const out: Hole[] = [[holes[0]![0], holes[0]![1]]];
  for (let i = 1; i < holes.length - 1; i++) {
    const a = holes[i - 1]!;
    const b = holes[i]!;
    const c = holes[i + 1]!;
    const straight = (b[0] - a[0]) * (c[1] - b[1]) === (b[1] - a[1]) * (c[0] - b[0]) && (b[0] - a[0]) * (c[0] - b[0]) + (b[1] - a[1]) * (c[1] - b[1]) > 0;
    if (!straight) out.push([b[0], b[1]]);
  }
  const last = holes[holes.length - 1]!;
  out.push([last[0], last[1]]);
  return out;
}
