/**
 * `planLayout(design, options, hooks?, context?): Result<{ layout, stats, design }>` — place, route
 * and verify a design; every layout it returns is routed and verifies clean.
 *
 * Options (PlanOptionsSchema): `board` 'auto' (default: find the smallest board that routes,
 * of kind `autoKind`) or a fixed board; `cutStyle`, `seed` (1), `effort` ('normal'),
 * `padsEdge` ('left'), `supplyAtEdges` (true), `locked` refs (kept where `context.previous`
 * has them; with 'auto' the previous board is used), `keepOut` rectangles,
 * `linksOverBodies`, `insulatedLinks` (true: late routing rounds may use insulated wire
 * links, each flagged; false: never). Hooks: `onProgress({ phase, fraction, cost, best })`
 * with phases spread, snap, anneal, route, verify; `shouldStop()` ends the annealing early and stops
 * further attempts (what has been found is still routed and checked). `context.circuit` is
 * the circuit to verify against (rebuilt from the design when absent).
 *
 * Each attempt places on a working board (placeOnBoard; small designs get two or three
 * independent placements at normal or thorough effort, tried best first), crops an auto
 * board to the parts plus a margin of 1, then 2 holes (designs of more than 50 parts: 1
 * only) and polishes the placement there (designs up to 50 parts; bigger ones are only
 * moved), routes (routeLayout) and verifies (verifyLayout) from scratch. When the router
 * names nets it could not join, the same placement gets free columns or a free strip where
 * they help those nets (spread.ts: cuts and links stay as they were), or else those nets
 * weigh more and it is polished again (also when, on a big design, the count of failed nets
 * stops falling once insulated links are allowed: free columns no longer reach the last
 * hemmed-in leads) — up to ROUNDS routings (BIG_ROUNDS on big designs), each cheap next to
 * a fresh annealing; late rounds may use insulated wire links (INSULATED_ROUND), and a big
 * design that needed some is spread for them and routed again (SLEEVE_ROUNDS). A failed
 * attempt is retried on a bigger board (auto) or with the next seed, with a looser area
 * weight; when all fail the result is `place.no-layout` with every reason. Normal and thorough effort first plan as
 * quick does, then carry on annealing from the quick placement for the rest of their steps
 * and keep the better layout (planScore), so they are never worse than quick for a seed;
 * designs of more than CARRY_PARTS parts skip the quick pre-pass and search at their effort
 * from the start (routing the quick placement cost more than it earned there). 'auto' means
 * the smallest board that routes: designs of up to SHRINK_PARTS parts then try boards one
 * row or column smaller than the layout's used box, placed afresh, while one still routes
 * and verifies (shrink); bigger designs keep the cropped board of their first layout.
 */
import type { Design } from '../netlist/design.ts';
import type { Circuit } from '../model/circuit.ts';
import type { Board, Layout } from '../model/layout.ts';
import { PlanOptionsSchema, type Effort, type PlanOptions, type PlanOptionsInput } from '../model/options.ts';
import { fail, ok, type Problem, type Result } from '../model/problem.ts';
import { zodProblems } from '../model/parse.ts';
import { breadboardBoard } from '../board/breadboard.ts';
import { makeBoard } from '../board/grid.ts';
import { routeLayout } from '../route/index.ts';
import { verifyLayout } from '../verify/index.ts';
import { copperMap } from './copper-map.ts';
import { circuitOfDesign } from './circuit-of-design.ts';
import { DEFAULT_WEIGHTS, placementTotal } from './cost.ts';
import { lockedSpots } from './locked.ts';
import { designAfterSwaps, placementLayout } from './output.ts';
import { EFFORT_STEPS, placeOnBoard, polishOnBoard, reweighAndPolish, type BoardSettings, type Placed } from './place-board.ts';
import type { PlaceProblem } from './problem.ts';
import { failedNets, spreadLanes } from './spread.ts';
import type { Spot } from './state.ts';
import { buildProblem } from './problem.ts';
import { cropBoard, workingBoard } from './board-size.ts';
import { layoutStats, usedBox, type PlanStats } from './stats.ts';

