/**
 * `buildProblem(design, options): PlaceProblem` — the design as the placer sees it.
 *
 * Each part gets its footprint, every pose it may take (quarter turns × lead spans within
 * the part's range, duplicates removed) and integer net ids per pin; an unconnected pin gets
 * a net of its own so that nothing else may share its copper. Parts also carry the weak
 * preferences the forces and the tidiness cost use: a board edge for off-board parts
 * (footprint height class `offboard`; `part.edge` or `options.padsEdge`), a signal-flow
 * side (touching an `input` net → left, `output` → right) and a supply pull (pins on
 * positive supply nets → top, on ground or negative supply → bottom).
 */
import type { Design } from '../netlist/design.ts';
import { designFootprint } from '../netlist/design.ts';
import type { Edge, PlanOptions } from '../model/options.ts';
import type { Footprint, Offset } from '../parts/footprint.ts';
import { poseBody, posePins } from '../parts/footprint.ts';
import { sectionTables } from './sections.ts';
import type { SectionTable } from './sections.ts';

export interface PoseOption {
  rotation: number;
  span?: number;
  /** Pin offsets from the anchor, in the footprint's pin order. */
  pins: Offset[];
  body: Offset[];
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

export interface PlacePart {
  ref: string;
  fp: Footprint;
  poses: PoseOption[];
  pinNames: string[];
  /** Net id per pin (original assignment; the state keeps its own copy). */
  pinNet: number[];
  /** Parts sharing a key can trade places pose for pose. */
  swapKey: string;
  cells: number;
  edge?: Edge;
  /** −1 toward the left (inputs), +1 toward the right (outputs), 0 no preference. */
  flow: number;
  /** < 0 toward the top (positive supply), > 0 toward the bottom (ground, negative supply). */
  supplyPull: number;
}

export interface PlaceNet {
  name: string;
  /** Net made up here for one unconnected pin. */
  open: boolean;
  pins: number;
  /** 'top', 'bottom' or undefined: where its strip belongs when supplies go to the edges. */
  supplyEdge?: 'top' | 'bottom';
}

export interface PlaceProblem {
  parts: PlacePart[];
  /** Parts with an edge or a signal-flow side: the only ones the tidiness cost visits. */
  leaning: number[];
  nets: PlaceNet[];
  sections: SectionTable[];
}

/** Lead spans tried per two-lead part, from the shortest allowed: longer bends make walls that links cannot cross. */
const MAX_SPANS = 3;

function posesOf(fp: Footprint, span: { min: number; max: number } | undefined): PoseOption[] {
  const spans: (number | undefined)[] = [];
  if (fp.span) {
    const lo = Math.max(fp.span.min, span?.min ?? fp.span.min);
    const hi = Math.min(fp.span.max, span?.max ?? fp.span.max, lo + MAX_SPANS - 1);
    for (let s = lo; s <= hi; s++) spans.push(s);
  } else spans.push(undefined);
  const seen = new Set<string>();
  const out: PoseOption[] = [];
  for (const s of spans)
    for (const rotation of fp.rotations) {
      const pose = s === undefined ? { anchor: [0, 0] as Offset, rotation } : { anchor: [0, 0] as Offset, rotation, span: s };
      const pins = posePins(fp, pose).map((p) => p.at);
      const body = poseBody(fp, pose);
      const key = pins.map((p) => p.join(',')).join(';') + '|' + body.map((b) => b.join(',')).sort().join(';');
      if (seen.has(key)) continue;
      seen.add(key);
      const xs = body.map((b) => b[0]);
      const ys = body.map((b) => b[1]);
      const o: PoseOption = { rotation, pins, body, minX: Math.min(...xs), minY: Math.min(...ys), maxX: Math.max(...xs), maxY: Math.max(...ys) };
      if (s !== undefined) o.span = s;
      out.push(o);
    }
  return out;
}

export function buildProblem(design: Design, options: Pick<PlanOptions, 'padsEdge'>): PlaceProblem {
  const nets: PlaceNet[] = [];
  const netId = new Map<string, number>();
  const hasNegative = design.nets.some((n) => n.info.role === 'power' && (n.info.volts ?? 0) < 0);
  for (const n of design.nets) {
    netId.set(n.name, nets.length);
    const role = n.info.role;
    const pn: PlaceNet = { name: n.name, open: false, pins: n.pins.length };
    if (role === 'power') pn.supplyEdge = (n.info.volts ?? 1) < 0 ? 'bottom' : 'top';
    else if (role === 'ground' && !hasNegative) pn.supplyEdge = 'bottom';
    nets.push(pn);
  }
  const roleOf = new Map(design.nets.map((n) => [n.name, n.info.role]));
  const parts: PlacePart[] = design.parts.map((dp) => {
    const fp = designFootprint(dp);
    const pinNet = fp.pinNames.map((pin) => {
      const name = dp.nets[pin];
      const id = name === undefined ? undefined : netId.get(name);
      if (id !== undefined) return id;
      nets.push({ name: `${dp.ref}.${pin} (unconnected)`, open: true, pins: 1 });
      return nets.length - 1;
    });
    const poses = posesOf(fp, dp.span);
    let flow = 0;
    let supplyPull = 0;
    for (const id of pinNet) {
      const net = nets[id]!;
      const role = roleOf.get(net.name);
      if (role === 'input') flow -= 1;
      if (role === 'output') flow += 1;
      if (net.supplyEdge === 'top') supplyPull -= 1;
      if (net.supplyEdge === 'bottom') supplyPull += 1;
    }
    const p: PlacePart = {
      ref: dp.ref,
      fp,
      poses,
      pinNames: fp.pinNames.slice(),
      pinNet,
      swapKey: `${fp.name}:${poses.length}:${dp.span?.min ?? ''}-${dp.span?.max ?? ''}`,
      cells: poses[0]!.body.length,
      flow: Math.sign(flow),
      supplyPull,
    };
    const edge = dp.edge ?? (fp.height === 'offboard' ? options.padsEdge : undefined);
    if (edge) p.edge = edge;
    return p;
  });
  const leaning = parts.flatMap((p, i) => (p.edge || p.flow ? [i] : []));
  return { parts, leaning, nets, sections: sectionTables(design, parts.map((p) => p.ref)) };
}
