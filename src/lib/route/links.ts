/**
 * `linkIslands(st): void` — join each net's islands with straight links by Kruskal's
 * minimum spanning tree over candidate links, shortest first, so a net on k islands gets
 * k − 1 links of least total length whenever landing holes exist.
 *
 * Candidates come from one sweep along every column and every row: within a stretch of
 * holes a link may cross (no leads, no other link, no body unless allowed, no hole another
 * net's island keeps), each landing hole of a net (never under a body) is paired with the
 * previous one of that net in the stretch. Pairs further
 * apart are never shorter than a chain of neighbours (points on a line), so the sweep keeps
 * the tree exact at O(holes) candidates. A candidate made stale by an earlier link (its
 * holes taken, its gap side full) is skipped; the sweep then runs again on what is left.
 * Column links are preferred at equal length (tidier: one link across strips), and a link
 * landing in a gap pays for the holes it takes from the other side when that side's net
 * still needs links (so one net does not starve its neighbour).
 */
import { claimLoss, claimOk, gapSide, sideSeg } from './claims.ts';
import { placeLink } from './landing.ts';
import { reserveScarce } from './reserve.ts';
import { components, find, type RouteState } from './state.ts';

const PASSES = 4;

export function linkIslands(st: RouteState): void {
  for (let pass = 0; pass < PASSES; pass++) {
    const needs = new Uint8Array(st.netCount);
    let any = false;
    for (let n = 0; n < st.realNets; n++)
      if (st.netSegs[n]!.length > 1 && components(st, n).length > 1) {
        needs[n] = 1;
        any = true;
      }
    if (!any) return;
    reserveScarce(st);
    const edges = sweep(st, needs);
    if (!kruskal(st, edges)) return;
  }
}

interface Edges {
  a: number[];
  b: number[];
  net: number[];
  key: number[];
}

function sweep(st: RouteState, needs: Uint8Array): Edges {
  const { cols, rows } = st.copper;
  const { segOf, gapOf, gapLow, gapHigh } = st.cut;
  const edges: Edges = { a: [], b: [], net: [], key: [] };
  const lastRun = new Int32Array(st.netCount).fill(-1);
  const lastHole = new Int32Array(st.netCount);
  const lastRoot = new Int32Array(st.netCount);
  let run = 0;
  // What a landing takes from the other side of its gap, when that side still needs room.
  const sideNet = (s: number): number => (s >= 0 ? st.owner[s]! : -1);
  const loss = (h: number, n: number): number => {
    const g = gapOf[h]!;
    if (g < 0) return 0;
    const other = sideNet(sideNet(gapLow[g]!) === n ? gapHigh[g]! : gapLow[g]!);
    return other >= 0 && needs[other] ? claimLoss(st, h, n) : 0;
  };
  const visit = (h: number, n: number, s: number, len: (a: number, b: number) => number, vertical: boolean): void => {
    const r = find(st, s);
    if (lastRun[n] === run && lastRoot[n] !== r) {
      const a = lastHole[n]!;
      edges.a.push(a);
      edges.b.push(h);
      edges.net.push(n);
      edges.key.push(len(a, h) * 2 + (vertical ? 0 : 1) + loss(a, n) + loss(h, n));
    }
    lastRun[n] = run;
    lastHole[n] = h;
    lastRoot[n] = r;
  };
  const scan = (h: number, len: (a: number, b: number) => number, vertical: boolean): void => {
    if (st.leadNet[h]! >= 0 || st.linkUse[h] || (!st.cfg.overBodies && st.body[h])) {
      run++;
      return;
    }
    const kept = st.reserve[h]!;
    if (kept >= 0) {
      // A kept hole stops every other net's links but not its own.
      const going = lastRun[kept] === run;
      run++;
      if (going) lastRun[kept] = run;
    }
    if (st.body[h]) return; // passable when links may cross bodies, never a landing
    const s = segOf[h]!;
    if (s >= 0) {
      const o = st.owner[s]!;
      if (o >= 0 && needs[o] && (kept < 0 || kept === o)) visit(h, o, s, len, vertical);
      return;
    }
    const g = gapOf[h]!;
    const pos = st.copper.posOf[h]!;
    const lo = gapLow[g]!;
    const hi = gapHigh[g]!;
    const nLo = sideNet(lo);
    const nHi = sideNet(hi);
    if (nLo >= 0 && needs[nLo] && (kept < 0 || kept === nLo) && claimOk(st, g, pos, 0)) visit(h, nLo, lo, len, vertical);
    if (nHi >= 0 && needs[nHi] && (kept < 0 || kept === nHi) && claimOk(st, g, pos, 1)) visit(h, nHi, hi, len, vertical);
  };
  const vLen = (a: number, b: number): number => (b - a) / cols;
  for (let x = 0; x < cols; x++) {
    run++;
    for (let y = 0; y < rows; y++) scan(x + y * cols, vLen, true);
  }
  const hLen = (a: number, b: number): number => b - a;
  for (let y = 0; y < rows; y++) {
    run++;
    for (let x = 0; x < cols; x++) scan(x + y * cols, hLen, false);
  }
  return edges;
}

function kruskal(st: RouteState, e: Edges): boolean {
  const order = e.key.map((_, i) => i);
  order.sort((i, j) => e.key[i]! - e.key[j]! || e.a[i]! - e.a[j]! || e.b[i]! - e.b[j]!);
  let placed = false;
  for (const i of order) {
    const a = e.a[i]!;
    const b = e.b[i]!;
    const n = e.net[i]!;
    const ra = rootAt(st, a, n);
    const rb = rootAt(st, b, n);
    if (ra < 0 || rb < 0 || ra === rb) continue;
    if (placeLink(st, a, b, n, false)) placed = true;
  }
  return placed;
}

/** Component a link end of `net` at hole h would join (−1: it no longer may land there). */
function rootAt(st: RouteState, h: number, net: number): number {
  const s = st.cut.segOf[h]!;
  if (s >= 0) return st.owner[s] === net ? find(st, s) : -1;
  const g = st.cut.gapOf[h]!;
  const side = gapSide(st, g, net);
  return side < 0 ? -1 : find(st, sideSeg(st, g, side));
}
