/**
 * Gap claims. A gap is the run of free holes between two leads of different nets on one
 * conductor, where one cut will go, or a tail of a strip beyond its last lead (one side
 * only, no cut). A link end or a copper-side wire in a gap hole claims it for the side whose
 * net it carries; the cut must then fit between the low side's last claim and the high
 * side's first: a free hole between them for a drilled cut, any boundary for a scored one.
 * A missing side of a tail is a claim far beyond the strip's end (FAR): nothing ever needs a
 * cut towards it.
 *
 * Relay island: a net that is neither side of a gap may claim holes inside it as copper of
 * its own, parted by a cut from whatever lies on either side (the sides' claims, other
 * islands); see islands.ts for which island a claim joins. Islands never interleave, so the
 * sides see them all as one block from `relayLo` to `relayHi`: a side's claim must leave a
 * cut's room towards that block as it does towards the other side.
 */
import { cutRoom, islandFor } from './islands.ts';
import type { RouteState } from './state.ts';

export const LOW = 0;
export const HIGH = 1;

/** Stands for the missing side of a tail, and bounds an empty extent. */
export const FAR = 1 << 29;

/**
 * Room for a claim at `pos` on side `side` (LOW or HIGH) of gap `g`; `lo` and `hi` stand in
 * for the sides' claims (to test a path before building it).
 */
export function claimOk(st: RouteState, g: number, pos: number, side: number, lo = st.claimLo[g]!, hi = st.claimHi[g]!): boolean {
  const n = cutRoom(st);
  return side === LOW ? pos <= lo || Math.min(hi, st.relayLo[g]!) - pos >= n : pos >= hi || pos - Math.max(lo, st.relayHi[g]!) >= n;
}

/** Which side of gap `g` carries `net` (LOW, HIGH, or −1: neither, islands only). */
export function gapSide(st: RouteState, g: number, net: number): number {
  const { gapLow, gapHigh } = st.cut;
  if (gapLow[g]! >= 0 && st.owner[gapLow[g]!] === net) return LOW;
  if (gapHigh[g]! >= 0 && st.owner[gapHigh[g]!] === net) return HIGH;
  return -1;
}

/** The segment of side `side` of gap g (−1: the strip's end). */
export function sideSeg(st: RouteState, g: number, side: number): number {
  return side === LOW ? st.cut.gapLow[g]! : st.cut.gapHigh[g]!;
}

/**
 * The segment whose copper a claim of `net` at gap hole h joins: its side, else its relay
 * island (`islandFor`; a new one only when `fresh`), or −1.
 */
export function gapSegOf(st: RouteState, h: number, net: number, forced = -1, fresh = true): number {
  const g = st.cut.gapOf[h]!;
  const side = gapSide(st, g, net);
  if (side >= 0) return claimOk(st, g, st.copper.posOf[h]!, side) ? sideSeg(st, g, side) : -1;
  return islandFor(st, g, st.copper.posOf[h]!, net, forced, fresh);
}

/**
 * Holes the other side of a gap would lose if `net` claimed gap hole h (0 for a firm hole, a
 * tail, or a relay island): a claim moves the cut's room towards the other lead.
 */
export function claimLoss(st: RouteState, h: number, net: number): number {
  const g = st.cut.gapOf[h]!;
  if (g < 0 || st.cut.gapLow[g]! < 0 || st.cut.gapHigh[g]! < 0) return 0;
  const pos = st.copper.posOf[h]!;
  const side = gapSide(st, g, net);
  return side === LOW ? Math.max(0, pos - st.claimLo[g]!) : side === HIGH ? Math.max(0, st.claimHi[g]! - pos) : 0;
}

/**
 * Claim a gap hole for the side of `net`, or for the relay island `islandFor` gives (or
 * `forced`); the caller checked that it fits, a claim that does not is a bug.
 */
export function claimHole(st: RouteState, h: number, net: number, forced = -1): void {
  const g = st.cut.gapOf[h]!;
  if (g < 0) return;
  const pos = st.copper.posOf[h]!;
  const side = gapSide(st, g, net);
  if (side === LOW) st.claimLo[g] = Math.max(st.claimLo[g]!, pos);
  else if (side === HIGH) st.claimHi[g] = Math.min(st.claimHi[g]!, pos);
  else {
    const s = islandFor(st, g, pos, net, forced);
    if (s < 0) throw new Error(`route: net ${net} claims hole ${h} where no island of it fits`);
    st.claimSeg[h] = s;
    st.islandLo[s] = Math.min(st.islandLo[s]!, pos);
    st.islandHi[s] = Math.max(st.islandHi[s]!, pos);
    st.relayLo[g] = Math.min(st.relayLo[g]!, pos);
    st.relayHi[g] = Math.max(st.relayHi[g]!, pos);
  }
}
