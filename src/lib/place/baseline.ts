/**
 * `naiveBaseline(design): BaselineFigures` — what a layout made without thought costs on a
 * strip board, to measure the planner against (placement-notes.md "How to know it is good").
 *
 * The naive layout: one full strip per net along the top; below them every part in columns
 * of its own, in its most upright pose at its preferred span; every connected pin on a
 * short segment of its own (the pin and the hole where its link lands), cut off from its
 * neighbours along the row and linked straight up to its net's strip. Links of one part
 * cannot share a column (they would cross each other's landing holes), so a part takes its
 * own width plus one column per connected pin. So: links = connected pins; cuts = in each
 * parts row, one between every two neighbouring pins; holes = the box of it all.
 */
import type { Design } from '../netlist/design.ts';
import { buildProblem } from './problem.ts';

export interface BaselineFigures {
  cuts: number;
  links: number;
  cols: number;
  rows: number;
  holes: number;
}

export function naiveBaseline(design: Design): BaselineFigures {
  const problem = buildProblem(design, { padsEdge: 'left' });
  const strips = problem.nets.filter((n) => !n.open && n.pins > 0).length;
  const pinsPerRow = new Map<number, number>();
  let cols = 0;
  let height = 0;
  let links = 0;
  for (const part of problem.parts) {
    const preferred = part.fp.span?.preferred;
    // Most upright: fewest pins sharing a row, then the preferred span, then the narrowest.
    const score = (o: (typeof part.poses)[number]) => {
      const rows = new Map<number, number>();
      for (const q of o.pins) rows.set(q[1], (rows.get(q[1]) ?? 0) + 1);
      return Math.max(...rows.values()) * 1000 + (preferred !== undefined && o.span !== undefined ? Math.abs(o.span - preferred) * 10 : 0) + (o.maxX - o.minX);
    };
    const pose = part.poses.reduce((a, b) => (score(b) < score(a) ? b : a));
    for (const q of pose.pins) {
      const r = q[1] - pose.minY;
      pinsPerRow.set(r, (pinsPerRow.get(r) ?? 0) + 1);
    }
    const connected = part.pinNet.filter((n) => !problem.nets[n]!.open).length;
    links += connected;
    cols += pose.maxX - pose.minX + 1 + connected;
    height = Math.max(height, pose.maxY - pose.minY + 1);
  }
  let cuts = 0;
  for (const n of pinsPerRow.values()) cuts += Math.max(0, n - 1);
  const rows = strips + height;
  return { cuts, links, cols, rows, holes: cols * rows };
}
