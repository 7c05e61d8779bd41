/**
 * `drawScene(layout, design | undefined, opts: { side, highlightNet?, faults? }): Scene`
 *
 * Builds the plain drawing data for one side of a layout: board outline, every hole, the
 * copper left after cuts (strip segments, bus-board groups, lone pads), cuts (drilled: a
 * ring at the hole; scored: a bar across the copper between two holes), links (those that
 * must be insulated wire flagged, see insulated.ts, and drawn sleeved), copper-side wires,
 * parts (posed outlines with pin-1, "+" and cathode marks, ref and value), row letters and
 * column numbers. `side: 'copper'` mirrors every x (x → width − x) and numbers
 * the columns as read from the copper side. Nets come from the design (pin → net) joined
 * through the copper, links and wires; without a design nothing carries a net.
 * `highlightNet` marks every hole, copper run, link, wire and pin on that net; `faults`
 * (problems with holes and refs, e.g. from the verifier) mark their holes and parts.
 * Pure: same input, same output; never throws on a bad layout.
 */
import type { Layout } from '../model/layout.ts';
import type { Hole, Problem } from '../model/problem.ts';
import type { Design, DesignPart } from '../netlist/design.ts';
import { connect } from './connectivity.ts';
import { copperRuns, corners } from './copper.ts';
import { makeFrame, round, type Frame } from './frame.ts';
import { insulatedLinks } from './insulated.ts';
import { poseShapes } from './part-shapes.ts';
import { RULER_MARGIN, rulers } from './rulers.ts';
import type { Scene, SceneCopper, SceneCut, SceneFault, SceneHole, ScenePart, SceneSegment, SceneSide, SceneText } from './scene.ts';

export interface DrawOptions {
  side: SceneSide;
  highlightNet?: string;
  faults?: Problem[];
}


function segment(kind: 'link' | 'wire', index: number, from: Hole, to: Hole, frame: Frame): Omit<SceneSegment, 'net' | 'highlight'> {
  const [x1, y1] = frame.at(from[0], from[1]);
  const [x2, y2] = frame.at(to[0], to[1]);
  const a = frame.labels(from);
  const b = frame.labels(to);
  return {
    id: `${kind}:${index}`,
    index,
    from: [from[0], from[1]],
    to: [to[0], to[1]],
    x1,
    y1,
    x2,
    y2,
    lengthMm: round(Math.hypot(to[0] - from[0], to[1] - from[1]) * frame.pitch),
    label: `${a.label}–${b.label}`,
    sideLabel: `${a.sideLabel}–${b.sideLabel}`,
  };
}

function cutItem(cut: Layout['cuts'][number], index: number, frame: Frame, faulty: (h: Hole) => boolean): SceneCut {
  if ('at' in cut) {
    const h: Hole = [cut.at[0], cut.at[1]];
    const [x, y] = frame.at(h[0], h[1]);
    return { id: `cut:${index}`, index, style: 'drilled', holes: [h], x, y, r: round(0.45 * frame.pitch), ...frame.labels(h), fault: faulty(h) };
  }
  const a: Hole = [cut.between[0][0], cut.between[0][1]];
  const b: Hole = [cut.between[1][0], cut.between[1][1]];
  const pa = frame.at(a[0], a[1]);
  const pb = frame.at(b[0], b[1]);
  const len = Math.hypot(pb[0] - pa[0], pb[1] - pa[1]) || 1;
  // The bar lies across the copper, so perpendicular to the line between the two holes.
  const half = (frame.sizes.stripWidth + 0.2 * frame.pitch) / 2;
  const px = (-(pb[1] - pa[1]) / len) * half;
  const py = ((pb[0] - pa[0]) / len) * half;
  const mx = (pa[0] + pb[0]) / 2;
  const my = (pa[1] + pb[1]) / 2;
  const la = frame.labels(a);
  const lb = frame.labels(b);
  // Each label lists the two holes left to right as seen from its own side.
  const compOrder = a[0] <= b[0] && (a[0] !== b[0] || a[1] <= b[1]);
  const sideOrder = pa[0] < pb[0] || (pa[0] === pb[0] && pa[1] <= pb[1]);
  return {
    id: `cut:${index}`,
    index,
    style: 'scored',
    holes: [a, b],
    x1: round(mx + px),
    y1: round(my + py),
    x2: round(mx - px),
    y2: round(my - py),
    label: compOrder ? `${la.label}|${lb.label}` : `${lb.label}|${la.label}`,
    sideLabel: sideOrder ? `${la.sideLabel}|${lb.sideLabel}` : `${lb.sideLabel}|${la.sideLabel}`,
    fault: faulty(a) || faulty(b),
  };
}

/** Shrink a label to fit along its body (0.6 em per character is typical of sans faces), to a floor. */
function fitText(t: SceneText, box: { w: number; h: number }, pitch: number): SceneText {
  const room = t.rotate ? box.h : box.w;
  const size = Math.max(0.28 * pitch, Math.min(t.size, room / (0.6 * Math.max(1, t.text.length))));
  return { ...t, size: round(size) };
}

function pinOrderOf(part: Layout['parts'][number], dp: DesignPart | undefined): string[] {
  const placed = part.pins.map((p) => p.pin);
  if (dp && dp.pinNames.length === placed.length && dp.pinNames.every((n) => placed.includes(n))) return dp.pinNames;
  return placed;
}

