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
 *   `throughLinks`). A hole's copper belongs to one net, so nets never touch;
 * - with `relays`, a new relay island: a link or wire lands inside a gap between two other
 *   nets (or in the tail of another net's strip) with room for a cut on each side
 *   (claims.ts), and the path travels on along that copper. It costs the builder a cut, so
 *   it costs RELAY_CUT, more than any path without one: a path uses as few new relay islands
 *   as it can, and none when it can do without. Islands the net already has are its copper.
 *   Nearly every gap hole is a landing hole then, so a relay search walks links along each
 *   clear stretch of a row or column once, from the cheapest state on it (a later one would
 *   land only a few holes' cost cheaper, never with fewer islands).
 */
import { MinHeap } from './heap.ts';
import { claimLoss, gapSegOf } from './claims.ts';
import { stretchReach } from './islands.ts';
import { landingOn, linkClear } from './landing.ts';
import { find, isMulti, segmentHoles, type RouteState } from './state.ts';

export interface SearchOptions {
  wires: boolean;
  links: boolean;
  /** Allow claiming copper nobody owns (free strips as relays, unused pads). */
  unowned: boolean;
  /** Allow crossing other nets' wire-only holes at a price (to find rip-up victims). */
  throughWires?: boolean;
  /** Allow links to pass over other nets' links at a price (to find rip-up victims). */
  throughLinks?: boolean;
  /** Allow starting relay islands in other nets' gaps and tails (with `unowned`). */
  relays?: boolean;
}

/** The maze search's usual options: wires, links and free copper; and with relay islands as well. */
export const PLAIN: SearchOptions = { wires: true, links: true, unowned: true };
export const RELAYS: SearchOptions = { ...PLAIN, relays: true };

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
/** Price of starting a relay island (one more cut): above the cost of any path without one. */
const RELAY_CUT = 1 << 20;

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
  /** Per hole: the search (epoch) that spread a new relay island's stretch from it. */
  stretched: Int32Array;
  /** Per hole: the search (epoch) that walked links along its row, its column (relay searches). */
  walkedX: Int32Array;
  walkedY: Int32Array;
  /**
   * Per hole, for the net being searched (searches with links): may a link pass (1), the
   * segment it lands on, a gap hole's segment for the net, what a claim there takes from the
   * other side (claimLoss).
   */
  clear: Uint8Array;
  land: Int32Array;
  gapSeg: Int32Array;
  loss: Int32Array;
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
    stretched: new Int32Array(st.copper.holes),
    walkedX: new Int32Array(st.copper.holes),
    walkedY: new Int32Array(st.copper.holes),
    blocked: new Uint8Array(st.copper.holes),
    clear: new Uint8Array(st.copper.holes),
    land: new Int32Array(st.copper.holes),
    gapSeg: new Int32Array(st.copper.holes),
    loss: new Int32Array(st.copper.holes),
    epoch: 0,
    heap: new MinHeap(),
  };
}

/** Whether hole h lies on copper shared with other holes (a strip piece or a gap). */
function onStrip(st: RouteState, h: number): boolean {
  const s = st.cut.segOf[h]!;
  return s < 0 || isMulti(st, s);
}

/**
 * A wire may leave a pad, a copperless hole, or copper the net owns or may claim (`gs`: the
 * segment a gap hole's copper is for the net, see gapSegOf).
 */
function wireFrom(st: RouteState, h: number, net: number, unowned: boolean, gs: number): boolean {
  const s = st.cut.segOf[h]!;
  if (s < 0) return gs >= 0;
  return !isMulti(st, s) || st.owner[s] === net || (unowned && st.owner[s] === -1);
}

/**
 * Whether a wire of `net` may enter hole h: 0 no, 1 yes, 2 only by crossing another net's
 * wire (with `through`), 3 by starting a relay island (with `relays`). Pads and copperless
 * holes nobody owns, the net's own copper, a gap hole on the net's side (or its relay
 * island's) with room left for the cuts, and free strips when `unowned`.
 */
