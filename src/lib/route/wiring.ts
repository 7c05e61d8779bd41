/**
 * `wireIslands(st, scratch): RouteState` — copper-side wiring for islands that are single
 * holes (every pin on a pad board; pins in copperless holes of a patterned board).
 *
 * A net made only of such islands is grown into one tree from its first pin, each search
 * joining the tree to the nearest other island. A net that also has strip copper only joins
 * each lone-hole island to something of its net; links join the strips afterwards. Nets go
 * shortest first (half-perimeter of their pins' bounding box, then island count).
 *
 * Rip-up and re-route: when a net finds no path, a second search may cross other nets'
 * wires at a price; the nets it crosses lose all their wires, the failed net routes, and the
 * ripped nets queue up again. Each net is ripped up at most a few times, so the loop ends;
 * nets still failing are left for links (route.ts).
 */
import { hasExit } from './exits.ts';
import { blockers, connect } from './maze.ts';
import type { Scratch } from './search.ts';
import { replayWire } from './replay.ts';
import { cloneState, components, find, isMulti, type RouteState } from './state.ts';

const MAX_RIPS = 3;

export function wireIslands(st: RouteState, sc: Scratch): RouteState {
  const nets: { net: number; key: number }[] = [];
  const cols = st.copper.cols;
  const box = new Map<number, [number, number, number, number]>();
  for (let h = 0; h < st.copper.holes; h++) {
    const n = st.leadNet[h]!;
    if (n < 0 || n >= st.realNets) continue;
    const x = h % cols;
    const y = (h - x) / cols;
    const b = box.get(n);
    if (!b) box.set(n, [x, x, y, y]);
    else {
      b[0] = Math.min(b[0], x);
      b[1] = Math.max(b[1], x);
      b[2] = Math.min(b[2], y);
      b[3] = Math.max(b[3], y);
    }
  }
  for (let n = 0; n < st.realNets; n++) {
    const segs = st.netSegs[n]!;
    if (segs.length < 2 || !segs.some((s) => !isMulti(st, s))) continue;
    const b = box.get(n)!;
    nets.push({ net: n, key: (b[1] - b[0] + b[3] - b[2]) * 1024 + segs.length });
  }
  if (nets.length === 0) return st;
  const queue = nets.sort((a, b) => a.key - b.key || a.net - b.net).map((e) => e.net);
  const rips = new Int32Array(st.netCount);
  let cur = cloneState(st);
  while (queue.length) {
    const n = queue.shift()!;
    const stuck = wireNet(cur, sc, n);
    if (stuck < 0) continue;
    if (!hasExit(cur, n, stuck, true)) continue;
    const victims = blockers(cur, sc, n, stuck);
    if (!victims || victims.length === 0 || victims.some((v) => rips[v]! >= MAX_RIPS)) continue;
    for (const v of victims) rips[v]!++;
    cur = withoutWires(st, cur, victims);
    wireNet(cur, sc, n);
    queue.push(...victims);
  }
  return cur;
}

/** Route one net's lone-hole islands; the root that found no path, or −1 when done. */
function wireNet(st: RouteState, sc: Scratch, net: number): number {
  const hasStrip = st.netSegs[net]!.some((s) => isMulti(st, s));
  for (;;) {
    const comps = components(st, net);
    if (comps.length <= 1) return -1;
    const root = hasStrip ? comps.find((r) => st.netSegs[net]!.every((s) => find(st, s) !== r || !isMulti(st, s))) : comps[0];
    if (root === undefined) return -1;
    if (!connect(st, sc, net, root, { wires: true, links: false, unowned: false })) return root;
  }
}

/** The wiring so far minus every wire of the `victims` nets, rebuilt from the base state. */
function withoutWires(base: RouteState, cur: RouteState, victims: number[]): RouteState {
  const next = cloneState(base);
  const w = cur.wires;
  for (let i = 0; i < w.length; i += 3) if (!victims.includes(w[i + 2]!)) replayWire(next, w[i]!, w[i + 1]!, w[i + 2]!);
  return next;
}
