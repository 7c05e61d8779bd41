/**
 * `padCongestion(state): number` — on a pad board, how far wire demand exceeds room: each
 * net of two or more pins spreads one wire across the rows and one down the columns of its
 * bounding box (the usual probabilistic estimate); a row or column carrying more than
 * CAPACITY such wires costs the excess. A pin whose four neighbours all hold leads has no
 * way out for its wire and costs 2 more (1/2 with a single way out), as the state keeps it
 * (PlaceState.boxedLeads, pad boards only). O(nets + rows + cols); reads the nets' lead boxes
 * as of the state's last settle.
 */
import type { PlaceState } from './state.ts';

/** Wires a row or column of pads takes comfortably (one on the pads, one beside them). */
const CAPACITY = 2;

/** Per-row and per-column wire loads (scratch, grown on demand). */
let rows = new Float64Array(64);
let cols = new Float64Array(64);

export function padCongestion(s: PlaceState): number {
  if (rows.length < s.H + 1) rows = new Float64Array(2 * s.H + 1);
  if (cols.length < s.W + 1) cols = new Float64Array(2 * s.W + 1);
  rows.fill(0, 0, s.H + 1);
  cols.fill(0, 0, s.W + 1);
  const boxed = s.boxedLeads;
  for (let n = 0; n < s.netHoles.length; n++) {
    if (s.netHoles[n]!.length < 2) continue;
    // The lead box as of the last settle (the cost is read after one).
    const x0 = s.netMinX[n]!;
    const x1 = s.netMaxX[n]!;
    const y0 = s.netMinY[n]!;
    const y1 = s.netMaxY[n]!;
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
