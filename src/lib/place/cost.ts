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
 *
 * `placementTotal(state, weights?): number` is the same total without the parts (the
 * annealer's figure at every step). Both read the counts of the state's last settle.
 */
import type { PlaceProblem } from './problem.ts';
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

/** Nets with a supply edge, per problem (the tidiness term visits only these). */
const supplyNets = new WeakMap<PlaceProblem, Int32Array>();

function supplyNetsOf(problem: PlaceProblem): Int32Array {
  let list = supplyNets.get(problem);
  if (!list) {
    list = Int32Array.from(problem.nets.flatMap((n, i) => (n.supplyEdge ? [i] : [])));
    supplyNets.set(problem, list);
  }
  return list;
}

const scratch = { area: 0, tidyCost: 0 };

/** Board area and weighted tidiness of a placement (area −1 when nothing is placed), in a shared scratch object. */
function boxTerms(s: PlaceState, w: CostWeights): typeof scratch {
  const W = s.W;
  const H = s.H;
  let x0 = 0;
  while (x0 < W && s.colCount[x0] === 0) x0++;
  if (x0 === W) {
    scratch.area = -1;
    return scratch;
  }
  let x1 = W - 1;
  while (s.colCount[x1] === 0) x1--;
  let y0 = 0;
  while (s.rowCount[y0] === 0) y0++;
  let y1 = H - 1;
  while (s.rowCount[y1] === 0) y1--;
  let tidy = 0;
  let edge = 0;
  const parts = s.problem.parts;
  for (const p of s.problem.leaning) {
    const part = parts[p]!;
    const k = s.pose[p]!;
    if (k < 0) continue;
    const g = s.poseBase[p]! + k;
    const px0 = s.x[p]! + s.poseMinX[g]!;
    const px1 = s.x[p]! + s.poseMaxX[g]!;
    const py0 = s.y[p]! + s.poseMinY[g]!;
    const py1 = s.y[p]! + s.poseMaxY[g]!;
    if (part.edge === 'left') edge += px0 - x0;
    else if (part.edge === 'right') edge += x1 - px1;
    else if (part.edge === 'top') edge += py0 - y0;
    else if (part.edge === 'bottom') edge += y1 - py1;
    if (part.flow < 0) tidy += px0 - x0;
    else if (part.flow > 0) tidy += x1 - px1;
  }
  if (w.supplyAtEdges) {
    const nets = s.problem.nets;
    for (const n of supplyNetsOf(s.problem)) {
      if (s.netHoles[n]!.length === 0) continue;
      tidy += nets[n]!.supplyEdge === 'top' ? s.netMinY[n]! - y0 : y1 - s.netMaxY[n]!;
    }
  }
  scratch.area = (x1 - x0 + 1) * (y1 - y0 + 1);
  scratch.tidyCost = w.tidy * tidy + w.edge * edge;
  return scratch;
}

/** `placementCost(s, w).total` without building the parts (the annealer's per-step figure). */
export function placementTotal(s: PlaceState, w: CostWeights = DEFAULT_WEIGHTS): number {
  const { area, tidyCost } = boxTerms(s, w);
  if (area < 0) return 0;
  if (s.map.padLike) return w.wire * s.lenSum + w.area * area + tidyCost + w.congestion * padCongestion(s);
  const t = s.tally;
  return w.cut * t.cuts + w.link * t.linksW + w.length * s.lenSum + w.area * area + tidyCost + w.stranded * t.strandedW + w.blocked * s.blockedSum + w.cramped * t.cramped + (w.shortfall ? w.shortfall * linkShortfall(s) : 0);
}

export function placementCost(s: PlaceState, w: CostWeights = DEFAULT_WEIGHTS): CostParts {
  const total = placementTotal(s, w);
  const { area, tidyCost } = scratch;
  if (area < 0) return { total: 0, cuts: 0, links: 0, length: 0, area: 0, tidy: 0, stranded: 0 };
  if (s.map.padLike) return { total, cuts: 0, links: 0, length: s.lenSum, area, tidy: tidyCost, stranded: 0 };
  const t = s.tally;
  return { total, cuts: t.cuts, links: t.links, length: s.lenSum, area, tidy: tidyCost, stranded: t.stranded };
}