export interface PlanProgress {
  phase: string;
  fraction: number;
  cost: number;
  best: number;
}

export interface PlanHooks {
  onProgress?(p: PlanProgress): void;
  shouldStop?(): boolean;
}

/** A plan: the layout, its figures, and the design as placed (nets moved by gate swaps). */
export interface Planned {
  layout: Layout;
  stats: PlanStats;
  design: Design;
}

export interface PlanContext {
  circuit?: Circuit;
  previous?: Layout;
}

/** Attempts before giving up: boards grow (auto) or seeds change (fixed board). */
const ATTEMPTS = { auto: 6, fixed: 3 };
/** Margins tried round an auto board's parts when it is cropped to them (bigger designs: the first only; their routing rounds spread the board anyway). */
const MARGINS = [1, 2];
/** What an insulated wire link costs on top of a bare one when layouts are compared (three links' worth). */
const SLEEVE = 3 * DEFAULT_WEIGHTS.link;
/**
 * Routings more for a big design that routed with insulated links, its placement spread for
 * those nets; the best by score (SLEEVE each) is kept. Planted 300 parts, seeds 7 / 11 / 13 / 8:
 * 8 / 17 / 25 / 33 insulated links became 4 / 10 / 25 / 32, on boards up to 9 columns wider.
 */
const SLEEVE_ROUNDS = 2;
/** Routing rounds per placement: after a failure the placement is spread by free columns (or a free strip) or repaired. */
const ROUNDS = 8;
/**
 * Routing rounds on designs of more than REPAIR_PARTS parts: their last nets often need a
 * few polishes more, far cheaper than a fresh placement on a bigger board (planted 300
 * parts: 3 of 32 designs routed only on the second board with 8 rounds, none with 12).
 */
const BIG_ROUNDS = 12;
/**
 * From this round on, designs of more than REPAIR_PARTS parts may use insulated wire links
 * for nets nothing else joins (smaller ones only in the last round): by then spreading has
 * left few such nets (300 planted parts: 21 nets in pieces, then 16, 10, 6).
 */
const INSULATED_ROUND = 3;
/** Designs up to this many parts are repaired before they are spread, with the greedy link plan in view. */
const REPAIR_PARTS = 50;
/** How much more a net the router could not join weighs in a repair round. */
const REWEIGH = 3;
/** Weight of two leads of different nets side by side when cuts are drilled at holes. */
const CRAMPED = 25;
/** Share of the area weight on pad boards. */
const PAD_AREA = 0.3;
/** Independent placements per attempt by effort, for designs up to STARTS_PARTS parts. */
const STARTS = { quick: 1, normal: 2, thorough: 3 };
const STARTS_PARTS = 40;
/** Designs up to this many parts polish on the cropped board (bigger ones only move there). */
const POLISH_PARTS = 50;
/** Starting warmth when a longer effort carries on from the quick placement: a full re-anneal (cooler starts gained nothing on the demos). */
const CARRY_WARMTH = 1;
/** Bigger designs at normal or thorough effort skip the quick pre-pass (its routing rounds cost more than its guarantee earns there). */
const CARRY_PARTS = 50;
/** Designs up to this many parts on an auto strip or pad board look for a smaller board once one routes. */
const SHRINK_PARTS = 12;
/** Placements tried on each smaller board while shrinking, and in all at most SHRINK_TRIES × SHRINK_SEEDS. */
const SHRINK_TRIES = 12;
const SHRINK_SEEDS = 2;
/** Routing rounds per placement while shrinking (a board that needs many repairs is not worth it). */
const SHRINK_ROUNDS = 2;
export const PROGRAM = 'kerfline plan 0.1';

function fixedBoard(choice: Exclude<PlanOptions['board'], 'auto'>): Board {
  if (choice.kind === 'bus') return breadboardBoard(choice.cols);
  return makeBoard(choice.kind, choice.cols, choice.rows);
}

