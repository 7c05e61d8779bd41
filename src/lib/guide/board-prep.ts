/**
 * Board preparation: the board's kind and size, and the rectangle to trim it to — the
 * bounding box of every hole in use (part bodies and leads, link and wire ends, cuts) grown
 * by `TRIM_MARGIN` holes and kept on the board.
 */
import type { Layout } from '../model/layout.ts';
import type { Hole } from '../model/problem.ts';
import { poseBody } from '../parts/footprint.ts';
import { lineHoles } from '../render/index.ts';
import { holeName, type Placed } from './placed.ts';
import type { BoardPrep } from './types.ts';

/** One spare hole beyond the outermost used hole, so strip ends are not at the very edge (common practice). */
export const TRIM_MARGIN = 1;

const DESCRIBE: Record<string, string> = {
  strip: 'strip board: copper strips run along the rows',
  pads: 'pad board: every hole has its own pad',
  bus: 'pre-patterned board: copper in fixed groups',
};

function round2(v: number): number {
  return Math.round(v * 100) / 100;
}

export function boardPrep(layout: Layout, placed: Placed[]): BoardPrep {
  const b = layout.board;
  const used: Hole[] = [];
  for (const p of placed) {
    used.push(...p.lp.pins.map((q) => q.at));
    if (p.fp && p.pose) used.push(...poseBody(p.fp, p.pose));
  }
  for (const l of layout.links) used.push(l.from, l.to);
  for (const w of layout.wires) used.push(...lineHoles(w.from, w.to));
  for (const c of layout.cuts) used.push(...('at' in c ? [c.at] : c.between));
  const inside = used.filter((h) => h[0] >= 0 && h[1] >= 0 && h[0] < b.cols && h[1] < b.rows);
  const xs = inside.map((h) => h[0]);
  const ys = inside.map((h) => h[1]);
  const c0 = inside.length ? Math.max(0, Math.min(...xs) - TRIM_MARGIN) : 0;
  const r0 = inside.length ? Math.max(0, Math.min(...ys) - TRIM_MARGIN) : 0;
  const c1 = inside.length ? Math.min(b.cols - 1, Math.max(...xs) + TRIM_MARGIN) : b.cols - 1;
  const r1 = inside.length ? Math.min(b.rows - 1, Math.max(...ys) + TRIM_MARGIN) : b.rows - 1;
  const cols = c1 - c0 + 1;
  const rows = r1 - r0 + 1;
  const prep: BoardPrep = {
    kind: b.kind,
    describe: DESCRIBE[b.kind] ?? b.kind,
    cols: b.cols,
    rows: b.rows,
    pitchMm: b.pitchMm,
    widthMm: round2(b.cols * b.pitchMm),
    heightMm: round2(b.rows * b.pitchMm),
    trim: {
      from: holeName([c0, r0], b.cols),
      to: holeName([c1, r1], b.cols),
      cols,
      rows,
      widthMm: round2(cols * b.pitchMm),
      heightMm: round2(rows * b.pitchMm),
      whole: cols === b.cols && rows === b.rows,
    },
  };
  if (b.pattern) prep.pattern = b.pattern;
  return prep;
}
