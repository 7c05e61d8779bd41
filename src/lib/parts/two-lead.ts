/**
 * Two-lead footprints: axial bodies whose leads are bent to a span, and radial bodies
 * with fixed lead spacing. Pin names come from the part (1/2, A/K, +/−): the first pin sits
 * at the anchor, the second `span` holes to the right at rotation 0.
 *
 * Spans follow ../shared/reference/check-values.md §5 (lead-form tables and common
 * practice): a 1/4 W resistor at 10.16 mm (4 holes) or 7.62 mm (3), 1/2 W at 12.7 mm (5),
 * DO-35 at 7.62 or 10.16, DO-41 at 10.16, radial parts at 2.54/5.08/7.62.
 */
import type { Footprint, HeightClass, Marks, Offset, Shape, SpanRange } from './footprint.ts';

function marksFor(pinNames: string[]): Marks {
  const m: Marks = {};
  if (pinNames.includes('+')) m.plus = '+';
  if (pinNames.includes('K')) m.cathode = 'K';
  return m;
}

interface AxialSpec {
  name: string;
  title: string;
  span: SpanRange;
  /** Body length and diameter in holes (for drawing). */
  bodyLen: number;
  bodyDia: number;
  height: HeightClass;
}

export const AXIAL_SPECS: AxialSpec[] = [
  { name: 'axial-mini', title: 'axial, miniature 1/4 W resistor body (Ø1.7 × 3.3 mm)', span: { min: 2, max: 8, preferred: 3 }, bodyLen: 1.3, bodyDia: 0.7, height: 'low' },
  { name: 'axial-small', title: 'axial, 1/4 W resistor body (Ø2.3 × 6 mm)', span: { min: 3, max: 10, preferred: 4 }, bodyLen: 2.4, bodyDia: 0.9, height: 'low' },
  { name: 'axial-large', title: 'axial, 1/2 W resistor body (Ø3 × 9 mm)', span: { min: 4, max: 12, preferred: 5 }, bodyLen: 3.5, bodyDia: 1.2, height: 'low' },
  { name: 'do35', title: 'axial, DO-35 glass diode body (Ø1.5–2.3 × 3–5 mm)', span: { min: 3, max: 8, preferred: 3 }, bodyLen: 1.6, bodyDia: 0.75, height: 'low' },
  { name: 'do41', title: 'axial, DO-41 diode body (Ø2–2.7 × 4–5.2 mm)', span: { min: 4, max: 10, preferred: 4 }, bodyLen: 2, bodyDia: 1, height: 'low' },
  { name: 'upright', title: 'axial part standing on end, leads 2.54 mm apart', span: { min: 1, max: 1, preferred: 1 }, bodyLen: 0, bodyDia: 0.9, height: 'small' },
];

export function axial(spec: AxialSpec, pinNames: [string, string]): Footprint {
  const [a, b] = pinNames;
  return {
    name: spec.name,
    title: spec.title,
    pinNames,
    span: spec.span,
    offsets: (span = spec.span.preferred) => ({ [a]: [0, 0], [b]: [span, 0] }),
    body: (span = spec.span.preferred) => {
      const out: Offset[] = [];
      for (let x = 0; x <= span; x++) out.push([x, 0]);
      return out;
    },
    outline: (span = spec.span.preferred): Shape[] => {
      if (spec.bodyLen === 0) return [{ shape: 'circle', cx: 0, cy: 0, r: spec.bodyDia / 2 }, { shape: 'line', x1: 0, y1: 0, x2: span, y2: 0 }];
      const len = Math.min(spec.bodyLen, Math.max(0.6, span - 0.6));
      const x = (span - len) / 2;
      return [
        { shape: 'line', x1: 0, y1: 0, x2: span, y2: 0 },
        { shape: 'rect', x, y: -spec.bodyDia / 2, w: len, h: spec.bodyDia },
      ];
    },
    height: spec.height,
    marks: marksFor(pinNames),
    rotations: [0, 1, 2, 3],
  };
}

interface RadialSpec {
  name: string;
  title: string;
  spacing: number;
  /** Body diameter in holes. */
  dia: number;
  height: HeightClass;
}

/** Radial bodies. Electrolytic can sizes and lead spacings: Vishay 515D / KEMET ESY tables (check-values §5). */
export const RADIAL_SPECS: RadialSpec[] = [
  { name: 'radial-2.54', title: 'radial, 2.54 mm leads (ceramic disc or MLCC)', spacing: 1, dia: 1.6, height: 'small' },
  { name: 'radial-5.08', title: 'radial, 5.08 mm leads (film box or large disc)', spacing: 2, dia: 2.8, height: 'small' },
  { name: 'radial-7.62', title: 'radial, 7.62 mm leads (film box)', spacing: 3, dia: 3.8, height: 'small' },
  { name: 'ecap-2.54', title: 'electrolytic can Ø5–6.3 mm, 2.54 mm leads', spacing: 1, dia: 2.2, height: 'tall' },
  { name: 'ecap-5.08', title: 'electrolytic can Ø10–12.5 mm, 5.08 mm leads', spacing: 2, dia: 4.2, height: 'tall' },
  { name: 'ecap-7.62', title: 'electrolytic can Ø16–18 mm, 7.62 mm leads', spacing: 3, dia: 6.6, height: 'tall' },
  { name: 'led-5mm', title: 'LED Ø5 mm, 2.54 mm leads', spacing: 1, dia: 2.1, height: 'tall' },
  { name: 'led-3mm', title: 'LED Ø3 mm, 2.54 mm leads', spacing: 1, dia: 1.3, height: 'tall' },
];

export function radial(spec: RadialSpec, pinNames: [string, string]): Footprint {
  const [a, b] = pinNames;
  const cx = spec.spacing / 2;
  const r = spec.dia / 2;
  const cells: Offset[] = [];
  for (let y = Math.floor(-r); y <= Math.ceil(r); y++)
    for (let x = Math.floor(cx - r); x <= Math.ceil(cx + r); x++)
      if ((x - cx) ** 2 + y ** 2 <= (r - 0.35) ** 2 || (y === 0 && x >= 0 && x <= spec.spacing)) cells.push([x, y]);
  return {
    name: spec.name,
    title: spec.title,
    pinNames,
    offsets: () => ({ [a]: [0, 0], [b]: [spec.spacing, 0] }),
    body: () => cells.map((c) => [c[0], c[1]] as Offset),
    outline: () => [{ shape: 'circle', cx, cy: 0, r }],
    height: spec.height,
    marks: marksFor(pinNames),
    rotations: [0, 1, 2, 3],
    spacingMm: spec.spacing * 2.54,
  };
}