export function drawScene(layout: Layout, design: Design | undefined, opts: DrawOptions): Scene {
  const board = layout.board;
  // Holes off the board get no index: nothing is drawn for them.
  const key = (h: Hole) => (h[0] >= 0 && h[1] >= 0 && h[0] < board.cols && h[1] < board.rows ? h[0] + h[1] * board.cols : -1);
  const frame = makeFrame(board, opts.side);
  const hl = opts.highlightNet;
  const byRef = new Map<string, DesignPart>((design?.parts ?? []).map((p) => [p.ref, p]));
  const pinNet = (ref: string, pin: string) => byRef.get(ref)?.nets[pin];
  const runs = copperRuns(board, layout.cuts);
  const conn = connect(layout, runs, pinNet);
  const onNet = (h: Hole) => hl !== undefined && conn.netsAt(h).includes(hl);

  const faultHoles = new Set<number>();
  const faultRefs = new Set<string>();
  const faults: SceneFault[] = (opts.faults ?? []).map((p, i) => {
    const holes = (p.holes ?? []).map((h) => [h[0], h[1]] as Hole);
    for (const h of holes) faultHoles.add(key(h));
    for (const r of p.refs ?? []) faultRefs.add(r);
    return { id: `fault:${i}`, code: p.code, message: p.message, holes, points: holes.map((h) => frame.at(h[0], h[1])), refs: [...(p.refs ?? [])] };
  });
  const faulty = (h: Hole) => faultHoles.has(key(h));

  const copperOf = new Map<number, string>();
  const copper: SceneCopper[] = runs.map((run, k) => {
    const id = `copper:${k}`;
    for (const h of run) copperOf.set(key(h), id);
    const nets = [...conn.netsAt(run[0]!)];
    const item: SceneCopper = { id, holes: run, points: corners(run).map((h) => frame.at(h[0], h[1])), nets, highlight: hl !== undefined && nets.includes(hl) };
    if (nets.length === 1) item.net = nets[0]!;
    return item;
  });

  const leads = new Map<number, SceneHole['lead']>();
  for (const part of layout.parts) for (const p of part.pins) leads.set(key(p.at), { ref: part.ref, pin: p.pin });
  layout.links.forEach((l, i) => {
    leads.set(key(l.from), { link: i });
    leads.set(key(l.to), { link: i });
  });

  const holes: SceneHole[] = [];
  for (let r = 0; r < board.rows; r++)
    for (let c = 0; c < board.cols; c++) {
      const h: Hole = [c, r];
      const [x, y] = frame.at(c, r);
      const item: SceneHole = { id: `hole:${c},${r}`, hole: h, x, y, ...frame.labels(h), highlight: onNet(h), fault: faulty(h) };
      const cu = copperOf.get(key(h));
      if (cu) item.copper = cu;
      const net = conn.netAt(h);
      if (net !== undefined) item.net = net;
      const lead = leads.get(key(h));
      if (lead) item.lead = lead;
      holes.push(item);
    }

  const seg = (kind: 'link' | 'wire') => (s: { from: Hole; to: Hole }, i: number): SceneSegment => {
    const item: SceneSegment = { ...segment(kind, i, s.from, s.to, frame), highlight: onNet(s.from) };
    const net = conn.netAt(s.from);
    if (net !== undefined) item.net = net;
    return item;
  };

  const parts: ScenePart[] = layout.parts.map((part) => {
    const dp = byRef.get(part.ref);
    const g = poseShapes(part, pinOrderOf(part, dp), frame);
    const value = dp?.value ?? part.value;
    const pins = g.pins.map((p) => {
      const net = pinNet(part.ref, p.pin);
      const out: ScenePart['pins'][number] = { ...p, highlight: hl !== undefined && net === hl };
      if (net !== undefined) out.net = net;
      return out;
    });
    const item: ScenePart = {
      id: `part:${part.ref}`,
      ref: part.ref,
      footprint: part.footprint,
      broken: g.broken,
      shapes: g.shapes,
      marks: g.marks,
      pins,
      box: g.box,
      refText: fitText({ ...g.refText, text: part.ref }, g.box, frame.pitch),
      highlight: pins.some((p) => p.highlight),
      fault: faultRefs.has(part.ref) || part.pins.some((p) => faulty(p.at)),
    };
    if (value !== undefined && value !== '') {
      item.value = value;
      item.valueText = fitText({ ...g.valueText, text: value }, g.box, frame.pitch);
    }
    return item;
  });

  const m = RULER_MARGIN * frame.pitch;
  const sleeved = insulatedLinks(layout);
  const scene: Scene = {
    side: opts.side,
    title: design?.title ?? '',
    pitchMm: frame.pitch,
    board: { kind: board.kind, cols: board.cols, rows: board.rows, width: round(frame.width), height: round(frame.height) },
    view: { x: round(-m), y: round(-m), width: round(frame.width + m + 0.4 * frame.pitch), height: round(frame.height + m + 0.4 * frame.pitch) },
    sizes: frame.sizes,
    holes,
    copper,
    cuts: layout.cuts.map((c, i) => cutItem(c, i, frame, faulty)),
    links: layout.links.map(seg('link')).map((l, i) => (sleeved[i] ? { ...l, insulated: true } : l)),
    wires: layout.wires.map(seg('wire')),
    parts,
    rulers: rulers(frame),
    faults,
  };
  if (board.pattern) scene.board.pattern = board.pattern;
  if (hl !== undefined) scene.highlightNet = hl;
  return scene;
}

