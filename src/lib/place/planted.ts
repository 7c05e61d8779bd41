/**
 * `plantedInstance(parts, seed): PlantedInstance` — a layout problem with a known good
 * answer (placement-notes.md "planted instances").
 *
 * Random parts (resistors, small capacitors, diodes, TO-92 transistors, now and then a
 * DIP-8) are dropped at random legal spots of a strip board about 2.5 times their body area,
 * upright poses preferred; each strip is cut between neighbouring leads at random (always
 * between two leads of one part), a few straight links across the strips join segments
 * (each over free holes, landing in free holes of the two segments' copper), and the
 * netlist is read off the copper. The result is the design, the board, and the planted spots, whose cost is
 * an upper bound on the optimum: a planner that re-plans the scrambled design should come
 * in at or under it.
 */
import type { Board } from '../model/layout.ts';
import type { Design, DesignPart } from '../netlist/design.ts';
import { makeBoard } from '../board/grid.ts';
import { copperMap } from './copper-map.ts';
import { buildProblem } from './problem.ts';
import { createRng } from './rng.ts';
import { PlaceState, type Spot } from './state.ts';

export interface PlantedInstance {
  design: Design;
  board: Board;
  spots: Spot[];
}

const KINDS: { kind: DesignPart['kind']; footprint: string; pins: string[]; weight: number }[] = [
  { kind: 'resistor', footprint: 'axial-small', pins: ['1', '2'], weight: 5 },
  { kind: 'capacitor', footprint: 'radial-2.54', pins: ['1', '2'], weight: 2 },
  { kind: 'diode', footprint: 'do35', pins: ['A', 'K'], weight: 1 },
  { kind: 'npn', footprint: 'to92-EBC', pins: ['E', 'B', 'C'], weight: 2 },
  { kind: 'ic', footprint: 'dip-8', pins: ['1', '2', '3', '4', '5', '6', '7', '8'], weight: 0.4 },
];