function boardName(b: Board): string {
  return `${b.kind} ${b.cols}×${b.rows}`;
}

/** Reasons shown in the message (all of them stay in `data.reasons`). */
const SHOWN_REASONS = 5;

function noLayout(message: string, all: string[], hint: string): Problem {
  const reasons = [...new Set(all)];
  const shown = reasons.slice(0, SHOWN_REASONS).join('; ') + (reasons.length > SHOWN_REASONS ? `; and ${reasons.length - SHOWN_REASONS} more` : '');
  return { code: 'place.no-layout', severity: 'error', path: [], message: reasons.length ? `${message}: ${shown}` : message, hint, data: { reasons } };
}

/** What the builder pays for a finished layout, for choosing between two (weights of cost.ts). */
export function planScore(st: PlanStats, pitchMm: number): number {
  const w = DEFAULT_WEIGHTS;
  return w.cut * st.cuts + w.link * st.links + w.length * (st.linkLengthMm / pitchMm) + w.area * st.holesUsed + w.wire * (st.wireLengthMm / pitchMm);
}

/** Everything one search needs, shared by the quick run and the longer one. */
interface Env {
  design: Design;
  problem: PlaceProblem;
  opts: PlanOptions;
  locked: Map<number, Spot>;
  circuit: Circuit;
  auto: boolean;
  /** The board of the previous layout, kept when locked parts pin the placement to it. */
  previous?: Board;
  reasons: string[];
  progress: (phase: string, fraction: number, cost: number, best: number) => void;
  stop: () => boolean;
}

/** A found layout, with the placement it came from (for a longer effort to carry on from). */
interface Found {
  planned: Planned;
  warnings: Problem[];
  score: number;
  start: { placed: Placed; board: Board; attempt: number };
}

function settingsFor(env: Env, board: Board, attempt: number, effort: Effort): BoardSettings {
  const { opts } = env;
  return {
    seed: (opts.seed + attempt * 7919) % 2 ** 31,
    effort,
    // Wires on a pad board need room between pads: the board area counts for less there.
    // Each retry cares more for room to route than for a small board.
    weights: {
      ...DEFAULT_WEIGHTS,
      supplyAtEdges: opts.supplyAtEdges,
      area: DEFAULT_WEIGHTS.area * 0.6 ** attempt * (copperMap(board).padLike ? PAD_AREA : 1),
      stranded: DEFAULT_WEIGHTS.stranded * (1 + attempt),
      blocked: DEFAULT_WEIGHTS.blocked * (1 + attempt),
      cramped: opts.cutStyle === 'hole' ? CRAMPED : 0,
    },
    locked: env.locked,
    keepOut: opts.keepOut,
    onProgress: env.progress,
    shouldStop: env.stop,
  };
}

/**
 * Route a placement, verify it, and on a routing failure repair or spread it and try again
 * (ROUNDS in all, BIG_ROUNDS on big designs; SHRINK_ROUNDS while `shrinking`, which never
 * spreads nor uses insulated links). A big design that routed with insulated links is
 * spread for those nets and routed again, up to SLEEVE_ROUNDS times, keeping the best.
 * Spreading (free columns, spread.ts) needs a board that may grow: auto, nothing locked, no
 * keep-out areas.
 */
