/**
 * `spreadLanes(state, board, failed): { board, spots } | undefined` — make link room in a
 * finished placement without placing it again: insert free columns (and, on strip boards,
 * free rows) of holes between parts and shift everything beyond each by one hole.
 * `failedNets(state, problems)` reads the nets (and their islands) from the router's
 * problems: `route.unroutable`, or `route.insulated-link` warnings for nets to give room.
 *
 * A column or row goes in only where no part's body crosses the boundary, so every lead
 * keeps its strip and its order along it: on a strip board the cuts and the segments to join
 * stay exactly what they were; each new column is a clear lane for links (on a pad board, a
 * clear lane for wires; on a breadboard pattern, a fresh bus column) and each new row a free
 * strip, a relay any net may borrow. For each failed net one column goes where two of its
 * segments on different rows (of different islands, when the router named them) both reach
 * (strip boards), or in the middle of its leads (other boards). On a strip board a net with
 * no such column gets a column beside each of its islands and a free row among (or beside)
 * the rows of its leads; islands of a single lead get a column beside them anyway. When no
 * more than FEW nets failed (strip and pad boards), every lead of their islands gets a free
 * column on each side at the nearest boundary no body crosses before the next lead along its
 * row — past the body when one covers the holes beside the lead (a lead hemmed in by other
 * nets' leads and bodies then has a free hole on its own copper, or on a pad board a free
 * neighbour for a copper-side wire). Undefined when nothing helps or may be added (boards
 * with their own copper other than the breadboard pattern keep their size).
 */
import type { Board } from '../model/layout.ts';
import type { Problem } from '../model/problem.ts';
import { breadboardBoard } from '../board/breadboard.ts';
import { makeBoard } from '../board/grid.ts';
import type { PlaceState, Spot } from './state.ts';

/** Widest and tallest a board may grow to (the same bounds as the working board's). */
const MAX_COLS = 400;
const MAX_ROWS = 400;
/** Islands of up to this many leads get a column beside them whatever else is added. */
const SMALL_ISLAND = 1;
/** When no more nets than this failed, every lead of their islands gets a free column on each side it can (besideLead). */
const FEW = 3;

