/**
 * `blockedPairs(state, net): number` — on a board whose strips run along the rows, how many
 * of a net's segments (taken in row order) have no straight link to the next one: no
 * column where both may land a link in a free hole with nothing but free holes between.
 * A proxy for the router's straight links, counted per net when the net or the bodies
 * around it change; other links are not seen.
 */
import type { PlaceState } from './state.ts';

export function blockedPairs(s: PlaceState, net: number): number {
  const t = s.tally;
  if (t.segs[net]! < 2) return 0;
  const rows = new Set<number>();
  for (const h of s.netHoles[net]!) rows.add(s.map.cond[h]!);
  const segs: { row: number; lo: number; hi: number }[] = [];
  for (const c of rows) {
    const runs = t.runs[c]!;
    for (let i = 0; i < runs.length; i++) if (runs[i] === net) segs.push({ row: Math.floor(s.map.holes[c]![0]! / s.W), lo: t.runLo[c]![i]!, hi: t.runHi[c]![i]! });
  }
  segs.sort((a, b) => a.row - b.row || a.lo - b.lo);
  // Remember how far the net's segments reach along the rows: bodies outside cannot matter.
  let lo = Infinity;
  let hi = -Infinity;
  for (const g of segs) {
    lo = Math.min(lo, g.lo);
    hi = Math.max(hi, g.hi);
  }
  s.netReachLo[net] = lo;
  s.netReachHi[net] = hi;
  let blocked = 0;
  for (let i = 0; i + 1 < segs.length; i++) {
    const a = segs[i]!;
    const b = segs[i + 1]!;
    if (a.row === b.row) continue; // joined along the row, or through another row: not judged here
    let found = false;
    for (let x = Math.max(a.lo, b.lo); x <= Math.min(a.hi, b.hi) && !found; x++) {
      let clear = true;
      for (let y = a.row; y <= b.row && clear; y++) {
        const k = x + y * s.W;
        if (s.owner[k] !== -1 || s.blocked[k]) clear = false;
      }
      found = clear;
    }
    if (!found) blocked++;
  }
  return blocked;
}
