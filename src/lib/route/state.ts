/**
 * The router's working state: flat typed arrays indexed by hole, segment and gap, changed
 * only through the functions of state.ts, claims.ts and landing.ts so the rules hold
 * everywhere. A segment's owner is the one net its copper carries (−1: nobody yet);
 * segments joined by links and copper-side wires are merged in a union-find. A relay island
 * (segments.ts) is a segment like any other once a net owns it: in its net's union-find, a
 * place for further landings and copper-side wires.
 */
import { FAR, HIGH, LOW, claimOk, gapSegOf } from './claims.ts';
import { islandReach } from './islands.ts';
import type { Copper } from './copper.ts';
import type { Placed } from './placement.ts';
import type { Cutting } from './segments.ts';

export interface RouteConfig {
  /** Cuts must be drilled at a free hole. */
  drilled: boolean;
  /** Links may pass over part bodies (never end under one). */
  overBodies: boolean;
}

export interface RouteState {
  copper: Copper;
  cut: Cutting;
  cfg: RouteConfig;
  realNets: number;
  netCount: number;
  /** Per hole: net of the lead in it (pin or link end), −1 when free. */
  leadNet: Int32Array;
  body: Uint8Array;
  /** Per hole: 1 + the net of a link that lies over it or ends in it; 0 when none. */
  linkUse: Int32Array;
  /** Per hole: 1 when a part's pin is in it (link ends are leads too, but not pins). */
  pin: Uint8Array;
  /** Per hole: the net it is kept for (−1: none), see reserve.ts. */
  reserve: Int32Array;
  owner: Int32Array;
  uf: Int32Array;
  /**
   * Per gap: the highest position claimed by the low side, the lowest by the high side (a
   * missing side of a tail: ∓FAR), and the lowest and highest claim of its relay islands
   * (none: FAR, −FAR).
   */
  claimLo: Int32Array;
  claimHi: Int32Array;
  relayLo: Int32Array;
  relayHi: Int32Array;
  /** Per hole: the relay island a claim there belongs to, else −1. */
  claimSeg: Int32Array;
  /** Per segment: a relay island's lowest and highest claim (none: FAR, −FAR). */
  islandLo: Int32Array;
  islandHi: Int32Array;
  /** Per net: the segments it owns (pins first, in hole order). */
  netSegs: number[][];
  /** Placed links and copper-side wire steps, as flat (hole, hole, net) triples. */
  links: number[];
  wires: number[];
}

export function newState(copper: Copper, cut: Cutting, placed: Placed, cfg: RouteConfig): RouteState {
  const netCount = placed.netNames.length;
  const netSegs: number[][] = Array.from({ length: netCount }, () => []);
  const owner = Int32Array.from(cut.segNet);
  const seen = new Uint8Array(cut.segCount);
  for (let h = 0; h < copper.holes; h++) {
    const s = cut.segOf[h]!;
    if (s >= 0 && !seen[s] && owner[s]! >= 0 && placed.leadNet[h]! >= 0) {
      seen[s] = 1;
      netSegs[owner[s]!]!.push(s);
    }
  }
  const uf = new Int32Array(cut.segCount);
  for (let s = 0; s < cut.segCount; s++) uf[s] = s;
  // A missing side of a tail claims far beyond the strip's end (claims.ts).
  const claimLo = cut.gapI.slice();
  const claimHi = cut.gapJ.slice();
  for (let g = 0; g < cut.gapCount; g++) {
    if (cut.gapLow[g]! < 0) claimLo[g] = -FAR;
    if (cut.gapHigh[g]! < 0) claimHi[g] = FAR;
  }
  return {
    copper,
    cut,
    cfg,
    realNets: placed.realNets,
    netCount,
    leadNet: Int32Array.from(placed.leadNet),
    body: placed.body,
    linkUse: new Int32Array(copper.holes),
    pin: Uint8Array.from(placed.leadPin, (p) => (p >= 0 ? 1 : 0)),
    reserve: new Int32Array(copper.holes).fill(-1),
    owner,
    uf,
    claimLo,
    claimHi,
    relayLo: new Int32Array(cut.gapCount).fill(FAR),
    relayHi: new Int32Array(cut.gapCount).fill(-FAR),
    claimSeg: new Int32Array(copper.holes).fill(-1),
    islandLo: new Int32Array(cut.segCount).fill(FAR),
    islandHi: new Int32Array(cut.segCount).fill(-FAR),
    netSegs,
    links: [],
    wires: [],
  };
}

