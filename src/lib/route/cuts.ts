/**
 * `placeCuts(st, style): Cut[]` — the cuts, placed after the links have landed. Along each
 * gap, between every two neighbouring parties — the low side's claims, each relay island,
 * the high side's claims — one cut inside the room they leave: one per gap between leads, one
 * more per relay island; a tail (one side only) gets a cut for each island and none without.
 * A drilled cut goes at the free hole nearest the middle of its room, preferring one no link
 * lies over; a scored cut goes at the middle boundary. Style `either` drills when a hole is
 * left (the usual bench method) and scores when the two claims are neighbours.
 */
import type { CutStyle, Cut, Hole } from '../model/index.ts';
import { islandsOf } from './islands.ts';
import type { RouteState } from './state.ts';

export function placeCuts(st: RouteState, style: CutStyle): Cut[] {
  const { cols, condStart, condHoles } = st.copper;
  const hole = (i: number): Hole => [i % cols, Math.floor(i / cols)];
  const cuts: Cut[] = [];
  /** One cut strictly between positions lo and hi of the conductor starting at `start`. */
  const cutBetween = (start: number, lo: number, hi: number): void => {
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
  };
  const islands: number[] = [];
  for (let g = 0; g < st.cut.gapCount; g++) {
    const start = condStart[st.cut.gapCond[g]!]!;
    // The previous party's last claim (none: the strip's end of a tail).
    let prev = st.cut.gapLow[g]! >= 0 ? st.claimLo[g]! : undefined;
    for (const s of islandsOf(st, g, islands)) {
      if (prev !== undefined) cutBetween(start, prev, st.islandLo[s]!);
      prev = st.islandHi[s]!;
    }
    if (prev !== undefined && st.cut.gapHigh[g]! >= 0) cutBetween(start, prev, st.claimHi[g]!);
  }
  return cuts;
}
