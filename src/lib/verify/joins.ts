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
import { onBoard } from '../board/index.ts';
import type { Board, Segment } from '../model/layout.ts';
import type { Hole, Problem } from '../model/problem.ts';
import type { Copper } from './copper.ts';
import { HoleLists } from './hole-lists.ts';
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
  /** hole → links passing over it between their ends (`a` is the link index). */
  linkOver: HoleLists;
  faults: Problem[];
  warnings: Problem[];
}

export function buildJoins(board: Board, copper: Copper, links: Segment[], wires: Segment[]): Joins {
  const { cols, rows, size } = copper;
  const faults: Problem[] = [];
  const warnings: Problem[] = [];
  // a node per copper piece (its first hole) and per hole without copper: the class of a
  // node set is then its smallest node, which is the smallest hole in it
  const piece = copper.piece;
  const first = new Int32Array(copper.pieceCount).fill(-1);
  for (let i = 0; i < size; i++) if (piece[i]! >= 0 && first[piece[i]!]! < 0) first[piece[i]!] = i;
  const node = (i: number) => (piece[i]! >= 0 ? first[piece[i]!]! : i);
  const parent = links.length || wires.length ? new Int32Array(size) : undefined;
  if (parent) for (let i = 0; i < size; i++) parent[i] = i;
  const find = (i: number) => {
    while (parent![i] !== i) {
      parent![i] = parent![parent![i]!]!;
      i = parent![i]!;
    }
    return i;
  };
  const join = (a: number, b: number) => {
    const ra = find(node(a));
    const rb = find(node(b));
    if (ra < rb) parent![rb] = ra;
    else parent![ra] = rb;
  };
  const steps: number[] = [];
  const wireOver = new Uint8Array(size);
  const linkOver = new HoleLists(size);
  const offHint = `columns run 0–${cols - 1} and rows 0–${rows - 1} in the document (0-based)`;

  const okLinks: number[] = [];
  links.forEach((l, k) => {
    const fromOn = onBoard(board, l.from);
    const toOn = onBoard(board, l.to);
    if (!fromOn || !toOn) {
      if (!fromOn) faults.push(problem('verify.off-board', 'error', ['links', k, 'from'], `link ${k + 1} starts off the board at [${l.from.join(', ')}]`, { hint: offHint }));
      if (!toOn) faults.push(problem('verify.off-board', 'error', ['links', k, 'to'], `link ${k + 1} ends off the board at [${l.to.join(', ')}]`, { hint: offHint }));
      return;
    }
    const a = l.from[0] + l.from[1] * cols;
    const b = l.to[0] + l.to[1] * cols;
    join(a, b);
    steps.push(a, b, LINK_STEP, k);
    okLinks.push(k);
    eachCellUnder(l.from, l.to, (i) => linkOver.add(i, k, 0), cols);
  });

  wires.forEach((w, k) => {
    const fromOn = onBoard(board, w.from);
    const toOn = onBoard(board, w.to);
    if (!fromOn || !toOn) {
      if (!fromOn) faults.push(problem('verify.off-board', 'error', ['wires', k, 'from'], `copper-side wire ${k + 1} starts off the board at [${w.from.join(', ')}]`, { hint: offHint }));
      if (!toOn) faults.push(problem('verify.off-board', 'error', ['wires', k, 'to'], `copper-side wire ${k + 1} ends off the board at [${w.to.join(', ')}]`, { hint: offHint }));
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
    let prev = w.from[0] + w.from[1] * cols;
    wireOver[prev] = 1;
    for (let x = w.from[0], y = w.from[1]; x !== w.to[0] || y !== w.to[1]; ) {
      x += dx;
      y += dy;
      const i = x + y * cols;
      wireOver[i] = 1;
      join(prev, i);
      steps.push(prev, i, WIRE_STEP, k);
      prev = i;
    }
  });

  for (const k of okLinks) {
    const l = links[k]!;
    for (const e of ['from', 'to'] as const) {
      const i = l[e][0] + l[e][1] * cols;
      if (!copper.copper[i] && !copper.cutAt[i] && !wireOver[i])
        warnings.push(
          problem('verify.link-dangling', 'warning', ['links', k, e], `link ${k + 1} ${e === 'from' ? 'starts' : 'ends'} at ${at(l[e], cols)}, where there is no copper and no wire: that end joins nothing`, {
            hint: 'end the link on a strip or pad, or solder a copper-side wire to it',
            holes: [l[e]],
          }),
        );
    }
  }

  const cls = new Int32Array(size);
  for (let i = 0; i < size; i++) {
    const n = piece[i]! >= 0 ? first[piece[i]!]! : i;
    cls[i] = parent && parent[n] !== n ? find(n) : n;
  }
  return { cls, wireOver, steps, linkOver, faults, warnings };
}

/** Visit the holes a link passes over between its two ends (cells whose centre is within half a pitch). */
function eachCellUnder(a: Hole, b: Hole, visit: (hole: number) => void, cols: number): void {
  const [x0, y0] = a;
  const [x1, y1] = b;
  const dx = x1 - x0;
  const dy = y1 - y0;
  const len = Math.hypot(dx, dy);
  if (len === 0) return;
  for (let y = Math.min(y0, y1); y <= Math.max(y0, y1); y++)
    for (let x = Math.min(x0, x1); x <= Math.max(x0, x1); x++) {
      if ((x === x0 && y === y0) || (x === x1 && y === y1)) continue;
      if (Math.abs((x - x0) * dy - (y - y0) * dx) / len < 0.5) visit(x + y * cols);
    }
}
