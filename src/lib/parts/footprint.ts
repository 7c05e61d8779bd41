/**
 * The footprint contract. Placer, router, verifier and renderer ask a footprint for pin
 * offsets, body cells and outline; none of them switches on a footprint's name.
 *
 * Offsets are in holes, [dx, dy], in the base orientation (rotation 0), relative to the
 * anchor hole. Rotation k turns the part k quarter turns clockwise as seen from the
 * component side (x right, y down): (x, y) → (−y, x) per turn.
 */
export type Offset = [number, number];

/** Build order ranks, lowest first (common practice: lowest parts are soldered first). */
export const HEIGHT_CLASSES = ['link', 'low', 'socket', 'small', 'transistor', 'tall', 'offboard'] as const;
export type HeightClass = (typeof HEIGHT_CLASSES)[number];

export type Shape =
  | { shape: 'rect'; x: number; y: number; w: number; h: number }
  | { shape: 'circle'; cx: number; cy: number; r: number }
  | { shape: 'line'; x1: number; y1: number; x2: number; y2: number }
  /** A TO-92 style body: flat face along the chord. `flat` is the side the flat faces. */
  | { shape: 'dee'; cx: number; cy: number; r: number; flat: 'down' | 'up' | 'left' | 'right' };

export interface Marks {
  /** Pin that carries the pin-1 dot or notch. */
  pin1?: string;
  /** Pin marked "+" (electrolytics). */
  plus?: string;
  /** Cathode pin (band on diodes, flat on LEDs). */
  cathode?: string;
}

export interface SpanRange {
  min: number;
  max: number;
  /** The span a builder reaches for first. */
  preferred: number;
}

export interface Footprint {
  /** Library name, as written in the layout document. */
  name: string;
  /** One line for people: "axial, 1/4 W resistor body". */
  title: string;
  pinNames: string[];
  /** Two-lead parts whose leads can be bent to different spans. */
  span?: SpanRange;
  /** Pin offsets at rotation 0 (span given for stretchable footprints). */
  offsets(span?: number): Record<string, Offset>;
  /** Holes the body covers (lead holes included), at rotation 0. */
  body(span?: number): Offset[];
  /** Drawing of the body at rotation 0, in hole units relative to the anchor. */
  outline(span?: number): Shape[];
  height: HeightClass;
  marks: Marks;
  /** Allowed quarter turns. */
  rotations: number[];
  /** Lead pitch along a row of leads, mm (DIP, TO-92, headers). */
  leadPitchMm?: number;
  /** Distance between DIP pin rows, mm. */
  rowSpacingMm?: number;
  /** Lead spacing for the parts list, in mm (fixed footprints). */
  spacingMm?: number;
}

export function rotate(o: Offset, k: number): Offset {
  let [x, y] = o;
  for (let i = 0; i < (((k % 4) + 4) % 4); i++) [x, y] = [-y, x];
  return [x + 0, y + 0];
}

export interface Pose {
  anchor: Offset;
  rotation: number;
  span?: number;
}

/** Holes of every pin for a pose. */
export function posePins(fp: Footprint, pose: Pose): { pin: string; at: Offset }[] {
  const offs = fp.offsets(pose.span);
  return fp.pinNames.map((pin) => {
    const r = rotate(offs[pin]!, pose.rotation);
    return { pin, at: [pose.anchor[0] + r[0], pose.anchor[1] + r[1]] as Offset };
  });
}

/** Holes covered by the body for a pose. */
export function poseBody(fp: Footprint, pose: Pose): Offset[] {
  return fp.body(pose.span).map((o) => {
    const r = rotate(o, pose.rotation);
    return [pose.anchor[0] + r[0], pose.anchor[1] + r[1]] as Offset;
  });
}

/**
 * Recover the pose from placed pins, or undefined when the pins do not keep the
 * footprint's geometry (wrong pitch, wrong order, span out of range).
 */
export function fitPose(fp: Footprint, pins: Record<string, Offset>, spanLimit?: { min: number; max: number }): Pose | undefined {
  const first = fp.pinNames[0]!;
  const at0 = pins[first];
  if (!at0) return undefined;
  for (const pin of fp.pinNames) if (!pins[pin]) return undefined;
  const spans: (number | undefined)[] = [];
  if (fp.span) {
    const lo = Math.max(fp.span.min, spanLimit?.min ?? 1);
    const hi = Math.min(fp.span.max, spanLimit?.max ?? 999);
    for (let s = lo; s <= hi; s++) spans.push(s);
  } else spans.push(undefined);
  for (const rotation of fp.rotations) {
    for (const span of spans) {
      const offs = fp.offsets(span);
      const r0 = rotate(offs[first]!, rotation);
      const anchor: Offset = [at0[0] - r0[0], at0[1] - r0[1]];
      let good = true;
      for (const pin of fp.pinNames) {
        const r = rotate(offs[pin]!, rotation);
        const p = pins[pin]!;
        if (p[0] !== anchor[0] + r[0] || p[1] !== anchor[1] + r[1]) {
          good = false;
          break;
        }
      }
      if (good) return span === undefined ? { anchor, rotation } : { anchor, rotation, span };
    }
  }
  return undefined;
}
