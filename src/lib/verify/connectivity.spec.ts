/**
 * Cross-check against an independent reference. fast-check builds random boards (strip,
 * pads, bus with explicit conductors — random lists and the breadboard pattern), cuts,
 * links, wires and pin placements; the reference builds a graphology graph straight from
 * the exchange contract's words and takes connectedComponents. The verifier's classes,
 * its copper pieces and the netlist it extracts must agree on every case.
 */
import fc from 'fast-check';
import Graph from 'graphology';
import { connectedComponents } from 'graphology-components';
import { describe, expect, it } from 'vitest';
import { breadboardBoard } from '../board/index.ts';
import type { Board, Cut, Layout, Segment } from '../model/index.ts';
import { extractNetlist } from './extract.ts';
import { buildStage } from './stage.ts';

type H = [number, number];

const CASES = 2000;

/** Random documents; holes may fall just off the board so those rules are exercised too. */
const arbLayout: fc.Arbitrary<Layout> = fc
  .record({
    kind: fc.constantFrom('strip', 'pads', 'bus', 'breadboard', 'strip+conductors'),
    cols: fc.integer({ min: 1, max: 12 }),
    rows: fc.integer({ min: 1, max: 9 }),
    seed: fc.array(fc.integer({ min: 0, max: 1 << 30 }), { minLength: 64, maxLength: 64 }),
    nCuts: fc.integer({ min: 0, max: 12 }),
    nLinks: fc.integer({ min: 0, max: 6 }),
    nWires: fc.integer({ min: 0, max: 5 }),
    nParts: fc.integer({ min: 0, max: 6 }),
  })
  .map(({ kind, cols, rows, seed, nCuts, nLinks, nWires, nParts }) => {
    let k = 0;
    const next = (n: number) => {
      const v = seed[k++ % seed.length]! ^ (k * 2654435761);
      return Math.abs(v) % Math.max(1, n);
    };
    let board: Board;
    if (kind === 'breadboard') board = breadboardBoard(Math.max(4, cols));
    else if (kind === 'bus' || kind === 'strip+conductors') {
      const conductors: H[][] = [];
      const n = 1 + next(8);
      for (let i = 0; i < n; i++) {
        const len = 1 + next(6);
        const c: H[] = [];
        for (let j = 0; j < len; j++) c.push([next(cols + 1), next(rows + 1)]); // cols/rows themselves are off the board
        conductors.push(c);
      }
      board = { kind: kind === 'bus' ? 'bus' : 'strip', cols, rows, pitchMm: 2.54, conductors };
    } else board = { kind: kind as 'strip' | 'pads', cols, rows, pitchMm: 2.54 };
    const C = board.cols;
    const R = board.rows;
    const hole = (): H => [next(C + 1), next(R + 1)];
    const cuts: Cut[] = [];
    for (let i = 0; i < nCuts; i++) {
      if (next(3) === 0) cuts.push({ at: hole() });
      else {
        const a = hole();
        // mostly real neighbours along a row or column, sometimes any two holes
        const b: H = next(4) === 0 ? hole() : next(2) ? [a[0] + 1, a[1]] : [a[0], a[1] + 1];
        cuts.push({ between: [a, b] });
      }
    }
    const links: Segment[] = [];
    for (let i = 0; i < nLinks; i++) links.push({ from: hole(), to: hole() });
    const wires: Segment[] = [];
    for (let i = 0; i < nWires; i++) {
      const a = hole();
      const len = next(5);
      const kindOf = next(5);
      const b: H = kindOf === 0 ? [a[0] + len, a[1] + len + 1] : kindOf % 2 ? [Math.max(0, a[0] - len + 2), a[1]] : [a[0], a[1] + len];
      wires.push({ from: a, to: b });
    }
    const parts = [];
    for (let i = 0; i < nParts; i++) {
      const n = 1 + next(3);
      parts.push({ ref: `X${i + 1}`, footprint: `pads-${n}`, pins: Array.from({ length: n }, (_, j) => ({ pin: String(j + 1), at: hole() })) });
    }
    return { format: 'kerfline.layout', version: 1, board, parts, cuts, links, wires } as Layout;
  });

