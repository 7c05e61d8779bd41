/**
 * A placed part as drawing data: `poseShapes(part, pinOrder, frame)` fits the footprint's
 * pose from the placed pins (parts/fitPose), turns the footprint outline (hole units,
 * rotation 0) into posed millimetre shapes on the frame's side, and adds the builder's
 * marks: pin-1 dot, "+" beside the positive lead, cathode band across the body, pin letters
 * inside three-lead bodies. Pins that do not keep the footprint's geometry come back as a
 * plain box around the leads with `broken: true`, never as a thrown error.
 */
import type { LayoutPart } from '../model/layout.ts';
import type { Hole } from '../model/problem.ts';
import { fitPose, rotate, type Footprint, type Offset, type Pose, type Shape } from '../parts/footprint.ts';
import { getFootprint } from '../parts/library.ts';
import { round, type Frame } from './frame.ts';
import type { Point, SceneMark, SceneShape, SceneText } from './scene.ts';

export interface PartGeometry {
  broken: boolean;
  shapes: SceneShape[];
  marks: SceneMark[];
  pins: { pin: string; hole: Hole; x: number; y: number; tag?: SceneText }[];
  box: { x: number; y: number; w: number; h: number };
  refText: SceneText;
  valueText: SceneText;
}

type Dir = 'down' | 'up' | 'left' | 'right';
const DIRS: Record<Dir, Offset> = { down: [0, 1], up: [0, -1], left: [-1, 0], right: [1, 0] };

function dirOf(v: Offset): Dir {
  if (Math.abs(v[0]) >= Math.abs(v[1])) return v[0] >= 0 ? 'right' : 'left';
  return v[1] >= 0 ? 'down' : 'up';
}

/** Base-orientation point (hole units from the anchor) → mm on the frame's side. */
function placer(pose: Pose, frame: Frame): (p: Offset) => Point {
  return (p) => {
    const r = rotate(p, pose.rotation);
    return frame.at(pose.anchor[0] + r[0], pose.anchor[1] + r[1]);
  };
}

function shapeOf(s: Shape, to: (p: Offset) => Point, frame: Frame, pose: Pose): SceneShape {
  const pitch = frame.pitch;
  switch (s.shape) {
    case 'rect': {
      const a = to([s.x, s.y]);
      const b = to([s.x + s.w, s.y + s.h]);
      return { shape: 'rect', x: round(Math.min(a[0], b[0])), y: round(Math.min(a[1], b[1])), w: round(Math.abs(a[0] - b[0])), h: round(Math.abs(a[1] - b[1])) };
    }
    case 'circle': {
      const c = to([s.cx, s.cy]);
      return { shape: 'circle', cx: c[0], cy: c[1], r: round(s.r * pitch) };
    }
    case 'line': {
      const a = to([s.x1, s.y1]);
      const b = to([s.x2, s.y2]);
      return { shape: 'line', x1: a[0], y1: a[1], x2: b[0], y2: b[1] };
    }
    case 'dee': {
      const c = to([s.cx, s.cy]);
      const d = rotate(DIRS[s.flat], pose.rotation);
      const seen: Offset = frame.side === 'copper' ? [-d[0], d[1]] : d;
      return { shape: 'dee', cx: c[0], cy: c[1], r: round(s.r * pitch), flat: dirOf(seen) };
    }
  }
}

function boxOf(points: Point[], pad: number): { x: number; y: number; w: number; h: number } {
  const xs = points.map((p) => p[0]);
  const ys = points.map((p) => p[1]);
  const x = Math.min(...xs) - pad;
  const y = Math.min(...ys) - pad;
  return { x: round(x), y: round(y), w: round(Math.max(...xs) + pad - x), h: round(Math.max(...ys) + pad - y) };
}

function shapePoints(s: SceneShape): Point[] {
  switch (s.shape) {
    case 'rect':
      return [[s.x, s.y], [s.x + s.w, s.y + s.h]];
    case 'line':
      return [[s.x1, s.y1], [s.x2, s.y2]];
    default:
      return [[s.cx - s.r, s.cy - s.r], [s.cx + s.r, s.cy + s.r]];
  }
}

/** Extent of the body outline (lead lines left out) at rotation 0, in hole units. */
function baseBodyBox(fp: Footprint, span: number | undefined): { x0: number; x1: number; y0: number; y1: number } | undefined {
  let box: { x0: number; x1: number; y0: number; y1: number } | undefined;
  for (const s of fp.outline(span)) {
    if (s.shape === 'line') continue;
    const b =
      s.shape === 'rect'
        ? { x0: s.x, x1: s.x + s.w, y0: s.y, y1: s.y + s.h }
        : { x0: s.cx - s.r, x1: s.cx + s.r, y0: s.cy - s.r, y1: s.cy + s.r };
    box = box ? { x0: Math.min(box.x0, b.x0), x1: Math.max(box.x1, b.x1), y0: Math.min(box.y0, b.y0), y1: Math.max(box.y1, b.y1) } : b;
  }
  return box;
}

function unit(v: Offset): Offset | undefined {
  const n = Math.hypot(v[0], v[1]);
  return n < 1e-6 ? undefined : [v[0] / n, v[1] / n];
}

