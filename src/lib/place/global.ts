/**
 * `globalPlace(problem, area, rng, fixed, ticks): {x, y}[]` — rough part centres by a
 * force model (force-directed placement, Quinn and Breuer 1979, via d3-force).
 *
 * Parts are bodies with a radius from their footprint; nets pull their parts together
 * (a clique of links for nets on up to four parts, a star through a net node for bigger
 * ones, so a ground net on forty parts does not make 780 springs); bodies collide.
 * Weak pulls: off-board parts toward their edge, parts on input nets toward the left and
 * on output nets toward the right, supply-heavy parts toward their supply's edge. Fixed
 * (locked) parts stay put. The simulation is stopped at once and ticked `ticks` times with
 * our seeded generator as its random source; nodes are copies, positions are copied out.
 */
import { forceCollide, forceLink, forceSimulation } from 'd3-force';
import type { SimulationLinkDatum } from 'd3-force';
import type { PlaceProblem } from './problem.ts';
import type { Rng } from './rng.ts';
import { forceInside, forceToward, type BodyNode } from './pull-forces.ts';

interface Node extends BodyNode {
  part: number;
}

/** A clique costs k(k−1)/2 springs; past this many parts a star is cheaper. */
const CLIQUE_MAX = 4;

export function globalPlace(
  problem: PlaceProblem,
  area: { w: number; h: number },
  rng: Rng,
  fixed: Map<number, { x: number; y: number }>,
  ticks: number,
): { x: number; y: number }[] {
  const { w, h } = area;
  const nodes: Node[] = problem.parts.map((p, i) => {
    const pose = p.poses[0]!;
    const r = 0.5 * Math.hypot(pose.maxX - pose.minX + 1, pose.maxY - pose.minY + 1) + 0.3;
    const f = fixed.get(i);
    const n: Node = { part: i, r, x: f ? f.x : rng.next() * w, y: f ? f.y : rng.next() * h };
    if (f) {
      n.fx = f.x;
      n.fy = f.y;
    }
    return n;
  });
  const links: SimulationLinkDatum<Node>[] = [];
  const strengths: number[] = [];
  const byNet = new Map<number, Set<number>>();
  problem.parts.forEach((p, i) =>
    p.pinNet.forEach((n) => {
      if (problem.nets[n]!.open) return;
      let set = byNet.get(n);
      if (!set) byNet.set(n, (set = new Set()));
      set.add(i);
    }),
  );
  for (const members of byNet.values()) {
    const list = [...members];
    const k = list.length;
    if (k < 2) continue;
    if (k <= CLIQUE_MAX) {
      for (let a = 0; a < k; a++)
        for (let b = a + 1; b < k; b++) {
          links.push({ source: nodes[list[a]!]!, target: nodes[list[b]!]! });
          strengths.push(0.6 / (k - 1));
        }
    } else {
      const hub: Node = { part: -1, r: 0, x: w / 2, y: h / 2 };
      nodes.push(hub);
      for (const m of list) {
        links.push({ source: hub, target: nodes[m]! });
        strengths.push(1.2 / k);
      }
    }
  }
  const partOf = (n: Node) => (n.part >= 0 ? problem.parts[n.part]! : undefined);
  const sim = forceSimulation<Node>(nodes)
    .stop()
    .randomSource(() => rng.next())
    .force(
      'nets',
      forceLink<Node, SimulationLinkDatum<Node>>(links)
        .distance((l) => ((l.source as Node).r + (l.target as Node).r) * 0.8)
        .strength((_l, i) => strengths[i]!),
    )
    .force('collide', forceCollide<Node>((n) => n.r).strength(0.9))
    .force('centreX', forceToward<Node>('x', () => w / 2, (n) => (n.part >= 0 ? 0.02 : 0)))
    .force('centreY', forceToward<Node>('y', () => h / 2, (n) => (n.part >= 0 ? 0.02 : 0)))
    .force(
      'edgeX',
      forceToward<Node>(
        'x',
        (n) => (partOf(n)?.edge === 'right' ? w - n.r : n.r),
        (n) => {
          const p = partOf(n);
          return p?.edge === 'left' || p?.edge === 'right' ? 0.15 : 0;
        },
      ),
    )
    .force(
      'flowX',
      forceToward<Node>('x', (n) => ((partOf(n)?.flow ?? 0) > 0 ? w - n.r : n.r), (n) => {
        const p = partOf(n);
        return p && !p.edge && p.flow ? 0.04 : 0;
      }),
    )
    .force(
      'edgeY',
      forceToward<Node>(
        'y',
        (n) => {
          const p = partOf(n);
          if (p?.edge === 'top') return n.r;
          if (p?.edge === 'bottom') return h - n.r;
          return (p?.supplyPull ?? 0) < 0 ? n.r : h - n.r;
        },
        (n) => {
          const p = partOf(n);
          if (p?.edge === 'top' || p?.edge === 'bottom') return 0.15;
          return p && p.supplyPull ? (0.03 * Math.abs(p.supplyPull)) / p.pinNet.length : 0;
        },
      ),
    )
    .force('inside', forceInside<Node>(w, h));
  sim.tick(ticks);
  return problem.parts.map((_, i) => ({ x: nodes[i]!.x, y: nodes[i]!.y }));
}
