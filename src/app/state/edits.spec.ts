import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { fitPose, getFootprint, type Offset } from '../../lib/parts/index.ts';
import { movePart, shiftInside, toggleLock, turnPart } from './edits.ts';
import { smallLayout } from './fixtures.ts';
import type { Layout } from '../../lib/model/index.ts';

const pinsOf = (l: Layout, ref: string) => l.parts.find((p) => p.ref === ref)!.pins;
const poseOf = (l: Layout, ref: string) => {
  const part = l.parts.find((p) => p.ref === ref)!;
  const fp = getFootprint(part.footprint, part.pins.map((p) => p.pin))!;
  return fitPose(fp, Object.fromEntries(part.pins.map((p) => [p.pin, p.at as Offset])));
};

describe('part edits', () => {
  it('moves every pin of one part and nothing else', () => {
    const before = smallLayout();
    const r = movePart(before, 'R1', [2, 3]);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(pinsOf(r.layout, 'R1')).toEqual([{ pin: '1', at: [3, 4] }, { pin: '2', at: [7, 4] }]);
    expect(pinsOf(r.layout, 'Q1')).toBe(pinsOf(before, 'Q1'));
    expect(r.layout.cuts).toBe(before.cuts);
    expect(pinsOf(before, 'R1')[0]!.at).toEqual([1, 1]); // input untouched
  });

  it('pulls a part pushed off the board back to the edge', () => {
    const r = movePart(smallLayout(), 'R1', [20, -5]);
    expect(r.ok && pinsOf(r.layout, 'R1').map((p) => p.at)).toEqual([[7, 0], [11, 0]]);
  });

  it('names a missing part instead of throwing', () => {
    const r = movePart(smallLayout(), 'R9', [1, 0]);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.why).toContain('R9');
  });

  it('turns a TO-92 a quarter turn in place, keeping its lead order', () => {
    const r = turnPart(smallLayout(), 'Q1');
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    // Base: C B E left to right on row E; a clockwise quarter turn stacks them downwards.
    expect(pinsOf(r.layout, 'Q1')).toEqual([{ pin: 'C', at: [3, 3] }, { pin: 'B', at: [3, 4] }, { pin: 'E', at: [3, 5] }]);
    expect(poseOf(r.layout, 'Q1')?.rotation).toBe(1);
  });

  it('four turns bring any part back to a pose of the same footprint (property)', () => {
    fc.assert(
      fc.property(fc.constantFrom('R1', 'Q1', 'U1'), (ref) => {
        let l = smallLayout();
        for (let i = 0; i < 4; i++) {
          const r = turnPart(l, ref);
          expect(r.ok).toBe(true);
          if (r.ok) l = r.layout;
          expect(poseOf(l, ref)).toBeDefined();
          for (const p of pinsOf(l, ref)) {
            expect(p.at[0]).toBeGreaterThanOrEqual(0);
            expect(p.at[1]).toBeLessThan(l.board.rows);
          }
        }
        expect(poseOf(l, ref)?.rotation).toBe(0);
      }),
    );
  });

  it('refuses to turn a part whose pins lost their footprint shape', () => {
    const l = smallLayout();
    const bent = { ...l, parts: l.parts.map((p) => (p.ref === 'Q1' ? { ...p, pins: [p.pins[0]!, p.pins[2]!, p.pins[1]!] .map((q, i) => ({ pin: ['C', 'B', 'E'][i]!, at: q.at })) } : p)) };
    const r = turnPart(bent, 'Q1');
    expect(r.ok).toBe(false);
  });

  it('toggles the lock flag both ways', () => {
    const a = toggleLock(smallLayout(), 'U1');
    expect(a.ok && a.layout.parts.find((p) => p.ref === 'U1')!.locked).toBe(true);
    const b = a.ok ? toggleLock(a.layout, 'U1') : a;
    expect(b.ok && 'locked' in b.layout.parts.find((p) => p.ref === 'U1')!).toBe(false);
  });

  it('shiftInside brings any hole set inside when it fits (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.integer({ min: -30, max: 30 }), fc.integer({ min: -30, max: 30 })), { minLength: 1, maxLength: 6 }), (raw) => {
        const holes = raw.map(([x, y]) => [x, y] as Offset);
        const spanX = Math.max(...holes.map((h) => h[0])) - Math.min(...holes.map((h) => h[0]));
        const spanY = Math.max(...holes.map((h) => h[1])) - Math.min(...holes.map((h) => h[1]));
        const board = { cols: 61, rows: 61 };
        const [dx, dy] = shiftInside(board, holes);
        if (spanX < board.cols && spanY < board.rows)
          for (const h of holes) {
            expect(h[0] + dx).toBeGreaterThanOrEqual(0);
            expect(h[0] + dx).toBeLessThan(board.cols);
            expect(h[1] + dy).toBeGreaterThanOrEqual(0);
            expect(h[1] + dy).toBeLessThan(board.rows);
          }
      }),
    );
  });
});
