/**
 * `spreadColumns(state, board, nets): { board, spots } | undefined` — make link room
 * in a finished placement without placing it again: insert free columns of holes between
 * parts and shift everything right of each by one hole.
 *
 * A column goes in only where no part's body crosses the boundary, so every lead keeps its
 * row and its order along the row: on a strip board the cuts and the segments to join stay
 * exactly what they were, and each new column is a clear lane for links (on a pad board,
 * a clear lane for wires; on a breadboard pattern, a fresh bus column). For each net in
 * `nets` (those the router could not join) one column goes where both of two of its
 * segments on different rows reach (strip boards), or in the middle of its leads (other
 * boards). Undefined when no column helps or may be added (boards with their own copper
 * other than the breadboard pattern keep their size).
 */
import type { Board } from '../model/layout.ts';
import { breadboardBoard } from '../board/breadboard.ts';
import { makeBoard } from '../board/grid.ts';
import type { PlaceState, Spot } from './state.ts';

/** Widest a board may grow to (the same bound as the working board's). */
const MAX_COLS = 400;

/** Boundaries b (between columns b − 1 and b) that no body crosses. */
function openBoundaries(s: PlaceState): Uint8Array {
  const open = new Uint8Array(s.W + 1).fill(1);
  s.problem.parts.forEach((part, p) => {
    const k = s.pose[p]!;
    if (k < 0) return;
    const pose = part.poses[k]!;
    for (let b = s.x[p]! + pose.minX + 1; b <= s.x[p]! + pose.maxX; b++) open[b] = 0;
  });
  return open;
}

/** The open boundary nearest to `at` within [lo, hi], or −1. */
function nearestOpen(open: Uint8Array, at: number, lo: number, hi: number): number {
  for (let d = 0; d <= hi - lo; d++) {
    for (const b of [Math.floor(at) - d, Math.ceil(at) + d]) if (b >= lo && b <= hi && open[b]) return b;
  }
  return -1;
}

/**
 * On a board whose strips run along the rows: an open boundary where a new column would
 * join two of the net's segments on different rows by a straight link (both reach it: their
 * leads or the gaps beside them), the nearest rows first; −1 when none.
 */
function laneBetweenSegments(s: PlaceState, open: Uint8Array, net: number): number {
  const t = s.tally;
  const segs: { row: number; lo: number; hi: number }[] = [];
  const seen = new Set<number>();
  for (const h of s.netHoles[net] ?? []) {
    const c = s.map.cond[h]!;
    if (seen.has(c)) continue;
    seen.add(c);
    const runs = t.runs[c]!;
    const row = Math.floor(h / s.W);
    for (let i = 0; i < runs.length; i++) if (runs[i] === net) segs.push({ row, lo: t.runLo[c]![i]!, hi: t.runHi[c]![i]! });
  }
  let best = -1;
  let bestRows = Infinity;
  for (let i = 0; i < segs.length; i++)
    for (let j = i + 1; j < segs.length; j++) {
      const a = segs[i]!;
      const b = segs[j]!;
      const rows = Math.abs(a.row - b.row);
      if (rows === 0 || rows >= bestRows) continue;
      const lo = Math.max(a.lo, b.lo);
      const hi = Math.min(a.hi, b.hi) + 1;
      if (lo > hi) continue;
      const at = nearestOpen(open, (lo + hi) / 2, lo, hi);
      if (at >= 0) {
        best = at;
        bestRows = rows;
      }
    }
  return best;
}

/** Middle column of a net's leads. */
function netMiddle(s: PlaceState, net: number): number {
  let x0 = Infinity;
  let x1 = -Infinity;
  for (const h of s.netHoles[net] ?? []) {
    x0 = Math.min(x0, h % s.W);
    x1 = Math.max(x1, h % s.W);
  }
  return (x0 + x1 + 1) / 2;
}

export function spreadColumns(s: PlaceState, board: Board, nets: number[]): { board: Board; spots: Spot[] } | undefined {
  const breadboard = board.pattern?.startsWith('breadboard') ?? false;
  if (board.conductors && !breadboard) return undefined;
  const box = s.bounds();
  if (!box) return undefined;
  const open = openBoundaries(s);
  const chosen = new Set<number>();
  for (const n of nets) {
    const lane = s.map.alongRows ? laneBetweenSegments(s, open, n) : nearestOpen(open, netMiddle(s, n), box.x0 + 1, box.x1);
    if (lane >= 0) chosen.add(lane);
  }
  if (!chosen.size || s.W + chosen.size > MAX_COLS) return undefined;
  const cuts = [...chosen].sort((a, b) => a - b);
  const spots = s.problem.parts.map((part, p) => {
    const spot = s.spotOf(p);
    const left = spot.x + part.poses[spot.pose]!.minX;
    let shift = 0;
    while (shift < cuts.length && cuts[shift]! <= left) shift++;
    return { ...spot, x: spot.x + shift };
  });
  const cols = s.W + cuts.length;
  const grown = breadboard ? breadboardBoard(cols, board.pitchMm) : makeBoard(board.kind, cols, board.rows, board.pitchMm);
  return { board: grown, spots };
}
