/**
 * `legalize(state, centres, fixed): number[]` — snap the force model's part centres onto
 * the hole grid. Returns the parts that found no site (empty on success).
 *
 * Locked parts go down first at their given spots, then the rest, largest body first
 * (placement-notes.md). Each part takes the nearest free legal site to its centre, rings
 * of growing distance searched in turn; at each site every pose is scored by how many of
 * the part's own leads of different nets would share a conductor (so two-lead parts stand
 * across strips, a TO-92 spans three strips and a DIP straddles with one pin per side on
 * each strip — none of it named by kind), then by distance and by how far its span is from
 * the footprint's preferred span.
 */
import type { PlaceState, Spot } from './state.ts';

const CONFLICT = 20;

/** Pairs of a pose's leads on one conductor with different nets: cuts the part makes alone. */
function ownConflicts(s: PlaceState, p: number, spot: Spot): number {
  const pose = s.problem.parts[p]!.poses[spot.pose]!;
  const nets = s.pinNet[p]!;
  const seen = new Map<number, Set<number>>();
  let extra = 0;
  pose.pins.forEach((o, i) => {
    const c = s.map.cond[spot.x + o[0] + (spot.y + o[1]) * s.W]!;
    let set = seen.get(c);
    if (!set) seen.set(c, (set = new Set()));
    if (!set.has(nets[i]!)) {
      if (set.size > 0) extra++;
      set.add(nets[i]!);
    }
  });
  return extra;
}

export function legalize(s: PlaceState, centres: { x: number; y: number }[], fixed: Map<number, Spot>): number[] {
  const parts = s.problem.parts;
  const failed: number[] = [];
  for (const [p, spot] of fixed) {
    if (s.fits(p, spot)) s.place(p, spot);
    else failed.push(p);
  }
  const order = parts
    .map((_, i) => i)
    .filter((i) => !fixed.has(i))
    .sort((a, b) => parts[b]!.cells - parts[a]!.cells || a - b);
  const maxD = s.W + s.H;
  for (const p of order) {
    const part = parts[p]!;
    const c = centres[p]!;
    let best: Spot | undefined;
    let bestScore = Infinity;
    for (let d = 0; d <= maxD && d < bestScore; d++) {
      part.poses.forEach((pose, k) => {
        const ax = Math.round(c.x - (pose.minX + pose.maxX) / 2);
        const ay = Math.round(c.y - (pose.minY + pose.maxY) / 2);
        const spanCost = part.fp.span && pose.span !== undefined ? 0.5 * Math.abs(pose.span - part.fp.span.preferred) : 0;
        for (let dx = -d; dx <= d; dx++) {
          const rest = d - Math.abs(dx);
          for (const dy of rest === 0 ? [0] : [-rest, rest]) {
            const spot = { x: ax + dx, y: ay + dy, pose: k };
            if (!s.fits(p, spot)) continue;
            const score = CONFLICT * ownConflicts(s, p, spot) + d + spanCost;
            if (score < bestScore) {
              bestScore = score;
              best = spot;
            }
          }
        }
      });
    }
    if (best) s.place(p, best);
    else failed.push(p);
  }
  s.settle();
  return failed;
}
