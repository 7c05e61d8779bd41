/**
 * `search(st, scratch, net, root, opts): number[] | undefined` — the cheapest path on the
 * hole grid from the component `root` of `net` to any other component of that net (Dijkstra,
 * the weighted form of Lee's maze search; A* towards the other islands for wire-only
 * searches). States are hole × arrival direction; the path comes back as states, each with
 * how it was reached in `scratch.kind` (START, WIRE, COPPER, LINK). A path is made of:
 * - copper-side wire steps between orthogonal neighbours, cost 2 per hole plus 1 per bend:
 *   over pads and copperless holes nobody owns, into and out of copper the net owns, and
 *   (with `unowned`) onto free strips; a step touching strip copper is a solder bridge and
 *   costs 40 more, so a short link wins where one fits;
 * - travel along copper the net owns (or, with `unowned`, a free strip it claims), free;
 * - component-side links between free holes in one row or column, cost 30 + 2 per hole,
 *   plus 60 for each hole kept by a scarce island of another net (reserve.ts) and, to find
 *   rip-up victims, 24 for each other net's wire or link crossed (`throughWires`,
 *   `throughLinks`). A hole's copper belongs to one net, so nets never touch.
 */
import { MinHeap } from './heap.ts';
import { claimLoss, claimOk, gapSide } from './claims.ts';
import { landingSeg, linkClear } from './landing.ts';
import { copperSegOf, find, isMulti, segmentHoles, type RouteState } from './state.ts';

export interface SearchOptions {
  wires: boolean;
  links: boolean;
  /** Allow claiming copper nobody owns (free strips as relays, unused pads). */
  unowned: boolean;
  /** Allow crossing other nets' wire-only holes at a price (to find rip-up victims). */
  throughWires?: boolean;
  /** Allow links to pass over other nets' links at a price (to find rip-up victims). */
  throughLinks?: boolean;
}

/** Costs in half-holes so that a bend weighs half a step. */
const WIRE_STEP = 2;
const BEND = 1;
const LINK_BASE = 30;
const LINK_PER_HOLE = 2;
/** Extra price of a wire step touching strip copper (a solder bridge): a short link is tidier. */
const BRIDGE = 40;
/** Price of each hole a link uses that an island of another net keeps (see reserve). */
const KEPT = 60;
/** Price of crossing another net's wire or link when looking for what blocks a net. */
const THROUGH = 24;

/** How a search reached a state (Scratch.kind). */
export const START = 0;
export const WIRE = 1;
export const COPPER = 2;
export const LINK = 3;

/** Reusable search arrays, sized for one board (states are hole × 5 arrival directions). */
export interface Scratch {
  cost: Float64Array;
  seen: Int32Array;
  done: Int32Array;
  prev: Int32Array;
  kind: Uint8Array;
  spread: Int32Array;
  blocked: Uint8Array;
  /** Per hole, for the net being searched: may a link pass (1), and the segment it lands on. */
  clear: Uint8Array;
  land: Int32Array;
  epoch: number;
  heap: MinHeap;
}

export function newScratch(st: RouteState): Scratch {
  const n = st.copper.holes * 5;
  return {
    cost: new Float64Array(n),
    seen: new Int32Array(n),
    done: new Int32Array(n),
    prev: new Int32Array(n),
    kind: new Uint8Array(n),
    spread: new Int32Array(st.cut.segCount),
    blocked: new Uint8Array(st.copper.holes),
    clear: new Uint8Array(st.copper.holes),
    land: new Int32Array(st.copper.holes),
    epoch: 0,
    heap: new MinHeap(),
  };
}

/** Whether hole h lies on copper shared with other holes (a strip piece or a gap). */
function onStrip(st: RouteState, h: number): boolean {
  const s = st.cut.segOf[h]!;
  return s < 0 || isMulti(st, s);
}

