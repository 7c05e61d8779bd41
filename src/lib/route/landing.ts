/**
 * Links on the component side: where one may pass and land, and placing one.
 * - A link passes over holes free of leads and other links, and over part bodies only when
 *   the options allow; it ends in such a hole outside every body (the part would sit on it),
 *   on copper its net owns, nobody owns (with `unowned`), or a gap hole its side may claim.
 * - Kept holes (reserve.ts) are advice, not law: the spanning tree keeps off them, the maze
 *   search pays to use them.
 */
import { claimHole, claimOk, gapSide } from './claims.ts';
import { claimSegment, union, type RouteState } from './state.ts';

/** Whether a link may pass over (or end in) this hole at all. */
export function linkClear(st: RouteState, h: number): boolean {
  return st.leadNet[h]! < 0 && st.linkUse[h] === 0 && (st.cfg.overBodies || st.body[h] === 0);
}

/**
 * The segment a link end of `net` in hole `h` would join, or −1 when it may not land there.
 * `unowned` also allows free copper nobody owns yet (a free strip, an unused pad).
 */
export function landingSeg(st: RouteState, h: number, net: number, unowned: boolean): number {
  // A link end under a body is never right: the part would sit on it.
  if (!linkClear(st, h) || st.body[h] !== 0) return -1;
  const s = st.cut.segOf[h]!;
  if (s >= 0) {
    const o = st.owner[s]!;
    return o === net || (o === -1 && unowned) ? s : -1;
  }
  const g = st.cut.gapOf[h]!;
  const side = gapSide(st, g, net);
  if (side < 0 || !claimOk(st, g, st.copper.posOf[h]!, side)) return -1;
  return side === 0 ? st.cut.gapLow[g]! : st.cut.gapHigh[g]!;
}

/** Step between neighbouring holes from a towards b, or 0 when they share no row or column. */
export function lineStep(st: RouteState, a: number, b: number): number {
  const cols = st.copper.cols;
  if (Math.floor(a / cols) === Math.floor(b / cols)) return b > a ? 1 : -1;
  if (a % cols === b % cols) return b > a ? cols : -cols;
  return 0;
}

/**
 * Place a straight link of `net` from a to b if every rule allows it right now; joins the
 * two segments and claims unowned copper when `unowned`. Returns whether it was placed.
 */
export function placeLink(st: RouteState, a: number, b: number, net: number, unowned: boolean): boolean {
  if (a === b) return false;
  const step = lineStep(st, a, b);
  if (step === 0) return false;
  for (let h = a + step; h !== b; h += step) if (!linkClear(st, h)) return false;
  // Both ends checked before either claims: two ends in one gap are on one side (one net),
  // and claims on one side that fit one by one fit together.
  const sa = landingSeg(st, a, net, unowned);
  const sb = landingSeg(st, b, net, unowned);
  if (sa < 0 || sb < 0) return false;
  claimHole(st, a, net);
  claimHole(st, b, net);
  for (let h = a; ; h += step) {
    st.linkUse[h] = net + 1;
    if (h === b) break;
  }
  st.leadNet[a] = net;
  st.leadNet[b] = net;
  claimSegment(st, sa, net);
  claimSegment(st, sb, net);
  union(st, sa, sb);
  st.links.push(a, b, net);
  return true;
}
