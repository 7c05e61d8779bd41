/**
 * The copper after cuts. `buildCopper(board, cuts)` takes the board's conductors
 * (conductorsOf: strips, pads or explicit lists) and applies the cuts: `{ at }` removes the
 * copper around one hole (in every conductor through it); `{ between: [a, b] }` breaks each
 * conductor in which a and b are consecutive. A `between` on holes that are not consecutive
 * along any conductor is a fault (`verify.bad-cut`) and breaks nothing; cuts and
 * conductor holes off the board are `verify.off-board` and are skipped (an off-board hole
 * inside a conductor list breaks the list there). Answers the copper pieces (connected
 * runs of copper) and the copper adjacency used to explain shorts.
 */
import { conductorsOf, holeIndex, onBoard } from '../board/index.ts';
import type { Board, Cut } from '../model/layout.ts';
import type { Hole, Problem } from '../model/problem.ts';
import { UnionFind } from './union-find.ts';
import { at, listText, problem } from './words.ts';

export interface Copper {
  cols: number;
  rows: number;
  size: number;
  /** 1 where copper remains around the hole. */
  copper: Uint8Array;
  /** 1 where a cut `at` the hole removed its copper. */
  cutAt: Uint8Array;
  /** Copper piece of each hole (a run of copper between cuts), −1 where there is none. */
  piece: Int32Array;
  pieceCount: number;
  /** Copper adjacency after cuts: pairs of hole indices, flattened. */
  edges: Int32Array;
  /** The holes on either side of each effective cut (for probe pairs). */
  cutSides: { cut: number; a: number; b: number }[];
  faults: Problem[];
  /** The copper's disjoint sets, for joining further. */
  sets: UnionFind;
}

export function buildCopper(board: Board, cuts: Cut[]): Copper {
  const { cols, rows } = board;
  const size = cols * rows;
  const faults: Problem[] = [];
  const cutAt = new Uint8Array(size);
  const atCut = new Map<number, number>();
  const between = new Map<number, number[]>();
  /** 1 on both holes of every scored cut: the map is asked only where this is set. */
  const scored = new Uint8Array(size);
  const pairKey = (a: number, b: number) => (a < b ? a * size + b : b * size + a);

  cuts.forEach((cut, k) => {
    if ('at' in cut) {
      if (!onBoard(board, cut.at)) faults.push(offBoard(['cuts', k, 'at'], `cut ${k + 1} at [${cut.at.join(', ')}] is off the board`, cols, rows));
      else {
        const i = holeIndex(board, cut.at);
        cutAt[i] = 1;
        if (!atCut.has(i)) atCut.set(i, k);
      }
      return;
    }
    const [a, b] = cut.between;
    if (!onBoard(board, a) || !onBoard(board, b)) {
      faults.push(offBoard(['cuts', k, 'between'], `cut ${k + 1} between [${a.join(', ')}] and [${b.join(', ')}] is off the board`, cols, rows));
      return;
    }
    const [ia, ib] = [holeIndex(board, a), holeIndex(board, b)];
    scored[ia] = scored[ib] = 1;
    const key = pairKey(ia, ib);
    (between.get(key) ?? between.set(key, []).get(key)!).push(k);
  });

  const conductors = patternOf(board);
  const copper = new Uint8Array(size);
  let holesListed = 0;
  for (const c of conductors) holesListed += c.length;
  const edgeBuf = new Int32Array(2 * holesListed);
  let nEdges = 0;
  const cutSides: Copper['cutSides'] = [];
  const matched = new Set<number>();
  const uf = new UnionFind(size);
  for (let ci = 0; ci < conductors.length; ci++) {
    const cond = conductors[ci]!;
    let prev = -1; // last hole with copper along this conductor
    let gap = -1; // first cut `at` passed since `prev`, if any
    let off: number[] | undefined;
    for (let k = 0; k < cond.length; k++) {
      const x = cond[k]![0];
      const y = cond[k]![1];
      if (!(x >= 0 && y >= 0 && x < cols && y < rows && Number.isInteger(x) && Number.isInteger(y))) {
        (off ??= []).push(k);
        prev = gap = -1;
        continue;
      }
      const i = x + y * cols;
      if (cutAt[i]) {
        if (gap < 0) gap = atCut.get(i)!;
        continue;
      }
      copper[i] = 1;
      if (prev >= 0 && gap >= 0) cutSides.push({ cut: gap, a: prev, b: i });
      else if (prev >= 0 && prev !== i) {
        const cutHere = scored[prev] && scored[i] ? between.get(pairKey(prev, i)) : undefined;
        if (cutHere) {
          for (const c of cutHere) matched.add(c);
          cutSides.push({ cut: cutHere[0]!, a: prev, b: i });
        } else {
          edgeBuf[nEdges++] = prev;
          edgeBuf[nEdges++] = i;
          uf.union(prev, i);
        }
      }
      prev = i;
      gap = -1;
    }
    if (off)
      faults.push(
        problem('verify.off-board', 'error', ['board', 'conductors', ci], `conductor ${ci + 1} lists ${off.length} hole${off.length > 1 ? 's' : ''} off the ${cols}×${rows} board (entries ${listText(off.map(String))})`, {
          hint: 'keep every conductor hole inside the board, or make the board larger',
        }),
      );
  }
  for (const ks of between.values())
    for (const k of ks) {
      if (matched.has(k)) continue;
      const [a, b] = (cuts[k] as { between: [[number, number], [number, number]] }).between;
      faults.push(
        problem('verify.bad-cut', 'error', ['cuts', k, 'between'], `cut ${k + 1} between ${at(a, cols)} and ${at(b, cols)}: these holes are not neighbours along one conductor, so nothing is cut`, {
          hint: 'a cut between holes goes between two neighbouring holes of one strip; use { "at": hole } to drill out a hole',
          holes: [a, b],
        }),
      );
    }

  const piece = new Int32Array(size).fill(-1);
  const idOf = new Int32Array(size).fill(-1);
  let pieceCount = 0;
  for (let i = 0; i < size; i++) {
    if (!copper[i]) continue;
    const r = uf.find(i);
    if (idOf[r]! < 0) idOf[r] = pieceCount++;
    piece[i] = idOf[r]!;
  }
  const edges = edgeBuf.subarray(0, nEdges);
  return { cols, rows, size, copper, cutAt, piece, pieceCount, edges, cutSides, faults, sets: uf };
}

const patterns = new Map<string, Hole[][]>();

/**
 * conductorsOf, remembered for boards whose copper follows from kind and size alone (the
 * same plain strip board is asked for again on every check). Read-only for callers.
 */
function patternOf(board: Board): Hole[][] {
  if (board.conductors) return conductorsOf(board);
  const key = `${board.kind}:${board.cols}x${board.rows}`;
  let got = patterns.get(key);
  if (!got) {
    got = conductorsOf(board);
    if (patterns.size >= 16) patterns.clear();
    patterns.set(key, got);
  }
  return got;
}

function offBoard(path: (string | number)[], message: string, cols: number, rows: number): Problem {
  return problem('verify.off-board', 'error', path, message, { hint: `columns run 0–${cols - 1} and rows 0–${rows - 1} in the document (0-based)` });
}