export function plantedInstance(count: number, seed: number): PlantedInstance {
  const rng = createRng(seed);
  const total = KINDS.reduce((a, k) => a + k.weight, 0);
  const parts: DesignPart[] = [];
  for (let i = 0; i < count; i++) {
    let r = rng.next() * total;
    const k = KINDS.find((x) => (r -= x.weight) < 0) ?? KINDS[0]!;
    const span = k.footprint === 'axial-small' || k.footprint === 'do35' ? { min: 3, max: 5 } : undefined;
    const dp: DesignPart = { ref: `P${i + 1}`, kind: k.kind, footprint: k.footprint, pinNames: k.pins.slice(), nets: {}, polarized: false, source: [i] };
    if (span) dp.span = span;
    // An ic names its package (the circuit rebuilt for verifying needs it).
    if (k.kind === 'ic') dp.package = 'DIP-8';
    parts.push(dp);
  }
  // Nets come later; build the problem with placeholder nets to get the poses.
  const scratch: Design = { title: 'planted', parts: parts.map((p) => ({ ...p, nets: Object.fromEntries(p.pinNames.map((n) => [n, `${p.ref}.${n}`])) })), nets: [] };
  const problem = buildProblem(scratch, { padsEdge: 'left' });
  const cells = problem.parts.reduce((a, p) => a + p.cells, 0);
  const cols = Math.max(8, Math.ceil(Math.sqrt(cells * 2.5 * 1.2)));
  const rows = Math.max(8, Math.ceil((cells * 2.5) / cols));
  const board = makeBoard('strip', cols, rows);
  const state = new PlaceState(problem, copperMap(board));
  const spots: Spot[] = [];
  const order = problem.parts.map((_, i) => i).sort((a, b) => problem.parts[b]!.cells - problem.parts[a]!.cells || a - b);
  for (const p of order) {
    const part = problem.parts[p]!;
    // Upright poses (leads on different strips) three times out of four.
    const upright = part.poses.map((o, k) => ({ o, k })).filter(({ o }) => new Set(o.pins.map((q) => q[1])).size === o.pins.length || o.pins.length > 3);
    let spot: Spot | undefined;
    for (let t = 0; t < 4000 && !spot; t++) {
      const pool = upright.length && rng.next() < 0.75 ? upright : part.poses.map((o, k) => ({ o, k }));
      const pick = pool[rng.int(pool.length)]!;
      const s = { x: rng.int(cols), y: rng.int(rows), pose: pick.k };
      if (state.fits(p, s)) spot = s;
    }
    if (!spot) throw new Error(`planted instance: no room for part ${p} on ${cols}×${rows}`);
    state.place(p, spot);
    spots[p] = spot;
  }
  // Read nets off the copper: cut between neighbouring leads at random, link a few segments.
  const owner: number[] = [];
  const pinOf = new Map<number, { p: number; i: number }>();
  problem.parts.forEach((part, p) =>
    part.poses[spots[p]!.pose]!.pins.forEach((o, i) => {
      const h = spots[p]!.x + o[0] + (spots[p]!.y + o[1]) * cols;
      pinOf.set(h, { p, i });
      owner[h] = p;
    }),
  );
  const parent: number[] = [];
  const find = (a: number): number => (parent[a] === a ? a : (parent[a] = find(parent[a]!)));
  const segOf = new Map<number, number>();
  const segments: number[][] = [];
  for (let y = 0; y < rows; y++) {
    let seg = -1;
    let lastOwner = -1;
    for (let x = 0; x < cols; x++) {
      const h = x + y * cols;
      if (!pinOf.has(h)) continue;
      const p = owner[h]!;
      if (seg < 0 || p === lastOwner || rng.next() < 0.45) {
        seg = segments.length;
        segments.push([]);
        parent.push(seg);
      }
      segments[seg]!.push(h);
      segOf.set(h, seg);
      lastOwner = p;
    }
  }
  // Straight links across the strips, each over free holes (no lead, no body, no other
  // link) from a free hole in one segment's copper to a free hole in another's: the planted
  // layout is then a real answer, routable as it stands. A segment's copper reaches halfway
  // to its neighbours' leads (the cut goes between); a strip with no leads is passed over.
  const segAt = new Int32Array(cols * rows).fill(-1);
  for (let y = 0; y < rows; y++) {
    const runs: { seg: number; a: number; b: number }[] = [];
    for (let x = 0; x < cols; x++) {
      const seg = segOf.get(x + y * cols);
      if (seg === undefined) continue;
      const last = runs[runs.length - 1];
      if (last && last.seg === seg) last.b = x;
      else runs.push({ seg, a: x, b: x });
    }
    runs.forEach((r, k) => {
      const from = k === 0 ? 0 : Math.floor((runs[k - 1]!.b + r.a) / 2) + 1;
      const to = k === runs.length - 1 ? cols - 1 : Math.floor((r.b + runs[k + 1]!.a) / 2);
      for (let x = from; x <= to; x++) segAt[x + y * cols] = r.seg;
    });
  }
  const used = new Uint8Array(cols * rows);
  const free = (h: number) => state.owner[h] === -1 && !used[h];
  const want = Math.floor(segments.length * 0.1);
  for (let made = 0, t = 0; made < want && t < want * 50; t++) {
    const x = rng.int(cols);
    const y = rng.int(rows);
    const a = segAt[x + y * cols]!;
    if (a < 0 || !free(x + y * cols)) continue;
    const dir = rng.next() < 0.5 ? -1 : 1;
    for (let yy = y + dir; yy >= 0 && yy < rows; yy += dir) {
      const h = x + yy * cols;
      if (!free(h)) break;
      const b = segAt[h]!;
      // Land on the first strip with leads now and then; else pass over it.
      if (b < 0 || rng.next() < 0.4) continue;
      if (find(a) !== find(b)) {
        parent[find(a)] = find(b);
        for (let k = Math.min(y, yy); k <= Math.max(y, yy); k++) used[x + k * cols] = 1;
        made++;
      }
      break;
    }
  }
  const nets = new Map<number, string>();
  for (const p of parts) p.nets = {};
  for (const [h, { p, i }] of pinOf) {
    const root = find(segOf.get(h)!);
    if (!nets.has(root)) nets.set(root, `N${nets.size + 1}`);
    parts[p]!.nets[parts[p]!.pinNames[i]!] = nets.get(root)!;
  }
  // A part with two pins on one net would be a short across it: give one pin its own net.
  for (const p of parts) {
    const seen = new Set<string>();
    for (const pin of p.pinNames) {
      const n = p.nets[pin]!;
      if (seen.has(n)) p.nets[pin] = `${p.ref}_${pin}`;
      seen.add(p.nets[pin]!);
    }
  }
  const byNet = new Map<string, { ref: string; pin: string }[]>();
  for (const p of parts) for (const pin of p.pinNames) byNet.set(p.nets[pin]!, [...(byNet.get(p.nets[pin]!) ?? []), { ref: p.ref, pin }]);
  const design: Design = {
    title: `planted ${count}`,
    parts,
    nets: [...byNet.entries()].sort((a, b) => (a[0] < b[0] ? -1 : 1)).map(([name, pins]) => ({ name, info: {}, pins })),
  };
  return { design, board, spots };
}
