/**
 * Test and bench support: planted instances (placement-notes.md, "How to know it is
 * good"). A random legal placement gets random cuts (scored, on conductors with leads) and
 * random straight links between free holes, clear of leads, bodies and each other; the
 * netlist is then read off that layout, so a routing with at most those cuts and links is
 * known to exist. Pins alone in their piece of copper stay unconnected where the part kind
 * allows it and get a net of their own otherwise. Deterministic for a seed.
 */
import { conductorsOf } from '../../board/index.ts';
import type { Board, Circuit, Cut, Layout, Segment } from '../../model/index.ts';
import { prepareDesign } from '../../netlist/index.ts';
import { KINDS, fitPose, getFootprint, poseBody } from '../../parts/index.ts';
import { randomCase, seeded, type RandomCase, type RandomOptions } from './random-placement.ts';

export interface PlantedCase extends RandomCase {
  /** The layout the netlist was read from. */
  planted: Layout;
}

export function plantedCase(seed: number, board: Board, parts: number, options: RandomOptions & { cutChance?: number; links?: number } = {}): PlantedCase {
  const base = randomCase(seed, board, parts, 4, { ...options, openChance: 0 });
  const rnd = seeded(seed ^ 0x5bd1e995);
  const { cols, rows } = board;
  const key = (x: number, y: number) => x + y * cols;
  const lead = new Uint8Array(cols * rows);
  const body = new Uint8Array(cols * rows);
  for (const lp of base.placement.parts) {
    const dp = base.design.parts.find((p) => p.ref === lp.ref)!;
    for (const pp of lp.pins) lead[key(pp.at[0], pp.at[1])] = 1;
    const fp = getFootprint(lp.footprint, dp.pinNames)!;
    const pose = fitPose(fp, Object.fromEntries(lp.pins.map((p) => [p.pin, p.at])), dp.span)!;
    for (const [x, y] of poseBody(fp, pose)) body[key(x, y)] = 1;
  }
  const parent = Array.from({ length: cols * rows }, (_, i) => i);
  const find = (i: number): number => (parent[i] === i ? i : (parent[i] = find(parent[i]!)));
  const cutChance = options.cutChance ?? 0.6;
  const cuts: Cut[] = [];
  for (const cond of conductorsOf(board)) {
    for (let i = 1; i < cond.length; i++) {
      const a = cond[i - 1]!;
      const b = cond[i]!;
      if (rnd() < cutChance * 0.35) cuts.push({ between: [a, b] });
      else parent[find(key(...a))] = find(key(...b));
    }
  }
  const used = new Uint8Array(cols * rows);
  const links: Segment[] = [];
  const want = options.links ?? Math.round(parts * 0.6);
  for (let tries = 0; links.length < want && tries < want * 20; tries++) {
    const x = Math.floor(rnd() * cols);
    const y = Math.floor(rnd() * rows);
    const vertical = rnd() < 0.8;
    const len = 1 + Math.floor(rnd() * 6);
    const x2 = vertical ? x : x + len;
    const y2 = vertical ? y + len : y;
    if (x2 >= cols || y2 >= rows) continue;
    const cells: number[] = [];
    for (let k = 0; k <= len; k++) cells.push(vertical ? key(x, y + k) : key(x + k, y));
    if (cells.some((c) => lead[c] || used[c] || body[c])) continue;
    for (const c of cells) used[c] = 1;
    lead[cells[0]!] = lead[cells[len]!] = 1;
    parent[find(cells[0]!)] = find(cells[len]!);
    links.push({ from: [x, y], to: [x2, y2] });
  }
  // Read the netlist off the planted layout.
  const netOf = new Map<number, string>();
  const count = new Map<number, number>();
  for (const lp of base.placement.parts) for (const pp of lp.pins) {
    const r = find(key(pp.at[0], pp.at[1]));
    count.set(r, (count.get(r) ?? 0) + 1);
  }
  const circuit: Circuit = structuredClone(base.circuit);
  circuit.parts.forEach((part, i) => {
    const lp = base.placement.parts[i]!;
    const pins: Record<string, string> = {};
    const open = KINDS[part.kind].openPinsAllowed;
    for (const pp of lp.pins) {
      const r = find(key(pp.at[0], pp.at[1]));
      if (count.get(r) === 1 && open) continue;
      if (!netOf.has(r)) netOf.set(r, `P${netOf.size}`);
      pins[pp.pin] = netOf.get(r)!;
    }
    part.pins = pins;
  });
  const design = prepareDesign(circuit);
  if (!design.ok) throw new Error(`planted case: ${design.problems.map((p) => p.message).join('; ')}`);
  return { circuit, design: design.value, placement: base.placement, planted: { ...base.placement, cuts, links } };
}
