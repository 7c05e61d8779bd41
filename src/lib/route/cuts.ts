/**
 * `placeCuts(st, style): Cut[]` — one cut per gap, placed after the links have landed.
 * Inside what the links left free (between the low side's last claim and the high side's
 * first), a drilled cut goes at the free hole nearest the middle, preferring one no link lies
 * over; a scored cut goes at the middle boundary. Style `either` drills when a hole is left
 * (the usual bench method) and scores when the two leads are neighbours.
 */
import type { CutStyle, Cut, Hole } from '../model/index.ts';
import type { RouteState } from './state.ts';

export function placeCuts(st: RouteState, style: CutStyle): Cut[] {
  const { cols, condStart, condHoles } = st.copper;
  const hole = (i: number): Hole => [i % cols, Math.floor(i / cols)];
  const cuts: Cut[] = [];
  for (let g = 0; g < st.cut.gapCount; g++) {
    const lo = st.claimLo[g]!;
    const hi = st.claimHi[g]!;
    const start = condStart[st.cut.gapCond[g]!]!;
    if (style !== 'between' && hi - lo >= 2) {
      let p = (lo + hi) >> 1;
      for (let k = 0; k <= hi - lo; k++) {
        const q = k % 2 === 0 ? ((lo + hi) >> 1) + k / 2 : ((lo + hi) >> 1) - (k + 1) / 2;
        if (q > lo && q < hi && st.linkUse[condHoles[start + q]!] === 0) {
          p = q;
          break;
        }
      }
      cuts.push({ at: hole(condHoles[start + p]!) });
    } else {
      const k = (lo + hi - 1) >> 1;
      cuts.push({ between: [hole(condHoles[start + k]!), hole(condHoles[start + k + 1]!)] });
    }
  }
  return cuts;
}
