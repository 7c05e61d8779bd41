/** Board: hole grids, their copper, labels for both sides, and board patterns. */
export { holeIndex, holeAt, onBoard, sameHole, conductorsOf, makeBoard, boardSizeMm } from './grid.ts';
export { rowLabel, colNumber, mirrorCol, holeLabel, holeLabelBoth, parseHoleLabel } from './labels.ts';
export type { Side } from './labels.ts';
export { breadboardBoard, BREADBOARD_ROWS, BREADBOARD_HEIGHT } from './breadboard.ts';
export type { BreadboardRows } from './breadboard.ts';
export { parseBoardSpec } from './spec.ts';
export type { BoardSpec } from './spec.ts';
