/**
 * `blockedPairs(state, net): number` — on a board whose strips run along the rows, how many
 * of a net's segments (taken in row order) have no straight link to the next one: no
 * column where both may land a link in a free hole with nothing but free holes between.
 * A proxy for the router's straight links, counted per net when the net or the bodies
 * around it change; other links are not seen. Each pair's lane (the columns both reach, over
 * the rows between) is noted in the state, so a body moving elsewhere leaves the verdict be.
 */
import type { PlaceState } from './state.ts';

/** Scratch for one net's segments, packed (row·1024 + lo)·1024 + hi so a numeric sort orders them by row, then lo (rows and columns < 1024). */
let scratch = new Int32Array(64);
/** Conductors already seen for the net being judged. */
let seen = new Int32Array(64);

export function blockedPairs(s: PlaceState, net: number): number {
  const t = s.tally;
  // A fresh verdict goes in the net's other lane slot (settleBack turns back to the old one).
  s.laneSlot[net]! ^= 1;
  const slot = 2 * net + s.laneSlot[net]!;
  if (t.segs[net]! < 2) {
    s.laneCount[slot] = -1;
    return 0;
  }
  s.laneCount[slot] = 0;
  let nRows = 0;
  let n = 0;
  for (const h of s.netHoles[net]!) {
    const c = s.map.cond[h]!;
    let dup = false;
    for (let i = 0; i < nRows && !dup; i++) dup = seen[i] === c;
    if (dup) continue;
    if (nRows === seen.length) {
      const more = new Int32Array(nRows * 2);
      more.set(seen);
      seen = more;
    }
    seen[nRows++] = c;
    const runs = t.runs[c]!;
    const row = Math.floor(s.map.holes[c]![0]! / s.W);
    for (let i = 0; i < runs.length; i++) {
      if (runs[i] !== net) continue;
      if (n === scratch.length) {
        const more = new Int32Array(n * 2);
        more.set(scratch);
        scratch = more;
      }
      scratch[n++] = (row * 1024 + t.runLo[c]![i]!) * 1024 + t.runHi[c]![i]!;
    }
  }
  const segs = scratch.subarray(0, n).sort();
  // Remember how far the net's segments reach along the rows: bodies outside cannot matter.
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < n; i++) {
    const g = segs[i]!;
    lo = Math.min(lo, (g >> 10) & 1023);
    hi = Math.max(hi, g & 1023);
  }
  s.netReachLo[net] = lo;
  s.netReachHi[net] = hi;
  let blocked = 0;
  for (let i = 0; i + 1 < n; i++) {
    const a = segs[i]!;
    const b = segs[i + 1]!;
    const aRow = a >> 20;
    const bRow = b >> 20;
    if (aRow === bRow) continue; // joined along the row, or through another row: not judged here
    let found = false;
    const x0 = Math.max((a >> 10) & 1023, (b >> 10) & 1023);
    const x1 = Math.min(a & 1023, b & 1023);
    // No shared column: blocked whatever the bodies do, so no lane to watch.
    if (x0 <= x1) addLane(s, slot, x0, x1, aRow, bRow);
    for (let x = x0; x <= x1 && !found; x++) {
      let clear = true;
      for (let y = aRow; y <= bRow && clear; y++) {
        const k = x + y * s.W;
        if (s.owner[k] !== -1 || s.blocked[k]) clear = false;
      }
      found = clear;
    }
    if (!found) blocked++;
  }
  return blocked;
}

/** Note a lane in lane slot `slot` (see PlaceState.laneRects). */
function addLane(s: PlaceState, slot: number, x0: number, x1: number, y0: number, y1: number): void {
  const k = s.laneCount[slot]! * 4;
  let r = s.laneRects[slot]!;
  if (k + 4 > r.length) {
    const more = new Int32Array(Math.max(16, r.length * 2));
    more.set(r);
    r = s.laneRects[slot] = more;
  }
  r[k] = x0;
  r[k + 1] = x1;
  r[k + 2] = y0;
  r[k + 3] = y1;
  s.laneCount[slot]!++;
}