/** A wire may leave a pad, a copperless hole, or copper the net owns or may claim. */
function wireFrom(st: RouteState, h: number, net: number, unowned: boolean): boolean {
  const s = st.cut.segOf[h]!;
  if (s < 0) return copperSegOf(st, h, net) >= 0;
  return !isMulti(st, s) || st.owner[s] === net || (unowned && st.owner[s] === -1);
}

/**
 * Whether a wire of `net` may enter hole h: 0 no, 1 yes, 2 only by crossing another net's
 * wire (with `through`). Pads and copperless holes nobody owns, the net's own copper, a gap
 * hole on the net's side with room left for its cut, and free strips when `unowned`.
 */
function wireInto(st: RouteState, h: number, net: number, opts: SearchOptions): number {
  const s = st.cut.segOf[h]!;
  if (s < 0) {
    const g = st.cut.gapOf[h]!;
    const side = gapSide(st, g, net);
    return side >= 0 && claimOk(st, g, st.copper.posOf[h]!, side) ? 1 : 0;
  }
  const o = st.owner[s]!;
  if (o === net) return 1;
  if (isMulti(st, s)) return o === -1 && opts.unowned ? 1 : 0;
  if (o === -1) return 1;
  return opts.throughWires && st.leadNet[h]! < 0 && o < st.realNets ? 2 : 0;
}

export function search(st: RouteState, sc: Scratch, net: number, root: number, opts: SearchOptions): number[] | undefined {
  const { cols, rows } = st.copper;
  const epoch = ++sc.epoch;
  const heap = sc.heap;
  heap.clear();
  const guide = opts.links ? undefined : targetBox(st, net, root);
  // A* towards the other islands' bounding box for wire-only searches (2 per hole is the
  // cheapest a wire can do); links and free travel along strips would make it overestimate.
  const ahead = (state: number): number => {
    if (!guide) return 0;
    const h = (state / 5) | 0;
    const x = h % cols;
    const y = (h - x) / cols;
    return WIRE_STEP * (Math.max(0, guide[0] - x, x - guide[1]) + Math.max(0, guide[2] - y, y - guide[3]));
  };
  const relax = (state: number, cost: number, prev: number, kind: number): void => {
    if (sc.seen[state] === epoch && sc.cost[state]! <= cost) return;
    sc.seen[state] = epoch;
    sc.cost[state] = cost;
    sc.prev[state] = prev;
    sc.kind[state] = kind;
    heap.push(cost + ahead(state), state);
  };
  const holes: number[] = [];
  for (const s of st.netSegs[net]!) {
    if (find(st, s) !== root) continue;
    sc.spread[s] = epoch;
    holes.length = 0;
    segmentHoles(st, s, holes);
    for (const h of holes) relax(h * 5 + 4, 0, -1, START);
  }
  if (guide && guide[0] > guide[1]) return undefined;
  if (opts.links)
    for (let h = 0; h < st.copper.holes; h++) {
      sc.clear[h] = linkClear(st, h) ? 1 : 0;
      sc.land[h] = sc.clear[h] && sc.blocked[h] === 0 ? landingSeg(st, h, net, opts.unowned) : -1;
    }
  const landable = (h: number): boolean => sc.land[h]! >= 0;
  while (heap.size > 0) {
    const key = heap.peekCost();
    const state = heap.pop();
    const cost = sc.cost[state]!;
    if (sc.done[state] === epoch || cost + ahead(state) < key) continue;
    sc.done[state] = epoch;
    const h = (state / 5) | 0;
    const d = state % 5;
    const cs = copperSegOf(st, h, net);
    if (cs >= 0 && st.owner[cs] === net && find(st, cs) !== root) return unwind(sc, state);
    // Travel along copper the net owns or may claim.
    if (cs >= 0 && isMulti(st, cs) && sc.spread[cs] !== epoch && (st.owner[cs] === net || (st.owner[cs] === -1 && opts.unowned))) {
      sc.spread[cs] = epoch;
      holes.length = 0;
      segmentHoles(st, cs, holes);
      for (const h2 of holes) relax(h2 * 5 + 4, cost, state, COPPER);
    }
    const x = h % cols;
    const y = (h - x) / cols;
    if (opts.wires && wireFrom(st, h, net, opts.unowned)) {
      for (let dir = 0; dir < 4; dir++) {
        const nx = dir === 0 ? x + 1 : dir === 2 ? x - 1 : x;
        const ny = dir === 1 ? y + 1 : dir === 3 ? y - 1 : y;
        if (nx < 0 || ny < 0 || nx >= cols || ny >= rows) continue;
        const h2 = nx + ny * cols;
        const into = sc.blocked[h2] ? 0 : wireInto(st, h2, net, opts);
        if (into === 0) continue;
        const bridge = onStrip(st, h) || onStrip(st, h2);
        relax(h2 * 5 + dir, cost + WIRE_STEP + (d !== 4 && d !== dir ? BEND : 0) + (into === 2 ? THROUGH : 0) + (bridge ? BRIDGE : 0), state, WIRE);
      }
    }
    if (opts.links && landable(h)) {
      const leave = claimLoss(st, h, net);
      for (let dir = 0; dir < 4; dir++) {
        const dx = dir === 0 ? 1 : dir === 2 ? -1 : 0;
        const dy = dir === 1 ? 1 : dir === 3 ? -1 : 0;
        let crossed = 0;
        let kept = 0;
        let last = cs;
        for (let k = 1; ; k++) {
          const nx = x + dx * k;
          const ny = y + dy * k;
          if (nx < 0 || ny < 0 || nx >= cols || ny >= rows) break;
          const h2 = nx + ny * cols;
          if (sc.clear[h2] === 0) {
            if (!opts.throughLinks || foreignLink(st, h2, net) < 0) break;
            crossed++;
            continue;
          }
          if (st.reserve[h2] !== -1 && st.reserve[h2] !== net) kept++;
          const s2 = sc.land[h2]!;
          if (s2 < 0) continue;
          // Further holes of a piece of strip just landed on cost more for the same copper;
          // and a walk that meets its own strip again is done better from there.
          if (s2 === last && isMulti(st, s2)) {
            if (s2 === cs && crossed === 0) break;
            continue;
          }
          last = s2;
          relax(h2 * 5 + 4, cost + LINK_BASE + LINK_PER_HOLE * k + claimLoss(st, h2, net) + leave + THROUGH * crossed + KEPT * kept, state, LINK);
        }
      }
    }
  }
  return undefined;
}

