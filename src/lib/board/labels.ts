/**
 * Bench labels. Rows are letters (A, B, … Z, AA, AB …), columns are numbers from 1. The
 * copper side is the board turned over about its vertical axis: columns mirror, rows do not.
 */
import type { Hole } from '../model/problem.ts';

export type Side = 'component' | 'copper';

export function rowLabel(row: number): string {
  let n = row + 1;
  let s = '';
  while (n > 0) {
    const m = (n - 1) % 26;
    s = String.fromCharCode(65 + m) + s;
    n = Math.floor((n - 1) / 26);
  }
  return s;
}

/** 1-based column number as seen from `side` on a board `cols` holes wide. */
export function colNumber(col: number, side: Side, cols: number): number {
  return side === 'component' ? col + 1 : cols - col;
}

/** The column index (0-based, component side) seen at copper-side column index `col`. */
export function mirrorCol(col: number, cols: number): number {
  return cols - 1 - col;
}

/** "C7": row letter then column number, as seen from `side`. */
export function holeLabel(h: Hole, side: Side, cols: number): string {
  return `${rowLabel(h[1])}${colNumber(h[0], side, cols)}`;
}

/** Both sides at once: "C7 (copper C18)". */
export function holeLabelBoth(h: Hole, cols: number): string {
  return `${holeLabel(h, 'component', cols)} (copper ${holeLabel(h, 'copper', cols)})`;
}

/** Parse "C7" (component side) back to a hole; undefined if it is not a label. */
export function parseHoleLabel(label: string, side: Side, cols: number): Hole | undefined {
  const m = /^([A-Za-z]+)(\d+)$/.exec(label.trim());
  if (!m) return undefined;
  let row = 0;
  for (const ch of m[1]!.toUpperCase()) row = row * 26 + (ch.charCodeAt(0) - 64);
  const num = Number(m[2]);
  const col = side === 'component' ? num - 1 : cols - num;
  return [col, row - 1];
}
