/**
 * Tracing how copper joins two leads: a breadth-first search over the hole graph (copper
 * adjacency, links, copper-side wires) from a set of source holes, then the path to a
 * target told in bench terms — runs of copper, links, wires — with the first place to
 * break it.
 */
import { holeAt } from '../board/index.ts';
import type { Hole } from '../model/problem.ts';
import { LINK_STEP, WIRE_STEP } from './joins.ts';
import { holeGraph, type Stage } from './stage.ts';
import { at } from './words.ts';

export interface Trace {
  /** Parent hole of each reached hole (−1 for sources, −2 unreached). */
  parent: Int32Array;
  /** Adjacency slot used to reach each hole. */
  via: Int32Array;
}

export function traceFrom(stage: Stage, sources: number[]): Trace {
  const g = holeGraph(stage);
  const n = stage.copper.size;
  const parent = new Int32Array(n).fill(-2);
  const via = new Int32Array(n).fill(-1);
  const queue = new Int32Array(n);
  let head = 0;
  let tail = 0;
  for (const s of sources)
    if (parent[s] === -2) {
      parent[s] = -1;
      queue[tail++] = s;
    }
  while (head < tail) {
    const h = queue[head++]!;
    for (let k = g.start[h]!; k < g.start[h + 1]!; k++) {
      const t = g.to[k]!;
      if (parent[t] !== -2) continue;
      parent[t] = h;
      via[t] = k;
      queue[tail++] = t;
    }
  }
  return { parent, via };
}

export interface PathStep {
  kind: 'copper' | 'link' | 'wire';
  from: Hole;
  to: Hole;
  /** Link or wire index. */
  index?: number;
  /** The hole after `from` along a copper run (where to cut). */
  second?: Hole;
}

/** Steps from the nearest source to `target` (empty when target is a source). */
export function pathTo(stage: Stage, trace: Trace, target: number): PathStep[] {
  const g = holeGraph(stage);
  const cols = stage.copper.cols;
  const raw: { kind: PathStep['kind']; a: number; b: number; index: number }[] = [];
  for (let h = target; trace.parent[h]! >= 0; h = trace.parent[h]!) {
    const slot = trace.via[h]!;
    const k = g.kind[slot]!;
    raw.push({ kind: k === LINK_STEP ? 'link' : k === WIRE_STEP ? 'wire' : 'copper', a: trace.parent[h]!, b: h, index: g.which[slot]! });
  }
  raw.reverse();
  const steps: PathStep[] = [];
  for (const r of raw) {
    const last = steps[steps.length - 1];
    const merge = last && last.kind === r.kind && r.kind !== 'link' && (r.kind === 'copper' || last.index === r.index);
    if (merge) last.to = holeAt({ cols }, r.b);
    else {
      const s: PathStep = { kind: r.kind, from: holeAt({ cols }, r.a), to: holeAt({ cols }, r.b) };
      if (r.kind !== 'copper') s.index = r.index;
      else s.second = holeAt({ cols }, r.b);
      steps.push(s);
    }
  }
  return steps;
}

export function stepsText(steps: PathStep[], cols: number): string {
  if (!steps.length) return 'the same hole';
  return steps
    .map((s) =>
      s.kind === 'copper'
        ? `a copper run from ${at(s.from, cols)} to ${at(s.to, cols)}`
        : s.kind === 'link'
          ? `link ${s.index! + 1} from ${at(s.from, cols)} to ${at(s.to, cols)}`
          : `copper-side wire ${s.index! + 1} from ${at(s.from, cols)} to ${at(s.to, cols)}`,
    )
    .join(', then ');
}

/** Where to break a joining path: the first copper run, else the first link or wire. */
export function breakHint(steps: PathStep[], cols: number): string {
  if (!steps.length) return 'give each lead its own hole';
  const cu = steps.find((s) => s.kind === 'copper');
  if (cu) {
    return `cut the copper between ${at(cu.from, cols)} and ${at(cu.second ?? cu.to, cols)} (or anywhere on that run between the two leads), then re-check`;
  }
  const s = steps[0]!;
  return s.kind === 'link' ? `remove or move link ${s.index! + 1}` : `remove or shorten copper-side wire ${s.index! + 1}`;
}