/** The reference: the contract's words, built with graphology, nothing shared with the verifier. */
function reference(l: Layout): { all: Map<string, number>; copper: Map<string, number> } {
  const { cols, rows } = l.board;
  const on = (h: H) => h[0] >= 0 && h[1] >= 0 && h[0] < cols && h[1] < rows;
  const id = (h: H) => `${h[0]},${h[1]}`;
  const drilled = new Set(l.cuts.flatMap((c) => ('at' in c ? [id(c.at)] : [])));
  const scored = new Set(l.cuts.flatMap((c) => ('between' in c ? [`${id(c.between[0])}|${id(c.between[1])}`, `${id(c.between[1])}|${id(c.between[0])}`] : [])));
  const conductors: H[][] = l.board.conductors
    ? l.board.conductors
    : l.board.kind === 'strip'
      ? Array.from({ length: rows }, (_, r) => Array.from({ length: cols }, (_, c) => [c, r] as H))
      : l.board.kind === 'pads'
        ? Array.from({ length: rows * cols }, (_, i) => [[i % cols, Math.floor(i / cols)] as H])
        : [];
  const copperGraph = new Graph({ type: 'undirected', multi: true, allowSelfLoops: true });
  const allGraph = new Graph({ type: 'undirected', multi: true, allowSelfLoops: true });
  for (let r = 0; r < rows; r++)
    for (let c = 0; c < cols; c++) {
      copperGraph.addNode(id([c, r]));
      allGraph.addNode(id([c, r]));
    }
  const hasCopper = new Set<string>();
  for (const cond of conductors) {
    for (const h of cond) if (on(h) && !drilled.has(id(h))) hasCopper.add(id(h));
    for (let i = 0; i + 1 < cond.length; i++) {
      const [a, b] = [cond[i]!, cond[i + 1]!];
      if (!on(a) || !on(b) || drilled.has(id(a)) || drilled.has(id(b)) || scored.has(`${id(a)}|${id(b)}`)) continue;
      copperGraph.addEdge(id(a), id(b));
      allGraph.addEdge(id(a), id(b));
    }
  }
  for (const link of l.links) if (on(link.from) && on(link.to)) allGraph.addEdge(id(link.from), id(link.to));
  for (const w of l.wires) {
    if (!on(w.from) || !on(w.to) || (w.from[0] !== w.to[0] && w.from[1] !== w.to[1])) continue;
    const n = Math.max(Math.abs(w.to[0] - w.from[0]), Math.abs(w.to[1] - w.from[1]));
    const dx = Math.sign(w.to[0] - w.from[0]);
    const dy = Math.sign(w.to[1] - w.from[1]);
    for (let i = 0; i < n; i++) allGraph.addEdge(id([w.from[0] + dx * i, w.from[1] + dy * i]), id([w.from[0] + dx * (i + 1), w.from[1] + dy * (i + 1)]));
  }
  const label = (g: Graph, keep: (node: string) => boolean) => {
    const m = new Map<string, number>();
    connectedComponents(g).forEach((comp, k) => {
      for (const node of comp) if (keep(node)) m.set(node, k);
    });
    return m;
  };
  return { all: label(allGraph, () => true), copper: label(copperGraph, (n) => hasCopper.has(n)) };
}

/** Two labellings describe the same partition. */
function samePartition(a: Map<string, number>, b: Map<string, number>): boolean {
  if (a.size !== b.size) return false;
  const ab = new Map<number, number>();
  const ba = new Map<number, number>();
  for (const [k, x] of a) {
    const y = b.get(k);
    if (y === undefined) return false;
    if ((ab.get(x) ?? y) !== y || (ba.get(y) ?? x) !== x) return false;
    ab.set(x, y);
    ba.set(y, x);
  }
  return true;
}

describe('connectivity against a graphology reference', () => {
  it(`agrees on classes, copper pieces and extracted nets (${CASES} random documents)`, () => {
    fc.assert(
      fc.property(arbLayout, (l) => {
        const ref = reference(l);
        const stage = buildStage(l.board, l.cuts, l.links, l.wires);
        const cols = l.board.cols;
        const mine = new Map<string, number>();
        const pieces = new Map<string, number>();
        stage.joins.cls.forEach((c, i) => {
          const key = `${i % cols},${Math.floor(i / cols)}`;
          mine.set(key, c);
          if (stage.copper.piece[i]! >= 0) pieces.set(key, stage.copper.piece[i]!);
        });
        expect(samePartition(mine, ref.all)).toBe(true);
        expect(samePartition(pieces, ref.copper)).toBe(true);
        // the extracted netlist: pins together exactly when their holes are connected
        const nets = extractNetlist(l).nets;
        const comps = nets.map((n) => new Set(n.holes.map((h) => ref.all.get(`${h[0]},${h[1]}`))));
        for (const s of comps) expect(s.size).toBe(1);
        expect(new Set(comps.map((s) => [...s][0])).size).toBe(nets.length);
      }),
      { numRuns: CASES },
    );
  });
});
