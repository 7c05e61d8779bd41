/**
 * `anneal(state, options): AnnealResult` — detailed placement by simulated annealing on the
 * true cost (classic annealing placers of the 1980s), starting from a legal placement.
 *
 * Each step proposes a move (moves.ts), applies it, recounts only the touched conductors
 * and nets (state.settle) and accepts it by the Metropolis rule at the current temperature;
 * a rejected move is undone (state.settleBack puts the counts back without recounting).
 * The temperature starts from the mean uphill step of a short sample and cools
 * geometrically to 1/500 of it over `steps`; the shift radius shrinks with it. The best
 * placement seen is kept (only the parts changed since the last best are copied) and
 * restored at the end. Deterministic for a given generator; `shouldStop` is asked every 256
 * steps; `onProgress` gets 50 reports. Moves go through one reused buffer, so a step
 * allocates nothing of its own (the greedy link plan, when its weight is on, does).
 */
import { placementTotal, type CostWeights } from './cost.ts';
import { moveBuffer, partMask, proposeMove, type MoveContext } from './moves.ts';
import type { Rng } from './rng.ts';
import type { SectionTable } from './sections.ts';
import type { PlaceState } from './state.ts';

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

function applyGate(s: PlaceState, o: AnnealOptions, table: number, a: number, b: number): void {
  const t = o.tables[table]!;
  const part = s.problem.parts[t.part]!;
  const pa = t.slots[a]!;
  const pb = t.slots[b]!;
  for (let r = 0; r < pa.length; r++) {
    const ia = part.pinNames.indexOf(pa[r]!);
    const ib = part.pinNames.indexOf(pb[r]!);
    const na = s.pinNet[t.part]![ia]!;
    const nb = s.pinNet[t.part]![ib]!;
    s.setNet(t.part, ia, nb);
    s.setNet(t.part, ib, na);
  }
  const slots = o.slotSections[table]!;
  [slots[a], slots[b]] = [slots[b], slots[a]];
}

/** The best placement seen: spots and pin nets per part, sections per table. */
class Best {
  readonly x: Int32Array;
  readonly y: Int32Array;
  readonly pose: Int32Array;
  readonly nets: number[][];
  slots: (string | undefined)[][];
  /** Parts changed since the last save, and whether any gate swap happened. */
  private readonly changed: number[] = [];
  private readonly isChanged: Uint8Array;
  private swapped = false;

  constructor(
    private readonly s: PlaceState,
    private readonly o: AnnealOptions,
  ) {
    this.x = s.x.slice();
    this.y = s.y.slice();
    this.pose = s.pose.slice();
    this.nets = s.pinNet.map((n) => n.slice());
    this.slots = o.slotSections.map((x) => x.slice());
    this.isChanged = new Uint8Array(s.x.length);
  }

  touch(p: number): void {
    if (!this.isChanged[p]) {
      this.isChanged[p] = 1;
      this.changed.push(p);
    }
  }

  touchGate(part: number): void {
    this.touch(part);
    this.swapped = true;
  }

  save(): void {
    const s = this.s;
    for (const p of this.changed) {
      this.isChanged[p] = 0;
      this.x[p] = s.x[p]!;
      this.y[p] = s.y[p]!;
      this.pose[p] = s.pose[p]!;
      const from = s.pinNet[p]!;
      const to = this.nets[p]!;
      for (let i = 0; i < from.length; i++) to[i] = from[i]!;
    }
    this.changed.length = 0;
    if (this.swapped) this.slots = this.o.slotSections.map((x) => x.slice());
    this.swapped = false;
  }

  restore(movable: number[]): void {
    const s = this.s;
    for (const p of movable) s.lift(p);
    this.nets.forEach((nets, p) => nets.forEach((n, i) => s.setNet(p, i, n)));
    for (const p of movable) s.place(p, { x: this.x[p]!, y: this.y[p]!, pose: this.pose[p]! });
    this.slots.forEach((x, i) => (this.o.slotSections[i] = x.slice()));
    s.settle();
  }
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
  let cost = placementTotal(s, o.weights);
  if (!movable.length || o.steps <= 0) return { cost, steps: 0, accepted: 0, stopped: false };
  const ctx: MoveContext = { s, rng: o.rng, movable, groups, tables, focus, movableMask: partMask(s, movable) };

  // The move of the last tryMove, and where its parts were (for undo).
  const m = moveBuffer(parts.length);
  const oldX = new Int32Array(m.parts.length);
  const oldY = new Int32Array(m.parts.length);
  const oldPose = new Int32Array(m.parts.length);
  let gateTable = 0;
  /** Make a move and return the change in cost, or undefined when none was made. */
  const tryMove = (radius: number): number | undefined => {
    if (!proposeMove(ctx, radius, m)) return undefined;
    if (m.gate) {
      gateTable = tableIndex[m.table]!;
      applyGate(s, o, gateTable, m.a, m.b);
    } else {
      for (let i = 0; i < m.n; i++) {
        const p = m.parts[i]!;
        oldX[i] = s.x[p]!;
        oldY[i] = s.y[p]!;
        oldPose[i] = s.pose[p]!;
      }
      if (!s.moveParts(m.parts, m.x, m.y, m.pose, m.n)) return undefined;
    }
    s.settle();
    return placementTotal(s, o.weights) - cost;
  };
  const undo = (): void => {
    if (m.gate) applyGate(s, o, gateTable, m.a, m.b);
    else s.moveParts(m.parts, oldX, oldY, oldPose, m.n);
    s.settleBack();
  };

  const maxR = Math.max(2, Math.ceil((Math.max(s.W, s.H) / 2) * Math.min(1, o.warmth ?? 1)));
  // Starting temperature: the mean uphill step of a sample of moves, each undone.
  let up = 0;
  let ups = 0;
  for (let i = 0; i < 60; i++) {
    const delta = tryMove(maxR);
    if (delta === undefined) continue;
    if (delta > 0) {
      up += delta;
      ups++;
    }
    undo();
  }
  const t0 = Math.max(0.5, ups ? (0.4 * up) / ups : 1) * (o.warmth ?? 1);
  const tEnd = t0 / 500;
  const cool = Math.pow(tEnd / t0, 1 / o.steps);
  let temp = t0;
  let best = cost;
  const bestSeen = new Best(s, o);
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
    const delta = tryMove(radius);
    temp *= cool;
    if (delta !== undefined) {
      if (delta <= 0 || o.rng.next() < Math.exp(-delta / temp)) {
        cost += delta;
        accepted++;
        if (m.gate) bestSeen.touchGate(o.tables[gateTable]!.part);
        else for (let i = 0; i < m.n; i++) bestSeen.touch(m.parts[i]!);
        if (cost < best - 1e-9) {
          best = cost;
          bestSeen.save();
        }
      } else undo();
    }
    if (o.onProgress && step % every === 0) o.onProgress(step / o.steps, cost, best);
  }
  if (cost > best + 1e-9) bestSeen.restore(movable);
  cost = placementTotal(s, o.weights);
  return { cost, steps: step, accepted, stopped };
}
