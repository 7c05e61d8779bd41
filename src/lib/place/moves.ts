/**
 * Move proposals for the detailed placement. `proposeMove(ctx, radius, move): boolean` fills
 * `move` (from `moveBuffer(parts)`, reused step after step) with the parts to move and their
 * new spots, or a gate swap, and says whether it found one; it never changes the state.
 *
 * Moves: shift a part within `radius`; change its pose (turn, or bend its leads to another
 * span) about its first lead; trade places with a part of the same footprint; trade places
 * with any part (centre for centre); hop next to another lead of one of its nets on that
 * lead's conductor (the move that removes cuts and links fastest); slide every part beyond a
 * line (a band of them) by one hole; swap two sections of a multi-section op-amp package.
 */
import type { PlaceState } from './state.ts';
import type { Rng } from './rng.ts';
import type { SectionTable } from './sections.ts';

/** A proposed move: parts[0..n) to spots (x, y, pose), or (gate) sections a and b of a table swapped. */
export interface MoveBuffer {
  gate: boolean;
  n: number;
  parts: Int32Array;
  x: Int32Array;
  y: Int32Array;
  pose: Int32Array;
  table: number;
  a: number;
  b: number;
}

export function moveBuffer(parts: number): MoveBuffer {
  const n = Math.max(2, parts);
  return { gate: false, n: 0, parts: new Int32Array(n), x: new Int32Array(n), y: new Int32Array(n), pose: new Int32Array(n), table: 0, a: 0, b: 0 };
}

export interface MoveContext {
  s: PlaceState;
  rng: Rng;
  movable: number[];
  /** Movable parts grouped by swap key, only groups of two or more. */
  groups: Map<string, number[]>;
  tables: SectionTable[];
  /** Parts to move more often (on nets the router or the link plan could not join). */
  focus: number[];
  /** The movable parts as a bit mask (see partMask). */
  movableMask: Int32Array;
}

/** A bit per part, set for the given parts (for MoveContext.movableMask). */
export function partMask(s: PlaceState, parts: number[]): Int32Array {
  const mask = new Int32Array(s.partWords);
  for (const p of parts) mask[p >> 5]! |= 1 << (p & 31);
  return mask;
}

function put(m: MoveBuffer, k: number, p: number, x: number, y: number, pose: number): void {
  m.parts[k] = p;
  m.x[k] = x;
  m.y[k] = y;
  m.pose[k] = pose;
}

function one(m: MoveBuffer, p: number, x: number, y: number, pose: number): true {
  m.gate = false;
  m.n = 1;
  put(m, 0, p, x, y, pose);
  return true;
}

function two(m: MoveBuffer, p: number, px: number, py: number, pp: number, q: number, qx: number, qy: number, qp: number): true {
  one(m, p, px, py, pp);
  m.n = 2;
  put(m, 1, q, qx, qy, qp);
  return true;
}

/** Centre of part p's current body, along x and along y. */
function centreX(s: PlaceState, p: number): number {
  const g = s.poseBase[p]! + s.pose[p]!;
  return s.x[p]! + (s.poseMinX[g]! + s.poseMaxX[g]!) / 2;
}

function centreY(s: PlaceState, p: number): number {
  const g = s.poseBase[p]! + s.pose[p]!;
  return s.y[p]! + (s.poseMinY[g]! + s.poseMaxY[g]!) / 2;
}

function hop(ctx: MoveContext, p: number, m: MoveBuffer): boolean {
  const { s, rng } = ctx;
  const part = s.problem.parts[p]!;
  const pin = rng.int(part.pinNames.length);
  const net = s.pinNet[p]![pin]!;
  const mates = s.netHoles[net]!;
  if (mates.length < 2) return false;
  const h = mates[rng.int(mates.length)]!;
  if (s.owner[h] === p) return false;
  const line = s.map.holes[s.map.cond[h]!]!;
  const i = ctx.s.tally.lineAt[h]!;
  const step = (1 + rng.int(4)) * (rng.next() < 0.5 ? -1 : 1);
  const target = line[i + step];
  if (target === undefined) return false;
  const pose = rng.next() < 0.7 ? s.pose[p]! : rng.int(part.poses.length);
  const q = s.pinOff[s.poseBase[p]! + pose]! + pin;
  const tx = target % s.W;
  const ty = (target - tx) / s.W;
  return one(m, p, tx - s.pinX[q]!, ty - s.pinY[q]!, pose);
}

