/**
 * Gap claims. A gap is the run of free holes between two leads of different nets on one
 * conductor, where exactly one cut will go. A link end or a copper-side wire in a gap hole
 * claims it for the side whose net it carries; the cut must then fit between the low side's
 * last claim and the high side's first: a free hole between them for a drilled cut, any
 * boundary for a scored one.
 */
import type { RouteState } from './state.ts';

/** Room for a claim at `pos` on one side of gap `g` (0: low side, 1: high side). */
export function claimOk(st: RouteState, g: number, pos: number, side: number, lo = st.claimLo[g]!, hi = st.claimHi[g]!): boolean {
  const need = st.cfg.drilled ? 2 : 1;
  return side === 0 ? pos <= lo || hi - pos >= need : pos >= hi || pos - lo >= need;
}

/** Which side of gap `g` carries `net` (0 low, 1 high, −1 neither). */
export function gapSide(st: RouteState, g: number, net: number): number {
  if (st.owner[st.cut.gapLow[g]!] === net) return 0;
  if (st.owner[st.cut.gapHigh[g]!] === net) return 1;
  return -1;
}

/**
 * Holes the other side of a gap would lose if `net` claimed gap hole h (0 for a firm hole):
 * a claim moves the cut's room towards the other lead.
 */
export function claimLoss(st: RouteState, h: number, net: number): number {
  const g = st.cut.gapOf[h]!;
  if (g < 0) return 0;
  const pos = st.copper.posOf[h]!;
  return gapSide(st, g, net) === 0 ? Math.max(0, pos - st.claimLo[g]!) : Math.max(0, st.claimHi[g]! - pos);
}

/** Claim a gap hole for the side of `net` (assumes claimOk allowed it). */
export function claimHole(st: RouteState, h: number, net: number): void {
  const g = st.cut.gapOf[h]!;
  if (g < 0) return;
  const pos = st.copper.posOf[h]!;
  if (gapSide(st, g, net) === 0) st.claimLo[g] = Math.max(st.claimLo[g]!, pos);
  else st.claimHi[g] = Math.min(st.claimHi[g]!, pos);
}