export function cloneState(st: RouteState): RouteState {
  return {
    ...st,
    leadNet: st.leadNet.slice(),
    linkUse: st.linkUse.slice(),
    reserve: st.reserve.slice(),
    owner: st.owner.slice(),
    uf: st.uf.slice(),
    claimLo: st.claimLo.slice(),
    claimHi: st.claimHi.slice(),
    relayLo: st.relayLo.slice(),
    relayHi: st.relayHi.slice(),
    claimSeg: st.claimSeg.slice(),
    islandLo: st.islandLo.slice(),
    islandHi: st.islandHi.slice(),
    netSegs: st.netSegs.map((l) => l.slice()),
    links: st.links.slice(),
    wires: st.wires.slice(),
  };
}

export function find(st: RouteState, s: number): number {
  const uf = st.uf;
  while (uf[s] !== s) {
    uf[s] = uf[uf[s]!]!;
    s = uf[s]!;
  }
  return s;
}

export function union(st: RouteState, a: number, b: number): void {
  const ra = find(st, a);
  const rb = find(st, b);
  if (ra !== rb) st.uf[Math.max(ra, rb)] = Math.min(ra, rb);
}

/** Distinct components among a net's segments, in the order of their first segment. */
export function components(st: RouteState, net: number): number[] {
  const out: number[] = [];
  for (const s of st.netSegs[net]!) {
    const r = find(st, s);
    if (!out.includes(r)) out.push(r);
  }
  return out;
}

/** Whether a segment spans several holes of one conductor (a strip piece, not a pad). */
export function isMulti(st: RouteState, s: number): boolean {
  return st.cut.segHole[s] === -1;
}

/** Give an unowned segment to a net. */
export function claimSegment(st: RouteState, s: number, net: number): void {
  if (st.owner[s] === -1) {
    st.owner[s] = net;
    st.netSegs[net]!.push(s);
  }
}

/**
 * The segment whose copper hole h carries for `net`: its own segment, or for a gap hole the
 * side of `net` or the relay island a claim there would join (claims.ts gapSegOf: `forced`
 * names the island, `fresh` allows a new one), or −1.
 */
export function copperSegOf(st: RouteState, h: number, net: number, forced = -1, fresh = true): number {
  const s = st.cut.segOf[h]!;
  return s >= 0 ? s : gapSegOf(st, h, net, forced, fresh);
}

/**
 * Holes of a segment a path may use: its firm holes and the gap holes it may still claim;
 * for a relay segment, the reach of its island (never called for one that is no island).
 */
export function segmentHoles(st: RouteState, s: number, out: number[]): void {
  const { cut, copper } = st;
  if (!isMulti(st, s)) {
    out.push(cut.segHole[s]!);
    return;
  }
  const start = copper.condStart[cut.segCond[s]!]!;
  if (cut.segGap[s]! >= 0) {
    // A relay island: the holes it may reach.
    const [from, to] = islandReach(st, s);
    for (let p = from; p <= to; p++) out.push(copper.condHoles[start + p]!);
    return;
  }
  for (let p = cut.segFrom[s]!; p <= cut.segTo[s]!; p++) out.push(copper.condHoles[start + p]!);
  const lowGap = cut.segLowGap[s]!;
  if (lowGap >= 0) for (let p = cut.gapI[lowGap]! + 1; p < cut.gapJ[lowGap]!; p++) if (claimOk(st, lowGap, p, HIGH)) out.push(copper.condHoles[start + p]!);
  const highGap = cut.segHighGap[s]!;
  if (highGap >= 0) for (let p = cut.gapI[highGap]! + 1; p < cut.gapJ[highGap]!; p++) if (claimOk(st, highGap, p, LOW)) out.push(copper.condHoles[start + p]!);
}
