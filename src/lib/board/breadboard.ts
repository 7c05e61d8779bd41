/**
 * A board printed in the pattern of a solderless breadboard (common practice): along the
 * length, numbered columns; across, two supply rails, a blank row, five holes a–e joined
 * per column, a centre gap, five holes f–j joined per column, a blank row, two more rails.
 * Rails run the full length. Blank and gap rows have holes but no copper.
 */
import type { Board } from '../model/layout.ts';
import type { Hole } from '../model/problem.ts';

export interface BreadboardRows {
  /** Row indices of the four rails, top to bottom. */
  rails: [number, number, number, number];
  /** First row of the upper group of five, and of the lower group. */
  upper: number;
  lower: number;
}

export const BREADBOARD_ROWS: BreadboardRows = { rails: [0, 1, 15, 16], upper: 3, lower: 9 };
export const BREADBOARD_HEIGHT = 17;

export function breadboardBoard(columns = 30, pitchMm = 2.54): Board {
  const conductors: Hole[][] = [];
  for (const r of BREADBOARD_ROWS.rails) {
    const rail: Hole[] = [];
    for (let c = 0; c < columns; c++) rail.push([c, r]);
    conductors.push(rail);
  }
  for (let c = 0; c < columns; c++) {
    for (const top of [BREADBOARD_ROWS.upper, BREADBOARD_ROWS.lower]) {
      const group: Hole[] = [];
      for (let r = top; r < top + 5; r++) group.push([c, r]);
      conductors.push(group);
    }
  }
  return { kind: 'bus', cols: columns, rows: BREADBOARD_HEIGHT, pitchMm, conductors, pattern: `breadboard-${columns}` };
}
