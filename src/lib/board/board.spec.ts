import { describe, expect, it } from 'vitest';
import {
  breadboardBoard,
  BREADBOARD_ROWS,
  colNumber,
  conductorsOf,
  holeLabel,
  makeBoard,
  mirrorCol,
  parseBoardSpec,
  parseHoleLabel,
  rowLabel,
} from './index.ts';

describe('conductors', () => {
  it('a strip board has one strip per row, running the full width (exchange.md)', () => {
    const c = conductorsOf(makeBoard('strip', 24, 18));
    expect(c).toHaveLength(18);
    expect(c[5]).toHaveLength(24);
    expect(c[5]!.every((h) => h[1] === 5)).toBe(true);
  });
  it('a pad board has one pad per hole', () => {
    expect(conductorsOf(makeBoard('pads', 7, 5))).toHaveLength(35);
  });
  it('explicit conductors win', () => {
    const b = { ...makeBoard('strip', 4, 4), conductors: [[[0, 0], [0, 1]] as [number, number][]] };
    expect(conductorsOf(b)).toEqual([[[0, 0], [0, 1]]]);
  });
});

describe('breadboard pattern (common practice: groups of five each side of a centre gap, two rails each side)', () => {
  const b = breadboardBoard(30);
  const c = conductorsOf(b);
  it('has 4 rails and 2 groups of five per column', () => {
    expect(c).toHaveLength(4 + 2 * 30);
    const rails = c.filter((x) => x.length === 30);
    expect(rails).toHaveLength(4);
    const groups = c.filter((x) => x.length === 5);
    expect(groups).toHaveLength(60);
    for (const g of groups) expect(new Set(g.map((h) => h[0])).size).toBe(1);
  });
  it('leaves the centre gap without copper', () => {
    const used = new Set(c.flat().map((h) => `${h[0]},${h[1]}`));
    const gapRow = BREADBOARD_ROWS.upper + 5;
    expect(gapRow).toBeLessThan(BREADBOARD_ROWS.lower);
    expect(used.has(`0,${gapRow}`)).toBe(false);
  });
});

describe('labels', () => {
  it('letters rows and numbers columns from 1', () => {
    expect(rowLabel(0)).toBe('A');
    expect(rowLabel(25)).toBe('Z');
    expect(rowLabel(26)).toBe('AA');
    expect(holeLabel([0, 0], 'component', 24)).toBe('A1');
  });
  it('mirrors columns on the copper side: column 3 of 24 reads 22 (issue 7)', () => {
    expect(colNumber(2, 'copper', 24)).toBe(22);
    expect(colNumber(0, 'copper', 24)).toBe(24);
    expect(mirrorCol(2, 24)).toBe(21);
    expect(holeLabel([2, 4], 'copper', 24)).toBe('E22');
  });
  it('parses labels back', () => {
    expect(parseHoleLabel('E22', 'copper', 24)).toEqual([2, 4]);
    expect(parseHoleLabel('AA3', 'component', 24)).toEqual([2, 26]);
    expect(parseHoleLabel('3A', 'component', 24)).toBeUndefined();
  });
});

describe('board choice strings', () => {
  it('reads strip, pads, bus and auto', () => {
    const s = parseBoardSpec('strip:24x18');
    expect(s.ok && s.value.kind === 'fixed' && s.value.board.cols).toBe(24);
    const b = parseBoardSpec('bus:breadboard-40');
    expect(b.ok && b.value.kind === 'fixed' && b.value.board.conductors?.length).toBe(84);
    expect(parseBoardSpec('auto').ok).toBe(true);
  });
  it('names the fix for a bad choice', () => {
    const r = parseBoardSpec('stripboard 24 by 18');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems[0]!.hint).toMatch(/strip:COLSxROWS/);
  });
});
