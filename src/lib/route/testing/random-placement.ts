/**
 * Test and bench support: random legal placements. Parts come from the footprint library
 * (axial, radial, electrolytic, TO-92, DIP-8/14, trimmer, pad rows), each at a random legal
 * pose (rotation, span, anchor) with its body on the board and clear of every other body;
 * pins get random nets from a pool (two-lead parts always two different nets, transistor,
 * IC, trimmer and pad pins sometimes unconnected). Deterministic for a seed.
 */
import type { Board, Circuit, CircuitPart, Layout } from '../../model/index.ts';
import { prepareDesign, type Design } from '../../netlist/index.ts';
import { footprintFor, poseBody, posePins } from '../../parts/index.ts';
import { mulberry32 } from '../../random/index.ts';

/** The tests' seeded generator (shared mulberry32). */
export const seeded = mulberry32;


export interface RandomCase {
  circuit: Circuit;
  design: Design;
  placement: Layout;
}

/** `size` is a uniform draw in [0, 1) fixing the part's size (DIP pins, pad count). */
type Maker = (ref: number, pick: () => string | undefined, two: () => [string, string], size: number) => CircuitPart;

const MAKERS: { weight: number; make: Maker }[] = [
  { weight: 5, make: (i, _p, two) => { const [a, b] = two(); return { ref: `R${i}`, kind: 'resistor', footprint: 'axial-small', pins: { '1': a, '2': b } }; } },
  { weight: 2, make: (i, _p, two) => { const [a, b] = two(); return { ref: `C${i}`, kind: 'capacitor', footprint: 'radial-2.54', pins: { '1': a, '2': b } }; } },
  { weight: 1, make: (i, _p, two) => { const [a, b] = two(); return { ref: `C${i}`, kind: 'capacitor', polarized: true, footprint: 'ecap-2.54', pins: { '+': a, '-': b } }; } },
  { weight: 2, make: (i, _p, two) => { const [a, b] = two(); return { ref: `D${i}`, kind: 'diode', footprint: 'do35', pins: { A: a, K: b } }; } },
  { weight: 2, make: (i, pick) => ({ ref: `Q${i}`, kind: 'npn', pinout: 'EBC', pins: pins(['C', 'B', 'E'], pick) }) },
  { weight: 1, make: (i, pick, _t, size) => { const n = size < 0.5 ? 8 : 14; return { ref: `U${i}`, kind: 'ic', package: `DIP-${n}`, pins: pins(Array.from({ length: n }, (_, k) => String(k + 1)), pick) }; } },
  { weight: 1, make: (i, pick) => ({ ref: `RV${i}`, kind: 'trimmer', pins: pins(['1', 'W', '3'], pick) }) },
  { weight: 1, make: (i, pick, _t, size) => { const n = 1 + Math.floor(size * 4); return { ref: `J${i}`, kind: 'pads', count: n, pins: pins(Array.from({ length: n }, (_, k) => String(k + 1)), pick) }; } },
];

function pins(names: string[], pick: () => string | undefined): Record<string, string> {
  const out: Record<string, string> = {};
  for (const n of names) {
    const net = pick();
    if (net !== undefined) out[n] = net;
  }
  return out;
}

export interface RandomOptions {
  /** Chance that a pin allowed to stay open is left unconnected (default 0.1). */
  openChance?: number;
  /**
   * Draw each part's nets from a pool local to its block of `block` × `block` holes
   * (`nets` per block, plus `shared` nets drawn anywhere) instead of one board-wide pool:
   * the locality a placer gives, used for large benchmark placements.
   */
  block?: number;
  shared?: number;
  /**
   * Only poses that spread a part's pins over the most rows (parts standing across the
   * strips, DIPs straddling them), as a placer does on a strip board. Default false.
   */
  acrossStrips?: boolean;
}

/** The footprint's rotations that put its pins on the most distinct rows. */
function acrossRotations(fp: NonNullable<ReturnType<typeof footprintFor>>): number[] {
  const rowsOf = (rotation: number) => new Set(posePins(fp, { anchor: [0, 0], rotation, ...(fp.span ? { span: fp.span.preferred } : {}) }).map((p) => p.at[1])).size;
  const best = Math.max(...fp.rotations.map(rowsOf));
  return fp.rotations.filter((r) => rowsOf(r) === best);
}

/**
 * A random legal placement of up to `parts` parts on `board` with nets N0…N(nets−1).
 * Parts that find no free pose in a few tries are left out of the circuit.
 */
export function randomCase(seed: number, board: Board, parts: number, nets: number, options: RandomOptions = {}): RandomCase {
  const rnd = seeded(seed);
  const openChance = options.openChance ?? 0.1;
  const { cols, rows } = board;
  const block = options.block ?? 0;
  const shared = options.shared ?? 0;
  let region = '';
  const net = () => {
    if (!block) return `N${Math.floor(rnd() * nets)}`;
    if (shared && rnd() < 0.2) return `S${Math.floor(rnd() * shared)}`;
    return `N${region}_${Math.floor(rnd() * nets)}`;
  };
  const pick = () => (rnd() < openChance ? undefined : net());
  const two = (): [string, string] => {
    const a = net();
    let b = net();
    for (let k = 0; k < 8 && b === a; k++) b = net();
    return b === a ? [a, `${a}b`] : [a, b];
  };
  const total = MAKERS.reduce((t, m) => t + m.weight, 0);
  const taken = new Uint8Array(cols * rows);
  const circuitParts: CircuitPart[] = [];
  const layoutParts: Layout['parts'] = [];
  for (let i = 1; i <= parts; i++) {
    let r = rnd() * total;
    const maker = MAKERS.find((m) => (r -= m.weight) < 0) ?? MAKERS[0]!;
    const size = rnd();
    const shape = maker.make(i, () => 'X', () => ['X', 'Y'], size);
    const fp = footprintFor(shape);
    if (!fp) throw new Error(`random placement: no footprint for ${shape.ref}`);
    const rotations = options.acrossStrips ? acrossRotations(fp) : fp.rotations;
    for (let attempt = 0; attempt < 12; attempt++) {
      const rotation = rotations[Math.floor(rnd() * rotations.length)]!;
      const span = fp.span ? fp.span.min + Math.floor(rnd() * Math.min(3, fp.span.max - fp.span.min + 1)) : undefined;
      const pose = { anchor: [Math.floor(rnd() * cols), Math.floor(rnd() * rows)] as [number, number], rotation, ...(span !== undefined ? { span } : {}) };
      const cells = poseBody(fp, pose);
      if (!cells.every(([x, y]) => x >= 0 && y >= 0 && x < cols && y < rows && !taken[x + y * cols])) continue;
      for (const [x, y] of cells) taken[x + y * cols] = 1;
      if (block) region = `${Math.floor(pose.anchor[0] / block)}_${Math.floor(pose.anchor[1] / block)}`;
      const part = maker.make(i, pick, two, size);
      circuitParts.push(part);
      layoutParts.push({ ref: part.ref, footprint: fp.name, pins: posePins(fp, pose).map((p) => ({ pin: p.pin, at: p.at })) });
      break;
    }
  }
  const circuit: Circuit = { format: 'kerfline.circuit', version: 1, title: `random ${seed}`, parts: circuitParts, nets: {} };
  const design = prepareDesign(circuit);
  if (!design.ok) throw new Error(`random placement: ${design.problems.map((p) => p.message).join('; ')}`);
  const placement: Layout = { format: 'kerfline.layout', version: 1, board, parts: layoutParts, cuts: [], links: [], wires: [] };
  return { circuit, design: design.value, placement };
}