/** Boundaries b (between columns, or rows, b − 1 and b) that no body crosses. */
function openBoundaries(s: PlaceState, rows: boolean): Uint8Array {
  const open = new Uint8Array((rows ? s.H : s.W) + 1).fill(1);
  s.problem.parts.forEach((part, p) => {
    const k = s.pose[p]!;
    if (k < 0) return;
    const pose = part.poses[k]!;
    const [at, lo, hi] = rows ? [s.y[p]!, pose.minY, pose.maxY] : [s.x[p]!, pose.minX, pose.maxX];
    for (let b = at + lo + 1; b <= at + hi; b++) open[b] = 0;
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
 * leads or the gaps beside them), the nearest rows first; −1 when none. With `islands`
 * (lead holes per island, as the router left them), only segments of two different islands
 * count: a lane between two pieces already joined helps nobody.
 */
function laneBetweenSegments(s: PlaceState, open: Uint8Array, net: number, islands?: number[][]): number {
  const t = s.tally;
  const segs: { row: number; lo: number; hi: number; island: number }[] = [];
  const seen = new Set<number>();
  const groups = islands ?? [s.netHoles[net] ?? []];
  groups.forEach((holes, k) => {
    for (const h of holes) {
      const c = s.map.cond[h]!;
      const x = h % s.W;
      const runs = t.runs[c]!;
      const row = Math.floor(h / s.W);
      for (let i = 0; i < runs.length; i++) {
        if (runs[i] !== net || seen.has(c * s.W + i)) continue;
        const lo = t.runLo[c]![i]!;
        const hi = t.runHi[c]![i]!;
        if (islands && (x < lo || x > hi)) continue;
        seen.add(c * s.W + i);
        segs.push({ row, lo, hi, island: islands ? k : i + c * s.W });
      }
    }
  });
  let best = -1;
  let bestRows = Infinity;
  for (let i = 0; i < segs.length; i++)
    for (let j = i + 1; j < segs.length; j++) {
      const a = segs[i]!;
      const b = segs[j]!;
      const rows = Math.abs(a.row - b.row);
      if (a.island === b.island || rows === 0 || rows >= bestRows) continue;
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

/**
 * The open boundary nearest to the lead in column x of the row starting at hole `rowStart`,
 * on the side `step` (−1 left, +1 right), with no lead between (`leads`: leads per hole, the
 * copper tally's count): where a body covers the holes next to the lead, past the body (a
 * new column there still gives the lead's copper a free hole). −1 when another lead or the
 * board's edge comes first.
 */
function besideLead(open: Uint8Array, leads: Int32Array, rowStart: number, x: number, step: number, W: number): number {
  for (let b = step < 0 ? x : x + 1; b >= 0 && b <= W; b += step) {
    if (open[b]) return b;
    // The hole the next boundary would put between the lead and the new column.
    const next = step < 0 ? b - 1 : b;
    if (next < 0 || next >= W || leads[rowStart + next]! > 0) return -1;
  }
  return -1;
}

/** How many of the sorted boundaries lie at or before `at`. */
function shiftAt(boundaries: number[], at: number): number {
  let k = 0;
  while (k < boundaries.length && boundaries[k]! <= at) k++;
  return k;
}

/** A net the router could not join, with the lead holes of each of its islands when known. */
export interface FailedNet {
  net: number;
  islands?: number[][];
}

/**
 * The nets named by the router's problems (`route.unroutable`, or `route.insulated-link`
 * warnings), with the lead holes of each island listed (`data.islands`, pins as "ref.pin"),
 * in the placement `s`.
 */
export function failedNets(s: PlaceState, problems: Problem[]): FailedNet[] {
  const parts = new Map(s.problem.parts.map((part, p) => [part.ref, p]));
  const out = new Map<number, FailedNet>();
  for (const pr of problems) {
    for (const name of pr.nets ?? []) {
      const net = s.problem.nets.findIndex((x) => x.name === name);
      if (net < 0 || out.has(net)) continue;
      const listed = (pr.data as { islands?: unknown } | undefined)?.islands;
      const islands = Array.isArray(listed)
        ? listed.map((group: unknown) =>
            (Array.isArray(group) ? group : []).flatMap((pin: unknown) => {
              const text = String(pin);
              const dot = text.lastIndexOf('.');
              const p = parts.get(text.slice(0, dot));
              if (p === undefined) return [];
              const i = s.problem.parts[p]!.pinNames.indexOf(text.slice(dot + 1));
              const spot = s.spotOf(p);
              const at = s.problem.parts[p]!.poses[spot.pose]!.pins[i];
              return at ? [spot.x + at[0] + (spot.y + at[1]) * s.W] : [];
            }),
          )
        : undefined;
      out.set(net, islands && islands.filter((g) => g.length).length > 1 ? { net, islands } : { net });
    }
  }
  return [...out.values()];
}

export function spreadLanes(s: PlaceState, board: Board, failed: FailedNet[]): { board: Board; spots: Spot[] } | undefined {
  const breadboard = board.pattern?.startsWith('breadboard') ?? false;
  if (board.conductors && !breadboard) return undefined;
  const box = s.bounds();
  if (!box) return undefined;
  const openCols = openBoundaries(s, false);
  const openRows = openBoundaries(s, true);
  const colSet = new Set<number>();
  const rowSet = new Set<number>();
  // Few nets left: room on both sides of every lead of their islands.
  if (failed.length <= FEW && (s.map.alongRows || s.map.padLike)) {
    for (const { islands } of failed)
      for (const h of (islands ?? []).flat()) {
        const x = h % s.W;
        for (const step of [-1, 1]) {
          const b = besideLead(openCols, s.tally.leadCount, h - x, x, step, s.W);
          if (b >= 0) colSet.add(b);
        }
      }
  }
  for (const { net: n, islands } of failed) {
    const lane = s.map.alongRows ? laneBetweenSegments(s, openCols, n, islands) : nearestOpen(openCols, (s.netMinX[n]! + s.netMaxX[n]! + 1) / 2, box.x0 + 1, box.x1);
    if (lane >= 0) colSet.add(lane);
    // No lane joins two islands: a column beside each island instead, room to land links and
    // to cut relay islands out of the longer gaps. Small islands get one anyway: hemmed in by
    // other nets' leads, they may have no free hole for any link to land in.
    if (islands && s.map.alongRows)
      for (const holes of islands) {
        if (lane >= 0 && holes.length > SMALL_ISLAND) continue;
        const xs = holes.map((h) => h % s.W);
        const at = nearestOpen(openCols, xs.reduce((a, b) => a + b, 0) / xs.length, Math.max(0, Math.min(...xs) - 2), Math.min(s.W, Math.max(...xs) + 3));
        if (at >= 0) colSet.add(at);
      }
    if (lane < 0 && s.map.alongRows && !breadboard) {
      // The net's lead box as of the last settle.
      const [lo, hi] = [s.netMinY[n]!, s.netMaxY[n]!];
      const row = nearestOpen(openRows, (lo + hi + 1) / 2, Math.max(0, lo), Math.min(s.H, hi + 1));
      if (row >= 0) rowSet.add(row);
    }
  }
  if ((!colSet.size && !rowSet.size) || s.W + colSet.size > MAX_COLS || s.H + rowSet.size > MAX_ROWS) return undefined;
  const cols = [...colSet].sort((a, b) => a - b);
  const rows = [...rowSet].sort((a, b) => a - b);
  const spots = s.problem.parts.map((part, p) => {
    const spot = s.spotOf(p);
    const pose = part.poses[spot.pose]!;
    return { ...spot, x: spot.x + shiftAt(cols, spot.x + pose.minX), y: spot.y + shiftAt(rows, spot.y + pose.minY) };
  });
  const W = s.W + cols.length;
  const H = s.H + rows.length;
  const grown = breadboard ? breadboardBoard(W, board.pitchMm) : makeBoard(board.kind, W, H, board.pitchMm);
  return { board: grown, spots };
}
