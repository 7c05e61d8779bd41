/**
 * `insulatedLinks(base, st, scratch, nets): { st, left, links }` — the last resort for the
 * nets joinRest left in pieces, used only when the options allow it: an insulated wire link
 * on the component side between the nearest two free landing holes of the net's first
 * island (in component order) and any other (row plus column distance), again while it is
 * in pieces. It lies over whatever is between its ends (sleeved
 * hook-up wire, common practice for a long hop), so it blocks nothing but its two holes; the
 * exchange contract joins a link's two ends only. Every reader tells it from a bare link by
 * its geometry: its ends are in different rows and columns, or, in one row or column, it
 * passes over a pin (two islands of one strip with other nets' leads between them) — the
 * drawing and the bench guide mark a link insulated when it is bent or straight over a pin,
 * which no bare link of the router's is (render/insulated.ts).
 *
 * An island with no free landing hole because other nets' straight links pass over (or end
 * in) its copper or the gaps beside it, or their relay islands lie beside it, gets room: the
 * state is rebuilt from `base` (the state before any link) without those nets' links, the
 * stuck net is joined (by the maze search from the freed island where it finds a way, else
 * by insulated links), and each ripped net is joined again by the maze search (plain, then
 * with relay islands) and insulated links for what is left. All hemmed islands of the net
 * are freed at once (the k-th covering net of each, then the first TRIES of each together);
 * a ripped net that is left hemmed in itself may rip up others in turn, once (DEPTH). The
 * rip-up is kept only when it joins an island of the stuck net and leaves every ripped net
 * in no more pieces than before; at most TRIES + 1 sets of nets, two tries each, and ROUNDS
 * rip-ups per net, so it ends. Nets in number order, nearest pair first, ties by hole
 * index. Returns the final state, the nets still in pieces (a subset of `nets`) and
 * the insulated links as flat (hole, hole, net) triples in the order they were placed.
 */
import { landLink, landingSeg, lineStep } from './landing.ts';
import { connect } from './maze.ts';
import { replay } from './replay.ts';
import { reserveScarce } from './reserve.ts';
import { PLAIN, RELAYS, type Scratch } from './search.ts';
import { components, find, isMulti, segmentHoles, type RouteState } from './state.ts';

/** Covering nets tried per stuck island, in hole order: each try replays the whole state. */
const TRIES = 3;
/** How deep a ripped net may rip up others in turn to get back together. */
const DEPTH = 1;
/** Rip-ups kept per net, each freeing one stuck island: bounds the work. */
const ROUNDS = 3;

export interface Insulated {
  st: RouteState;
  left: number[];
  links: number[];
}

export function insulatedLinks(base: RouteState, start: RouteState, sc: Scratch, nets: number[]): Insulated {
  let st = start;
  let links: number[] = [];
  for (const net of nets)
    for (let round = 0; round < ROUNDS && !joinNet(st, net, links); round++) {
      const freed = makeRoom(base, st, sc, net, links);
      if (!freed) break;
      [st, links] = freed;
    }
  // Whatever was tried, a net in pieces is reported: never a partial layout.
  return { st, left: nets.filter((n) => components(st, n).length > 1), links };
}

/** Landing holes of one component of `net`: free holes on copper it owns or may claim on its side. */
function landings(st: RouteState, net: number, root: number): number[] {
  const holes: number[] = [];
  for (const s of st.netSegs[net]!) if (find(st, s) === root) segmentHoles(st, s, holes);
  return [...new Set(holes)].filter((h) => landingSeg(st, h, net, false, false) >= 0).sort((a, b) => a - b);
}

