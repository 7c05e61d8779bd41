/**
 * Connectivity: the copper pieces joined by links (component side, joining the holes at
 * their two ends only) and copper-side wires (straight runs in one row or column, joining
 * every hole they pass over, ends included). Every hole is a node, so a wire passing over
 * a hole without copper (a pad-board gap, a drilled-out hole, a blank breadboard row) still
 * joins whatever lead sits in it: bare wire soldered to the lead is a connection whether
 * or not copper is under it. Links or wires with an end off the board and diagonal wires
 * are faults and join nothing.
 *
 * `buildJoins(board, copper, links, wires)` → `cls[hole]`: the class of every hole, named by
 * the smallest hole index in it, plus the link and wire steps used to explain shorts.
 */
import { holeIndex, onBoard } from '../board/index.ts';
import type { Board, Segment } from '../model/layout.ts';
import type { Hole, Problem } from '../model/problem.ts';
import type { Copper } from './copper.ts';
import { at, problem } from './words.ts';

export const LINK_STEP = 1;
export const WIRE_STEP = 2;

export interface Joins {
  /** Connectivity class of each hole: the smallest hole index of its class. */
  cls: Int32Array;
  /** 1 where a copper-side wire passes over the hole. */
  wireOver: Uint8Array;
  /** Link and wire steps, flattened as [a, b, LINK_STEP | WIRE_STEP, index]. */
  steps: number[];
  /** hole → links passing over it between their ends. */
  linkOver: Map<number, number[]>;
  faults: Problem[];
  warnings: Problem[];
}

export function buildJoins(board: Board, copper: Copper, links: Segment[], wires: Segment[]): Joins {
  const { cols, rows, size } = copper;
  const faults: Problem[] = [];
  const warnings: Problem[] = [];
  const uf = copper.sets.clone();
  const steps: number[] = [];
  const wireOver = new Uint8Array(size);
  const linkOver = new Map<number, number[]>();
  const offHint = `columns run 0–${cols - 1} and rows 0–${rows - 1} in the document (0-based)`;

  const okLinks: number[] = [];
  links.forEach((l, k) => {
    const bad = (['from', 'to'] as const).filter((e) => !onBoard(board, l[e]));
    if (bad.length) {
      for (const e of bad)
        faults.push(problem('verify.off-board', 'error', ['links', k, e], `link ${k + 1} ${e === 'from' ? 'starts' : 'ends'} off the board at [${l[e].join(', ')}]`, { hint: offHint }));
      return;
    }
    const a = holeIndex(board, l.from);
    const b = holeIndex(board, l.to);
    uf.union(a, b);
    steps.push(a, b, LINK_STEP, k);
    okLinks.push(k);
    for (const h of cellsUnder(l.from, l.to)) {
      const i = holeIndex(board, h);
      (linkOver.get(i) ?? linkOver.set(i, []).get(i)!).push(k);
    }
  });

  wires.forEach((w, k) => {
    const bad = (['from', 'to'] as const).filter((e) => !onBoard(board, w[e]));
    if (bad.length) {
      for (const e of bad)
        faults.push(problem('verify.off-board', 'error', ['wires', k, e], `copper-side wire ${k + 1} ${e === 'from' ? 'starts' : 'ends'} off the board at [${w[e].join(', ')}]`, { hint: offHint }));
      return;
    }
    if (w.from[0] !== w.to[0] && w.from[1] !== w.to[1]) {
      faults.push(
        problem('verify.diagonal-wire', 'error', ['wires', k], `copper-side wire ${k + 1} from ${at(w.from, cols)} to ${at(w.to, cols)} is diagonal; it joins nothing`, {
          hint: 'run copper-side wires along one row or one column; use two wires for a corner',
          holes: [w.from, w.to],
        }),
      );
      return;
    }
    const dx = Math.sign(w.to[0] - w.from[0]);
    const dy = Math.sign(w.to[1] - w.from[1]);
    let prev = holeIndex(board, w.from);
    wireOver[prev] = 1;
    for (let x = w.from[0], y = w.from[1]; x !== w.to[0] || y !== w.to[1]; ) {
      x += dx;
      y += dy;
      const i = x + y * cols;
      wireOver[i] = 1;
      uf.union(prev, i);
      steps.push(prev, i, WIRE_STEP, k);
      prev = i;
    }
  });

  for (const k of okLinks) {
    const l = links[k]!;
    for (const e of ['from', 'to'] as const) {
      const i = holeIndex(board, l[e]);
      if (!copper.copper[i] && !copper.cutAt[i] && !wireOver[i])
        warnings.push(
          problem('verify.link-dangling', 'warning', ['links', k, e], `link ${k + 1} ${e === 'from' ? 'starts' : 'ends'} at ${at(l[e], cols)}, where there is no copper and no wire: that end joins nothing`, {
            hint: 'end the link on a strip or pad, or solder a copper-side wire to it',
            holes: [l[e]],
          }),
        );
    }
  }

  const roots = uf.roots();
  const least = new Int32Array(size).fill(-1);
  const cls = new Int32Array(size);
  for (let i = 0; i < size; i++) {
    const r = roots[i]!;
    if (least[r]! < 0) least[r] = i;
    cls[i] = least[r]!;
  }
  return { cls, wireOver, steps, linkOver, faults, warnings };
}

/** Holes a link passes over between its two ends (cells whose centre is within half a pitch). */
export function cellsUnder(a: Hole, b: Hole): Hole[] {
  const out: Hole[] = [];
  const [x0, y0] = a;
  const [x1, y1] = b;
  const dx = x1 - x0;
  const dy = y1 - y0;
  const len = Math.hypot(dx, dy);
  if (len === 0) return out;
  for (let y = Math.min(y0, y1); y <= Math.max(y0, y1); y++)
    for (let x = Math.min(x0, x1); x <= Math.max(x0, x1); x++) {
      if ((x === x0 && y === y0) || (x === x1 && y === y1)) continue;
      if (Math.abs((x - x0) * dy - (y - y0) * dx) / len < 0.5) out.push([x, y]);
    }
  return out;
}
