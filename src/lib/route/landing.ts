/**
 * Links on the component side: where one may pass and land, and placing one.
 * - A link passes over holes free of leads and other links, and over part bodies only when
 *   the options allow; it ends in such a hole outside every body (the part would sit on it),
 *   on copper its net owns, nobody owns (with `unowned`), a gap hole its side may claim, or
 *   (with `relays`) a gap hole inside a relay island it has or may start (claims.ts).
 * - Kept holes (reserve.ts) are advice, not law: the spanning tree keeps off them, the maze
 *   search pays to use them.
 */
import { claimHole, gapSide } from './claims.ts';
import { claimSegment, copperSegOf, union, type RouteState } from './state.ts';

/** Whether a link may pass over (or end in) this hole at all. */
export function linkClear(st: RouteState, h: number): boolean {
  return st.leadNet[h]! < 0 && st.linkUse[h] === 0 && (st.cfg.overBodies || st.body[h] === 0);
}

/**
 * The segment a link end of `net` in hole `h` would join, or −1 when it may not land there.
 * `unowned` also allows free copper nobody owns yet (a free strip, an unused pad); `relays`
 * (default: as `unowned`) a new relay island; `forced` ≥ 0 names the island it must join.
 */
export function landingSeg(st: RouteState, h: number, net: number, unowned: boolean, relays = unowned, forced = -1): number {
  // Its side and its islands are the net's copper; a new island needs `relays`.
  return landingOn(st, h, net, unowned, copperSegOf(st, h, net, forced, relays));
}

/** landingSeg for a hole whose segment for `net` is known: `seg` (see copperSegOf). */
export function landingOn(st: RouteState, h: number, net: number, unowned: boolean, seg: number): number {
  // A link end under a body is never right: the part would sit on it.
  if (seg < 0 || !linkClear(st, h) || st.body[h] !== 0) return -1;
  const o = st.owner[seg]!;
  return o === net || (o === -1 && unowned) ? seg : -1;
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
 * two segments and claims unowned copper (and relay islands) when `unowned`. `islands`
 * (replay) names per hole the relay island a claim there must join. Returns whether it was
 * placed.
 */
export function placeLink(st: RouteState, a: number, b: number, net: number, unowned: boolean, islands?: Int32Array): boolean {
  if (a === b) return false;
  const step = lineStep(st, a, b);
  if (step === 0) return false;
  for (let h = a + step; h !== b; h += step) if (!linkClear(st, h)) return false;
  // Both ends checked before either claims: two ends in one gap are on one side (one net),
  // and claims on one side that fit one by one fit together. A link between two holes of one
  // gap that are no side's would join islands the copper already joins, or part them: never.
  const g = st.cut.gapOf[a]!;
  if (g >= 0 && g === st.cut.gapOf[b] && gapSide(st, g, net) < 0) return false;
  return landLink(st, a, b, net, unowned, islands, step);
}

/**
 * Land both ends of a link of `net` if both may land now, claim and join them; a straight
 * link (`step` ≠ 0, see lineStep) lies over every hole between, an insulated one (`step` 0)
 * only takes its two ends. Whether it was placed.
 */
export function landLink(st: RouteState, a: number, b: number, net: number, unowned: boolean, islands: Int32Array | undefined, step: number): boolean {
  const fa = islands ? islands[a]! : -1;
  const fb = islands ? islands[b]! : -1;
  const sa = landingSeg(st, a, net, unowned, unowned, fa);
  const sb = landingSeg(st, b, net, unowned, unowned, fb);
  if (sa < 0 || sb < 0) return false;
  claimHole(st, a, net, fa);
  claimHole(st, b, net, fb);
  if (step === 0) {
    st.linkUse[a] = net + 1;
    st.linkUse[b] = net + 1;
  } else
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
