/**
 * `splitSegments(copper, leadNet): Cutting` — the cut structure a placement forces.
 *
 * Along each conductor the pins are grouped into runs of one net. Each run becomes a
 * segment, from its first lead to its last; between two runs of different nets lies a gap,
 * the free holes between the last lead of one run and the first lead of the next, where one
 * cut will go. That is the minimum: neighbouring leads of different nets must be parted, and
 * one cut parts them. Where the cut goes inside its gap is left open until links have landed
 * (a link may claim a gap hole for either side), see claims.ts.
 *
 * The holes before a conductor's first lead and after its last (its tails) are gaps too,
 * with one side only (the other side, −1, is the strip's end): they carry the end segment's
 * net and need no cut, unless another net takes a relay island there.
 *
 * Relay island: in the last routing phase a net that is neither side of a gap may claim a
 * run of holes strictly inside it as a stepping stone, parted from its neighbours by a cut
 * on each side (towards the strip's end of a tail, none). A gap may hold several, of one net
 * or of several. Each gap hole has a relay segment of its own, appended after the ordinary
 * segments (`segGap` ≥ 0, `holeRelay`): the island a claim starts there would be, owned by
 * nobody at first (its position in `segFrom`/`segTo`).
 *
 * A conductor without leads is one unowned segment (a free strip, usable as a relay). Every
 * hole without copper, and every single-hole conductor (a pad), is a segment of its own.
 */
import type { Copper } from './copper.ts';

export interface Cutting {
  /** All segments: ordinary ones first, then one relay segment per gap hole. */
  segCount: number;
  /** Per segment: conductor (−1: a hole without copper), firm span as positions along it. */
  segCond: Int32Array;
  segFrom: Int32Array;
  segTo: Int32Array;
  /** Per segment: the one hole of a single-hole segment, else −1. */
  segHole: Int32Array;
  /** Per segment: the gap on its low and high side (−1: none). */
  segLowGap: Int32Array;
  segHighGap: Int32Array;
  /** Per segment: the net of its leads at the start (−1: no leads). */
  segNet: Int32Array;
  /** Per segment: the gap a relay segment lies in, −1 for an ordinary segment. */
  segGap: Int32Array;
  /** Per hole: the relay segment of a gap hole (an island started there), else −1. */
  holeRelay: Int32Array;
  /** Per hole: its segment when it firmly belongs to one, else −1 (a gap hole). */
  segOf: Int32Array;
  /** Per hole: its gap, else −1. */
  gapOf: Int32Array;
  /** Gaps between leads and tails (gaps with one side). */
  gapCount: number;
  /**
   * Per gap: conductor, positions of the two leads it lies between (a tail: −1 before the
   * strip's start or the strip's length after its end), segments on each side (−1: the
   * strip's end).
   */
  gapCond: Int32Array;
  gapI: Int32Array;
  gapJ: Int32Array;
  gapLow: Int32Array;
  gapHigh: Int32Array;
}

export function splitSegments(copper: Copper, leadNet: Int32Array): Cutting {
  const { holes, condStart, condLen, condHoles, condOf } = copper;
  const segOf = new Int32Array(holes).fill(-1);
  const gapOf = new Int32Array(holes).fill(-1);
  const sCond: number[] = [];
  const sFrom: number[] = [];
  const sTo: number[] = [];
  const sHole: number[] = [];
  const sLow: number[] = [];
  const sHigh: number[] = [];
  const sNet: number[] = [];
  const gCond: number[] = [];
  const gI: number[] = [];
  const gJ: number[] = [];
  const gLow: number[] = [];
  const gHigh: number[] = [];

  const addSeg = (cond: number, from: number, to: number, hole: number, net: number): number => {
    sCond.push(cond);
    sFrom.push(from);
    sTo.push(to);
    sHole.push(hole);
    sLow.push(-1);
    sHigh.push(-1);
    sNet.push(net);
    return sCond.length - 1;
  };
  /** A gap on conductor c between positions i and j (exclusive), sides lo and hi (−1: none). */
  const addGap = (c: number, i: number, j: number, lo: number, hi: number): void => {
    const g = gCond.length;
    gCond.push(c);
    gI.push(i);
    gJ.push(j);
    gLow.push(lo);
    gHigh.push(hi);
    if (lo >= 0) sHigh[lo] = g;
    if (hi >= 0) sLow[hi] = g;
    const start = condStart[c]!;
    for (let p = i + 1; p < j; p++) gapOf[condHoles[start + p]!] = g;
  };

  for (let c = 0; c < condLen.length; c++) {
    const start = condStart[c]!;
    const len = condLen[c]!;
    if (len === 1) {
      const h = condHoles[start]!;
      segOf[h] = addSeg(c, 0, 0, h, leadNet[h]!);
      continue;
    }
    // Runs of leads of one net: [net, first position, last position].
    const runs: [number, number, number][] = [];
    for (let p = 0; p < len; p++) {
      const net = leadNet[condHoles[start + p]!]!;
      if (net < 0) continue;
      const last = runs[runs.length - 1];
      if (last && last[0] === net) last[2] = p;
      else runs.push([net, p, p]);
    }
    if (runs.length === 0) {
      const s = addSeg(c, 0, len - 1, -1, -1);
      for (let p = 0; p < len; p++) segOf[condHoles[start + p]!] = s;
      continue;
    }
    let prev = -1;
    runs.forEach(([net, first, last], k) => {
      const s = addSeg(c, first, last, -1, net);
      for (let p = first; p <= last; p++) segOf[condHoles[start + p]!] = s;
      if (k === 0 && first > 0) addGap(c, -1, first, -1, s);
      if (prev >= 0) addGap(c, runs[k - 1]![2], first, prev, s);
      if (k === runs.length - 1 && last < len - 1) addGap(c, last, len, s, -1);
      prev = s;
    });
  }
  for (let h = 0; h < holes; h++) if (condOf[h] === -1) segOf[h] = addSeg(-1, 0, 0, h, leadNet[h]!);

  // One relay segment per gap hole, after the ordinary segments, in hole order.
  const ordinary = sCond.length;
  const holeRelay = new Int32Array(holes).fill(-1);
  const relayGap: number[] = [];
  for (let h = 0; h < holes; h++) {
    const g = gapOf[h]!;
    if (g < 0) continue;
    const p = copper.posOf[h]!;
    holeRelay[h] = addSeg(gCond[g]!, p, p, -1, -1);
    relayGap.push(g);
  }
  const segGap = new Int32Array(sCond.length).fill(-1);
  segGap.set(relayGap, ordinary);

  return {
    segCount: sCond.length,
    segCond: Int32Array.from(sCond),
    segFrom: Int32Array.from(sFrom),
    segTo: Int32Array.from(sTo),
    segHole: Int32Array.from(sHole),
    segLowGap: Int32Array.from(sLow),
    segHighGap: Int32Array.from(sHigh),
    segNet: Int32Array.from(sNet),
    segGap,
    holeRelay,
    segOf,
    gapOf,
    gapCount: gCond.length,
    gapCond: Int32Array.from(gCond),
    gapI: Int32Array.from(gI),
    gapJ: Int32Array.from(gJ),
    gapLow: Int32Array.from(gLow),
    gapHigh: Int32Array.from(gHigh),
  };
}
