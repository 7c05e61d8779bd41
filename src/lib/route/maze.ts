/**
 * `connect(st, scratch, net, root, opts): boolean` — join the component `root` of `net` to
 * any other component of that net along the cheapest path search.ts finds, and build it:
 * wires, links, claims of gap holes, of free copper and of relay islands. When two steps of
 * one path would collide (a link over a link of the same path, claims that leave a gap no
 * room for its cut), the later landing is blocked and the search runs again, a few times at
 * most.
 *
 * `blockers(...)` and `linkBlockers(...)` run the search allowed to cross other nets'
 * copper-side wires, or other nets' links, at a price, and name the nets in the way (for
 * rip-up and re-route: wiring.ts, join.ts).
 */
import { LOW, claimHole, claimOk, gapSegOf, gapSide } from './claims.ts';
import { lineStep, placeLink } from './landing.ts';
import { COPPER, LINK, WIRE, foreignLink, search, type Scratch, type SearchOptions } from './search.ts';
import { claimSegment, copperSegOf, union, type RouteState } from './state.ts';

const RETRIES = 6;

/**
 * The first hole of `path` that collides with an earlier step of it (a link over a link, two
 * claims that leave a gap no room for its cut), or −1 when the path can be built.
 */
function collision(st: RouteState, sc: Scratch, net: number, path: number[]): number {
  const used = new Set<number>();
  const claims = new Map<number, [number, number]>();
  const claim = (h: number): boolean => {
    const g = st.cut.gapOf[h]!;
    if (g < 0) return true;
    const side = gapSide(st, g, net);
    // Relay island claims of one path fit together when each fits alone: each keeps a cut's
    // room from the other nets' claims, and those do not move while the path is built.
    if (side < 0) return gapSegOf(st, h, net) >= 0;
    const c = claims.get(g) ?? [st.claimLo[g]!, st.claimHi[g]!];
    const pos = st.copper.posOf[h]!;
    if (!claimOk(st, g, pos, side, c[0], c[1])) return false;
    if (side === LOW) c[0] = Math.max(c[0], pos);
    else c[1] = Math.min(c[1], pos);
    claims.set(g, c);
    return true;
  };
  for (let i = 1; i < path.length; i++) {
    const kind = sc.kind[path[i]!];
    const a = (path[i - 1]! / 5) | 0;
    const b = (path[i]! / 5) | 0;
    if (kind === WIRE) {
      if (!claim(a) || !claim(b)) return b;
    } else if (kind === LINK) {
      const step = lineStep(st, a, b);
      for (let h = a; ; h += step) {
        if (used.has(h)) return b;
        if (h === b) break;
      }
      if (!claim(a) || !claim(b)) return b;
      for (let h = a; ; h += step) {
        used.add(h);
        if (h === b) break;
      }
    }
  }
  return -1;
}

function apply(st: RouteState, sc: Scratch, net: number, root: number, path: number[]): void {
  for (let i = 1; i < path.length; i++) {
    const a = (path[i - 1]! / 5) | 0;
    const b = (path[i]! / 5) | 0;
    const kind = sc.kind[path[i]!];
    if (kind === WIRE) {
      st.wires.push(a, b, net);
      for (const h of [a, b]) {
        const s = copperSegOf(st, h, net);
        if (s < 0) throw new Error(`route: wire step onto hole ${h} that ${net} cannot use`);
        claimHole(st, h, net);
        claimSegment(st, s, net);
        union(st, root, s);
      }
    } else if (kind === LINK) {
      if (!placeLink(st, a, b, net, true)) throw new Error(`route: a checked link ${a}→${b} could not be placed`);
      union(st, root, copperSegOf(st, a, net));
    } else if (kind === COPPER) {
      const s = copperSegOf(st, b, net);
      claimSegment(st, s, net);
      union(st, root, s);
    }
  }
  const last = (path[path.length - 1]! / 5) | 0;
  union(st, root, copperSegOf(st, last, net));
}

/**
 * Nets whose copper-side wires block every path of `root` (of `net`) to the rest of its
 * net, cheapest crossing first; undefined when no path exists even through them.
 */
export function blockers(st: RouteState, sc: Scratch, net: number, root: number): number[] | undefined {
  const path = search(st, sc, net, root, { wires: true, links: false, unowned: false, throughWires: true });
  if (!path) return undefined;
  const out: number[] = [];
  for (const state of path) {
    const s = st.cut.segOf[(state / 5) | 0]!;
    const o = s >= 0 ? st.owner[s]! : -1;
    if (o >= 0 && o !== net && !out.includes(o)) out.push(o);
  }
  return out;
}

/**
 * Nets whose links stand in the way of joining `root` (of `net`) to the rest of its net,
 * found by a search whose links may pass over other links at a price (and, with `relays`,
 * start relay islands); undefined when no path exists even so.
 */
export function linkBlockers(st: RouteState, sc: Scratch, net: number, root: number, relays: boolean): number[] | undefined {
  const path = search(st, sc, net, root, { wires: true, links: true, unowned: true, throughLinks: true, relays });
  if (!path) return undefined;
  const out: number[] = [];
  for (let i = 1; i < path.length; i++) {
    if (sc.kind[path[i]!] !== LINK) continue;
    const a = (path[i - 1]! / 5) | 0;
    const b = (path[i]! / 5) | 0;
    const step = lineStep(st, a, b);
    for (let h = a + step; h !== b; h += step) {
      const o = foreignLink(st, h, net);
      if (o >= 0 && !out.includes(o)) out.push(o);
    }
  }
  return out;
}

/** Join `root` to another component of `net`; false when no path exists. */
export function connect(st: RouteState, sc: Scratch, net: number, root: number, opts: SearchOptions): boolean {
  const blockedNow: number[] = [];
  try {
    for (let attempt = 0; attempt < RETRIES; attempt++) {
      const path = search(st, sc, net, root, opts);
      if (!path) return false;
      const bad = collision(st, sc, net, path);
      if (bad < 0) {
        apply(st, sc, net, root, path);
        return true;
      }
      sc.blocked[bad] = 1;
      blockedNow.push(bad);
    }
    return false;
  } finally {
    for (const h of blockedNow) sc.blocked[h] = 0;
  }
}
