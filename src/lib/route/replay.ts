/**
 * `replay(base, cur, drop)` — rip-up: rebuild a state from `base` with every link and wire
 * `cur` placed after it, except the links of the `drop` nets. Wires go first, then links,
 * each checked again as it is placed (a subset of a consistent set always fits; a failure is
 * a bug and throws).
 */
import { claimHole } from './claims.ts';
import { placeLink } from './landing.ts';
import { claimSegment, cloneState, copperSegOf, union, type RouteState } from './state.ts';

export function replay(base: RouteState, cur: RouteState, drop: ReadonlySet<number>): RouteState {
  const next = cloneState(base);
  const w = cur.wires;
  for (let i = base.wires.length; i < w.length; i += 3) {
    const a = w[i]!;
    const b = w[i + 1]!;
    const net = w[i + 2]!;
    next.wires.push(a, b, net);
    for (const h of [a, b]) {
      const s = copperSegOf(next, h, net);
      if (s < 0) throw new Error(`route: replayed wire ${a}→${b} lost its copper`);
      claimHole(next, h, net);
      claimSegment(next, s, net);
      union(next, s, copperSegOf(next, a, net));
    }
  }
  const l = cur.links;
  for (let i = base.links.length; i < l.length; i += 3) {
    if (drop.has(l[i + 2]!)) continue;
    if (!placeLink(next, l[i]!, l[i + 1]!, l[i + 2]!, true)) throw new Error(`route: replayed link ${l[i]}→${l[i + 1]} no longer fits`);
  }
  return next;
}
