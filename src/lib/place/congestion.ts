/**
 * `padCongestion(state): number` — on a pad board, how far wire demand exceeds room: each
 * net of two or more pins spreads one wire across the rows and one down the columns of its
 * bounding box (the usual probabilistic estimate); a row or column carrying more than
 * CAPACITY such wires costs the excess. A pin whose four neighbours all hold leads has no
 * way out for its wire and costs 2 more (1/2 with a single way out). O(leads + rows + cols).
 */
import type { PlaceState } from './state.ts';

/** Wires a row or column of pads takes comfortably (one on the pads, one beside them). */
const CAPACITY = 2;

export function padCongestion(s: PlaceState): number {
  const rows = new Float64Array(s.H + 1);
  const cols = new Float64Array(s.W + 1);
  const lead = new Uint8Array(s.W * s.H);
  for (const holes of s.netHoles) for (const h of holes) lead[h] = 1;
  let boxed = 0;
  for (const holes of s.netHoles)
    for (const h of holes) {
      const x = h % s.W;
      const y = (h - x) / s.W;
      let free = 0;
      if (x > 0 && !lead[h - 1]) free++;
      if (x + 1 < s.W && !lead[h + 1]) free++;
      if (y > 0 && !lead[h - s.W]) free++;
      if (y + 1 < s.H && !lead[h + s.W]) free++;
      boxed += free === 0 ? 2 : free === 1 ? 0.5 : 0;
    }
  for (let n = 0; n < s.netHoles.length; n++) {
    const holes = s.netHoles[n]!;
    if (holes.length < 2) continue;
    let x0 = Infinity, x1 = -1, y0 = Infinity, y1 = -1;
    for (const h of holes) {
      const x = h % s.W;
      const y = (h - x) / s.W;
      x0 = Math.min(x0, x);
      x1 = Math.max(x1, x);
      y0 = Math.min(y0, y);
      y1 = Math.max(y1, y);
    }
    // A horizontal run loads the rows of the box share-wise; a vertical one the columns.
    const h = y1 - y0 + 1;
    const w = x1 - x0 + 1;
    if (x1 > x0) {
      rows[y0]! += 1 / h;
      rows[y1 + 1]! -= 1 / h;
    }
    if (y1 > y0) {
      cols[x0]! += 1 / w;
      cols[x1 + 1]! -= 1 / w;
    }
  }
  let excess = boxed;
  let r = 0;
  for (let y = 0; y < s.H; y++) {
    r += rows[y]!;
    if (r > CAPACITY) excess += r - CAPACITY;
  }
  let c = 0;
  for (let x = 0; x < s.W; x++) {
    c += cols[x]!;
    if (c > CAPACITY) excess += c - CAPACITY;
  }
  return excess;
}
