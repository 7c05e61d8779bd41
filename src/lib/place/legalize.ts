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

/** Conductor and net of each lead of the pose being scored (scratch, grown on demand). */
let leadCond = new Int32Array(64);
let leadNet = new Int32Array(64);

/** Pairs of a pose's leads on one conductor with different nets: cuts the part makes alone. */
function ownConflicts(s: PlaceState, p: number, x: number, y: number, pose: number): number {
  const nets = s.pinNet[p]!;
  const q = s.pinOff[s.poseBase[p]! + pose]!;
  if (nets.length > leadCond.length) {
    leadCond = new Int32Array(nets.length * 2);
    leadNet = new Int32Array(nets.length * 2);
  }
  let extra = 0;
  for (let i = 0; i < nets.length; i++) {
    const c = s.map.cond[x + s.pinX[q + i]! + (y + s.pinY[q + i]!) * s.W]!;
    const net = nets[i]!;
    // A net new to a conductor that already has one: one more cut.
    let sameCond = false;
    let seen = false;
    for (let j = 0; j < i && !seen; j++) {
      if (leadCond[j] !== c) continue;
      sameCond = true;
      seen = leadNet[j] === net;
    }
    if (!seen && sameCond) extra++;
    leadCond[i] = c;
    leadNet[i] = net;
  }
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
      for (let k = 0; k < part.poses.length; k++) {
        const pose = part.poses[k]!;
        const ax = Math.round(c.x - (pose.minX + pose.maxX) / 2);
        const ay = Math.round(c.y - (pose.minY + pose.maxY) / 2);
        const spanCost = part.fp.span && pose.span !== undefined ? 0.5 * Math.abs(pose.span - part.fp.span.preferred) : 0;
        for (let dx = -d; dx <= d; dx++) {
          const rest = d - Math.abs(dx);
          // rest 0: one site (dy 0); otherwise dy −rest, then +rest
          for (let dy = -rest; dy <= rest; dy += rest ? 2 * rest : 1) {
            const x = ax + dx;
            const y = ay + dy;
            if (!s.fitsAt(p, x, y, k)) continue;
            const score = CONFLICT * ownConflicts(s, p, x, y, k) + d + spanCost;
            if (score < bestScore) {
              bestScore = score;
              best = { x, y, pose: k };
            }
          }
        }
      }
    }
    if (best) s.place(p, best);
    else failed.push(p);
  }
  s.settle();
  return failed;
}
