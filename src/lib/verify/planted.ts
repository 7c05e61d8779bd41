/**
 * Planted layouts for tests and benchmarks (not part of the module's public surface).
 *
 * `plantLayout({ parts, seed })` → `{ circuit, layout }`: a strip board tiled 6×6 holes per
 * part (resistors, capacitors, electrolytics, TO-92 transistors, DIP-8s standing across the
 * strips), random scored cuts between tiles, and random vertical links in the spare
 * columns; the circuit is then read off the planted copper by this generator's own count
 * (strip segments joined by links), so the layout verifies clean by construction.
 * `shiftPart(layout, index, dx, dy)` → a copy with one part moved.
 */
import type { Circuit, CircuitPart } from '../model/circuit.ts';
import type { Cut, Layout, LayoutPart, Segment } from '../model/layout.ts';
import { UnionFind } from './union-find.ts';
import { mulberry32 } from '../random/index.ts';

/** The planted layouts' seeded generator (shared mulberry32). */
export const seededRandom = mulberry32;

const TILE = 6;


type Kind = 'r' | 'c' | 'e' | 'q' | 'u';

export function plantLayout(opts: { parts: number; seed: number }): { circuit: Circuit; layout: Layout } {
  const rnd = seededRandom(opts.seed);
  const pick = (n: number) => Math.floor(rnd() * n);
  const tilesX = Math.max(1, Math.ceil(Math.sqrt(opts.parts)));
  const tilesY = Math.max(1, Math.ceil(opts.parts / tilesX));
  const cols = tilesX * TILE;
  const rows = tilesY * TILE;
  const parts: LayoutPart[] = [];
  const kinds: Kind[] = [];
  const cuts: Cut[] = [];
  const links: Segment[] = [];
  const count: Record<Kind, number> = { r: 0, c: 0, e: 0, q: 0, u: 0 };

  for (let t = 0; t < opts.parts; t++) {
    const tx = (t % tilesX) * TILE;
    const ty = Math.floor(t / tilesX) * TILE;
    const roll = rnd();
    const kind: Kind = roll < 0.45 ? 'r' : roll < 0.65 ? 'c' : roll < 0.75 ? 'e' : roll < 0.9 ? 'q' : 'u';
    kinds.push(kind);
    const ref = `${{ r: 'R', c: 'C', e: 'C', q: 'Q', u: 'U' }[kind]}${kind === 'e' ? 100 + ++count.e : ++count[kind]}`;
    const x = tx + 1;
    if (kind === 'r') {
      const span = 3 + pick(2);
      const a = ty + pick(TILE - span);
      const flip = rnd() < 0.5;
      const ends: [number, number] = flip ? [a + span, a] : [a, a + span];
      parts.push({ ref, footprint: 'axial-small', rotation: flip ? 3 : 1, pins: [{ pin: '1', at: [x, ends[0]] }, { pin: '2', at: [x, ends[1]] }] });
    } else if (kind === 'c' || kind === 'e') {
      const a = ty + pick(TILE - 1);
      const names = kind === 'e' ? ['+', '-'] : ['1', '2'];
      parts.push({ ref, footprint: kind === 'e' ? 'ecap-2.54' : 'radial-2.54', rotation: 1, pins: [{ pin: names[0]!, at: [x, a] }, { pin: names[1]!, at: [x, a + 1] }] });
    } else if (kind === 'q') {
      const a = ty + pick(TILE - 2);
      parts.push({ ref, footprint: 'to92-EBC', rotation: 1, pins: ['E', 'B', 'C'].map((pin, i) => ({ pin, at: [x, a + i] as [number, number] })) });
    } else {
      const pins = [];
      for (let k = 1; k <= 8; k++) pins.push({ pin: String(k), at: (k <= 4 ? [tx, ty + k - 1] : [tx + 3, ty + 8 - k]) as [number, number] });
      parts.push({ ref, footprint: 'dip-8', rotation: 0, pins });
      for (let r = 0; r < 4; r++) cuts.push({ between: [[tx + 1, ty + r], [tx + 2, ty + r]] });
    }
    for (let r = ty; r < ty + TILE; r++) if (tx + TILE < cols && rnd() < 0.6) cuts.push({ between: [[tx + 5, r], [tx + 6, r]] });
    if (rnd() < 0.5) {
      const a = pick(TILE - 1);
      const b = a + 1 + pick(TILE - 1 - a);
      links.push({ from: [tx + 5, ty + a], to: [tx + 5, ty + b] });
    }
    if (ty + TILE < rows && rnd() < 0.3) links.push({ from: [tx + 4, ty + 3 + pick(3)], to: [tx + 4, ty + TILE + pick(3)] });
  }

  // this generator's own count of the copper: segments of each strip, joined by links
  const uf = new UnionFind(cols * rows);
  const cutKey = new Set(cuts.map((c) => ('between' in c ? `${c.between[0][0]},${c.between[0][1]}` : '')));
  for (let r = 0; r < rows; r++) for (let c = 0; c + 1 < cols; c++) if (!cutKey.has(`${c},${r}`)) uf.union(c + r * cols, c + 1 + r * cols);
  for (const l of links) uf.union(l.from[0] + l.from[1] * cols, l.to[0] + l.to[1] * cols);
  const netName = new Map<number, string>();
  const netOf = (h: [number, number]) => {
    const root = uf.find(h[0] + h[1] * cols);
    let n = netName.get(root);
    if (!n) netName.set(root, (n = `N${netName.size + 1}`));
    return n;
  };
  const circuitParts: CircuitPart[] = parts.map((p, i) => {
    const pins = Object.fromEntries(p.pins.map((q) => [q.pin, netOf(q.at)]));
    const kind = kinds[i]!;
    if (kind === 'r') return { ref: p.ref, kind: 'resistor', value: '10k', pins };
    if (kind === 'c') return { ref: p.ref, kind: 'capacitor', value: '100n', pins };
    if (kind === 'e') return { ref: p.ref, kind: 'capacitor', value: '10u', polarized: true, pins };
    if (kind === 'q') return { ref: p.ref, kind: 'npn', value: 'small NPN', pinout: 'EBC', pins };
    return { ref: p.ref, kind: 'ic', value: 'dual op amp', package: 'DIP-8', pins };
  });
  const circuit: Circuit = { format: 'kerfline.circuit', version: 1, title: `planted ${opts.parts} parts, seed ${opts.seed}`, parts: circuitParts, nets: {} };
  const layout: Layout = { format: 'kerfline.layout', version: 1, board: { kind: 'strip', cols, rows, pitchMm: 2.54 }, parts, cuts, links, wires: [] };
  return { circuit, layout };
}

export function shiftPart(layout: Layout, index: number, dx: number, dy: number): Layout {
  const parts = layout.parts.slice();
  const p = parts[index]!;
  parts[index] = { ...p, pins: p.pins.map((q) => ({ pin: q.pin, at: [q.at[0] + dx, q.at[1] + dy] as [number, number] })) };
  return { ...layout, parts };
}
