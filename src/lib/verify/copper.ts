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
import { conductorsOf } from '../board/index.ts';
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
  /** The holes on either side of each effective cut (for probe pairs): [cut, a, b] triples, flattened. */
  cutSides: Int32Array;
  faults: Problem[];
}

export function buildCopper(board: Board, cuts: Cut[]): Copper {
  const { cols, rows } = board;
  const size = cols * rows;
  const faults: Problem[] = [];
  const cutAt = new Uint8Array(size);
  /** hole → first cut `at` it. */
  const atCut = new Map<number, number>();
  // cuts between two holes, listed from their lower hole: first[h], then next[k], ascending k
  const first = new Int32Array(size).fill(-1);
  const next = new Int32Array(cuts.length).fill(-1);
  const upper = new Int32Array(cuts.length).fill(-1);
  const matched = new Uint8Array(cuts.length);
  let scored = 0;

  for (let k = cuts.length - 1; k >= 0; k--) {
    const cut = cuts[k]!;
    if ('at' in cut) {
      const i = indexOn(cut.at, cols, rows);
      if (i >= 0) {
        cutAt[i] = 1;
        atCut.set(i, k); // walking down, the first cut is set last
      }
      continue;
    }
    const ia = indexOn(cut.between[0], cols, rows);
    const ib = indexOn(cut.between[1], cols, rows);
    if (ia < 0 || ib < 0) continue;
    const lo = ia < ib ? ia : ib;
    upper[k] = ia < ib ? ib : ia;
    next[k] = first[lo]!;
    first[lo] = k;
    scored++;
  }

  const pattern = patternOf(board);
  const flat = pattern.holes;
  const starts = pattern.starts;
  const copper = new Uint8Array(size);
  const edgeBuf = new Int32Array(2 * flat.length);
  let nEdges = 0;
  const sides: number[] = [];
  // each hole on one conductor at most: a piece is one run along it; else join runs by sets
  const uf = pattern.simple ? undefined : new UnionFind(size);
  const runOf = new Int32Array(size);
  let runs = 0;
  for (let ci = 0; ci + 1 < starts.length; ci++) {
    const s0 = starts[ci]!;
    const s1 = starts[ci + 1]!;
    let prev = -1; // last hole with copper along this conductor
    let gap = -1; // first cut `at` passed since `prev`, if any
    let off: number[] | undefined;
    for (let k = s0; k < s1; k++) {
      const i = flat[k]!;
      if (i < 0) {
        (off ??= []).push(k - s0);
        prev = gap = -1;
        continue;
      }
      if (cutAt[i]) {
        if (gap < 0) gap = atCut.get(i)!;
        continue;
      }
      copper[i] = 1;
      let joined = false;
      if (prev >= 0 && gap >= 0) sides.push(gap, prev, i);
      else if (prev >= 0 && prev !== i) {
        const cutHere = scored ? cutBetween(prev, i, first, next, upper, matched) : -1;
        if (cutHere >= 0) sides.push(cutHere, prev, i);
        else {
          edgeBuf[nEdges++] = prev;
          edgeBuf[nEdges++] = i;
          if (uf) uf.union(prev, i);
          joined = true;
        }
      } else if (prev === i) joined = true;
      if (!uf) runOf[i] = joined ? runOf[prev]! : runs++;
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
  for (let k = 0; k < cuts.length; k++) {
    const cut = cuts[k]!;
    if ('at' in cut) {
      if (indexOn(cut.at, cols, rows) < 0) faults.push(offBoard(['cuts', k, 'at'], `cut ${k + 1} at [${cut.at.join(', ')}] is off the board`, cols, rows));
      continue;
    }
    const [a, b] = cut.between;
    if (upper[k]! < 0)
      faults.push(offBoard(['cuts', k, 'between'], `cut ${k + 1} between [${a.join(', ')}] and [${b.join(', ')}] is off the board`, cols, rows));
    else if (!matched[k])
      faults.push(
        problem('verify.bad-cut', 'error', ['cuts', k, 'between'], `cut ${k + 1} between ${at(a, cols)} and ${at(b, cols)}: these holes are not neighbours along one conductor, so nothing is cut`, {
          hint: 'a cut between holes goes between two neighbouring holes of one strip; use { "at": hole } to drill out a hole',
          holes: [a, b],
        }),
      );
  }

  // pieces numbered in reading order of their first hole
  const piece = new Int32Array(size).fill(-1);
  const idOf = new Int32Array(uf ? size : runs).fill(-1);
  let pieceCount = 0;
  for (let i = 0; i < size; i++) {
    if (!copper[i]) continue;
    const r = uf ? uf.find(i) : runOf[i]!;
    if (idOf[r]! < 0) idOf[r] = pieceCount++;
    piece[i] = idOf[r]!;
  }
  const edges = edgeBuf.subarray(0, nEdges);
  return { cols, rows, size, copper, cutAt, piece, pieceCount, edges, cutSides: Int32Array.from(sides), faults };
}

/** The first cut between holes a and b (−1 if none); marks every cut on that pair as one that cuts. */
function cutBetween(a: number, b: number, first: Int32Array, next: Int32Array, upper: Int32Array, matched: Uint8Array): number {
  const lo = a < b ? a : b;
  const hi = a < b ? b : a;
  let found = -1;
  for (let k = first[lo]!; k >= 0; k = next[k]!)
    if (upper[k] === hi) {
      if (found < 0) found = k;
      matched[k] = 1;
    }
  return found;
}

/** Dense index of a hole, or −1 when it is off the board (onBoard, holeIndex in one step). */
function indexOn(h: Hole, cols: number, rows: number): number {
  const x = h[0];
  const y = h[1];
  return x >= 0 && y >= 0 && x < cols && y < rows && Number.isInteger(x) && Number.isInteger(y) ? x + y * cols : -1;
}

/** Conductors as one flat list of dense hole indices (−1 off the board); conductor k is starts[k] … starts[k+1]−1. */
interface Pattern {
  holes: Int32Array;
  starts: Int32Array;
  /** No hole is listed twice. */
  simple: boolean;
}

const patterns = new Map<string, Pattern>();

/**
 * conductorsOf, flattened; remembered for boards whose copper follows from kind and size
 * alone (the same plain strip board is asked for again on every check). Read-only.
 */
function patternOf(board: Board): Pattern {
  if (board.conductors) return flatten(conductorsOf(board), board.cols, board.rows);
  const key = `${board.kind}:${board.cols}x${board.rows}`;
  let got = patterns.get(key);
  if (!got) {
    got = flatten(conductorsOf(board), board.cols, board.rows);
    if (patterns.size >= 16) patterns.clear();
    patterns.set(key, got);
  }
  return got;
}

function flatten(conductors: Hole[][], cols: number, rows: number): Pattern {
  let n = 0;
  for (const c of conductors) n += c.length;
  const holes = new Int32Array(n);
  const starts = new Int32Array(conductors.length + 1);
  const seen = new Uint8Array(cols * rows);
  let simple = true;
  let k = 0;
  conductors.forEach((c, ci) => {
    starts[ci] = k;
    for (const h of c) {
      const i = indexOn(h, cols, rows);
      holes[k++] = i;
      if (i < 0) continue;
      if (seen[i]) simple = false;
      seen[i] = 1;
    }
  });
  starts[conductors.length] = k;
  return { holes, starts, simple };
}

function offBoard(path: (string | number)[], message: string, cols: number, rows: number): Problem {
  return problem('verify.off-board', 'error', path, message, { hint: `columns run 0–${cols - 1} and rows 0–${rows - 1} in the document (0-based)` });
}
