/**
 * `planLayout(design, options, hooks?, context?): Result<{ layout, stats, design }>` — place, route
 * and verify a design; every layout it returns is routed and verifies clean.
 *
 * Options (PlanOptionsSchema): `board` 'auto' (default: find the smallest board that routes,
 * of kind `autoKind`) or a fixed board; `cutStyle`, `seed` (1), `effort` ('normal'),
 * `padsEdge` ('left'), `supplyAtEdges` (true), `locked` refs (kept where `context.previous`
 * has them; with 'auto' the previous board is used), `keepOut` rectangles,
 * `linksOverBodies`. Hooks: `onProgress({ phase, fraction, cost, best })` with phases
 * spread, snap, anneal, route, verify; `shouldStop()` ends the annealing early and stops
 * further attempts (what has been found is still routed and checked). `context.circuit` is
 * the circuit to verify against (rebuilt from the design when absent).
 *
 * Each attempt places on a working board (placeOnBoard; small designs get two or three
 * independent placements at normal or thorough effort, tried best first), crops an auto board to the parts
 * plus a margin of 1, then 2 holes and polishes the placement there, routes (routeLayout)
 * and verifies (verifyLayout) from scratch. When the router names nets it could not join,
 * those nets weigh more and the placement is polished again (one repair round). A failed
 * attempt is retried on a bigger board (auto) or with the next seed, with a looser area
 * weight; when all fail the result is `place.no-layout` with every reason.
 */
import type { Design } from '../netlist/design.ts';
import type { Circuit } from '../model/circuit.ts';
import type { Board, Layout } from '../model/layout.ts';
import { PlanOptionsSchema, type PlanOptions, type PlanOptionsInput } from '../model/options.ts';
import { fail, ok, type Problem, type Result } from '../model/problem.ts';
import { zodProblems } from '../model/parse.ts';
import { breadboardBoard } from '../board/breadboard.ts';
import { makeBoard } from '../board/grid.ts';
import { routeLayout } from '../route/index.ts';
import { verifyLayout } from '../verify/index.ts';
import { copperMap } from './copper-map.ts';
import { circuitOfDesign } from './circuit-of-design.ts';
import { DEFAULT_WEIGHTS, placementCost } from './cost.ts';
import { lockedSpots } from './locked.ts';
import { designAfterSwaps, placementLayout } from './output.ts';
import { placeOnBoard, polishOnBoard, reweighAndPolish, type BoardSettings, type Placed } from './place-board.ts';
import { buildProblem } from './problem.ts';
import { cropBoard, workingBoard } from './board-size.ts';
import { layoutStats, type PlanStats } from './stats.ts';

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
/** Margins tried round an auto board's parts, and router-guided repair rounds per margin. */
const MARGINS = [1, 2];
const REPAIRS = 1;
/** How much more a net the router could not join weighs in each repair round. */
const REWEIGH = 3;
/** Weight of two leads of different nets side by side when cuts are drilled at holes. */
const CRAMPED = 25;
/** Share of the area weight on pad boards. */
const PAD_AREA = 0.3;
/** Independent placements per attempt by effort, for designs up to STARTS_PARTS parts. */
const STARTS = { quick: 1, normal: 2, thorough: 3 };
const STARTS_PARTS = 40;
export const PROGRAM = 'kerfline plan 0.1';

function fixedBoard(choice: Exclude<PlanOptions['board'], 'auto'>): Board {
  if (choice.kind === 'bus') return breadboardBoard(choice.cols);
  return makeBoard(choice.kind, choice.cols, choice.rows);
}

function boardName(b: Board): string {
  return `${b.kind} ${b.cols}×${b.rows}`;
}

function noLayout(message: string, reasons: string[], hint: string): Problem {
  return { code: 'place.no-layout', severity: 'error', path: [], message: reasons.length ? `${message}: ${reasons.join('; ')}` : message, hint, data: { reasons } };
}