function routeRounds(env: Env, first: Placed, board: Board, set: BoardSettings, attempt: number, steps: number, shrinking = false): { planned: Planned; warnings: Problem[] } | undefined {
  const { design, problem, opts } = env;
  const big = problem.parts.length > REPAIR_PARTS;
  const rounds = shrinking ? SHRINK_ROUNDS : big ? BIG_ROUNDS : ROUNDS;
  const canSpread = !shrinking && env.auto && !env.locked.size && !opts.keepOut.length;
  let cur = first;
  let frame = board;
  let repaired = false;
  let before = Infinity;
  let best: { found: { planned: Planned; warnings: Problem[] }; score: number } | undefined;
  let extra = 0;
  for (let round = 0; round < rounds + extra; round++) {
    const routedDesign = designAfterSwaps(design, cur.state, problem.sections, cur.slotSections);
    const placement = placementLayout(cur.state, routedDesign, frame, new Set(env.locked.keys()));
    env.progress('route', Math.min(1, round / rounds), cur.anneal.cost, cur.anneal.cost);
    // Insulated wire links only as a late resort, never while shrinking (see INSULATED_ROUND).
    const insulated = opts.insulatedLinks && !shrinking && round >= (big ? INSULATED_ROUND : rounds - 1);
    const routed = routeLayout(routedDesign, placement, { cutStyle: opts.cutStyle, linksOverBodies: opts.linksOverBodies, insulatedLinks: insulated });
    if (routed.ok) {
      env.progress('verify', 0, cur.anneal.cost, cur.anneal.cost);
      const report = verifyLayout(env.circuit, routed.value.layout);
      if (!report.clean) {
        env.reasons.push(`${boardName(frame)}: the routed layout failed verification (${report.faults.map((f) => f.code).join(', ')})`);
        return best?.found;
      }
      const layout: Layout = { ...routed.value.layout, meta: { program: PROGRAM, seed: opts.seed, effort: opts.effort, attempt: attempt + 1 } };
      const cost = placementTotal(cur.state, set.weights);
      const stats = layoutStats(layout, routed.value.stats, cost, problem.parts.length, attempt + 1, steps + cur.anneal.steps);
      const found = { planned: { layout, design: routedDesign, stats }, warnings: [...routed.warnings, ...report.warnings] };
      const sleeved = routed.warnings.filter((w) => w.code === 'route.insulated-link');
      const score = planScore(stats, frame.pitchMm) + SLEEVE * sleeved.length;
      if (!best || score < best.score) best = { found, score };
      // Big designs routed with insulated links: a free column or two where those nets need
      // them may let bare links do (SLEEVE_ROUNDS more routings while the last one was best).
      if (!(extra < SLEEVE_ROUNDS && big && canSpread && sleeved.length && best.found === found && !env.stop())) return best.found;
      extra++;
      const wide = spreadLanes(cur.state, frame, failedNets(cur.state, sleeved));
      const moved = wide && polishOnBoard(problem, cur, wide.board, wide.spots, set, { share: 0 });
      if (!wide || !moved?.ok) return best.found;
      cur = moved;
      frame = wide.board;
      continue;
    }
    if (best) return best.found;
    env.reasons.push(`${boardName(frame)}: ${routed.problems[0]?.message ?? 'did not route'}`);
    if (round === rounds - 1 || env.stop()) return undefined;
    const failed = failedNets(cur.state, routed.problems);
    const ids = failed.map((f) => f.net);
    // A free column where it lets a straight link join the failed nets (the router's islands
    // guide it on big designs only: on the demos, lanes between any two segments of a net
    // gave fewer cuts and links, 61 against 64 on four-mixer); else (or on a
    // board that may not grow, once) weigh those nets more and polish the placement again.
    // Small designs are repaired first: a polish is cheap for them and keeps the board small.
    // Big designs whose failures stopped falling once insulated links were allowed: the
    // last nets are hemmed in where no free column can reach; move their parts instead.
    const stalled = big && insulated && failed.length >= before;
    before = failed.length;
    const repairFirst = (!repaired && problem.parts.length <= REPAIR_PARTS) || stalled;
    const wide = canSpread && !repairFirst ? spreadLanes(cur.state, frame, big ? failed : failed.map((f) => ({ net: f.net }))) : undefined;
    const moved = wide && polishOnBoard(problem, cur, wide.board, wide.spots, set, { share: 0 });
    if (wide && moved?.ok) {
      cur = moved;
      frame = wide.board;
      continue;
    }
    if (repaired && !canSpread) return undefined;
    repaired = true;
    cur = reweighAndPolish(problem, cur, ids, REWEIGH, set, problem.parts.length <= REPAIR_PARTS);
  }
  return best?.found;
}

