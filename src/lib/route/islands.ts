/**
 * Relay islands (claims.ts): which island a claim in a gap joins, and how far one may reach.
 *
 * An island is a run of claims of one net inside a gap that is not its side, with a cut's
 * room (cutRoom) between it and whatever lies next to it: the sides' claims, other islands.
 * It is a segment (segments.ts: the relay segment of the hole where its first claim fell, or
 * a free one), extending from its lowest claim (`islandLo`) to its highest (`islandHi`);
 * `claimSeg` names the island of each claimed hole. A claim joins the net's island that
 * covers it or lies next to it with nothing between, else starts a new one; the island of
 * each claim is kept, so replaying a subset of claims (rip-up) rebuilds the same islands.
 */
import type { RouteState } from './state.ts';

/** Holes a cut needs between two claims: a free hole to drill, else a boundary to score. */
export function cutRoom(st: RouteState): number {
  return st.cfg.drilled ? 2 : 1;
}

/** The hole at position `pos` of gap g's conductor. */
function holeAt(st: RouteState, g: number, pos: number): number {
  return st.copper.condHoles[st.copper.condStart[st.cut.gapCond[g]!]! + pos]!;
}

/**
 * What lies next to `pos` inside gap g: the nearest island claim below and above (its
 * island and position), else the side's last claim (island −1). `inside` is the island whose
 * extent covers pos, else −1. Shared scratch: read the result before the next call.
 */
const near = { inside: -1, lowSeg: -1, lowPos: 0, highSeg: -1, highPos: 0 };
function neighbours(st: RouteState, g: number, pos: number): typeof near {
  near.inside = -1;
  near.lowSeg = -1;
  near.lowPos = st.claimLo[g]!;
  near.highSeg = -1;
  near.highPos = st.claimHi[g]!;
  if (st.relayLo[g]! > st.relayHi[g]!) return near; // no island in the gap
  const here = st.claimSeg[holeAt(st, g, pos)]!;
  if (here >= 0) {
    near.inside = here;
    return near;
  }
  below(st, g, pos);
  if (near.lowSeg >= 0 && st.islandHi[near.lowSeg]! >= pos) {
    near.inside = near.lowSeg;
    return near;
  }
  above(st, g, pos);
  return near;
}

/** The nearest island claim strictly below `pos` into `near.lowSeg/lowPos` (none: left as is). */
function below(st: RouteState, g: number, pos: number): void {
  const first = Math.max(st.claimLo[g]! + 1, st.cut.gapI[g]! + 1);
  for (let q = pos - 1; q >= first; q--) {
    const s = st.claimSeg[holeAt(st, g, q)]!;
    if (s < 0) continue;
    near.lowSeg = s;
    near.lowPos = q;
    return;
  }
}

/** The nearest island claim strictly above `pos` into `near.highSeg/highPos` (none: left as is). */
function above(st: RouteState, g: number, pos: number): void {
  const last = Math.min(st.claimHi[g]! - 1, st.cut.gapJ[g]! - 1);
  for (let q = pos + 1; q <= last; q++) {
    const s = st.claimSeg[holeAt(st, g, q)]!;
    if (s < 0) continue;
    near.highSeg = s;
    near.highPos = q;
    return;
  }
}

/**
 * The relay island a claim of `net` at position `pos` of gap g would belong to, or −1 when
 * it may not claim there: an island of the net whose extent covers pos; else a neighbouring
 * island of the net it would grow (room left towards the other neighbour); else a new island
 * (the relay segment of that hole, room left towards both) unless `fresh` is false.
 * `forced` ≥ 0 names the island the claim must join (replay). Only for a net that is neither
 * side of the gap.
 */
export function islandFor(st: RouteState, g: number, pos: number, net: number, forced = -1, fresh = true): number {
  const n = cutRoom(st);
  if (forced < 0 && st.relayLo[g]! > st.relayHi[g]!) {
    // No island in the gap yet: only a new one, its hole's own segment, room from both sides.
    const room = pos - st.claimLo[g]! >= n && st.claimHi[g]! - pos >= n;
    return fresh && room ? st.cut.holeRelay[holeAt(st, g, pos)]! : -1;
  }
  const nb = neighbours(st, g, pos);
  if (nb.inside >= 0) return st.owner[nb.inside] === net && (forced < 0 || forced === nb.inside) ? nb.inside : -1;
  const lowRoom = pos - nb.lowPos >= n;
  const highRoom = nb.highPos - pos >= n;
  if (forced >= 0) {
    const o = st.owner[forced]!;
    return (o === net || o === -1) && (nb.lowSeg === forced || lowRoom) && (nb.highSeg === forced || highRoom) ? forced : -1;
  }
  if (nb.lowSeg >= 0 && st.owner[nb.lowSeg] === net && highRoom) return nb.lowSeg;
  if (nb.highSeg >= 0 && st.owner[nb.highSeg] === net && lowRoom) return nb.highSeg;
  return fresh && lowRoom && highRoom ? freeIsland(st, g, pos) : -1;
}

/** Whether relay segment s is no island (nobody owns it, no claim). */
function unused(st: RouteState, s: number): boolean {
  return st.owner[s] === -1 && st.islandLo[s]! > st.islandHi[s]!;
}

/**
 * A relay segment of gap g no island uses, for a new island at `pos`: that hole's own, else
 * (an island started there lost that claim in a rip-up) the first free one of the gap. There
 * is always one: every island holds a claim, and the hole at pos holds none.
 */
function freeIsland(st: RouteState, g: number, pos: number): number {
  const own = st.cut.holeRelay[holeAt(st, g, pos)]!;
  if (unused(st, own)) return own;
  for (let p = st.cut.gapI[g]! + 1; p < st.cut.gapJ[g]!; p++) {
    const s = st.cut.holeRelay[holeAt(st, g, p)]!;
    if (unused(st, s)) return s;
  }
  throw new Error(`route: gap ${g} has no free relay segment`);
}

/**
 * Positions of gap g a relay island `s` may reach: its extent and the free holes beside it
 * up to a cut's room from its neighbours.
 */
export function islandReach(st: RouteState, s: number): [number, number] {
  const g = st.cut.segGap[s]!;
  near.lowPos = st.claimLo[g]!;
  near.highPos = st.claimHi[g]!;
  below(st, g, st.islandLo[s]!);
  above(st, g, st.islandHi[s]!);
  return [Math.max(near.lowPos + cutRoom(st), st.cut.gapI[g]! + 1), Math.min(near.highPos - cutRoom(st), st.cut.gapJ[g]! - 1)];
}

/**
 * Positions of gap g a new relay island at `pos` may reach: the free stretch around it with
 * a cut's room from its neighbours on both sides. Empty ([1, 0]) when pos has no room.
 */
export function stretchReach(st: RouteState, g: number, pos: number): [number, number] {
  if (neighbours(st, g, pos).inside >= 0) return [1, 0];
  const lo = Math.max(near.lowPos + cutRoom(st), st.cut.gapI[g]! + 1);
  const hi = Math.min(near.highPos - cutRoom(st), st.cut.gapJ[g]! - 1);
  return lo <= pos && pos <= hi ? [lo, hi] : [1, 0];
}

/** The relay islands of gap g in position order (each once). */
export function islandsOf(st: RouteState, g: number, out: number[]): number[] {
  out.length = 0;
  if (st.relayLo[g]! > st.relayHi[g]!) return out;
  for (let p = st.relayLo[g]!; p <= st.relayHi[g]!; p++) {
    const s = st.claimSeg[holeAt(st, g, p)]!;
    if (s >= 0 && out[out.length - 1] !== s) out.push(s);
  }
  return out;
}

