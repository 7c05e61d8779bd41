/**
 * `placeOnBoard(problem, board, settings): PlacedBoard | { unplaced }` — one placement on
 * one board: global placement (forces), legalization onto the grid, then annealing.
 *
 * Settings: seed, effort (moves per part: quick 300, normal 600, thorough 2500, plus a
 * floor), cost weights, locked spots, keep-out rectangles, section tables and hooks.
 * The returned state is legal: bodies on the board, apart, out of keep-out areas, locked
 * parts where they were given.
 */
import type { Board } from '../model/layout.ts';
import type { Effort, KeepOut } from '../model/options.ts';
import { anneal, type AnnealResult } from './anneal.ts';
import { copperMap } from './copper-map.ts';
import type { CostWeights } from './cost.ts';
import { globalPlace } from './global.ts';
import { legalize } from './legalize.ts';
import { linkPlan } from './link-plan.ts';
import type { PlaceProblem } from './problem.ts';
import { createRng } from './rng.ts';
import { PlaceState, type Spot } from './state.ts';

export const EFFORT_STEPS: Record<Effort, { perPart: number; floor: number; ticks: number }> = {
  quick: { perPart: 300, floor: 4000, ticks: 120 },
  normal: { perPart: 600, floor: 6000, ticks: 250 },
  thorough: { perPart: 2500, floor: 20000, ticks: 400 },
};

/** Share of the annealing steps spent polishing on the cropped board. */
const POLISH = 0.2;
/** Weight of a join the greedy link plan misses, while polishing on the final board. */
const SHORTFALL = 100;
/** Designs up to this many parts see the link plan during the main annealing too. */
const PLAN_PARTS = 40;
/** Starting temperature of a polish, as a share of a fresh annealing's. */
const WARMTH = 0.1;

export interface BoardSettings {
  seed: number;
  effort: Effort;
  weights: CostWeights;
  locked: Map<number, Spot>;
  keepOut: KeepOut[];
  /** Let the annealer see the greedy link plan (default true; off for pure-cost comparisons). */
  linkPlan?: boolean;
  onProgress?: (phase: string, fraction: number, cost: number, best: number) => void;
  shouldStop?: () => boolean;
}

export type PlacedBoard =
  | { ok: true; state: PlaceState; slotSections: (string | undefined)[][]; anneal: AnnealResult }
  | { ok: false; unplaced: number[] };
export type Placed = Extract<PlacedBoard, { ok: true }>;

/** Designs this small get RESTARTS annealing runs (cheap, and the landscape is rugged). */
const RESTART_PARTS = 12;
const RESTARTS = 3;

/**
 * Past this many parts the link-lane check costs more than it earns (stranded segments and
 * the final routing still guard routability). At 200 planted parts it cuts the insulated
 * links of a plan from 1–19 to 0–5 for about 1 s more; at 300 it would take the plan from
 * about 2.5 s to 5.5–8.5 s, on boards about a fifth bigger (with 1–9 insulated links
 * instead of 8–25).
 */
const LANE_PARTS = 250;

function judgeLanes(problem: PlaceProblem, set: BoardSettings): boolean {
  return set.weights.blocked > 0 && problem.parts.length <= LANE_PARTS;
}

/** Put every part back at the given spots with the given pin nets. */
function resetTo(state: PlaceState, spots: Spot[], nets: number[][]): void {
  spots.forEach((_, p) => state.lift(p));
  nets.forEach((list, p) => list.forEach((n, i) => state.setNet(p, i, n)));
  spots.forEach((spot, p) => state.place(p, spot));
  state.settle();
}

export function keepOutMask(board: Pick<Board, 'cols' | 'rows'>, keepOut: KeepOut[]): Uint8Array {
  const mask = new Uint8Array(board.cols * board.rows);
  for (const k of keepOut) {
    const [xa, xb] = [Math.min(k.from[0], k.to[0]), Math.max(k.from[0], k.to[0])];
    const [ya, yb] = [Math.min(k.from[1], k.to[1]), Math.max(k.from[1], k.to[1])];
    for (let y = Math.max(0, ya); y <= Math.min(board.rows - 1, yb); y++)
      for (let x = Math.max(0, xa); x <= Math.min(board.cols - 1, xb); x++) mask[x + y * board.cols] = 1;
  }
  return mask;
}

/** How a polish runs: share of a fresh annealing's steps, starting warmth, progress phase, link plan on or off. */
export interface PolishTune {
  share?: number;
  warmth?: number;
  phase?: string;
  linkPlan?: boolean;
}

/**
 * Re-place a finished placement on another board (the working board cropped to size, or
 * spread by free columns): parts shifted by (dx, dy) or put at the given spots, gate swaps
 * carried over, then a short cool anneal so the cost sees the real board edges (landing
 * holes and link lanes near them). `tune` scales it (default: POLISH of the steps, warmth
 * WARMTH, the greedy link plan in the cost); a share of 0 only moves the placement.
 */
