/**
 * `linkShortfall(state): number` — on a board whose strips run along the rows, how many
 * links a greedy link plan cannot place: the nets' segments are joined by straight links
 * (column or row), shortest first, each link landing in free holes of its two segments and
 * crossing only free holes, no two links sharing a hole. The count of joins still missing
 * is the estimate of what a router would fail to route. It is rebuilt from scratch over
 * the parts' box and a margin of MARGIN holes (O(holes) per call), so the placer uses it
 * for small designs and to polish a placement on its final board. Joins of equal length
 * go by their first hole, then in the order found (columns, then rows). Working arrays are
 * module scratch reused from call to call: a call allocates little besides its answer.
 */
import type { PlaceState } from './state.ts';

/** Holes round the parts' box that links may still use. */
const MARGIN = 2;

/**
 * Scratch shared by every call (grown on demand; the planner runs one call at a time).
 * Stretch numbers and stamps keep rising from call to call, so nothing needs clearing.
 */
const scratch = {
  runNet: new Int32Array(256),
  runLo: new Int32Array(256),
  runHi: new Int32Array(256),
  parent: new Int32Array(256),
  rowStart: new Int32Array(64),
  first: new Int32Array(64),
  /** Per net: the call stamp once its components are being counted, and their number. */
  counted: new Float64Array(64),
  comps: new Int32Array(64),
  lastStretch: new Float64Array(64),
  lastHole: new Int32Array(64),
  lastRun: new Int32Array(64),
  /** Candidate links: holes a < b, runs ra and rb; then their sort keys. */
  a: new Int32Array(1024),
  b: new Int32Array(1024),
  ra: new Int32Array(1024),
  rb: new Int32Array(1024),
  keys: new Float64Array(1024),
  claimed: new Float64Array(256),
  stamp: 0,
  stretch: 0,
};

function grown<T extends Int32Array | Float64Array>(a: T, n: number): T {
  if (n <= a.length) return a;
  const more = new (a.constructor as new (n: number) => T)(Math.max(n, 2 * a.length));
  more.set(a);
  return more;
}

export function linkShortfall(s: PlaceState): number {
  return linkPlan(s).missing;
}

