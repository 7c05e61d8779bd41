/**
 * Footprints with three or more leads: TO-92 and TO-220 in line, DIP at 300 mil, single-row
 * pad groups, trimmers and 2×N headers.
 */
import type { Footprint, Offset, Shape } from './footprint.ts';

function rectCells(x0: number, y0: number, x1: number, y1: number): Offset[] {
  const out: Offset[] = [];
  for (let y = y0; y <= y1; y++) for (let x = x0; x <= x1; x++) out.push([x, y]);
  return out;
}

/**
 * TO-92 with leads formed to 2.54 mm in one line (common practice; the straight-lead pitch is
 * 1.27 mm, check-values §4). `order` is the lead order left to right seen from the flat face;
 * at rotation 0 the flat faces down the page, so the order reads left to right on the board.
 */
export function to92(order: string): Footprint {
  const pins = order.split('');
  return {
    name: `to92-${order}`,
    title: `TO-92, leads in line at 2.54 mm, ${order.split('').join('-')} from the flat face`,
    pinNames: pins,
    offsets: () => Object.fromEntries(pins.map((p, i) => [p, [i, 0] as Offset])),
    body: () => rectCells(0, 0, 2, 0),
    outline: (): Shape[] => [{ shape: 'dee', cx: 1, cy: 0, r: 0.95, flat: 'down' }],
    height: 'transistor',
    marks: {},
    rotations: [0, 1, 2, 3],
    leadPitchMm: 2.54,
  };
}

/** TO-220 standing, leads at 2.54 mm, the tab behind the leads (up the page at rotation 0). */
export function to220(order: string): Footprint {
  const pins = order.split('');
  return {
    name: `to220-${order}`,
    title: `TO-220 upright, leads at 2.54 mm, ${order.split('').join('-')} from the printed face`,
    pinNames: pins,
    offsets: () => Object.fromEntries(pins.map((p, i) => [p, [i, 0] as Offset])),
    body: () => rectCells(-1, -1, 3, 0),
    outline: (): Shape[] => [
      { shape: 'rect', x: -0.95, y: -0.75, w: 3.9, h: 1.05 },
      { shape: 'rect', x: -0.95, y: -1.2, w: 3.9, h: 0.45 },
    ],
    height: 'transistor',
    marks: {},
    rotations: [0, 1, 2, 3],
    leadPitchMm: 2.54,
  };
}

/**
 * Plastic DIP, 300 mil (JEDEC MS-001 via maker drawings, check-values §3): lead pitch 2.54 mm,
 * rows 7.62 mm = 3 holes apart. Seen from the top with the notch up, pin 1 is top-left and
 * numbering runs down the left row and back up the right row (counter-clockwise).
 */
export function dip(n: number): Footprint {
  const half = n / 2;
  const pins = Array.from({ length: n }, (_, i) => String(i + 1));
  return {
    name: `dip-${n}`,
    title: `DIP-${n}, 300 mil rows, 2.54 mm pitch`,
    pinNames: pins,
    offsets: () => {
      const o: Record<string, Offset> = {};
      for (let k = 1; k <= n; k++) o[String(k)] = k <= half ? [0, k - 1] : [3, n - k];
      return o;
    },
    body: () => rectCells(0, 0, 3, half - 1),
    outline: (): Shape[] => [
      { shape: 'rect', x: 0.35, y: -0.45, w: 2.3, h: half - 0.1 },
      { shape: 'circle', cx: 1.5, cy: -0.45, r: 0.35 },
    ],
    height: 'socket',
    marks: { pin1: '1' },
    rotations: [0, 1, 2, 3],
    leadPitchMm: 2.54,
    rowSpacingMm: 7.62,
  };
}

/** A single row of pads for off-board wires (jacks, panel pots, power entry). */
export function padRow(n: number): Footprint {
  const pins = Array.from({ length: n }, (_, i) => String(i + 1));
  return {
    name: `pads-${n}`,
    title: `${n} pad${n === 1 ? '' : 's'} in a row for off-board wires`,
    pinNames: pins,
    offsets: () => Object.fromEntries(pins.map((p, i) => [p, [0, i] as Offset])),
    body: () => rectCells(0, 0, 0, n - 1),
    outline: (): Shape[] => [{ shape: 'rect', x: -0.45, y: -0.45, w: 0.9, h: n - 0.1 }],
    height: 'offboard',
    marks: { pin1: '1' },
    rotations: [0, 1, 2, 3],
    leadPitchMm: 2.54,
  };
}

/** 2×N pin header, odd pins in one row, even pins in the other (common practice). */
export function header2(n: number): Footprint {
  const pins = Array.from({ length: 2 * n }, (_, i) => String(i + 1));
  return {
    name: `header-2x${n}`,
    title: `2×${n} pin header, 2.54 mm`,
    pinNames: pins,
    offsets: () => Object.fromEntries(pins.map((p, i) => [p, [i % 2, Math.floor(i / 2)] as Offset])),
    body: () => rectCells(0, 0, 1, n - 1),
    outline: (): Shape[] => [{ shape: 'rect', x: -0.45, y: -0.45, w: 1.9, h: n - 0.1 }],
    height: 'offboard',
    marks: { pin1: '1' },
    rotations: [0, 1, 2, 3],
    leadPitchMm: 2.54,
  };
}

/** Trimmer: three leads in line, or in a triangle (ends 5.08 mm apart, wiper one row ahead). */
export function trimmer(style: 'inline' | 'triangle'): Footprint {
  const pins = ['1', 'W', '3'];
  const offs: Record<string, Offset> = style === 'inline' ? { '1': [0, 0], W: [1, 0], '3': [2, 0] } : { '1': [0, 0], W: [1, 1], '3': [2, 0] };
  return {
    name: `trimmer-${style}`,
    title: style === 'inline' ? 'trimmer, three leads in line at 2.54 mm' : 'trimmer, leads in a triangle (ends 5.08 mm apart)',
    pinNames: pins,
    offsets: () => ({ ...offs }),
    body: () => rectCells(0, style === 'inline' ? -1 : 0, 2, style === 'inline' ? 0 : 1),
    outline: (): Shape[] =>
      style === 'inline'
        ? [{ shape: 'rect', x: -0.4, y: -1.3, w: 2.8, h: 1.7 }]
        : [{ shape: 'rect', x: -0.4, y: -0.5, w: 2.8, h: 2 }],
    height: 'transistor',
    marks: {},
    rotations: [0, 1, 2, 3],
    leadPitchMm: 2.54,
  };
}
