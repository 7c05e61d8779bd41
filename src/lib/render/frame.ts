/**
 * Hole grid → millimetres for one side. Hole centres sit half a pitch in from the board
 * edge; the copper side is the board turned over about its vertical axis, so x mirrors
 * (x → width − x) and rows stay put (check-values §3 trap: copper side reads mirrored).
 */
import type { Board } from '../model/layout.ts';
import type { Hole } from '../model/problem.ts';
import { colNumber, rowLabel } from '../board/labels.ts';
import type { Point, SceneSide, SceneSizes } from './scene.ts';

export interface Frame {
  side: SceneSide;
  pitch: number;
  cols: number;
  rows: number;
  width: number;
  height: number;
  /** Centre of a hole, or of a fractional hole position, in mm on this side. */
  at(col: number, row: number): Point;
  /** Mirror an x already in mm (identity on the component side). */
  x(xComponent: number): number;
  /** Label as seen from the component side, and as seen from this side. */
  labels(h: Hole): { label: string; sideLabel: string };
  sizes: SceneSizes;
}

export function makeFrame(board: Board, side: SceneSide): Frame {
  const pitch = board.pitchMm;
  const width = board.cols * pitch;
  const height = board.rows * pitch;
  const x = (xc: number) => (side === 'copper' ? width - xc : xc);
  return {
    side,
    pitch,
    cols: board.cols,
    rows: board.rows,
    width,
    height,
    at: (col, row) => [round(x((col + 0.5) * pitch)), round((row + 0.5) * pitch)],
    x,
    labels: (h) => {
      const row = rowLabel(h[1]);
      return { label: `${row}${colNumber(h[0], 'component', board.cols)}`, sideLabel: `${row}${colNumber(h[0], side, board.cols)}` };
    },
    // check-values §8: hole ≈ Ø1.0 mm (0.4 pitch), strip ≈ 2 mm wide (pitch − 0.5 mm gap),
    // perfboard pad Ø ≈ 1.8–2 mm (0.75 pitch); all scale with the pitch.
    sizes: {
      holeR: 0.2 * pitch,
      padR: 0.375 * pitch,
      stripWidth: 0.8 * pitch,
      leadR: 0.26 * pitch,
      textSize: 0.5 * pitch,
    },
  };
}

export function round(v: number): number {
  return Math.round(v * 1000) / 1000;
}