function marksOf(fp: Footprint, pose: Pose, to: (p: Offset) => Point, pitch: number): SceneMark[] {
  const offs = fp.offsets(pose.span);
  const marks: SceneMark[] = [];
  const body = fp.body(pose.span);
  const centre: Offset = [body.reduce((s, c) => s + c[0], 0) / body.length, body.reduce((s, c) => s + c[1], 0) / body.length];
  if (fp.marks.pin1 && offs[fp.marks.pin1]) {
    const p = offs[fp.marks.pin1]!;
    const d = unit([centre[0] - p[0], centre[1] - p[1]]) ?? [0, -1];
    const [cx, cy] = to([p[0] + 0.45 * d[0], p[1] + 0.45 * d[1]]);
    marks.push({ mark: 'pin1', cx, cy, r: round(0.12 * pitch) });
  }
  const other = (name: string) => fp.pinNames.find((n) => n !== name);
  if (fp.marks.plus && offs[fp.marks.plus]) {
    const p = offs[fp.marks.plus]!;
    const o = offs[other(fp.marks.plus) ?? ''] ?? [p[0] + 1, p[1]];
    const d = unit([p[0] - o[0], p[1] - o[1]]) ?? [-1, 0];
    const [x, y] = to([p[0] + 0.55 * d[0], p[1] + 0.55 * d[1]]);
    marks.push({ mark: 'plus', x, y, size: round(0.6 * pitch) });
  }
  const k = fp.marks.cathode;
  const bb = baseBodyBox(fp, pose.span);
  if (k && offs[k] && bb) {
    const kx = offs[k]![0];
    const ox = offs[other(k) ?? '']?.[0] ?? kx;
    const w = bb.x1 - bb.x0;
    const bx = kx >= ox ? bb.x1 - 0.18 * w : bb.x0 + 0.18 * w;
    const a = to([bx, bb.y0]);
    const b = to([bx, bb.y1]);
    marks.push({ mark: 'cathode', x1: a[0], y1: a[1], x2: b[0], y2: b[1] });
  }
  return marks;
}

/** Pin letters for three-or-more-lead parts with lettered pins (E, B, C; 1, W, 3). */
function pinTags(fp: Footprint, pose: Pose, to: (p: Offset) => Point, pitch: number): Map<string, SceneText> {
  const tags = new Map<string, SceneText>();
  if (fp.pinNames.length < 3 || fp.pinNames.every((n) => /^\d+$/.test(n))) return tags;
  const offs = fp.offsets(pose.span);
  const outline = fp.outline(pose.span);
  const bb = baseBodyBox(fp, pose.span);
  const pins = fp.pinNames.map((n) => offs[n]!);
  const mean: Offset = [pins.reduce((s, p) => s + p[0], 0) / pins.length, pins.reduce((s, p) => s + p[1], 0) / pins.length];
  const dee = outline.find((s) => s.shape === 'dee');
  const towards = bb ? unit([(bb.x0 + bb.x1) / 2 - mean[0], (bb.y0 + bb.y1) / 2 - mean[1]]) : undefined;
  const d = towards ?? (dee && dee.shape === 'dee' ? DIRS[dee.flat] : ([0, 1] as Offset));
  for (const n of fp.pinNames) {
    const p = offs[n]!;
    const [x, y] = to([p[0] + 0.42 * d[0], p[1] + 0.42 * d[1]]);
    tags.set(n, { x, y, text: n, size: round(0.3 * pitch), rotate: 0 });
  }
  return tags;
}

function texts(box: { x: number; y: number; w: number; h: number }, pitch: number): { refText: SceneText; valueText: SceneText } {
  const cx = box.x + box.w / 2;
  const cy = box.y + box.h / 2;
  const upright = box.h > 1.3 * box.w;
  const size = round(0.5 * pitch);
  const vsize = round(0.4 * pitch);
  const gap = 0.32 * pitch;
  if (upright)
    return {
      refText: { x: round(cx - gap), y: round(cy), text: '', size, rotate: -90 },
      valueText: { x: round(cx + gap), y: round(cy), text: '', size: vsize, rotate: -90 },
    };
  return {
    refText: { x: round(cx), y: round(cy - gap), text: '', size, rotate: 0 },
    valueText: { x: round(cx), y: round(cy + gap), text: '', size: vsize, rotate: 0 },
  };
}

export function poseShapes(part: LayoutPart, pinOrder: readonly string[], frame: Frame): PartGeometry {
  const placed = part.pins.map((p) => {
    const [x, y] = frame.at(p.at[0], p.at[1]);
    return { pin: p.pin, hole: [p.at[0], p.at[1]] as Hole, x, y };
  });
  const fp = getFootprint(part.footprint, pinOrder);
  const pinMap: Record<string, Offset> = Object.fromEntries(part.pins.map((p) => [p.pin, [p.at[0], p.at[1]] as Offset]));
  const pose = fp && part.pins.length === fp.pinNames.length ? fitPose(fp, pinMap) : undefined;
  const leadPoints = placed.map((p) => [p.x, p.y] as Point);
  if (!fp || !pose) {
    const box = leadPoints.length ? boxOf(leadPoints, 0.45 * frame.pitch) : { x: 0, y: 0, w: 0, h: 0 };
    return { broken: true, shapes: [{ shape: 'rect', ...box }], marks: [], pins: placed, box, ...texts(box, frame.pitch) };
  }
  const to = placer(pose, frame);
  const shapes = fp.outline(pose.span).map((s) => shapeOf(s, to, frame, pose));
  const box = boxOf([...shapes.flatMap(shapePoints), ...leadPoints], frame.sizes.leadR);
  const tags = pinTags(fp, pose, to, frame.pitch);
  const pins = placed.map((p) => {
    const tag = tags.get(p.pin);
    return tag ? { ...p, tag } : p;
  });
  return { broken: false, shapes, marks: marksOf(fp, pose, to, frame.pitch), pins, box, ...texts(box, frame.pitch) };
}
