/**
 * The board stage: everything that depends only on the board, cuts, links and wires —
 * copper pieces, connectivity classes, link ends as leads — plus lazily built indexes
 * (holes per class, the hole graph used to trace shorts). Parts moving never change it,
 * which is what the incremental verifier keeps between calls.
 */
import { holeIndex, onBoard } from '../board/index.ts';
import type { Board, Cut, Segment } from '../model/layout.ts';
import { buildCopper, type Copper } from './copper.ts';
import { HoleLists } from './hole-lists.ts';
import { buildJoins, type Joins } from './joins.ts';

/** A lead through a hole: a part's pin or a link end. */
export type Lead = { kind: 'pin'; part: number; j: number; ref: string; pin: string } | { kind: 'link'; link: number; end: 'from' | 'to' };

export interface Stage {
  board: Board;
  cuts: Cut[];
  links: Segment[];
  wires: Segment[];
  copper: Copper;
  joins: Joins;
  /** hole → link ends in it (`a` the link index, `b` 0 for its start, 1 for its end). */
  linkEnds: HoleLists;
  /** hole lists per class (built on first use). */
  classHoles?: Map<number, number[]>;
  /** adjacency of holes by copper, link and wire steps (built on first use). */
  graph?: HoleGraph;
}

/** Compressed adjacency: neighbours of hole h are at start[h] … start[h+1]−1. */
export interface HoleGraph {
  start: Int32Array;
  to: Int32Array;
  /** 0 copper, LINK_STEP, WIRE_STEP. */
  kind: Int8Array;
  /** link or wire index, −1 for copper. */
  which: Int32Array;
}

export function buildStage(board: Board, cuts: Cut[], links: Segment[], wires: Segment[]): Stage {
  const copper = buildCopper(board, cuts);
  const joins = buildJoins(board, copper, links, wires);
  const linkEnds = new HoleLists(copper.size);
  links.forEach((l, k) => {
    if (onBoard(board, l.from)) linkEnds.add(holeIndex(board, l.from), k, 0);
    if (onBoard(board, l.to)) linkEnds.add(holeIndex(board, l.to), k, 1);
  });
  return { board, cuts, links, wires, copper, joins, linkEnds };
}

export function classHoles(stage: Stage): Map<number, number[]> {
  if (!stage.classHoles) {
    const m = new Map<number, number[]>();
    const cls = stage.joins.cls;
    for (let i = 0; i < cls.length; i++) (m.get(cls[i]!) ?? m.set(cls[i]!, []).get(cls[i]!)!).push(i);
    stage.classHoles = m;
  }
  return stage.classHoles;
}

export function holeGraph(stage: Stage): HoleGraph {
  if (stage.graph) return stage.graph;
  const n = stage.copper.size;
  const e = stage.copper.edges;
  const s = stage.joins.steps;
  const deg = new Int32Array(n + 1);
  for (let k = 0; k < e.length; k += 2) {
    deg[e[k]!]!++;
    deg[e[k + 1]!]!++;
  }
  for (let k = 0; k < s.length; k += 4) {
    deg[s[k]!]!++;
    deg[s[k + 1]!]!++;
  }
  const start = new Int32Array(n + 1);
  for (let i = 0; i < n; i++) start[i + 1] = start[i]! + deg[i]!;
  const fill = start.slice(0, n);
  const m = start[n]!;
  const to = new Int32Array(m);
  const kind = new Int8Array(m);
  const which = new Int32Array(m);
  const add = (a: number, b: number, k: number, w: number) => {
    const at = fill[a]!++;
    to[at] = b;
    kind[at] = k;
    which[at] = w;
  };
  for (let k = 0; k < e.length; k += 2) {
    add(e[k]!, e[k + 1]!, 0, -1);
    add(e[k + 1]!, e[k]!, 0, -1);
  }
  for (let k = 0; k < s.length; k += 4) {
    add(s[k]!, s[k + 1]!, s[k + 2]!, s[k + 3]!);
    add(s[k + 1]!, s[k]!, s[k + 2]!, s[k + 3]!);
  }
  stage.graph = { start, to, kind, which };
  return stage.graph;
}
