/**
 * The continuity-tester checklist for a finished board.
 *
 * `probeChecklist(circuit, layout)` → `{ beep, silent }`. For each net: a spanning tree over
 * its copper pieces (runs of copper between cuts; a lead in a hole without copper counts as
 * a piece of its own), one pair of holes per tree edge, so a net on k pieces needs k − 1
 * beeps; a pair across a link uses the link's two ends, other pairs the top-left lead (pin or
 * link end) of each piece, bare copper only where a piece has no lead. For each cut between
 * pieces of different nets: one pair, the leads nearest the cut on each side, that must stay
 * silent. Both lists in reading order (top to bottom, left to right), labelled from both
 * sides of the board. Meant for a layout that verifies clean; on a faulty one it still
 * lists what the copper is, shorted classes under the joined name "A+B".
 */
import { holeAt, holeIndex, onBoard } from '../board/index.ts';
import type { Circuit } from '../model/circuit.ts';
import type { Layout } from '../model/layout.ts';
import { readExpected } from './expect.ts';
import { LINK_STEP } from './joins.ts';
import { openLabel } from './nets.ts';
import { buildStage } from './stage.ts';
import type { ProbeChecklist, ProbePair } from './types.ts';
import { at, byReading } from './words.ts';

export function probeChecklist(circuit: Circuit, layout: Layout): ProbeChecklist {
  const board = layout.board;
  const stage = buildStage(board, layout.cuts, layout.links, layout.wires);
  const { copper, joins } = stage;
  const { cols, size } = copper;
  const cls = joins.cls;
  const expected = readExpected(circuit, layout);

  const isLead = new Uint8Array(size);
  for (let h = 0; h < size; h++) if (stage.linkEnds.count[h]) isLead[h] = 1;
  const labels = new Map<number, Set<string>>();
  const seen = new Set<string>();
  for (const lp of layout.parts) {
    const e = expected.parts.get(lp.ref);
    for (const pp of lp.pins) {
      if (!onBoard(board, pp.at)) continue;
      const h = holeIndex(board, pp.at);
      isLead[h] = 1;
      const k = `${lp.ref}\u0000${pp.pin}`;
      if (!e || !e.pinNames.includes(pp.pin) || seen.has(k)) continue;
      seen.add(k);
      const label = e.nets[pp.pin] ?? openLabel(lp.ref, pp.pin);
      (labels.get(cls[h]!) ?? labels.set(cls[h]!, new Set()).get(cls[h]!)!).add(label);
    }
  }
  const nameOf = (c: number) => {
    const l = labels.get(c);
    return l ? [...l].sort().join('+') : undefined;
  };

  // units: copper pieces, and single holes without copper
  const unit = (h: number) => (copper.piece[h]! >= 0 ? copper.piece[h]! : copper.pieceCount + h);
  const unitHoles = new Map<number, number[]>();
  for (let h = 0; h < size; h++) if (labels.has(cls[h]!)) (unitHoles.get(unit(h)) ?? unitHoles.set(unit(h), []).get(unit(h))!).push(h);
  const required = (u: number) => u < copper.pieceCount || isLead[unitHoles.get(u)![0]!] === 1;
  const rep = (u: number) => {
    const hs = unitHoles.get(u)!;
    return hs.find((h) => isLead[h]) ?? hs[0]!;
  };
  const adj = new Map<number, { to: number; a: number; b: number; link: boolean }[]>();
  const s = joins.steps;
  for (let k = 0; k < s.length; k += 4) {
    const [a, b] = [s[k]!, s[k + 1]!];
    if (!labels.has(cls[a]!)) continue;
    const [ua, ub] = [unit(a), unit(b)];
    if (ua === ub) continue;
    const link = s[k + 2] === LINK_STEP;
    (adj.get(ua) ?? adj.set(ua, []).get(ua)!).push({ to: ub, a, b, link });
    (adj.get(ub) ?? adj.set(ub, []).get(ub)!).push({ to: ua, a: b, b: a, link });
  }

  const pair = (a: number, b: number, nets: string[], note: string): ProbePair => {
    let [ha, hb] = [holeAt({ cols }, a), holeAt({ cols }, b)];
    if (byReading(hb, ha) < 0) [ha, hb] = [hb, ha];
    return { a: ha, b: hb, labels: [at(ha, cols), at(hb, cols)], nets, note };
  };

  const beep: ProbePair[] = [];
  const byClass = new Map<number, number[]>();
  for (const u of unitHoles.keys()) {
    const c = cls[unitHoles.get(u)![0]!]!;
    (byClass.get(c) ?? byClass.set(c, []).get(c)!).push(u);
  }
  for (const [c, units] of byClass) {
    const name = nameOf(c)!;
    const req = units.filter(required);
    if (req.length < 2) continue;
    const root = req.reduce((best, u) => (rep(u) < rep(best) ? u : best));
    const parent = new Map<number, { from: number; a: number; b: number; link: boolean } | null>([[root, null]]);
    const queue = [root];
    for (let qi = 0; qi < queue.length; qi++) {
      const u = queue[qi]!;
      for (const e of adj.get(u) ?? []) {
        if (parent.has(e.to)) continue;
        parent.set(e.to, { from: u, a: e.a, b: e.b, link: e.link });
        queue.push(e.to);
      }
    }
    for (const u of queue) {
      if (u === root || !required(u)) continue;
      const step = parent.get(u)!;
      let anc = step.from;
      while (!required(anc)) anc = parent.get(anc)!.from;
      if (step.link && step.from === anc) beep.push(pair(step.a, step.b, [name], `net ${name}: across link from ${at(holeAt({ cols }, step.a), cols)}`));
      else beep.push(pair(rep(anc), rep(u), [name], `net ${name}: between two pieces of its copper`));
    }
  }

  const silent: ProbePair[] = [];
  const done = new Set<string>();
  const sides = copper.cutSides;
  for (let t = 0; t < sides.length; t += 3) {
    const side = { cut: sides[t]!, a: sides[t + 1]!, b: sides[t + 2]! };
    const [ca, cb] = [cls[side.a]!, cls[side.b]!];
    const [na, nb] = [nameOf(ca), nameOf(cb)];
    if (ca === cb || na === undefined || nb === undefined || na === nb) continue;
    const [pa, pb] = [copper.piece[side.a]!, copper.piece[side.b]!];
    const k = pa < pb ? `${pa}|${pb}` : `${pb}|${pa}`;
    if (done.has(k)) continue;
    done.add(k);
    const a = nearestLead(unitHoles.get(pa) ?? [side.a], side.a, isLead, cols);
    const b = nearestLead(unitHoles.get(pb) ?? [side.b], side.b, isLead, cols);
    silent.push(pair(a, b, [na, nb].sort(), `${na} and ${nb} either side of cut ${side.cut + 1}: no beep`));
  }
  const order = (x: ProbePair, y: ProbePair) => byReading(x.a, y.a) || byReading(x.b, y.b);
  return { beep: beep.sort(order), silent: silent.sort(order) };
}

function nearestLead(holes: number[], near: number, isLead: Uint8Array, cols: number): number {
  let best = near;
  let bestD = Infinity;
  const nx = near % cols;
  const ny = (near - nx) / cols;
  for (const h of holes) {
    if (!isLead[h]) continue;
    const x = h % cols;
    const d = (x - nx) ** 2 + ((h - x) / cols - ny) ** 2;
    if (d < bestD) [best, bestD] = [h, d];
  }
  return best;
}
