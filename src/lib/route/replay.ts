/**
 * `replay(base, cur, drop)` — rip-up: rebuild a state from `base` with every link and wire
 * `cur` placed after it, except the links of the `drop` nets. Wires go first, then links,
 * each checked again as it is placed, with its gap claims; a claim in a relay island joins
 * the island it joined in `cur`, so islands come back as they were, only smaller where
 * claims were dropped (a subset of a consistent set always fits; a failure is a bug and
 * throws).
 *
 * `replayWire(st, a, b, net, islands?)` — put back one copper-side wire step with its claims
 * (`islands`: per hole, the relay island a claim there must join).
 */
import { claimHole } from './claims.ts';
import { placeLink } from './landing.ts';
import { claimSegment, cloneState, copperSegOf, union, type RouteState } from './state.ts';

export function replayWire(st: RouteState, a: number, b: number, net: number, islands?: Int32Array): void {
  st.wires.push(a, b, net);
  let first = -1;
  for (const h of [a, b]) {
    const forced = islands ? islands[h]! : -1;
    const s = copperSegOf(st, h, net, forced);
    if (s < 0) throw new Error(`route: replayed wire ${a}→${b} lost its copper`);
    claimHole(st, h, net, forced);
    claimSegment(st, s, net);
    if (first >= 0) union(st, first, s);
    first = s;
  }
}

export function replay(base: RouteState, cur: RouteState, drop: ReadonlySet<number>): RouteState {
  const next = cloneState(base);
  const w = cur.wires;
  for (let i = base.wires.length; i < w.length; i += 3) replayWire(next, w[i]!, w[i + 1]!, w[i + 2]!, cur.claimSeg);
  const l = cur.links;
  for (let i = base.links.length; i < l.length; i += 3) {
    if (drop.has(l[i + 2]!)) continue;
    if (!placeLink(next, l[i]!, l[i + 1]!, l[i + 2]!, true, cur.claimSeg)) throw new Error(`route: replayed link ${l[i]}→${l[i + 1]} no longer fits`);
  }
  return next;
}