/**
 * One search at one effort: attempts on growing boards (auto) or further seeds, each with
 * one or more placements tried best first. With `from`, the search carries on from a
 * placement found before (the quick run's) on its board for the rest of this effort's steps.
 */
function search(env: Env, effort: Effort, from?: Found['start']): Found | undefined {
  const { problem, opts } = env;
  const first = from ? from.attempt : 0;
  const last = from ? from.attempt + 1 : env.auto ? ATTEMPTS.auto : ATTEMPTS.fixed;
  for (let attempt = first; attempt < last && !env.stop(); attempt++) {
    const board = from ? from.board : opts.board !== 'auto' ? fixedBoard(opts.board) : env.auto ? workingBoard(problem, opts.autoKind, attempt) : { ...env.previous! };
    const set = settingsFor(env, board, attempt, effort);
    const candidates: Placed[] = [];
    if (from) {
      const done = EFFORT_STEPS.quick.floor + EFFORT_STEPS.quick.perPart * problem.parts.length;
      const all = EFFORT_STEPS[effort].floor + EFFORT_STEPS[effort].perPart * problem.parts.length;
      const more = polishOnBoard(problem, from.placed, board, { dx: 0, dy: 0 }, set, { share: Math.max(0, 1 - done / all), warmth: CARRY_WARMTH, phase: 'anneal', linkPlan: problem.parts.length <= POLISH_PARTS });
      if (more.ok) candidates.push(more);
    } else {
      // Small designs at higher effort: several independent placements, best first.
      const starts = problem.parts.length <= STARTS_PARTS ? STARTS[effort] : 1;
      for (let k = 0; k < starts && !env.stop(); k++) {
        const one = placeOnBoard(problem, board, { ...set, seed: (set.seed + k * 104729) % 2 ** 31 });
        if (one.ok) candidates.push(one);
        else if (k === 0) env.reasons.push(`${boardName(board)}: no room for ${one.unplaced.map((p) => problem.parts[p]!.ref).join(', ')}`);
      }
      candidates.sort((a, b) => a.anneal.cost - b.anneal.cost);
    }
    for (const placed of candidates) {
      if (env.stop()) break;
      const margins = problem.parts.length > REPAIR_PARTS ? MARGINS.slice(0, 1) : MARGINS;
      const frames = env.auto ? margins.map((m) => cropBoard(board, placed.state.bounds()!, m)) : [{ board, dx: 0, dy: 0 }];
      for (const frame of frames) {
        if (env.stop()) break;
        const polished = polishOnBoard(problem, placed, frame.board, frame, set, problem.parts.length <= POLISH_PARTS ? {} : { share: 0 });
        if (!polished.ok) continue;
        const found = routeRounds(env, polished, frame.board, set, attempt, placed.anneal.steps);
        if (found) return { ...found, score: planScore(found.planned.stats, frame.board.pitchMm), start: { placed, board, attempt } };
      }
    }
  }
  return undefined;
}

/**
 * Small designs on an auto strip or pad board: from the found layout's used box, try the
 * boards one column or one row smaller (smaller area first), placed afresh with a few seeds;
 * a smaller board that routes and verifies wins and the search carries on from it, until
 * neither shrink routes or SHRINK_TRIES × SHRINK_SEEDS placements are spent. These placements leave the greedy
 * link plan out of the cost (it slows each step threefold; the routing decides anyway), and
 * each gets SHRINK_ROUNDS routings, without spreading: the board may not grow.
 */