/** Join the components of `net` by insulated links while landing holes allow; whether it is whole. */
function joinNet(st: RouteState, net: number, links: number[]): boolean {
  const { cols } = st.copper;
  for (;;) {
    const comps = components(st, net);
    if (comps.length <= 1) return true;
    const mine = landings(st, net, comps[0]!);
    let best: [number, number] | undefined;
    let bestD = Infinity;
    for (const other of comps.slice(1)) {
      for (const b of landings(st, net, other)) {
        const bx = b % cols;
        const by = (b - bx) / cols;
        for (const a of mine) {
          const ax = a % cols;
          const ay = (a - ax) / cols;
          const d = Math.abs(ax - bx) + Math.abs(ay - by);
          // Two ends in one gap would need claims on one side that may not fit together.
          if (d < bestD && (st.cut.gapOf[a]! < 0 || st.cut.gapOf[a] !== st.cut.gapOf[b]) && ((ax !== bx && ay !== by) || overPin(st, a, b))) {
            bestD = d;
            best = [a, b];
          }
        }
      }
    }
    if (!best) return false;
    if (!placeInsulated(st, best[0], best[1], net)) throw new Error(`route: insulated link ${best[0]}→${best[1]} of net ${net} lost its landing`);
    links.push(best[0], best[1], net);
  }
}

/** Whether the straight line from a to b (one row or column) passes over a pin between its ends. */
function overPin(st: RouteState, a: number, b: number): boolean {
  const step = lineStep(st, a, b);
  for (let h = a + step; h !== b; h += step) if (st.pin[h]) return true;
  return false;
}

/**
 * Place an insulated link of `net` if both ends may land now (`islands`: per hole, the relay
 * island a claim there must join, as in replay); whether it was placed. Its ends lie in two
 * different gaps (or none), so their claims never meet.
 */
function placeInsulated(st: RouteState, a: number, b: number, net: number, islands?: Int32Array): boolean {
  return landLink(st, a, b, net, false, islands, 0);
}

/**
 * Rebuild `cur` from `base` without the links of `drop`: replay puts back the wires and the
 * straight links, then the insulated ones go back by placeInsulated (a hole holds one lead,
 * so a link's first end names it). Returns the state and the insulated links kept.
 */
function rebuild(base: RouteState, cur: RouteState, links: number[], drop: ReadonlySet<number>): [RouteState, number[]] {
  const insulated = new Set<number>();
  for (let i = 0; i < links.length; i += 3) insulated.add(links[i]!);
  const straight: number[] = [];
  for (let i = 0; i < cur.links.length; i += 3) if (!insulated.has(cur.links[i]!)) straight.push(cur.links[i]!, cur.links[i + 1]!, cur.links[i + 2]!);
  const next = replay(base, { ...cur, links: straight }, drop);
  const kept: number[] = [];
  for (let i = 0; i < links.length; i += 3) {
    const [a, b, net] = [links[i]!, links[i + 1]!, links[i + 2]!];
    if (drop.has(net)) continue;
    if (!placeInsulated(next, a, b, net, cur.claimSeg)) throw new Error(`route: replayed insulated link ${a}→${b} no longer fits`);
    kept.push(a, b, net);
  }
  return [next, kept];
}

/**
 * Other nets whose links pass over or end in a hole of component `root` of `net` that could
 * otherwise take a link end (no pin, no body), or whose relay islands lie there, in hole
 * order: the island's own holes and every hole of the gaps beside its segments, claimed or
 * not (a neighbour's link end in the gap moves the cut towards the island and takes the hole
 * it could have landed in).
 */
function coveringNets(st: RouteState, net: number, root: number): number[] {
  const holes: number[] = [];
  for (const s of st.netSegs[net]!) if (find(st, s) === root) {
    segmentHoles(st, s, holes);
    gapHoles(st, s, holes);
  }
  const out: number[] = [];
  for (const h of [...new Set(holes)].sort((a, b) => a - b)) {
    const v = st.linkUse[h]! - 1;
    if (v >= 0 && v !== net && st.pin[h] === 0 && st.body[h] === 0 && !out.includes(v)) out.push(v);
    // A relay island of another net in the gap takes the holes beside it too (cut room).
    const r = st.claimSeg[h]!;
    const w = r >= 0 ? st.owner[r]! : -1;
    if (w >= 0 && w !== net && !out.includes(w)) out.push(w);
  }
  return out;
}