export function polishOnBoard(problem: PlaceProblem, from: Placed, board: Board, where: { dx: number; dy: number } | Spot[], set: BoardSettings, tune: PolishTune = {}): PlacedBoard {
  const state = new PlaceState(problem, copperMap(board), keepOutMask(board, set.keepOut), judgeLanes(problem, set));
  from.state.pinNet.forEach((nets, p) => nets.forEach((n, i) => state.setNet(p, i, n)));
  const locked = new Map<number, Spot>();
  const unplaced: number[] = [];
  problem.parts.forEach((_, p) => {
    const old = from.state.spotOf(p);
    const spot = Array.isArray(where) ? where[p]! : { x: old.x + where.dx, y: old.y + where.dy, pose: old.pose };
    if (state.fits(p, spot)) state.place(p, spot);
    else unplaced.push(p);
    if (set.locked.has(p)) locked.set(p, spot);
  });
  if (unplaced.length) return { ok: false, unplaced };
  state.settle();
  for (let n = 0; n < problem.nets.length; n++) if (from.state.tally.weight[n] !== 1) state.weighNet(n, from.state.tally.weight[n]!);
  const slotSections = from.slotSections.map((x) => x.slice());
  const effort = EFFORT_STEPS[set.effort];
  const steps = Math.round((effort.floor + effort.perPart * problem.parts.length) * (tune.share ?? POLISH));
  const withPlan = tune.linkPlan ?? true;
  const opts: Parameters<typeof anneal>[1] = {
    rng: createRng(set.seed).fork(3),
    steps,
    weights: withPlan ? { ...set.weights, shortfall: SHORTFALL } : set.weights,
    locked: new Set(locked.keys()),
    tables: problem.sections,
    slotSections,
    warmth: tune.warmth ?? WARMTH,
  };
  if (steps > 0) opts.focusNets = withPlan ? linkPlan(state).nets : [];
  const phase = tune.phase ?? 'polish';
  if (set.onProgress) opts.onProgress = (f, c, b) => set.onProgress!(phase, f, c, b);
  if (set.shouldStop) opts.shouldStop = set.shouldStop;
  return { ok: true, state, slotSections, anneal: anneal(state, opts) };
}

/**
 * After the router named nets it could not join: weigh those nets' links and link room
 * `factor` times more and anneal the same placement again, cool and short.
 */
export function reweighAndPolish(problem: PlaceProblem, placed: Placed, nets: number[], factor: number, set: BoardSettings, withPlan = true): Placed {
  const state = placed.state;
  for (const n of nets) state.weighNet(n, state.tally.weight[n]! * factor);
  const locked = new Set<number>(set.locked.keys());
  const effort = EFFORT_STEPS[set.effort];
  const opts: Parameters<typeof anneal>[1] = {
    rng: createRng(set.seed).fork(4 + nets.length),
    steps: Math.round((effort.floor + effort.perPart * problem.parts.length) * POLISH),
    weights: withPlan ? { ...set.weights, shortfall: SHORTFALL } : set.weights,
    locked,
    tables: problem.sections,
    slotSections: placed.slotSections,
    warmth: WARMTH,
    focusNets: withPlan ? [...new Set([...nets, ...linkPlan(state).nets])] : nets,
  };
  if (set.onProgress) opts.onProgress = (f, c, b) => set.onProgress!('repair', f, c, b);
  if (set.shouldStop) opts.shouldStop = set.shouldStop;
  return { ok: true, state, slotSections: placed.slotSections, anneal: anneal(state, opts) };
}

export function placeOnBoard(problem: PlaceProblem, board: Board, set: BoardSettings): PlacedBoard {
  const rng = createRng(set.seed);
  const map = copperMap(board);
  const state = new PlaceState(problem, map, keepOutMask(board, set.keepOut), judgeLanes(problem, set));
  const effort = EFFORT_STEPS[set.effort];
  const fixedCentres = new Map<number, { x: number; y: number }>();
  for (const [p, spot] of set.locked) {
    const pose = problem.parts[p]!.poses[spot.pose]!;
    fixedCentres.set(p, { x: spot.x + (pose.minX + pose.maxX) / 2, y: spot.y + (pose.minY + pose.maxY) / 2 });
  }
  set.onProgress?.('spread', 0, 0, 0);
  const centres = globalPlace(problem, { w: board.cols, h: board.rows }, rng.fork(1), fixedCentres, effort.ticks);
  set.onProgress?.('snap', 0, 0, 0);
  const unplaced = legalize(state, centres, set.locked);
  if (unplaced.length) return { ok: false, unplaced };
  const slotSections = problem.sections.map((t) => t.sections.slice());
  const opts: Parameters<typeof anneal>[1] = {
    rng: rng.fork(2),
    steps: effort.floor + effort.perPart * problem.parts.length,
    // The full link plan is O(holes) per step: worth it while the design is small.
    weights: problem.parts.length <= PLAN_PARTS && set.linkPlan !== false ? { ...set.weights, shortfall: SHORTFALL } : set.weights,
    locked: new Set(set.locked.keys()),
    tables: problem.sections,
    slotSections,
  };
  if (set.onProgress) opts.onProgress = (f, c, b) => set.onProgress!('anneal', f, c, b);
  if (set.shouldStop) opts.shouldStop = set.shouldStop;
  let result = anneal(state, opts);
  // Small designs: a few more independent runs from the same start, keep the best.
  if (problem.parts.length <= RESTART_PARTS && !set.shouldStop?.()) {
    const start = problem.parts.map((_, p) => state.spotOf(p));
    let best = { cost: result.cost, spots: start.map((_, p) => state.spotOf(p)), nets: state.pinNet.map((n) => n.slice()), slots: slotSections.map((x) => x.slice()) };
    for (let r = 1; r < RESTARTS; r++) {
      const slots = problem.sections.map((t) => t.sections.slice());
      resetTo(state, start, problem.parts.map((p) => p.pinNet));
      const again = anneal(state, { ...opts, rng: rng.fork(10 + r), slotSections: slots });
      result = { ...again, steps: result.steps + again.steps, accepted: result.accepted + again.accepted };
      if (again.cost < best.cost - 1e-9) best = { cost: again.cost, spots: problem.parts.map((_, p) => state.spotOf(p)), nets: state.pinNet.map((n) => n.slice()), slots };
    }
    resetTo(state, best.spots, best.nets);
    best.slots.forEach((x, i) => (slotSections[i] = x));
    result = { ...result, cost: best.cost };
  }
  return { ok: true, state, slotSections, anneal: result };
}