/** The nets the greedy link plan leaves in pieces, and how many joins are missing. */
export function linkPlan(s: PlaceState): { missing: number; nets: number[] } {
  if (!s.map.alongRows) return { missing: 0, nets: [] };
  const box = s.bounds();
  if (!box) return { missing: 0, nets: [] };
  const t = s.tally;
  const { W, H } = s;
  const X0 = Math.max(0, box.x0 - MARGIN);
  const X1 = Math.min(W - 1, box.x1 + MARGIN);
  const Y0 = Math.max(0, box.y0 - MARGIN);
  const Y1 = Math.min(H - 1, box.y1 + MARGIN);
  const k = scratch;
  const stamp = ++k.stamp;
  const nets = s.problem.nets.length;
  k.counted = grown(k.counted, nets);
  k.comps = grown(k.comps, nets);
  k.lastStretch = grown(k.lastStretch, nets);
  k.lastHole = grown(k.lastHole, nets);
  k.lastRun = grown(k.lastRun, nets);
  k.rowStart = grown(k.rowStart, Y1 - Y0 + 2);
  // Per row of the box, the runs of nets that need links, in order, with the holes they may
  // use (gaps count for both sides). Other runs take no part: leaving them out changes nothing.
  let runs = 0;
  for (let y = Y0; y <= Y1; y++) {
    k.rowStart[y - Y0] = runs;
    const c = s.map.cond[y * W]!;
    const list = t.runs[c]!;
    const lo = t.runLo[c]!;
    const hi = t.runHi[c]!;
    if (runs + list.length > k.runNet.length) {
      k.runNet = grown(k.runNet, runs + list.length);
      k.runLo = grown(k.runLo, runs + list.length);
      k.runHi = grown(k.runHi, runs + list.length);
    }
    for (let i = 0; i < list.length; i++) {
      const net = list[i]!;
      if (t.segs[net]! < 2) continue;
      k.runNet[runs] = net;
      k.runLo[runs] = lo[i]!;
      k.runHi[runs] = hi[i]!;
      runs++;
    }
  }
  k.rowStart[Y1 - Y0 + 1] = runs;
  k.parent = grown(k.parent, runs);
  const parent = k.parent;
  for (let i = 0; i < runs; i++) parent[i] = i;
  const find = (a: number): number => {
    while (parent[a] !== a) a = parent[a] = parent[parent[a]!]!;
    return a;
  };
  const { runNet, runLo, runHi, rowStart, lastStretch, lastHole, lastRun } = k;
  let count = 0;
  let stretch = k.stretch;
  // A row's runs come in copper order with their reaches (lo, hi) never decreasing, so the
  // runs over column x are the ones from the first with hi ≥ x while lo ≤ x: `first` keeps,
  // per row, where that search starts, moving on as x grows.
  k.first = grown(k.first, Y1 - Y0 + 1);
  const first = k.first;
  const visit = (h: number, x: number, row: number) => {
    if (s.owner[h] !== -1 || s.blocked[h]) {
      stretch++;
      return;
    }
    const end = rowStart[row + 1]!;
    let r = first[row]!;
    while (r < end && runHi[r]! < x) r++;
    first[row] = r;
    for (; r < end && runLo[r]! <= x; r++) {
      const net = runNet[r]!;
      if (lastStretch[net] === stretch && lastRun[net] !== r) {
        if (count === k.a.length) {
          k.a = grown(k.a, count + 1);
          k.b = grown(k.b, count + 1);
          k.ra = grown(k.ra, count + 1);
          k.rb = grown(k.rb, count + 1);
        }
        k.a[count] = lastHole[net]!;
        k.b[count] = h;
        k.ra[count] = lastRun[net]!;
        k.rb[count] = r;
        count++;
      }
      lastStretch[net] = stretch;
      lastHole[net] = h;
      lastRun[net] = r;
    }
  };
  for (let row = 0; row <= Y1 - Y0; row++) first[row] = rowStart[row]!;
  for (let x = X0; x <= X1; x++) {
    stretch++;
    for (let y = Y0; y <= Y1; y++) visit(x + y * W, x, y - Y0);
  }
  for (let y = Y0; y <= Y1; y++) {
    stretch++;
    first[y - Y0] = rowStart[y - Y0]!;
    for (let x = X0; x <= X1; x++) visit(x + y * W, x, y - Y0);
  }
  k.stretch = stretch + 1;
  // Shortest first, then by first hole, then in the order found: one numeric key each.
  const { a, b, ra, rb } = k;
  k.keys = grown(k.keys, count);
  const keys = k.keys.subarray(0, count);
  for (let i = 0; i < count; i++) {
    const len = Math.abs((b[i]! % W) - (a[i]! % W)) + Math.abs(Math.floor(b[i]! / W) - Math.floor(a[i]! / W));
    keys[i] = (len * W * H + a[i]!) * count + i;
  }
  keys.sort();
  k.claimed = grown(k.claimed, W * H);
  const claimed = k.claimed;
  for (let n = 0; n < count; n++) {
    const i = keys[n]! % count;
    const ca = find(ra[i]!);
    const cb = find(rb[i]!);
    if (ca === cb) continue;
    const from = a[i]!;
    const to = b[i]!;
    const step = Math.floor(from / W) === Math.floor(to / W) ? 1 : W;
    let free = true;
    for (let h = from; h <= to && free; h += step) if (claimed[h] === stamp) free = false;
    if (!free) continue;
    for (let h = from; h <= to; h += step) claimed[h] = stamp;
    parent[ca] = cb;
  }
  // Joins still missing: per net, components − 1 (each component's root is one of its runs).
  const order: number[] = [];
  for (let id = 0; id < runs; id++) {
    const net = runNet[id]!;
    if (k.counted[net] !== stamp) {
      k.counted[net] = stamp;
      k.comps[net] = 0;
      order.push(net);
    }
    if (find(id) === id) k.comps[net]!++;
  }
  let missing = 0;
  const pieces: number[] = [];
  for (const net of order) {
    missing += k.comps[net]! - 1;
    if (k.comps[net]! > 1) pieces.push(net);
  }
  return { missing, nets: pieces };
}
