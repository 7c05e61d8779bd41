/**
 * `splitSegments(copper, leadNet): Cutting` — the cut structure a placement forces.
 *
 * Along each conductor the pins are grouped into runs of one net. Each run becomes a
 * segment; between two runs of different nets lies a gap, the free holes between the last
 * lead of one run and the first lead of the next, where exactly one cut will go. That is
 * the minimum: neighbouring leads of different nets must be parted, and one cut parts them.
 * Where the cut goes inside its gap is left open until links have landed (a link may claim
 * a gap hole for either side), see claims.ts. Holes before the first lead and after the
 * last belong to the end segments; a conductor without leads is one unowned segment (a
 * free strip, usable as a relay). Every hole without copper, and every single-hole
 * conductor (a pad), is a segment of its own.
 */
import type { Copper } from './copper.ts';

export interface Cutting {
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
  /** Per hole: its segment when it firmly belongs to one, else −1 (a gap hole). */
  segOf: Int32Array;
  /** Per hole: its gap, else −1. */
  gapOf: Int32Array;
  gapCount: number;
  /** Per gap: conductor, positions of the two leads it lies between, segments on each side. */
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
      const from = k === 0 ? 0 : first;
      const to = k === runs.length - 1 ? len - 1 : last;
      const s = addSeg(c, from, to, -1, net);
      for (let p = from; p <= to; p++) segOf[condHoles[start + p]!] = s;
      if (prev >= 0) {
        const g = gCond.length;
        const i = runs[k - 1]![2];
        gCond.push(c);
        gI.push(i);
        gJ.push(first);
        gLow.push(prev);
        gHigh.push(s);
        sHigh[prev] = g;
        sLow[s] = g;
        for (let p = i + 1; p < first; p++) gapOf[condHoles[start + p]!] = g;
      }
      prev = s;
    });
  }
  for (let h = 0; h < holes; h++) if (condOf[h] === -1) segOf[h] = addSeg(-1, 0, 0, h, leadNet[h]!);

  return {
    segCount: sCond.length,
    segCond: Int32Array.from(sCond),
    segFrom: Int32Array.from(sFrom),
    segTo: Int32Array.from(sTo),
    segHole: Int32Array.from(sHole),
    segLowGap: Int32Array.from(sLow),
    segHighGap: Int32Array.from(sHigh),
    segNet: Int32Array.from(sNet),
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
