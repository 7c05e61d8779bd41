/**
 * `insulatedLinks(st, nets): number[]` — the last resort for nets still in pieces, used only
 * when the options allow it: an insulated wire link on the component side between the
 * nearest two free landing holes of two of the net's islands, in any direction. It lies over
 * whatever is between its ends (sleeved hook-up wire, common practice for a long hop), so it
 * blocks nothing but its two holes; the exchange contract joins a link's two ends only.
 * Nets in number order, nearest pair first (shortest wire), ties by hole index. Returns the
 * nets that stay in pieces (an island with no free landing hole at all).
 */
import { claimHole } from './claims.ts';
import { landingSeg } from './landing.ts';
import { claimSegment, components, find, segmentHoles, union, type RouteState } from './state.ts';

/** Landing holes of one component of `net`: free holes on copper it owns or may claim on its side. */
function landings(st: RouteState, net: number, root: number): number[] {
  const holes: number[] = [];
  for (const s of st.netSegs[net]!) if (find(st, s) === root) segmentHoles(st, s, holes);
  return [...new Set(holes)].filter((h) => landingSeg(st, h, net, false, false) >= 0).sort((a, b) => a - b);
}

export function insulatedLinks(st: RouteState, nets: number[]): number[] {
  const { cols } = st.copper;
  const left: number[] = [];
  for (const net of nets) {
    for (;;) {
      const comps = components(st, net);
      if (comps.length <= 1) break;
      const mine = landings(st, net, comps[0]!);
      let best: [number, number] | undefined;
      let bestD = Infinity;
      for (const other of comps.slice(1)) {
        for (const b of landings(st, net, other)) {
          const bx = b % cols;
          const by = (b - bx) / cols;
          for (const a of mine) {
            const d = Math.abs((a % cols) - bx) + Math.abs(Math.floor(a / cols) - by);
            // Two ends in one gap would need claims on one side that may not fit together.
            if (d < bestD && (st.cut.gapOf[a]! < 0 || st.cut.gapOf[a] !== st.cut.gapOf[b])) {
              bestD = d;
              best = [a, b];
            }
          }
        }
      }
      if (!best) {
        left.push(net);
        break;
      }
      const [a, b] = best;
      const sa = landingSeg(st, a, net, false, false);
      claimHole(st, a, net);
      const sb = landingSeg(st, b, net, false, false);
      if (sb < 0) throw new Error(`route: insulated link end ${b} of net ${net} lost its landing`);
      claimHole(st, b, net);
      st.linkUse[a] = net + 1;
      st.linkUse[b] = net + 1;
      st.leadNet[a] = net;
      st.leadNet[b] = net;
      claimSegment(st, sa, net);
      claimSegment(st, sb, net);
      union(st, sa, sb);
      st.links.push(a, b, net);
    }
  }
  return left;
}