export function planLayout(design: Design, options: PlanOptionsInput, hooks: PlanHooks = {}, context: PlanContext = {}): Result<Planned> {
  const parsed = PlanOptionsSchema.safeParse(options);
  if (!parsed.success) return fail(zodProblems(parsed.error, 'place.options'));
  const opts = parsed.data;
  if (!design.parts.length) return fail([noLayout('the circuit has no parts to place', [], 'add parts to the circuit')]);
  const problem = buildProblem(design, opts);
  const locked = lockedSpots(problem, opts.locked, context.previous);
  if (!locked.ok) return fail(locked.problems);
  const circuit = context.circuit ?? circuitOfDesign(design);
  const progress = (phase: string, fraction: number, cost: number, best: number) => hooks.onProgress?.({ phase, fraction, cost, best });
  const auto = opts.board === 'auto' && !(locked.value.size && context.previous);
  const attempts = auto ? ATTEMPTS.auto : ATTEMPTS.fixed;
  const reasons: string[] = [];
  let stopped = false;
  for (let attempt = 0; attempt < attempts && !stopped; attempt++) {
    const board = opts.board !== 'auto' ? fixedBoard(opts.board) : auto ? workingBoard(problem, opts.autoKind, attempt) : { ...context.previous!.board };
    const set: BoardSettings = {
      seed: (opts.seed + attempt * 7919) % 2 ** 31,
      effort: opts.effort,
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
      locked: locked.value,
      keepOut: opts.keepOut,
      onProgress: progress,
      shouldStop: () => (stopped ||= hooks.shouldStop?.() ?? false),
    };
    // Small designs at higher effort: several independent placements, best first.
    const starts = problem.parts.length <= STARTS_PARTS ? STARTS[opts.effort] : 1;
    const candidates: Placed[] = [];
    for (let k = 0; k < starts && !stopped; k++) {
      const one = placeOnBoard(problem, board, { ...set, seed: (set.seed + k * 104729) % 2 ** 31 });
      if (one.ok) candidates.push(one);
      else if (k === 0) reasons.push(`${boardName(board)}: no room for ${one.unplaced.map((p) => problem.parts[p]!.ref).join(', ')}`);
    }
    candidates.sort((a, b) => a.anneal.cost - b.anneal.cost);
    for (const placed of candidates) {
      const box = placed.state.bounds()!;
      const frames = auto ? MARGINS.map((m) => cropBoard(board, box, m)) : [{ board, dx: 0, dy: 0 }];
      for (const frame of frames) {
        if (stopped) break;
        const first = polishOnBoard(problem, placed, frame.board, frame.dx, frame.dy, set);
        if (!first.ok) continue;
        let cur: Placed = first;
        for (let round = 0; round <= REPAIRS; round++) {
          const routedDesign = designAfterSwaps(design, cur.state, problem.sections, cur.slotSections);
          const placement = placementLayout(cur.state, routedDesign, frame.board, new Set(locked.value.keys()));
          progress('route', round / (REPAIRS + 1), cur.anneal.cost, cur.anneal.cost);
          const routed = routeLayout(routedDesign, placement, { cutStyle: opts.cutStyle, linksOverBodies: opts.linksOverBodies });
          if (!routed.ok) {
            const nets = routed.problems.flatMap((p) => p.nets ?? []);
            reasons.push(`${boardName(frame.board)}: ${routed.problems[0]?.message ?? 'did not route'}`);
            if (round === REPAIRS || stopped) break;
            const ids = [...new Set(nets)].map((n) => problem.nets.findIndex((x) => x.name === n)).filter((i) => i >= 0);
            cur = reweighAndPolish(problem, cur, ids, REWEIGH, set);
            continue;
          }
          progress('verify', 0, cur.anneal.cost, cur.anneal.cost);
          const report = verifyLayout(circuit, routed.value.layout);
          if (!report.clean) {
            reasons.push(`${boardName(frame.board)}: the routed layout failed verification (${report.faults.map((f) => f.code).join(', ')})`);
            break;
          }
          const layout: Layout = { ...routed.value.layout, meta: { program: PROGRAM, seed: opts.seed, effort: opts.effort, attempt: attempt + 1 } };
          const cost = placementCost(cur.state, set.weights).total;
          return ok({ layout, design: routedDesign, stats: layoutStats(layout, routed.value.stats, cost, problem.parts.length, attempt + 1, placed.anneal.steps + cur.anneal.steps) }, report.warnings);
        }
      }
    }
  }
  return fail([
    noLayout(
      stopped ? 'planning was stopped before a layout routed' : 'no placement could be routed and verified',
      reasons,
      auto ? 'try --effort thorough, another --seed, or a pad board' : 'try a bigger board, auto, another seed or fewer keep-out areas',
    ),
  ]);
}