/** Bounding box [x0, x1, y0, y1] of the holes of `net` outside component `root` (empty: x0 > x1). */
function targetBox(st: RouteState, net: number, root: number): [number, number, number, number] {
  const cols = st.copper.cols;
  const box: [number, number, number, number] = [Infinity, -Infinity, Infinity, -Infinity];
  const holes: number[] = [];
  for (const s of st.netSegs[net]!) if (find(st, s) !== root) segmentHoles(st, s, holes);
  for (const h of holes) {
    const x = h % cols;
    const y = (h - x) / cols;
    box[0] = Math.min(box[0], x);
    box[1] = Math.max(box[1], x);
    box[2] = Math.min(box[2], y);
    box[3] = Math.max(box[3], y);
  }
  return box;
}

function unwind(sc: Scratch, state: number): number[] {
  const path: number[] = [];
  for (let s = state; s !== -1; s = sc.prev[s]!) path.push(s);
  return path.reverse();
}

/**
 * The net of another net's link that alone keeps a link of `net` from passing hole h, or −1
 * (a pin, a body, a kept hole or the net's own link block it for good).
 */
export function foreignLink(st: RouteState, h: number, net: number): number {
  if (st.pin[h] || (!st.cfg.overBodies && st.body[h])) return -1;
  const other = st.linkUse[h]! > 0 ? st.linkUse[h]! - 1 : st.leadNet[h]!;
  return other >= 0 && other !== net ? other : -1;
}
