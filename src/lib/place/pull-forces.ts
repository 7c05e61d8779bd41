/**
 * Custom forces for the global placement, each a small closure keeping d3-force's force
 * contract (`force(alpha)` nudges node velocities; `force.initialize(nodes)` receives the
 * nodes): `forceToward` pulls chosen nodes toward a line (an edge of the board area),
 * `forceInside` keeps every node's body within the area.
 */
import type { SimulationNodeDatum } from 'd3-force';

export interface BodyNode extends SimulationNodeDatum {
  x: number;
  y: number;
  r: number;
}

export interface Force<N extends SimulationNodeDatum> {
  (alpha: number): void;
  initialize(nodes: N[], random: () => number): void;
}

/** Pull node i toward x = target(i) (axis 'x') or y = target(i), with strength(i) (0 = none). */
export function forceToward<N extends BodyNode>(axis: 'x' | 'y', target: (n: N) => number, strength: (n: N) => number): Force<N> {
  let nodes: N[] = [];
  const force = ((alpha: number) => {
    for (const n of nodes) {
      const k = strength(n);
      if (!k) continue;
      if (axis === 'x') n.vx = (n.vx ?? 0) + (target(n) - n.x) * k * alpha;
      else n.vy = (n.vy ?? 0) + (target(n) - n.y) * k * alpha;
    }
  }) as Force<N>;
  force.initialize = (list) => {
    nodes = list;
  };
  return force;
}

/** Keep each body inside [0, w] × [0, h]: a node about to leave is turned back. */
export function forceInside<N extends BodyNode>(w: number, h: number): Force<N> {
  let nodes: N[] = [];
  const force = ((_alpha: number) => {
    for (const n of nodes) {
      const nx = n.x + (n.vx ?? 0);
      const ny = n.y + (n.vy ?? 0);
      const rx = Math.min(n.r, w / 2);
      const ry = Math.min(n.r, h / 2);
      if (nx < rx) n.vx = rx - n.x;
      else if (nx > w - rx) n.vx = w - rx - n.x;
      if (ny < ry) n.vy = ry - n.y;
      else if (ny > h - ry) n.vy = h - ry - n.y;
    }
  }) as Force<N>;
  force.initialize = (list) => {
    nodes = list;
  };
  return force;
}