/** Every hole of the gaps on either side of segment `s` (none for a relay island or a lone hole). */
function gapHoles(st: RouteState, s: number, out: number[]): void {
  const { cut, copper } = st;
  if (!isMulti(st, s) || cut.segGap[s]! >= 0) return;
  const start = copper.condStart[cut.segCond[s]!]!;
  for (const g of [cut.segLowGap[s]!, cut.segHighGap[s]!]) if (g >= 0) for (let p = cut.gapI[g]! + 1; p < cut.gapJ[g]!; p++) out.push(copper.condHoles[start + p]!);
}

/**
 * Free the islands of `net` with no landing hole by ripping up nets whose links cover them
 * (see the module comment): the k-th covering net of each such island at once (both ends of
 * a net may be hemmed in, and freeing one alone joins nothing). The new state and insulated
 * links, or undefined when no try joins an island.
 */
function makeRoom(base: RouteState, st: RouteState, sc: Scratch, net: number, links: number[], depth = 0): [RouteState, number[]] | undefined {
  const comps = components(st, net);
  const stuck = comps.filter((r) => landings(st, net, r).length === 0);
  // Roots may change in a rebuild; a segment of each island names it across.
  const segs = stuck.map((r) => st.netSegs[net]!.find((s) => find(st, s) === r)!);
  const covering = stuck.map((r) => coveringNets(st, net, r)).filter((c) => c.length);
  if (!covering.length) return undefined;
  const tried = new Set<string>();
  // The k-th covering net of each island, then the first TRIES of each together (an island
  // may be hemmed in by two nets at once: one's link over it, another's relay island beside it).
  const sets = Array.from({ length: TRIES }, (_, k) => covering.map((c) => c[Math.min(k, c.length - 1)]!));
  sets.push(covering.flatMap((c) => c.slice(0, TRIES)));
  for (const set of sets) {
    const drop = [...new Set(set)].sort((a, b) => a - b);
    if (tried.has(drop.join())) continue;
    tried.add(drop.join());
    const had = drop.map((v) => components(st, v).length);
    // First the maze search from the freed islands (a straight link or wire beats an
    // insulated one); if its path leaves a ripped net no way back, insulated links only.
    for (const maze of [true, false]) {
      const [next, kept] = rebuild(base, st, links, new Set(drop));
      const free = segs.filter((s) => landings(next, net, find(next, s)).length > 0);
      if (!free.length) break;
      reserveScarce(next);
      let mazed = false;
      if (maze) for (const s of free) if (components(next, net).length > 1 && connect(next, sc, net, find(next, s), PLAIN)) mazed = true;
      joinNet(next, net, kept);
      if (components(next, net).length < comps.length) {
        for (const v of drop) rejoin(next, sc, v, kept);
        let done: [RouteState, number[]] | undefined = [next, kept];
        // A ripped net left hemmed in may make room for itself in turn, once (DEPTH).
        for (let i = 0; i < drop.length && done && depth < DEPTH; i++)
          if (components(done[0], drop[i]!).length > had[i]!) done = makeRoom(base, done[0], sc, drop[i]!, done[1], depth + 1);
        if (done && components(done[0], net).length < comps.length && drop.every((v, i) => components(done[0], v).length <= had[i]!)) return done;
      }
      if (!mazed) break; // this try was the insulated-only one already
    }
  }
  return undefined;
}

/** Join a ripped net again: maze search as joinRest does (no further rip-up), then insulated links. */
function rejoin(st: RouteState, sc: Scratch, net: number, links: number[]): void {
  reserveScarce(st);
  for (const opts of [PLAIN, RELAYS])
    for (;;) {
      const comps = components(st, net);
      if (comps.length <= 1) return;
      if (!connect(st, sc, net, comps[0]!, opts)) break;
    }
  joinNet(st, net, links);
}
