/**
 * `reserveScarce(st)` — islands with few landing holes keep them. A component of a net still
 * in pieces with at most SCARCE holes where a link could land marks those holes as kept for
 * its net (`st.reserve`, the lower net number wins a tie), so that other nets' links do not
 * take the only way out of it: the spanning tree treats kept holes as walls for other nets,
 * the maze search charges for them.
 */
import { landingSeg } from './landing.ts';
import { components, find, segmentHoles, type RouteState } from './state.ts';

/** Few enough free holes that an island keeps them for itself. */
const SCARCE = 2;

export function reserveScarce(st: RouteState): void {
  st.reserve.fill(-1);
  const holes: number[] = [];
  for (let n = 0; n < st.realNets; n++) {
    if (st.netSegs[n]!.length < 2) continue;
    const comps = components(st, n);
    if (comps.length < 2) continue;
    for (const root of comps) {
      holes.length = 0;
      for (const s of st.netSegs[n]!) if (find(st, s) === root) segmentHoles(st, s, holes);
      const mine = holes.filter((h) => landingSeg(st, h, n, false) >= 0);
      if (mine.length <= SCARCE) for (const h of mine) if (st.reserve[h] === -1) st.reserve[h] = n;
    }
  }
}
