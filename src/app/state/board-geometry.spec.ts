import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { holeAtPoint, holeCentre, type SideGrid } from './board-geometry.ts';

describe('board millimetres and holes', () => {
  const comp: SideGrid = { side: 'component', pitchMm: 2.54, cols: 24, rows: 18 };
  const copper: SideGrid = { ...comp, side: 'copper' };

  it('puts hole A1 at the top-left on the component side and top-right on the copper side', () => {
    expect(holeCentre(comp, [0, 0])).toEqual([1.27, 1.27]);
    expect(holeCentre(copper, [0, 0])[0]).toBeCloseTo(24 * 2.54 - 1.27);
  });

  it('finds the hole back from any point inside its square, on both sides (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 23 }), fc.integer({ min: 0, max: 17 }), fc.double({ min: -0.49, max: 0.49, noNaN: true }), fc.double({ min: -0.49, max: 0.49, noNaN: true }), fc.boolean(), (c, r, dx, dy, flip) => {
          const g = flip ? copper : comp;
          const [x, y] = holeCentre(g, [c, r]);
          expect(holeAtPoint(g, [x + dx * g.pitchMm, y + dy * g.pitchMm])).toEqual([c, r]);
        }),
    );
  });

  it('answers undefined off the board', () => {
    expect(holeAtPoint(comp, [-0.1, 3])).toBeUndefined();
    expect(holeAtPoint(comp, [3, 18 * 2.54 + 0.01])).toBeUndefined();
  });
});
