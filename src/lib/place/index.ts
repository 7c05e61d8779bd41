/**
 * Place: automatic placement on strip, pad and bus boards, and the references it is
 * measured against.
 *
 * - `planLayout(design, options, hooks?, context?)` → Result<{ layout, stats, design }>:
 *   place, route, verify (plan.ts); `design` is the design as placed (gate swaps applied). Every layout it returns is routed and verifies clean.
 * - `buildProblem(design, options)`, `placeOnBoard(problem, board, settings)`,
 *   `scoreSpots(problem, board, spots, weights?)`, `DEFAULT_WEIGHTS`: the placer's own
 *   stages and cost, for benchmarks and the app's live figures.
 * - `naiveBaseline(design)`, `plantedInstance(parts, seed)`, `exactPlacement(problem,
 *   board, weights, bound, limit?)`: yardsticks (placement-notes.md "How to know it is good").
 * - `circuitOfDesign(design)`: a circuit document equivalent to a design.
 */
export { planLayout, PROGRAM } from './plan.ts';
export type { PlanHooks, PlanProgress, PlanContext, Planned } from './plan.ts';
export type { PlanStats } from './stats.ts';
export { buildProblem } from './problem.ts';
export type { PlaceProblem, PlacePart, PlaceNet, PoseOption } from './problem.ts';
export { placeOnBoard, EFFORT_STEPS } from './place-board.ts';
export type { BoardSettings, PlacedBoard } from './place-board.ts';
export { DEFAULT_WEIGHTS } from './cost.ts';
export type { CostWeights, CostParts } from './cost.ts';
export { scoreSpots } from './score.ts';
export type { Spot } from './state.ts';
export { naiveBaseline } from './baseline.ts';
export type { BaselineFigures } from './baseline.ts';
export { plantedInstance } from './planted.ts';
export type { PlantedInstance } from './planted.ts';
export { exactPlacement } from './exact.ts';
export type { ExactResult } from './exact.ts';
export { circuitOfDesign } from './circuit-of-design.ts';
