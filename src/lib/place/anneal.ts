/**
 * `anneal(state, options): AnnealResult` — detailed placement by simulated annealing on the
 * true cost (classic annealing placers of the 1980s), starting from a legal placement.
 *
 * Each step proposes a move (moves.ts), applies it, recounts only the touched conductors
 * and nets (state.settle) and accepts it by the Metropolis rule at the current temperature;
 * a rejected move is undone (state.settleBack puts the counts back without recounting). The temperature starts from the mean uphill step of a short
 * sample and cools geometrically to 1/500 of it over `steps`; the shift radius shrinks
 * with it. The best placement seen is kept and restored at the end. Deterministic for a
 * given generator; `shouldStop` is asked every 256 steps; `onProgress` gets 50 reports.
 */
import { placementCost, type CostWeights } from './cost.ts';
import { proposeMove, type Move, type MoveContext } from './moves.ts';
import type { Rng } from './rng.ts';
import type { SectionTable } from './sections.ts';
import type { PlaceState, Spot } from './state.ts';

export interface AnnealOptions {
  rng: Rng;
  steps: number;
  weights: CostWeights;
  locked: Set<number>;
  tables: SectionTable[];
  /** Section in each slot of each table; updated in place by gate swaps. */
  slotSections: (string | undefined)[][];
  /** Nets whose parts deserve more moves (see MoveContext.focus). */
  focusNets?: number[];
  /** Scale on the starting temperature: below 1 for polishing a placement already good. */
  warmth?: number;
  onProgress?: (fraction: number, cost: number, best: number) => void;
  shouldStop?: () => boolean;
}

export interface AnnealResult {
  cost: number;
  steps: number;
  accepted: number;
  stopped: boolean;
}

function applyGate(s: PlaceState, o: AnnealOptions, m: Extract<Move, { kind: 'gate' }>): void {
  const t = o.tables[m.table]!;
  const part = s.problem.parts[t.part]!;
  const pa = t.slots[m.a]!;
  const pb = t.slots[m.b]!;
  for (let r = 0; r < pa.length; r++) {
    const ia = part.pinNames.indexOf(pa[r]!);
    const ib = part.pinNames.indexOf(pb[r]!);
    const na = s.pinNet[t.part]![ia]!;
    const nb = s.pinNet[t.part]![ib]!;
    s.setNet(t.part, ia, nb);
    s.setNet(t.part, ib, na);
  }
  const slots = o.slotSections[m.table]!;
  [slots[m.a], slots[m.b]] = [slots[m.b], slots[m.a]];
}

interface Snapshot {
  spots: Spot[];
  nets: number[][];
  slots: (string | undefined)[][];
}

function snapshot(s: PlaceState, o: AnnealOptions): Snapshot {
  return {
    spots: s.problem.parts.map((_, p) => s.spotOf(p)),
    nets: s.pinNet.map((n) => n.slice()),
    slots: o.slotSections.map((x) => x.slice()),
  };
}

function restore(s: PlaceState, o: AnnealOptions, snap: Snapshot, movable: number[]): void {
  for (const p of movable) s.lift(p);
  snap.nets.forEach((nets, p) => nets.forEach((n, i) => s.setNet(p, i, n)));
  for (const p of movable) s.place(p, snap.spots[p]!);
  snap.slots.forEach((x, i) => (o.slotSections[i] = x.slice()));
  s.settle();
}

export function anneal(s: PlaceState, o: AnnealOptions): AnnealResult {
  const parts = s.problem.parts;
  const movable = parts.map((_, i) => i).filter((i) => !o.locked.has(i));
  const groups = new Map<string, number[]>();
  for (const p of movable) {
    const key = parts[p]!.swapKey;
    groups.set(key, [...(groups.get(key) ?? []), p]);
  }
  for (const [k, g] of groups) if (g.length < 2) groups.delete(k);
  const tables = o.tables.filter((t) => !o.locked.has(t.part));
  const tableIndex = tables.map((t) => o.tables.indexOf(t));
  const hot = new Set(o.focusNets ?? []);
  const focus = movable.filter((p) => s.pinNet[p]!.some((n) => hot.has(n)));
  const ctx: MoveContext = { s, rng: o.rng, movable, groups, tables, focus };
  let cost = placementCost(s, o.weights).total;
  if (!movable.length || o.steps <= 0) return { cost, steps: 0, accepted: 0, stopped: false };

  const tryMove = (radius: number): { undo: () => void; delta: number } | undefined => {
    const m = proposeMove(ctx, radius);
    if (!m) return undefined;
    if (m.kind === 'gate') {
      const g = { ...m, table: tableIndex[m.table]! };
      applyGate(s, o, g);
      s.settle();
      const now = placementCost(s, o.weights).total;
      return {
        delta: now - cost,
        undo: () => {
          applyGate(s, o, g);
          s.settleBack();
        },
      };
    }
    const old = m.parts.map((p) => s.spotOf(p));
    if (!s.moveMany(m.parts, m.spots)) return undefined;
    s.settle();
    const now = placementCost(s, o.weights).total;
    return {
      delta: now - cost,
      undo: () => {
        s.moveMany(m.parts, old);
        s.settleBack();
      },
    };
  };

  const maxR = Math.max(2, Math.ceil((Math.max(s.W, s.H) / 2) * Math.min(1, o.warmth ?? 1)));
  // Starting temperature: the mean uphill step of a sample of moves, each undone.
  let up = 0;
  let ups = 0;
  for (let i = 0; i < 60; i++) {
    const t = tryMove(maxR);
    if (!t) continue;
    if (t.delta > 0) {
      up += t.delta;
      ups++;
    }
    t.undo();
  }
  const t0 = Math.max(0.5, ups ? (0.4 * up) / ups : 1) * (o.warmth ?? 1);
  const tEnd = t0 / 500;
  const cool = Math.pow(tEnd / t0, 1 / o.steps);
  let temp = t0;
  let best = cost;
  let bestSnap = snapshot(s, o);
  let accepted = 0;
  let step = 0;
  let stopped = false;
  const every = Math.max(1, Math.floor(o.steps / 50));
  for (; step < o.steps; step++) {
    if ((step & 255) === 0 && o.shouldStop?.()) {
      stopped = true;
      break;
    }
    const radius = Math.max(1, Math.round(maxR * Math.sqrt(temp / t0)));
    const t = tryMove(radius);
    temp *= cool;
    if (t) {
      if (t.delta <= 0 || o.rng.next() < Math.exp(-t.delta / temp)) {
        cost += t.delta;
        accepted++;
        if (cost < best - 1e-9) {
          best = cost;
          bestSnap = snapshot(s, o);
        }
      } else t.undo();
    }
    if (o.onProgress && step % every === 0) o.onProgress(step / o.steps, cost, best);
  }
  if (cost > best + 1e-9) restore(s, o, bestSnap, movable);
  cost = placementCost(s, o.weights).total;
  return { cost, steps: step, accepted, stopped };
}
