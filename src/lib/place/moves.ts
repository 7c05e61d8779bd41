/**
 * Move proposals for the detailed placement. `proposeMove(ctx, radius)` returns the parts to
 * move and their new spots, or a gate swap; it never changes the state itself.
 *
 * Moves: shift a part within `radius`; change its pose (turn, or bend its leads to another
 * span) about its first lead; trade places with a part of the same footprint; trade places
 * with any part (centre for centre); hop next to another lead of one of its nets on that
 * lead's conductor (the move that removes cuts and links fastest); slide every part beyond a
 * line (a band of them) by one hole; swap two sections of a multi-section op-amp package.
 */
import type { PlaceState, Spot } from './state.ts';
import type { Rng } from './rng.ts';
import type { SectionTable } from './sections.ts';

export type Move = { kind: 'parts'; parts: number[]; spots: Spot[] } | { kind: 'gate'; table: number; a: number; b: number };

export interface MoveContext {
  s: PlaceState;
  rng: Rng;
  movable: number[];
  /** Movable parts grouped by swap key, only groups of two or more. */
  groups: Map<string, number[]>;
  tables: SectionTable[];
  /** Parts to move more often (on nets the router or the link plan could not join). */
  focus: number[];
}

function centre(s: PlaceState, p: number, spot: Spot): { cx: number; cy: number } {
  const pose = s.problem.parts[p]!.poses[spot.pose]!;
  return { cx: spot.x + (pose.minX + pose.maxX) / 2, cy: spot.y + (pose.minY + pose.maxY) / 2 };
}

function at(s: PlaceState, p: number, pose: number, cx: number, cy: number): Spot {
  const o = s.problem.parts[p]!.poses[pose]!;
  return { x: Math.round(cx - (o.minX + o.maxX) / 2), y: Math.round(cy - (o.minY + o.maxY) / 2), pose };
}

function hop(ctx: MoveContext, p: number): Move | undefined {
  const { s, rng } = ctx;
  const part = s.problem.parts[p]!;
  const pin = rng.int(part.pinNames.length);
  const net = s.pinNet[p]![pin]!;
  const mates = s.netHoles[net]!;
  if (mates.length < 2) return undefined;
  const h = mates[rng.int(mates.length)]!;
  if (s.owner[h] === p) return undefined;
  const c = s.map.cond[h]!;
  const line = s.map.holes[c]!;
  const i = line.indexOf(h);
  const step = (1 + rng.int(4)) * (rng.next() < 0.5 ? -1 : 1);
  const target = line[i + step];
  if (target === undefined) return undefined;
  const pose = rng.next() < 0.7 ? s.pose[p]! : rng.int(part.poses.length);
  const o = part.poses[pose]!.pins[pin]!;
  const tx = target % s.W;
  const ty = (target - tx) / s.W;
  return { kind: 'parts', parts: [p], spots: [{ x: tx - o[0], y: ty - o[1], pose }] };
}

/** How deep a band of parts one slide moves (holes across the band). */
const BAND = 6;

function slide(ctx: MoveContext): Move | undefined {
  const { s, rng } = ctx;
  const vertical = rng.next() < 0.5;
  const line = vertical ? rng.int(s.H) : rng.int(s.W);
  const d = rng.next() < 0.5 ? -1 : 1;
  const parts: number[] = [];
  const spots: Spot[] = [];
  for (const p of ctx.movable) {
    const pose = s.problem.parts[p]!.poses[s.pose[p]!]!;
    const lo = vertical ? s.y[p]! + pose.minY : s.x[p]! + pose.minX;
    if (lo < line || lo >= line + BAND) continue;
    parts.push(p);
    spots.push({ x: s.x[p]! + (vertical ? 0 : d), y: s.y[p]! + (vertical ? d : 0), pose: s.pose[p]! });
  }
  return parts.length ? { kind: 'parts', parts, spots } : undefined;
}

/** Up to a few tries for a move that is legal as far as a single part's own check tells. */
export function proposeMove(ctx: MoveContext, radius: number): Move | undefined {
  for (let i = 0; i < 6; i++) {
    const m = proposeOnce(ctx, radius);
    if (!m) continue;
    if (m.kind === 'gate' || m.parts.length > 1 || ctx.s.fits(m.parts[0]!, m.spots[0]!)) return m;
  }
  return undefined;
}

function proposeOnce(ctx: MoveContext, radius: number): Move | undefined {
  const { s, rng, movable } = ctx;
  const p = ctx.focus.length && rng.next() < 0.5 ? ctx.focus[rng.int(ctx.focus.length)]! : movable[rng.int(movable.length)]!;
  const part = s.problem.parts[p]!;
  const r = rng.next();
  if (r < 0.35) {
    const dx = rng.int(2 * radius + 1) - radius;
    const dy = rng.int(2 * radius + 1) - radius;
    if (!dx && !dy) return undefined;
    return { kind: 'parts', parts: [p], spots: [{ x: s.x[p]! + dx, y: s.y[p]! + dy, pose: s.pose[p]! }] };
  }
  if (r < 0.5) {
    if (part.poses.length < 2) return undefined;
    const pose = rng.int(part.poses.length);
    const old = part.poses[s.pose[p]!]!.pins[0]!;
    const now = part.poses[pose]!.pins[0]!;
    return { kind: 'parts', parts: [p], spots: [{ x: s.x[p]! + old[0] - now[0], y: s.y[p]! + old[1] - now[1], pose }] };
  }
  if (r < 0.75) return hop(ctx, p);
  if (r < 0.85) {
    const group = ctx.groups.get(part.swapKey);
    if (group) {
      const q = group[rng.int(group.length)]!;
      if (q === p) return undefined;
      return { kind: 'parts', parts: [p, q], spots: [s.spotOf(q), s.spotOf(p)] };
    }
    const q = movable[rng.int(movable.length)]!;
    if (q === p) return undefined;
    const a = centre(s, p, s.spotOf(p));
    const b = centre(s, q, s.spotOf(q));
    return { kind: 'parts', parts: [p, q], spots: [at(s, p, s.pose[p]!, b.cx, b.cy), at(s, q, s.pose[q]!, a.cx, a.cy)] };
  }
  if (r < 0.92 && ctx.tables.length) {
    const table = rng.int(ctx.tables.length);
    const n = ctx.tables[table]!.slots.length;
    const a = rng.int(n);
    const b = rng.int(n);
    return a === b ? undefined : { kind: 'gate', table, a, b };
  }
  return slide(ctx);
}
