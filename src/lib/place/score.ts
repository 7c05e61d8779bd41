/**
 * `scoreSpots(problem, board, spots, weights?): CostParts | undefined` — the placement cost
 * of parts put at given spots (undefined when they do not all fit), for comparing a
 * planner's answer with a planted or exact one on the same terms.
 */
import type { Board } from '../model/layout.ts';
import { copperMap } from './copper-map.ts';
import { DEFAULT_WEIGHTS, placementCost, type CostParts, type CostWeights } from './cost.ts';
import type { PlaceProblem } from './problem.ts';
import { PlaceState, type Spot } from './state.ts';

export function scoreSpots(problem: PlaceProblem, board: Board, spots: Spot[], weights: CostWeights = DEFAULT_WEIGHTS): CostParts | undefined {
  const s = new PlaceState(problem, copperMap(board));
  for (let p = 0; p < spots.length; p++) {
    if (!s.fits(p, spots[p]!)) return undefined;
    s.place(p, spots[p]!);
  }
  s.settle();
  return placementCost(s, weights);
}
