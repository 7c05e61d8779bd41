import { describe, expect, it } from 'vitest';
import { leadAt, occupancy, partAt } from './hit.ts';
import { smallLayout } from './fixtures.ts';

describe('hole occupancy', () => {
  const occ = occupancy(smallLayout());
  it('finds a part by a lead hole and by a body hole', () => {
    expect(partAt(occ, [1, 1])).toBe('R1');
    expect(partAt(occ, [3, 1])).toBe('R1'); // under the resistor body
    expect(leadAt(occ, [3, 1])).toBeUndefined();
    expect(leadAt(occ, [3, 4])).toEqual({ ref: 'Q1', pin: 'B' });
    expect(partAt(occ, [8, 7])).toBe('U1'); // between the DIP rows
  });
  it('answers nothing for empty and off-board holes', () => {
    expect(partAt(occ, [0, 9])).toBeUndefined();
    expect(partAt(occ, [-1, 0])).toBeUndefined();
    expect(partAt(occ, [12, 0])).toBeUndefined();
  });
});