function wireInto(st: RouteState, h: number, net: number, opts: SearchOptions, gs: number): number {
  const s = st.cut.segOf[h]!;
  if (s < 0) return gs < 0 ? 0 : st.owner[gs] === net ? 1 : 3;
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
  // Per gap hole, the segment its copper is for this net (a new relay island only with
  // `relays`); tabled once per search when links walk the whole board, else asked each time.
  const fresh = opts.relays === true && opts.unowned;
  const { segOf, gapOf } = st.cut;
  if (opts.links)
    for (let h = 0; h < st.copper.holes; h++) {
      const gap = gapOf[h]! >= 0;
      const gs = gap ? gapSegOf(st, h, net, -1, fresh) : -1;
      sc.gapSeg[h] = gs;
      sc.clear[h] = linkClear(st, h) ? 1 : 0;
      sc.land[h] = sc.clear[h] && sc.blocked[h] === 0 ? landingOn(st, h, net, opts.unowned, gap ? gs : segOf[h]!) : -1;
      // Read only where a link may land.
      sc.loss[h] = gap && sc.land[h]! >= 0 ? claimLoss(st, h, net) : 0;
    }
  const gapSegAt = (h: number): number => (gapOf[h]! < 0 ? -1 : opts.links ? sc.gapSeg[h]! : gapSegOf(st, h, net, -1, fresh));
  const landable = (h: number): boolean => sc.land[h]! >= 0;
  // With relay islands most gap holes are landing holes and a search that finds nothing
  // walks every row and column from each of them; walk each clear run once per line instead.
  const shortcut = opts.relays === true;
  const runX: number[] = [];
  const runY: number[] = [];
  const whole = [1, 1];
  while (heap.size > 0) {
    const key = heap.peekCost();
    const state = heap.pop();
    const cost = sc.cost[state]!;
    if (sc.done[state] === epoch || cost + ahead(state) < key) continue;
    sc.done[state] = epoch;
    const h = (state / 5) | 0;
    const d = state % 5;
    const cs = segOf[h]! >= 0 ? segOf[h]! : gapSegAt(h);
    if (cs >= 0 && st.owner[cs] === net && find(st, cs) !== root) return unwind(sc, state);
    // Travel along copper the net owns or may claim; along the free stretch a new relay
    // island would take (its segment is only a name until claimed, so the stretch is marked
    // by its holes: the first one popped spreads it at the least cost).
    if (cs >= 0 && st.owner[cs] === -1 && st.cut.segGap[cs]! >= 0) {
      if (sc.stretched[h] !== epoch) {
        const g = st.cut.segGap[cs]!;
        const [from, to] = stretchReach(st, g, st.copper.posOf[h]!);
        const start = st.copper.condStart[st.cut.gapCond[g]!]!;
        for (let p = from; p <= to; p++) {
          const h2 = st.copper.condHoles[start + p]!;
          sc.stretched[h2] = epoch;
          relax(h2 * 5 + 4, cost, state, COPPER);
        }
      }
    } else if (cs >= 0 && isMulti(st, cs) && sc.spread[cs] !== epoch && (st.owner[cs] === net || (st.owner[cs] === -1 && opts.unowned))) {
      sc.spread[cs] = epoch;
      holes.length = 0;
      segmentHoles(st, cs, holes);
      for (const h2 of holes) relax(h2 * 5 + 4, cost, state, COPPER);
    }
    const x = h % cols;
    const y = (h - x) / cols;
    if (opts.wires && wireFrom(st, h, net, opts.unowned, cs)) {
      for (let dir = 0; dir < 4; dir++) {
        const nx = dir === 0 ? x + 1 : dir === 2 ? x - 1 : x;
        const ny = dir === 1 ? y + 1 : dir === 3 ? y - 1 : y;
        if (nx < 0 || ny < 0 || nx >= cols || ny >= rows) continue;
        const h2 = nx + ny * cols;
        const into = sc.blocked[h2] ? 0 : wireInto(st, h2, net, opts, gapSegAt(h2));
        if (into === 0) continue;
        const bridge = onStrip(st, h) || onStrip(st, h2);
        relax(h2 * 5 + dir, cost + WIRE_STEP + (d !== 4 && d !== dir ? BEND : 0) + (into === 2 ? THROUGH : into === 3 ? RELAY_CUT : 0) + (bridge ? BRIDGE : 0), state, WIRE);
      }
    }
    if (opts.links && landable(h)) {
      const leave = sc.loss[h]!;
      const fromGap = cs >= 0 ? st.cut.segGap[cs]! : -1;
      // Per line (0: row, 1: column): walked already, walked whole, holes walked over.
      const skipX = shortcut && sc.walkedX[h] === epoch;
      const skipY = shortcut && sc.walkedY[h] === epoch;
      whole[0] = whole[1] = 1;
      runX.length = runY.length = 0;
      for (let dir = 0; dir < 4; dir++) {
        if (dir % 2 === 0 ? skipX : skipY) continue;
        const dx = dir === 0 ? 1 : dir === 2 ? -1 : 0;
        const dy = dir === 1 ? 1 : dir === 3 ? -1 : 0;
        const run = dir % 2 === 0 ? runX : runY;
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
          if (shortcut) run.push(h2);
          if (st.reserve[h2] !== -1 && st.reserve[h2] !== net) kept++;
          const s2 = sc.land[h2]!;
          if (s2 < 0 || (fromGap >= 0 && st.cut.segGap[s2] === fromGap)) continue;
          // Further holes of a piece of strip just landed on cost more for the same copper;
          // and a walk that meets its own strip again is done better from there.
          if (s2 === last && isMulti(st, s2)) {
            if (s2 === cs && crossed === 0) {
              whole[dir % 2] = 0;
              break;
            }
            continue;
          }
          last = s2;
          const relay = st.cut.segGap[s2]! >= 0 && st.owner[s2] === -1 ? RELAY_CUT : 0;
          relax(h2 * 5 + 4, cost + LINK_BASE + LINK_PER_HOLE * k + sc.loss[h2]! + leave + THROUGH * crossed + KEPT * kept + relay, state, LINK);
        }
      }
      // A whole line walked from the cheapest state on it: a later state there would walk it
      // again only to land a few holes' cost cheaper, never with fewer relay islands.
      if (shortcut && !skipX && whole[0]) {
        sc.walkedX[h] = epoch;
        for (const h2 of runX) sc.walkedX[h2] = epoch;
      }
      if (shortcut && !skipY && whole[1]) {
        sc.walkedY[h] = epoch;
        for (const h2 of runY) sc.walkedY[h2] = epoch;
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