function shrink(env: Env, effort: Effort, found: Found): Found {
  const { problem } = env;
  const { kind, pitchMm } = found.planned.layout.board;
  let best = found;
  let tries = 0;
  for (;;) {
    const box = usedBox(best.planned.layout);
    const sizes = [
      { cols: box.cols - 1, rows: box.rows },
      { cols: box.cols, rows: box.rows - 1 },
    ]
      .filter((b) => b.cols >= 2 && b.rows >= 2)
      .sort((a, b) => a.cols * a.rows - b.cols * b.rows);
    let better: Found | undefined;
    for (const size of sizes) {
      const board = makeBoard(kind, size.cols, size.rows, pitchMm);
      const set0 = settingsFor(env, board, best.start.attempt, effort);
      for (let k = 0; k < SHRINK_SEEDS && !better; k++) {
        if (tries >= SHRINK_TRIES * SHRINK_SEEDS || env.stop()) return best;
        tries++;
        const set = { ...set0, seed: (set0.seed + k * 104729) % 2 ** 31, linkPlan: false };
        const placed = placeOnBoard(problem, board, set);
        if (!placed.ok) break;
        const routed = routeRounds(env, placed, board, set, best.start.attempt, placed.anneal.steps, true);
        if (!routed) continue;
        // The board is smaller than best's used box in one direction: so is the new used box.
        better = { ...routed, score: planScore(routed.planned.stats, pitchMm), start: { placed, board, attempt: best.start.attempt } };
      }
      if (better) break;
    }
    if (!better) return best;
    best = better;
  }
}

export function planLayout(design: Design, options: PlanOptionsInput, hooks: PlanHooks = {}, context: PlanContext = {}): Result<Planned> {
  const parsed = PlanOptionsSchema.safeParse(options);
  if (!parsed.success) return fail(zodProblems(parsed.error, 'place.options'));
  const opts = parsed.data;
  if (!design.parts.length) return fail([noLayout('the circuit has no parts to place', [], 'add parts to the circuit')]);
  const problem = buildProblem(design, opts);
  const locked = lockedSpots(problem, opts.locked, context.previous);
  if (!locked.ok) return fail(locked.problems);
  let stopped = false;
  const env: Env = {
    design,
    problem,
    opts,
    locked: locked.value,
    circuit: context.circuit ?? circuitOfDesign(design),
    auto: opts.board === 'auto' && !(locked.value.size && context.previous),
    ...(context.previous ? { previous: context.previous.board } : {}),
    reasons: [],
    progress: (phase, fraction, cost, best) => hooks.onProgress?.({ phase, fraction, cost, best }),
    stop: () => (stopped ||= hooks.shouldStop?.() ?? false),
  };
  // A longer effort first plans as quick does, then carries on from that placement and
  // keeps the better layout: it is never worse than quick for the same seed. When quick
  // finds nothing, the longer effort searches afresh with all its steps.
  // Small designs on an auto board go for the smallest board that routes (shrink): their
  // layouts compare by holes used first, then by score.
  const small = env.auto && opts.autoKind !== 'bus' && problem.parts.length <= SHRINK_PARTS;
  const better = (a: Found, b: Found) => (small && a.planned.stats.holesUsed !== b.planned.stats.holesUsed ? a.planned.stats.holesUsed < b.planned.stats.holesUsed : a.score < b.score - 1e-9);
  let quick = opts.effort !== 'quick' && problem.parts.length > CARRY_PARTS ? undefined : search(env, 'quick');
  if (quick && small && !stopped) quick = shrink(env, 'quick', quick);
  let found = quick;
  if (opts.effort !== 'quick' && !stopped) {
    const longer = quick ? search(env, opts.effort, quick.start) : search(env, opts.effort);
    if (longer && (!found || better(longer, found))) found = longer;
    if (found && small && !stopped) found = shrink(env, opts.effort, found);
  }
  if (found) return ok(found.planned, found.warnings);
  return fail([
    noLayout(
      stopped ? 'planning was stopped before a layout routed' : 'no placement could be routed and verified',
      env.reasons,
      env.auto ? 'try --effort thorough, another --seed, or a pad board' : 'try a bigger board, auto, another seed or fewer keep-out areas',
    ),
  ]);
}
