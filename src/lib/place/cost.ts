/**
 * `placementCost(state, weights?): CostParts` — the true cost of a placement, in the order
 * builders mind it (placement-notes.md): cuts and links first, then link length, then
 * board area (the bounding box of all bodies: the board is cut to size), then tidiness
 * (off-board pads at their edge, inputs left and outputs right, supply nets at the top and
 * bottom edges when `supplyAtEdges`). On a pad board cuts and links mean nothing, and the
 * half-perimeter wire length per net and a congestion term (congestion.ts) take their place.
 *
 * Default weights (ours, tuned on the demo circuits): a cut 10, a link 12, one hole of link
 * length 1, one hole of area 0.25, one hole of tidiness 0.15 (0.5 for pads off their edge); on pad boards one
 * hole of wire 3 and one wire of congestion 5; routability (strip boards): a stranded
 * segment 40, a blocked link lane 20.
 */
import type { PlaceState } from './state.ts';
import { linkShortfall } from './link-plan.ts';
import { padCongestion } from './congestion.ts';

export interface CostWeights {
  cut: number;
  link: number;
  length: number;
  area: number;
  tidy: number;
  edge: number;
  wire: number;
  /** A wire over the comfortable number across a row or column of a pad board. */
  congestion: number;
  /** A segment that needs a link but has no free hole for one. */
  stranded: number;
  /** Two segments of a net with no clear straight link between them (strip boards). */
  blocked: number;
  /** A join the greedy link plan cannot make (0: not computed; used when polishing). */
  shortfall: number;
  /** Leads of different nets side by side when cuts must be drilled (cutStyle 'hole'). */
  cramped: number;
  supplyAtEdges: boolean;
}

export const DEFAULT_WEIGHTS: CostWeights = { cut: 10, link: 12, length: 1, area: 0.25, tidy: 0.15, edge: 0.5, wire: 3, congestion: 5, stranded: 40, blocked: 20, shortfall: 0, cramped: 0, supplyAtEdges: true };

export interface CostParts {
  total: number;
  cuts: number;
  links: number;
  length: number;
  area: number;
  tidy: number;
  stranded: number;
}

export function placementCost(s: PlaceState, w: CostWeights = DEFAULT_WEIGHTS): CostParts {
  const b = s.bounds();
  if (!b) return { total: 0, cuts: 0, links: 0, length: 0, area: 0, tidy: 0, stranded: 0 };
  const area = (b.x1 - b.x0 + 1) * (b.y1 - b.y0 + 1);
  let tidy = 0;
  let edge = 0;
  const parts = s.problem.parts;
  for (const p of s.problem.leaning) {
    const part = parts[p]!;
    const k = s.pose[p]!;
    if (k < 0) continue;
    const pose = part.poses[k]!;
    const px0 = s.x[p]! + pose.minX;
    const px1 = s.x[p]! + pose.maxX;
    const py0 = s.y[p]! + pose.minY;
    const py1 = s.y[p]! + pose.maxY;
    if (part.edge === 'left') edge += px0 - b.x0;
    else if (part.edge === 'right') edge += b.x1 - px1;
    else if (part.edge === 'top') edge += py0 - b.y0;
    else if (part.edge === 'bottom') edge += b.y1 - py1;
    if (part.flow < 0) tidy += px0 - b.x0;
    else if (part.flow > 0) tidy += b.x1 - px1;
  }
  if (w.supplyAtEdges) {
    const nets = s.problem.nets;
    for (let n = 0; n < nets.length; n++) {
      const e = nets[n]!.supplyEdge;
      if (!e || s.netHoles[n]!.length === 0) continue;
      tidy += e === 'top' ? s.netMinY[n]! - b.y0 : b.y1 - s.netMaxY[n]!;
    }
  }
  const tidyCost = w.tidy * tidy + w.edge * edge;
  if (s.map.padLike) {
    const length = w.wire * s.lenSum;
    const total = length + w.area * area + tidyCost + w.congestion * padCongestion(s);
    return { total, cuts: 0, links: 0, length: s.lenSum, area, tidy: tidyCost, stranded: 0 };
  }
  const t = s.tally;
  const total = w.cut * t.cuts + w.link * t.linksW + w.length * s.lenSum + w.area * area + tidyCost + w.stranded * t.strandedW + w.blocked * s.blockedSum + w.cramped * t.cramped + (w.shortfall ? w.shortfall * linkShortfall(s) : 0);
  return { total, cuts: t.cuts, links: t.links, length: s.lenSum, area, tidy: tidyCost, stranded: t.stranded };
}