/** How deep a band of parts one slide moves (holes across the band). */
const BAND = 6;

function slide(ctx: MoveContext, m: MoveBuffer): boolean {
  const { s, rng } = ctx;
  const vertical = rng.next() < 0.5;
  const line = vertical ? rng.int(s.H) : rng.int(s.W);
  const d = rng.next() < 0.5 ? -1 : 1;
  const dx = vertical ? 0 : d;
  const dy = vertical ? d : 0;
  // The movable parts whose body starts in the band, in index order.
  const n = s.partsWithin(vertical, line, line + BAND, ctx.movableMask, m.parts);
  for (let i = 0; i < n; i++) {
    const p = m.parts[i]!;
    m.x[i] = s.x[p]! + dx;
    m.y[i] = s.y[p]! + dy;
    m.pose[i] = s.pose[p]!;
  }
  m.gate = false;
  m.n = n;
  return n > 0;
}

/** Up to a few tries for a move that is legal as far as a single part's own check tells. */
export function proposeMove(ctx: MoveContext, radius: number, m: MoveBuffer): boolean {
  for (let i = 0; i < 6; i++) {
    if (!proposeOnce(ctx, radius, m)) continue;
    if (m.gate || m.n > 1 || ctx.s.fitsAt(m.parts[0]!, m.x[0]!, m.y[0]!, m.pose[0]!)) return true;
  }
  return false;
}

function proposeOnce(ctx: MoveContext, radius: number, m: MoveBuffer): boolean {
  const { s, rng, movable } = ctx;
  const p = ctx.focus.length && rng.next() < 0.5 ? ctx.focus[rng.int(ctx.focus.length)]! : movable[rng.int(movable.length)]!;
  const part = s.problem.parts[p]!;
  const r = rng.next();
  if (r < 0.35) {
    const dx = rng.int(2 * radius + 1) - radius;
    const dy = rng.int(2 * radius + 1) - radius;
    if (!dx && !dy) return false;
    return one(m, p, s.x[p]! + dx, s.y[p]! + dy, s.pose[p]!);
  }
  if (r < 0.5) {
    if (part.poses.length < 2) return false;
    const pose = rng.int(part.poses.length);
    const old = s.pinOff[s.poseBase[p]! + s.pose[p]!]!;
    const now = s.pinOff[s.poseBase[p]! + pose]!;
    return one(m, p, s.x[p]! + s.pinX[old]! - s.pinX[now]!, s.y[p]! + s.pinY[old]! - s.pinY[now]!, pose);
  }
  if (r < 0.75) return hop(ctx, p, m);
  if (r < 0.85) {
    const group = ctx.groups.get(part.swapKey);
    if (group) {
      const q = group[rng.int(group.length)]!;
      if (q === p) return false;
      return two(m, p, s.x[q]!, s.y[q]!, s.pose[q]!, q, s.x[p]!, s.y[p]!, s.pose[p]!);
    }
    const q = movable[rng.int(movable.length)]!;
    if (q === p) return false;
    const ax = centreX(s, p);
    const ay = centreY(s, p);
    const bx = centreX(s, q);
    const by = centreY(s, q);
    const gp = s.poseBase[p]! + s.pose[p]!;
    const gq = s.poseBase[q]! + s.pose[q]!;
    return two(
      m,
      p,
      Math.round(bx - (s.poseMinX[gp]! + s.poseMaxX[gp]!) / 2),
      Math.round(by - (s.poseMinY[gp]! + s.poseMaxY[gp]!) / 2),
      s.pose[p]!,
      q,
      Math.round(ax - (s.poseMinX[gq]! + s.poseMaxX[gq]!) / 2),
      Math.round(ay - (s.poseMinY[gq]! + s.poseMaxY[gq]!) / 2),
      s.pose[q]!,
    );
  }
  if (r < 0.92 && ctx.tables.length) {
    const table = rng.int(ctx.tables.length);
    const n = ctx.tables[table]!.slots.length;
    const a = rng.int(n);
    const b = rng.int(n);
    if (a === b) return false;
    m.gate = true;
    m.table = table;
    m.a = a;
    m.b = b;
    return true;
  }
  return slide(ctx, m);
}
